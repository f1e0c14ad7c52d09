import { useCallback, useMemo } from 'react';
import { ModeLegend } from './mode-legend';
import { PlotFigure, type PlotModule } from './plot-figure';
import { modeLabels } from '../../../shared/modes';
import { countsSubsets, hoursOfSpec, hoursText, modeRowSpecs, notCountedShort } from '../../../shared/report/mode-subsets';
import type { ModeHours } from '../../../shared/scenario/results';
import { MONTH_SHORT as monthShort } from '../../../shared/calendar';
import { monthlyModeRows } from '../../lib/charts/monthly-mode-rows';
import { ModeColumnHead, modeSpecKey } from '../ui/mode-marks';
import { modeColourScale, modeLabelOrder } from '../../lib/charts/mode-scale';

/**
 * Stacked hours per mode for each calendar month (site standard time), with the table beside it
 * (`withTable={false}` where the page prints the table itself, as the report does).
 */
export function MonthlyModeChart({
  byMonth,
  zoneLabel,
  withTable = true,
  engineVersion,
}: {
  byMonth: (ModeHours & { month: number })[];
  zoneLabel: string;
  withTable?: boolean;
  engineVersion?: string;
}) {
  const rows = useMemo(() => monthlyModeRows(byMonth), [byMonth]);
  const render = useCallback(
    (Plot: PlotModule, widthPx: number) =>
      Plot.plot({
        width: widthPx,
        height: 300,
        marginLeft: 56,
        // Room for the axis title under the month names, so they never overlap at a page's width.
        marginBottom: 42,
        style: { fontFamily: 'var(--font-sans)', fontSize: '12px' },
        x: { domain: monthShort, label: `Month (${zoneLabel})`, labelAnchor: 'center', labelArrow: 'none' },
        y: { label: 'Hours (h)', grid: true, labelArrow: 'up' },
        color: modeColourScale,
        marks: [
          Plot.barY(rows, {
            x: (d: (typeof rows)[number]) => monthShort[d.month - 1],
            y: 'hours',
            fill: (d: (typeof rows)[number]) => modeLabels[d.mode],
            order: modeLabelOrder,
            tip: { format: { x: true, y: (v: number) => `${v.toLocaleString('en')} h`, fill: true } },
          }),
          Plot.ruleY([0]),
        ],
      }),
    [rows, zoneLabel],
  );
  return (
    <div className="space-y-2">
      <ModeLegend />
      <PlotFigure render={render} label="Hours per mode for each month" placeholderHeightPx={300} />
      {withTable && (
        <details className="text-sm">
          <summary className="cursor-pointer text-ink-soft">Table of the same figures</summary>
          <table className="num mt-2 w-full text-right text-xs">
            <thead>
              <tr className="border-b border-rule text-ink-soft">
                <th scope="col" className="py-1 text-left font-sans font-medium">
                  Month
                </th>
                {modeRowSpecs.map((spec) => (
                  <ModeColumnHead key={modeSpecKey(spec)} spec={spec} />
                ))}
              </tr>
            </thead>
            <tbody>
              {byMonth.map((m) => (
                <tr key={m.month} className="border-b border-rule/60">
                  <th scope="row" className="py-0.5 text-left font-sans font-normal">
                    {monthShort[m.month - 1]}
                  </th>
                  {modeRowSpecs.map((spec) => (
                    <td key={modeSpecKey(spec)} className={`px-2 py-0.5 ${spec.kind === 'subset' ? 'text-ink-soft' : ''}`}>
                      {hoursText(hoursOfSpec(m, spec))}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
          {engineVersion && byMonth.length > 0 && !countsSubsets({ hours: byMonth[0] }) && (
            <p className="mt-1 text-xs text-ink-soft">{notCountedShort(engineVersion)}</p>
          )}
        </details>
      )}
    </div>
  );
}
