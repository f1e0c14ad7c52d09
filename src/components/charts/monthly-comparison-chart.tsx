import { useCallback, useMemo } from 'react';
import { ModeLegend } from './mode-legend';
import { PlotFigure, type PlotModule } from './plot-figure';
import { hoursOfMode, modeKeys, modeLabels, type ModeKey } from '../../../shared/modes';
import type { ModeHours } from '../../../shared/scenario/results';
import { MONTH_SHORT as months } from '../../../shared/calendar';
import { modeColourScale, modeLabelOrder } from '../../lib/charts/mode-scale';

type MonthRow = ModeHours & { month: number };

interface Bar {
  month: string;
  run: string;
  mode: ModeKey;
  hours: number;
}

/** For each month, one stacked bar per run: the modes' hours side by side (`withTable={false}` where the page prints its own table). */
export function MonthlyComparisonChart({ series, withTable = true }: { series: { runId: number; hoursByMonth: MonthRow[] }[]; withTable?: boolean }) {
  const bars = useMemo<Bar[]>(
    () =>
      series.flatMap((s) =>
        s.hoursByMonth.flatMap((m) => modeKeys.map((mode) => ({ month: months[m.month - 1], run: `Run ${s.runId}`, mode, hours: hoursOfMode(m, mode) }))),
      ),
    [series],
  );
  const render = useCallback(
    (Plot: PlotModule, widthPx: number) =>
      Plot.plot({
        width: widthPx,
        height: 320,
        marginLeft: 56,
        marginBottom: 48,
        // Room above the month names for the facet title, so "Month" does not sit on them.
        marginTop: 40,
        style: { fontFamily: 'var(--font-sans)', fontSize: '11px' },
        fx: { domain: months, label: 'Month', padding: 0.15 },
        x: { domain: series.map((s) => `Run ${s.runId}`), tickRotate: -40, label: null },
        y: { label: 'Hours (h)', grid: true, labelArrow: 'up' },
        color: modeColourScale,
        marks: [
          Plot.barY(bars, {
            fx: 'month',
            x: 'run',
            y: 'hours',
            fill: (d: Bar) => modeLabels[d.mode],
            order: modeLabelOrder,
            tip: { format: { fx: true, x: true, y: (v: number) => `${v.toLocaleString('en')} h`, fill: true } },
          }),
          Plot.ruleY([0]),
        ],
      }),
    [bars, series],
  );
  return (
    <div className="space-y-2">
      <ModeLegend />
      <PlotFigure render={render} label="Hours per mode for each month, one bar per run" placeholderHeightPx={320} />
      {withTable && (
        <details className="text-sm">
          <summary className="cursor-pointer text-ink-soft">Table of the same figures</summary>
          <table className="num mt-2 w-full text-right text-xs">
            <caption className="pb-1 text-left font-sans text-ink-soft">Hours free / adiabatic / mechanical per month</caption>
            <thead>
              <tr className="border-b border-rule text-ink-soft">
                <th scope="col" className="py-1 text-left font-sans font-medium">
                  Month
                </th>
                {series.map((s) => (
                  <th key={s.runId} scope="col" className="px-2 py-1 font-sans font-medium">
                    Run {s.runId}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {months.map((name, i) => (
                <tr key={name} className="border-b border-rule/60">
                  <th scope="row" className="py-0.5 text-left font-sans font-normal">
                    {name}
                  </th>
                  {series.map((s) => {
                    const m = s.hoursByMonth.find((r) => r.month === i + 1);
                    return (
                      <td key={s.runId} className="px-2 py-0.5">
                        {m ? `${m.free} / ${m.adiabatic} / ${m.mechanical}` : '–'}
                      </td>
                    );
                  })}
                </tr>
              ))}
            </tbody>
          </table>
        </details>
      )}
    </div>
  );
}
