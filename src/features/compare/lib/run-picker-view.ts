import type { RunListing } from '@/lib/api/runs';

/** Which runs the compare page's picker lists: plain runs, all runs, or the points of one sweep ("sweep-12"). */
export type PickerView = 'plain' | 'all' | `sweep-${number}`;

export interface PickerViewOption {
  value: PickerView;
  label: string;
  count: number;
}

type PickerRun = Pick<RunListing, 'id' | 'sweepId' | 'sweepName'>;

/**
 * The choices of the picker's "Runs listed" menu, each with how many runs it lists: plain runs, all runs, then one per
 * sweep in the list's order. Empty when no run is a sweep point, as there is then nothing to choose.
 */
export function pickerViewOptions(runs: readonly PickerRun[]): PickerViewOption[] {
  const sweeps = new Map<number, PickerViewOption>();
  let plain = 0;
  for (const r of runs) {
    if (r.sweepId === null) {
      plain++;
      continue;
    }
    const option = sweeps.get(r.sweepId) ?? { value: `sweep-${r.sweepId}` as const, label: `Points of sweep ${r.sweepName ?? r.sweepId}`, count: 0 };
    option.count++;
    sweeps.set(r.sweepId, option);
  }
  if (sweeps.size === 0) return [];
  return [
    { value: 'plain', label: 'Plain runs, sweep points hidden', count: plain },
    { value: 'all', label: 'All runs, with sweep points', count: runs.length },
    ...sweeps.values(),
  ];
}

/** Sweep points stay out of the way unless there is nothing else to compare. */
export const defaultPickerView = (runs: readonly PickerRun[]): PickerView => (runs.some((r) => r.sweepId === null) ? 'plain' : 'all');

/** The runs a view lists; runs already ticked stay listed whatever the view, so a tick can always be taken back. */
export function runsInView<R extends PickerRun>(runs: readonly R[], view: PickerView, chosen: readonly number[]): R[] {
  const sweepId = view.startsWith('sweep-') ? Number(view.slice('sweep-'.length)) : null;
  return runs.filter((r) => {
    if (chosen.includes(r.id) || view === 'all') return true;
    return sweepId === null ? r.sweepId === null : r.sweepId === sweepId;
  });
}
