import { Notice } from '@/components/ui/notice';
import { useCancelRun } from '../api/cancel-run';
import type { RunRecord } from '../api/get-run';
import { ProgressBar } from '@/components/ui/progress-bar';

/** Progress while the run waits or computes, with a way to cancel; what happened when it did not finish. */
export function RunStatus({ run, canEdit }: { run: RunRecord; canEdit: boolean }) {
  const cancel = useCancelRun(run.projectId, run.id);
  if (run.status === 'failed') {
    return (
      <Notice tone="bad" title="The run failed">
        {run.error ?? 'No message was recorded.'} Check the scenario and the climate file, then run it again.
      </Notice>
    );
  }
  if (run.status === 'cancelled') {
    return <Notice title="The run was cancelled">Nothing was computed. Run the scenario again from its editor when needed.</Notice>;
  }
  const pct = Math.round(100 * (run.status === 'queued' ? 0 : run.progress));
  return (
    <div className="rounded-md border border-rule bg-panel p-4" data-testid="run-progress">
      <div className="flex items-center justify-between gap-4">
        <p className="text-sm font-medium" role="status" aria-live="polite">
          {run.status === 'queued' ? 'Waiting for a free worker…' : `Classifying ${run.climate.hours.toLocaleString('en')} hours…`}
        </p>
        {canEdit && (
          <button
            type="button"
            onClick={() => cancel.mutate()}
            disabled={cancel.isPending}
            className="rounded border border-rule px-3 py-1 text-sm hover:bg-mist disabled:opacity-50"
          >
            Cancel run
          </button>
        )}
      </div>
      {/* A running run shows at least a sliver, so it never looks not started. */}
      <ProgressBar label="Run progress" percent={Math.max(pct, run.status === 'queued' ? 0 : 5)} />
      <p className="mt-2 text-xs text-ink-soft">The results fill this page by themselves when the run finishes; you can leave and come back.</p>
      {cancel.isError && <p className="mt-2 text-xs text-signal-bad">{cancel.error.message}</p>}
    </div>
  );
}
