// @ts-nocheck
import { useCallback, useMemo, useState } from 'react';
import type { MonthlyClimate } from '../../../../shared/morphing';
import { PlotFigure, type PlotModule } from '@/components/charts/plot-figure';
import { MONTH_SHORT as monthNames } from '../../../../shared/calendar';
import { SegmentedSwitch } from '@/components/charts/segmented-switch';
import { formatQuantity, toDisplay, unitOf, type QuantityKind } from '@/lib/quantity';
import { useUnitSystem, type UnitSystem } from '@/lib/unit-system';

type View = 'dryBulb' | 'dewPoint' | 'specificHumidity';

const views: ReadonlyArray<{ value: View; label: string }> = [
  { value: 'dryBulb', label: 'Dry-bulb' },
  { value: 'dewPoint', label: 'Dew point' },
  { value: 'specificHumidity', label: 'Specific humidity' },
];

// Today in the faint ink, dashed; the projection in harbour blue: theme tokens (src/index.css), not mode colours.
const TODAY = '#626b70';
const PROJECTION = '#2e5468';

interface Row {
  month: number;
  low: number | null;
  mean: number | null;
  high: number | null;
}

/** Per month: low, mean and high of one quantity, SI (°C, or kg/kg for specific humidity). */
function rowsOf(c: MonthlyClimate, view: View): Row[] {
  if (view === 'dryBulb') {
    return c.dryBulbC.map((r, m) => ({ month: r.month, low: c.meanDailyMinC[m], mean: r.mean, high: c.meanDailyMaxC[m] }));
  }
  const source = view === 'dewPoint' ? c.dewPointC : c.specificHumidityGPerKg;
  const si = (v: number | null) => (v === null ? null : view === 'specificHumidity' ? v / 1000 : v);
  return source.map((r) => ({ month: r.month, low: si(r.min), mean: si(r.mean), high: si(r.max) }));
}

const kindOf = (view: View): QuantityKind => (view === 'specificHumidity' ? 'humidityRatio' : 'temperature');
const changeKindOf = (view: View): QuantityKind => (view === 'specificHumidity' ? 'humidityRatio' : 'temperatureDifference');

