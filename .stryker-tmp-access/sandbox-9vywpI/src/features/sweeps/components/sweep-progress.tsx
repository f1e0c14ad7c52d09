// @ts-nocheck
import type { SweepProgress } from '../../../../shared/sweep';
import { ProgressBar } from '@/components/ui/progress-bar';

/** How far the sweep has got: one bar over all points, and the count in each state. */
export function SweepProgressBar({ progress }: { progress: SweepProgress }) {
  const pct = Math.round(100 * progress.fraction);
  const parts = [
    `${progress.done} of ${progress.total} points done`,
    progress.running ? `${progress.running} running` : '',
    progress.queued ? `${progress.queued} waiting` : '',
    progress.failed ? `${progress.failed} failed` : '',
    progress.cancelled ? `${progress.cancelled} cancelled` : '',
  ].filter(Boolean);
  return (
    <div className="rounded-md border border-rule bg-panel p-4" data-testid="sweep-progress">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-sm font-medium" role="status" aria-live="polite">
          {!progress.finished
            ? 'Running the points on the worker pool…'
            : progress.cancelled > 0
              ? 'Stopped before every point ran.'
              : 'Every point has finished.'}{' '}
          <span className="num text-ink-soft">{parts.join(' · ')}</span>
        </p>
        <span className="num text-sm">{pct} %</span>
      </div>
      <ProgressBar label="Sweep progress" percent={pct} animate={!progress.finished} />
      {!progress.finished && <p className="mt-2 text-xs text-ink-soft">The charts fill in as points finish; you can leave and come back.</p>}
    </div>
  );
}
