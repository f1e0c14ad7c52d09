// @ts-nocheck
import { hoursOfMode, modeKeys, modeLabels } from '../../../shared/modes';
import type { ModeHours } from '../../../shared/scenario/results';
import { ModeShareBar, ModeSwatch } from './mode-marks';

type Hours = Pick<ModeHours, 'free' | 'adiabatic' | 'mechanical' | 'noData' | 'total'>;

/**
 * A hybrid hall's hours per mode for each loop beside the hall's own (the more demanding loop each hour), with a
 * share bar per column: the editor's preview and the run page show the same table.
 */
export function LoopHoursTable({ hall, liquid, air, liquidShare }: { hall: Hours; liquid: Hours; air: Hours; liquidShare: number }) {
  const columns = [
    { key: 'liquid', title: `Liquid ${Math.round(liquidShare * 100)} %`, hours: liquid },
    { key: 'air', title: `Air ${Math.round((1 - liquidShare) * 100)} %`, hours: air },
    { key: 'hall', title: 'Hall', hours: hall },
  ];
  return (
    <table className="w-full text-sm" data-testid="loop-hours">
      <caption className="sr-only">Hours per mode for each loop and the hall</caption>
      <thead>
        <tr className="border-b border-rule text-left text-xs text-ink-soft">
          <th scope="col" className="py-1 font-normal">
            Mode
          </th>
          {columns.map((c) => (
            <th key={c.key} scope="col" className="py-1 pl-2 text-right font-normal whitespace-nowrap">
              {c.title}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {modeKeys.map((mode) => (
          <tr key={mode} className="border-b border-rule/60 last:border-0">
            <th scope="row" className="py-1 text-left font-normal">
              <ModeSwatch mode={mode} className="mr-2 size-2.5 align-middle" />
              {modeLabels[mode]}
            </th>
            {columns.map((c) => (
              <td key={c.key} className="num py-1 pl-2 text-right whitespace-nowrap" data-testid={`loop-${c.key}-${mode}`}>
                {hoursOfMode(c.hours, mode).toLocaleString('en')} h
              </td>
            ))}
          </tr>
        ))}
        <tr>
          <th scope="row" className="pt-2 text-left text-xs font-normal text-ink-soft">
            Share of hours
          </th>
          {columns.map((c) => (
            <td key={c.key} className="pt-2 pl-2">
              <ModeShareBar hours={c.hours} className="h-2.5" label={`${c.title}: hours per mode`} />
            </td>
          ))}
        </tr>
      </tbody>
    </table>
  );
}
