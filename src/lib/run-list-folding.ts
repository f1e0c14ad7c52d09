import type { RunListing } from './api/runs';

/** What folding reads of a run. */
export type FoldableRun = Pick<RunListing, 'id' | 'status' | 'sweepId' | 'sweepName' | 'results'>;

/** All the points of one sweep, standing for them in a run list. */
export interface SweepRow<R extends FoldableRun> {
  sweepId: number;
  name: string;
  points: number;
  done: number;
  failed: number;
  cancelled: number;
  /** Points still waiting or computing. */
  active: number;
  /** The lowest and highest share of hours in free cooling over its finished points (0…1); null before any is done. */
  freeShare: { min: number; max: number } | null;
  /** Its first point in the list's order (the newest, in a newest-first list): the row takes its place. */
  lead: R;
}

export type RunListEntry<R extends FoldableRun> = { kind: 'run'; run: R } | { kind: 'sweep'; sweep: SweepRow<R> };

export interface FoldedRuns<R extends FoldableRun> {
  entries: RunListEntry<R>[];
  /** Plain runs left out by the limit. */
  hiddenRuns: number;
  /** Sweeps left out: beyond the sweep limit, or older than the last plain run shown. */
  hiddenSweeps: number;
}

/**
 * A run list with each sweep's points folded into one row, so a sweep of 200 points does not push the plain runs
 * out of view. Keeps the list's order (a sweep sits where its first point sat). Up to `limits.runs` plain runs are
 * listed; a sweep is listed when it comes before the last of those and within `limits.sweeps`, so the sweep rows
 * never count against the plain runs.
 */
export function foldSweepPoints<R extends FoldableRun>(runs: readonly R[], limits: { runs: number; sweeps: number }): FoldedRuns<R> {
  const rows = new Map<number, SweepRow<R>>();
  for (const run of runs) {
    if (run.sweepId === null) continue;
    let row = rows.get(run.sweepId);
    if (!row) {
      row = {
        sweepId: run.sweepId,
        name: run.sweepName ?? `Sweep ${run.sweepId}`,
        points: 0,
        done: 0,
        failed: 0,
        cancelled: 0,
        active: 0,
        freeShare: null,
        lead: run,
      };
      rows.set(run.sweepId, row);
    }
    row.points++;
    if (run.status === 'done' || run.status === 'failed' || run.status === 'cancelled') row[run.status]++;
    else row.active++;
    if (run.status === 'done' && run.results) {
      const share = run.results.hours.free / Math.max(1, run.results.hours.total);
      row.freeShare = row.freeShare ? { min: Math.min(row.freeShare.min, share), max: Math.max(row.freeShare.max, share) } : { min: share, max: share };
    }
  }

  const entries: RunListEntry<R>[] = [];
  let shownRuns = 0;
  let shownSweeps = 0;
  let hiddenRuns = 0;
  let hiddenSweeps = 0;
  for (const run of runs) {
    if (run.sweepId === null) {
      if (shownRuns < limits.runs) {
        entries.push({ kind: 'run', run });
        shownRuns++;
      } else hiddenRuns++;
      continue;
    }
    const row = rows.get(run.sweepId)!;
    if (row.lead !== run) continue;
    if (shownRuns < limits.runs && shownSweeps < limits.sweeps) {
      entries.push({ kind: 'sweep', sweep: row });
      shownSweeps++;
    } else hiddenSweeps++;
  }
  return { entries, hiddenRuns, hiddenSweeps };
}

/** "13 points, 7 done", with failed, cancelled and still-running points named when there are any. */
export function sweepRowSummary(row: Pick<SweepRow<FoldableRun>, 'points' | 'done' | 'failed' | 'cancelled' | 'active'>): string {
  const parts = [`${row.points} point${row.points === 1 ? '' : 's'}`, `${row.done} done`];
  if (row.failed) parts.push(`${row.failed} failed`);
  if (row.cancelled) parts.push(`${row.cancelled} cancelled`);
  if (row.active) parts.push(`${row.active} to go`);
  return parts.join(', ');
}

/** "41–97 % free" over a sweep's finished points, or "63 % free" when they all agree to the percent. */
export function freeShareText(range: { min: number; max: number }): string {
  const [low, high] = [Math.round(100 * range.min), Math.round(100 * range.max)];
  return low === high ? `${low} % free` : `${low}–${high} % free`;
}
