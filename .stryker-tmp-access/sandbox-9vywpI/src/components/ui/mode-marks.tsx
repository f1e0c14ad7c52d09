// @ts-nocheck
import { hoursOfMode, modeColours, modeKeys, modeLabels, type ModeKey } from '../../../shared/modes';
import { modeColumnLabel, type ModeRowSpec } from '../../../shared/report/mode-subsets';
import type { ModeHours } from '../../../shared/scenario/results';

/** A small square in a mode's colour, before its name in a table or legend. Decorative: the name says it. */
export function ModeSwatch({ mode, className = 'mr-2 size-3 align-middle' }: { mode: ModeKey; className?: string }) {
  return <span aria-hidden className={`inline-block rounded-sm ${className}`} style={{ background: modeColours[mode] }} />;
}

/**
 * The modes' shares of the hours as one bar in the mode palette. Decorative unless `label` is given (then it is an
 * image with that text): a table or figure beside it carries the numbers.
 */
export function ModeShareBar({
  hours,
  className = 'h-4',
  label,
}: {
  hours: Pick<ModeHours, 'free' | 'adiabatic' | 'mechanical' | 'noData' | 'total'>;
  className?: string;
  label?: string;
}) {
  const total = hours.total || 1;
  return (
    <div className={`flex overflow-hidden rounded-sm ${className}`} {...(label ? { role: 'img', 'aria-label': label, title: label } : { 'aria-hidden': true })}>
      {modeKeys.map((k) => {
        const n = hoursOfMode(hours, k);
        return n > 0 ? <div key={k} style={{ width: `${(100 * n) / total}%`, background: modeColours[k] }} /> : null;
      })}
    </div>
  );
}

/**
 * The head of one mode column in a table of hours: the mode with its swatch, or a count that is part of the
 * mode before it ("with humidification"), set lighter and explained on hover.
 */
export function ModeColumnHead({ spec, className = 'px-2 py-1' }: { spec: ModeRowSpec; className?: string }) {
  if (spec.kind === 'mode') {
    return (
      <th scope="col" className={`${className} font-sans font-medium`}>
        <ModeSwatch mode={spec.mode} className="mr-1 size-2.5 align-middle" />
        {modeColumnLabel(spec, modeLabels)}
      </th>
    );
  }
  return (
    <th scope="col" className={`${className} font-sans font-normal italic`} title={spec.subset.description}>
      {modeColumnLabel(spec, modeLabels)}
    </th>
  );
}

/** React key of a mode column. */
export const modeSpecKey = (spec: ModeRowSpec) => (spec.kind === 'mode' ? spec.mode : spec.subset.key);