/** Today and the projection month by month: a chart of both and the same figures as a table. */
export function MonthlyComparison({ today, projection }: { today: MonthlyClimate; projection: MonthlyClimate }) {
  const { unitSystem } = useUnitSystem();
  const [view, setView] = useState<View>('dryBulb');
  const a = useMemo(() => rowsOf(today, view), [today, view]);
  const b = useMemo(() => rowsOf(projection, view), [projection, view]);
  const kind = kindOf(view);
  const lowWord = view === 'dryBulb' ? 'Mean daily min' : 'Min';
  const highWord = view === 'dryBulb' ? 'Mean daily max' : 'Max';
  const f = (v: number | null) => formatQuantity(kind, unitSystem, v, false);
  const change = (x: number | null, y: number | null) => {
    if (x === null || y === null) return '–';
    const d = toDisplay(changeKindOf(view), unitSystem, y - x);
    return `${d > 0 ? '+' : d < 0 ? '−' : '±'}${Math.abs(d).toFixed(kind === 'humidityRatio' ? (unitSystem === 'SI' ? 2 : 1) : 1)}`;
  };
  const render = useCallback((Plot: PlotModule, widthPx: number) => chart(Plot, widthPx, a, b, view, unitSystem), [a, b, view, unitSystem]);
  const unit = unitOf(kind, unitSystem);

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <SegmentedSwitch label="Quantity" options={views} value={view} onChange={setView} />
        <p className="flex gap-4 text-xs text-ink-soft" aria-hidden="true">
          <span>
            <span className="mr-1 inline-block w-5 border-t-2 border-dashed align-middle" style={{ borderColor: TODAY }} />
            Today
          </span>
          <span>
            <span className="mr-1 inline-block w-5 border-t-2 align-middle" style={{ borderColor: PROJECTION }} />
            Projection
          </span>
          <span>
            band: {lowWord.toLowerCase()} to {highWord.toLowerCase()}
          </span>
        </p>
      </div>
      <PlotFigure
        render={render}
        label={`Monthly ${views.find((v) => v.value === view)!.label.toLowerCase()}, today and projection`}
        placeholderHeightPx={300}
      />
      <div className="overflow-x-auto">
        <table className="w-full table-fixed text-right text-sm" data-testid="projection-monthly-table">
          <colgroup>
            <col className="w-16" />
          </colgroup>
          <caption className="pb-1 text-left text-xs text-ink-soft">
            {views.find((v) => v.value === view)!.label} by month on the site's standard time, {unit}
            {view === 'specificHumidity' && ' of moist air'}
          </caption>
          <thead>
            <tr className="text-xs text-ink-soft">
              <th scope="col" rowSpan={2} className="py-1 text-left font-medium">
                Month
              </th>
              <th scope="colgroup" colSpan={3} className="border-b border-rule px-2 text-center font-medium">
                Today
              </th>
              <th scope="colgroup" colSpan={3} className="border-b border-rule px-2 text-center font-medium">
                Projection
              </th>
              <th scope="col" rowSpan={2} className="px-2 font-medium">
                Change of mean
              </th>
            </tr>
            <tr className="border-b border-rule text-xs text-ink-soft">
              {[0, 1].flatMap((i) => [
                <th key={`${i}l`} scope="col" className="px-2 font-medium">
                  {lowWord}
                </th>,
                <th key={`${i}m`} scope="col" className="px-2 font-medium">
                  Mean
                </th>,
                <th key={`${i}h`} scope="col" className="px-2 font-medium">
                  {highWord}
                </th>,
              ])}
            </tr>
          </thead>
          <tbody>
            {a.map((r, m) => (
              <tr key={r.month} className={`border-b border-rule/60 ${r.mean === null ? 'text-ink-faint' : ''}`}>
                <th scope="row" className="py-1 text-left font-normal">
                  {monthNames[m]}
                </th>
                <td className="num px-2">{f(r.low)}</td>
                <td className="num px-2">{f(r.mean)}</td>
                <td className="num px-2">{f(r.high)}</td>
                <td className="num px-2">{f(b[m].low)}</td>
                <td className="num px-2 font-semibold">{f(b[m].mean)}</td>
                <td className="num px-2">{f(b[m].high)}</td>
                <td className="num px-2">{change(r.mean, b[m].mean)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

function chart(Plot: PlotModule, widthPx: number, a: Row[], b: Row[], view: View, system: UnitSystem): Element {
  const kind = kindOf(view);
  const shown = (rows: Row[], series: string) =>
    rows
      .filter((r) => r.mean !== null)
      .map((r) => ({
        series,
        month: r.month,
        low: r.low === null ? null : toDisplay(kind, system, r.low),
        mean: toDisplay(kind, system, r.mean!),
        high: r.high === null ? null : toDisplay(kind, system, r.high),
      }));
  const today = shown(a, 'Today');
  const projected = shown(b, 'Projection');
  const label = views.find((v) => v.value === view)!.label;
  return Plot.plot({
    width: widthPx,
    height: 300,
    marginLeft: 52,
    marginBottom: 44,
    style: { fontSize: '12px', fontFamily: 'inherit' },
    x: {
      domain: [1, 12],
      inset: 14,
      ticks: 12,
      tickFormat: (m: number) => monthNames[m - 1],
      label: 'Month (site standard time)',
      labelAnchor: 'center',
      labelOffset: 38,
    },
    y: { label: `${label} (${unitOf(kind, system)})`, grid: true },
    marks: [
      Plot.areaY(today, { x: 'month', y1: 'low', y2: 'high', fill: TODAY, fillOpacity: 0.12 }),
      Plot.areaY(projected, { x: 'month', y1: 'low', y2: 'high', fill: PROJECTION, fillOpacity: 0.16 }),
      Plot.line(today, { x: 'month', y: 'mean', stroke: TODAY, strokeWidth: 2, strokeDasharray: '5 4' }),
      Plot.line(projected, { x: 'month', y: 'mean', stroke: PROJECTION, strokeWidth: 2.5 }),
      Plot.dot(today, { x: 'month', y: 'mean', fill: TODAY, r: 3 }),
      Plot.dot(projected, { x: 'month', y: 'mean', fill: PROJECTION, r: 3.5 }),
      Plot.tip(
        [...today, ...projected],
        Plot.pointerX({
          x: 'month',
          y: 'mean',
          title: (d: { series: string; month: number; mean: number }) => `${d.series}, ${monthNames[d.month - 1]}: ${d.mean.toFixed(1)}`,
        }),
      ),
    ],
  });
}
