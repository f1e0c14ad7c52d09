import { hoursOfMode, modeColours, modeKeys, type ModeKey } from '../../../shared/modes';
import type { ModeHours } from '../../../shared/scenario/results';

/** A small square in a mode's colour, before its name in a table or legend. Decorative: the name says it. */
export function ModeSwatch({ mode, className = 'mr-2 size-3 align-middle' }: { mode: ModeKey; className?: string }) {
  return <span aria-hidden className={`inline-block rounded-sm ${className}`} style={{ background: modeColours[mode] }} />;
}

/**
 * The modes' shares of the hours as one bar in the mode palette. Decorative unless `label` is given (then it is an
 * image with that text): a table or figure beside it carries the numbers.
 */
export function ModeShareBar({ hours, className = 'h-4', label }: { hours: Pick<ModeHours, 'free' | 'adiabatic' | 'mechanical' | 'noData' | 'total'>; className?: string; label?: string }) {
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
