// @ts-nocheck
import { modeKeys, modeLabels, type ModeKey } from '../../../shared/modes';
import { ModeSwatch } from '../ui/mode-marks';

/** The one legend for the cooling modes: the palette of shared/modes.ts, in its order. */
export function ModeLegend({ include = modeKeys }: { include?: readonly ModeKey[] }) {
  return (
    <ul aria-label="Modes" className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft">
      {include.map((key) => (
        <li key={key} className="flex items-center gap-1.5">
          <ModeSwatch mode={key} className="size-3" />
          {modeLabels[key]}
        </li>
      ))}
    </ul>
  );
}
