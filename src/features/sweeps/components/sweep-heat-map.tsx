import { useCallback, useMemo, useState } from 'react';
import { densityRamp } from '@/lib/charts/colour-ramps';
import { PlotFigure, type PlotModule } from '@/components/charts/plot-figure';
import { useUnitSystem } from '@/lib/unit-system';
import { axisOrder, gridCells, SWEEP_METRICS, sweepMetric, type SweepInputPath, type SweepMetric, type SweepPoint } from '../../../../shared/sweep';
import { formatSweepValue, sweepAxisTitle } from '@/lib/sweep-value';
import { compactPresetLabel } from '../lib/sweep-format';
import { formatMetric, metricTitle, shownNumber } from '@/lib/metric-text';
import { NOT_COUNTED } from '../../../../shared/report/mode-subsets';

/** Ink on the pale half of the ramp, paper on the dark half, so every cell's figure keeps its contrast. */
const cellInk = (t: number) => (t < 0.45 ? '#1d2327' : '#ffffff');

/**
 * A two-input sweep as a heat map of one chosen metric (rows the first input, columns the second), cells
 * with no mechanical hours outlined, and the same figures as a table.
 */
export function SweepHeatMap({ rowInput, columnInput, points }: { rowInput: SweepInputPath; columnInput: SweepInputPath; points: readonly SweepPoint[] }) {
  const { unitSystem } = useUnitSystem();
  const [metric, setMetric] = useState<SweepMetric>('mechanical');
  const rowLabels = useMemo(() => axisOrder(points, rowInput).map((v) => formatSweepValue(rowInput, unitSystem, v)), [points, rowInput, unitSystem]);
  const columnLabels = useMemo(
    () => axisOrder(points, columnInput).map((v) => formatSweepValue(columnInput, unitSystem, v)),
    [points, columnInput, unitSystem],
  );
  // Preset names are long: the chart's ticks take the short form, the table the full one.
  const tick = useCallback((label: string) => compactPresetLabel(label), []);
  const cells = useMemo(
    () =>
      gridCells(points, rowInput, columnInput, metric).map((c) => ({
        ...c,
        rowLabel: formatSweepValue(rowInput, unitSystem, c.row),
        columnLabel: formatSweepValue(columnInput, unitSystem, c.column),
        shown: c.metric === null ? null : shownNumber(sweepMetric(metric), unitSystem, c.metric),
        text: c.metric === null && c.done ? NOT_COUNTED : formatMetric(sweepMetric(metric), unitSystem, c.metric, { withUnit: false }),
      })),
    [points, rowInput, columnInput, metric, unitSystem],
  );
  const title = metricTitle(sweepMetric(metric), unitSystem);
  const rowTitle = sweepAxisTitle(rowInput, unitSystem);
  const columnTitle = sweepAxisTitle(columnInput, unitSystem);

  const render = useCallback(
    (Plot: PlotModule, widthPx: number) => {
      const values = cells.map((c) => c.shown).filter((v): v is number => v !== null);
      const lo = Math.min(...values);
      const hi = Math.max(...values);
      const t = (v: number | null) => (v === null || hi === lo ? 0 : (v - lo) / (hi - lo));
      const bandPx = Math.max(26, Math.min(44, 360 / Math.max(1, rowLabels.length)));
      const colour = { type: 'linear' as const, domain: values.length ? [lo, hi] : [0, 1], interpolate: densityRamp, label: title };
      const figure = document.createElement('div');
      // The ramp is drawn apart from the plot so its first tick keeps a margin of its own.
      figure.append(Plot.legend({ color: colour, marginLeft: 12, width: 340 }));
      figure.append(
        Plot.plot({
          width: widthPx,
          height: 70 + bandPx * rowLabels.length,
          marginLeft: Math.min(200, 16 + 7 * Math.max(...rowLabels.map((l) => tick(l).length))),
          marginTop: 28,
          marginBottom: 44,
          style: { fontFamily: 'var(--font-sans)', fontSize: '12px' },
          x: { type: 'band', domain: columnLabels, label: columnTitle, labelAnchor: 'center', labelArrow: 'none', labelOffset: 36, tickFormat: tick },
          // The row title sits above the axis, level, so it never runs into the row labels.
          y: { type: 'band', domain: rowLabels, label: rowTitle, labelAnchor: 'top', labelArrow: 'none', tickFormat: tick },
          color: colour,
          marks: [
            Plot.cell(
              cells.filter((c) => c.shown === null),
              { x: 'columnLabel', y: 'rowLabel', fill: '#f6f5f1', stroke: '#dcdad2', inset: 1 },
            ),
            Plot.cell(
              cells.filter((c) => c.shown !== null),
              { x: 'columnLabel', y: 'rowLabel', fill: 'shown', inset: 1, tip: true },
            ),
            Plot.cell(
              cells.filter((c) => c.noMechanical),
              { x: 'columnLabel', y: 'rowLabel', fill: 'none', stroke: '#1d2327', strokeWidth: 2, strokeDasharray: '3,2', inset: 3 },
            ),
            Plot.cell(
              cells.filter((c) => c.breaksEnvelope),
              { x: 'columnLabel', y: 'rowLabel', fill: 'none', stroke: '#a8322d', strokeWidth: 2, inset: 2 },
            ),
            Plot.text(cells, {
              x: 'columnLabel',
              y: 'rowLabel',
              text: 'text',
              fill: (c: (typeof cells)[number]) => cellInk(t(c.shown)),
              fontFamily: 'var(--font-mono)',
            }),
          ],
        }),
      );
      return figure;
    },
    [cells, rowLabels, columnLabels, rowTitle, columnTitle, title, tick],
  );

  return (
    <div className="space-y-3">
      <label className="flex items-baseline gap-2 text-sm">
        <span className="text-ink-soft">Colour the cells by</span>
        <select
          className="rounded border border-rule bg-panel px-2 py-1"
          value={metric}
          onChange={(e) => setMetric(e.target.value as SweepMetric)}
          data-testid="heat-map-metric"
        >
          {SWEEP_METRICS.filter((m) => m !== 'liquidMechanical' || points.some((p) => p.results?.liquidMechanicalHours !== undefined)).map((m) => (
            <option key={m} value={m}>
              {sweepMetric(m).label}
            </option>
          ))}
        </select>
      </label>
      <PlotFigure render={render} label={`${title} for each ${rowTitle} and ${columnTitle}`} placeholderHeightPx={320} />
      <p className="text-xs text-ink-soft">
        Cells outlined with a dashed line have no mechanical hours (inside the envelope); cells outlined in red break the inlet envelope (supply setpoint beyond
        the derated limits, every hour an excursion), marked ✕ in the table. Pale cells with a dash have not finished yet.
      </p>
      <details className="text-sm">
        <summary className="cursor-pointer text-ink-soft">Table of the same figures</summary>
        <div className="overflow-x-auto">
          <table className="num mt-2 text-right text-xs" data-testid="heat-map-table">
            <caption className="pb-1 text-left font-sans text-ink-soft">
              {title}: rows {rowTitle}, columns {columnTitle}
            </caption>
            <thead>
              <tr className="border-b border-rule text-ink-soft">
                <th scope="col" className="py-1 pr-3 text-left font-sans font-medium">
                  {rowTitle} \ {columnTitle}
                </th>
                {columnLabels.map((c) => (
                  <th key={c} scope="col" className="px-2 py-1 font-sans font-medium">
                    {c}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {rowLabels.map((r) => (
                <tr key={r} className="border-b border-rule/60">
                  <th scope="row" className="py-0.5 pr-3 text-left font-sans font-normal">
                    {r}
                  </th>
                  {columnLabels.map((c) => (
                    <td key={c} className="px-2 py-0.5">
                      {(() => {
                        const cell = cells.find((x) => x.rowLabel === r && x.columnLabel === c);
                        return cell ? `${cell.text}${cell.breaksEnvelope ? ' ✕' : ''}` : '–';
                      })()}
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
