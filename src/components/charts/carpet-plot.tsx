import { useCallback, useMemo } from 'react';
import { modeColours, modeKeys, modeLabels } from '../../../shared/modes';
import { formatCount, formatQuantity, toDisplay, unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { CARPET_DAYS, carpetBins, carpetSummary, HOURS_PER_DAY, LEAP_DAY_INDEX } from '../../lib/charts/carpet-data';
import { MONTH_SHORT as monthNames } from '../../../shared/calendar';
import { utcOffsetLabel } from '../../../shared/time-zone';
import { carpetDayLabel, carpetMonthStartDays } from '../../lib/charts/chart-format';
import { temperatureRamp } from '../../lib/charts/colour-ramps';
import { ModeLegend } from './mode-legend';
import { PlotFigure, type PlotModule } from './plot-figure';

export interface CarpetPlotProps {
  timestampsMs: ArrayLike<number>;
  /** °C for kind 'temperature'; mode codes 0 free, 1 adiabatic, 2 mechanical, 3 no data for kind 'mode'. */
  values: ArrayLike<number>;
  kind: 'temperature' | 'mode';
  /** The site's standard-time offset, so rows are local hours; UTC when omitted. */
  utcOffsetMinutes?: number;
}

/** Day of year × hour of day, each cell coloured by the hour's temperature (mean over years) or its most frequent mode. */
export function CarpetPlot({ timestampsMs, values, kind, utcOffsetMinutes = 0 }: CarpetPlotProps) {
  const { unitSystem } = useUnitSystem();
  const grid = useMemo(() => carpetBins(timestampsMs, values, kind, utcOffsetMinutes), [timestampsMs, values, kind, utcOffsetMinutes]);
  const summary = useMemo(() => carpetSummary(timestampsMs, values, kind, utcOffsetMinutes), [timestampsMs, values, kind, utcOffsetMinutes]);
  const zone = utcOffsetLabel(utcOffsetMinutes);
  const label =
    kind === 'temperature' ? `Dry-bulb temperature by day of year and hour of day (${zone})` : `Cooling mode by day of year and hour of day (${zone})`;

  const render = useCallback(
    (Plot: PlotModule, widthPx: number) => {
      // Without a 29 February in the data, close its column so March follows February directly.
      const shift = grid.leapDay ? 0 : 1;
      const columns = CARPET_DAYS - shift;
      const dayIndex = (c: number) => Math.floor(c / HOURS_PER_DAY);
      // 0-based column of a cell
      const column = (c: number) => dayIndex(c) - (dayIndex(c) > LEAP_DAY_INDEX ? shift : 0);
      const monthTicks = carpetMonthStartDays.map((d, m) => (m >= 2 ? d - shift : d));
      const hour = (c: number) => c % HOURS_PER_DAY;
      const many = grid.years > 1;
      // Hover text for the hovered cell alone (Plot's tip formats only the hour it shows).
      const title = (c: number) => {
        const when = `${carpetDayLabel(dayIndex(c) + 1)}, ${String(hour(c)).padStart(2, '0')}:00–${String(hour(c) + 1).padStart(2, '0')}:00`;
        if (kind === 'mode') {
          const key = modeKeys[grid.cells[c]];
          return `${when}\n${modeLabels[key]}${many ? ` (most frequent of ${grid.counts[c]} years)` : ''}`;
        }
        return `${when}\n${formatQuantity('temperature', unitSystem, grid.cells[c])}${many ? ` (mean of ${grid.counts[c]} years)` : ''}`;
      };
      // One pixel per cell, row-major (hour × column), painted on a canvas by Plot's raster mark. Empty cells stay
      // clear: NaN is outside the temperature scale, null is no colour.
      const pixels: Array<number | string | null> = new Array(columns * HOURS_PER_DAY).fill(kind === 'temperature' ? Number.NaN : null);
      const index: number[] = [];
      for (let c = 0; c < grid.cells.length; c++) {
        const v = grid.cells[c];
        if (v !== v) continue;
        index.push(c);
        pixels[hour(c) * columns + column(c)] = kind === 'temperature' ? toDisplay('temperature', unitSystem, v) : modeColours[modeKeys[v]];
      }
      return Plot.plot({
        width: widthPx,
        height: Math.max(220, Math.min(360, Math.round(widthPx * 0.28))),
        marginLeft: 48,
        marginBottom: 36,
        style: { fontFamily: 'var(--font-sans)', fontSize: '12px' },
        x: {
          domain: [1, 367 - shift],
          ticks: monthTicks,
          tickFormat: (d: number) => monthNames[monthTicks.indexOf(d)] ?? '',
          label: 'Day of year →',
          labelAnchor: 'right',
        },
        y: {
          domain: [24, 0],
          ticks: [0, 6, 12, 18, 24],
          tickFormat: (h: number) => `${String(h).padStart(2, '0')}:00`,
          label: `↓ Hour of day (${zone})`,
          labelAnchor: 'top',
        },
        color:
          kind === 'temperature'
            ? { type: 'linear', interpolate: temperatureRamp, legend: true, label: `Dry-bulb (${unitOf('temperature', unitSystem)})` }
            : undefined,
        marks: [
          Plot.raster(pixels, { width: columns, height: HOURS_PER_DAY, x1: 1, x2: 1 + columns, y1: 0, y2: HOURS_PER_DAY, imageRendering: 'pixelated' }),
          // The title channel carries the cell only; `format` writes the text when the tip shows it.
          Plot.tip(index, Plot.pointer({ x: (c: number) => column(c) + 1.5, y: (c: number) => hour(c) + 0.5, title: (c: number) => c, format: { title } })),
        ],
      });
    },
    [grid, kind, unitSystem, zone],
  );

  const bandLabels = ['00–04', '04–08', '08–12', '12–16', '16–20', '20–24'];
  return (
    <div className="space-y-2">
      {kind === 'mode' && <ModeLegend />}
      <PlotFigure render={render} label={label} placeholderHeightPx={280} />
      <details className="text-sm">
        <summary className="cursor-pointer text-ink-soft">Table of the same figures</summary>
        <div className="mt-2 overflow-x-auto">
          <table className="num w-full text-right text-xs">
            <caption className="pb-1 text-left font-sans text-ink-soft">
              {kind === 'temperature'
                ? `Mean dry-bulb (${unitOf('temperature', unitSystem)}) per month and 4-hour band, ${zone}`
                : `Hours per mode and month, ${zone}`}
            </caption>
            <thead>
              <tr className="border-b border-rule text-ink-soft">
                <th scope="col" className="py-1 text-left font-sans font-medium">
                  Month
                </th>
                {(kind === 'mode' ? modeKeys.map((k) => modeLabels[k]) : bandLabels).map((h) => (
                  <th key={h} scope="col" className="px-2 py-1 font-sans font-medium">
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {summary.map((row) => (
                <tr key={row.month} className="border-b border-rule/60">
                  <th scope="row" className="py-0.5 text-left font-sans font-normal">
                    {monthNames[row.month - 1]}
                  </th>
                  {row.values.map((v, i) => (
                    <td key={i} className="px-2 py-0.5">
                      {kind === 'mode' ? formatCount(v) : formatQuantity('temperature', unitSystem, v, false)}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </details>
    </div>
  );
}
