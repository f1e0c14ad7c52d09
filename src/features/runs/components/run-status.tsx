import { Notice } from '@/components/ui/notice';
import { useCancelRun } from '../api/cancel-run';
import type { RunRecord } from '@/lib/api/runs';

/**
 * Where the run stands while it waits or computes, with a way to cancel; what happened when it did not finish.
 * A run is one task on a worker thread, so there is no fraction done to show: it says when it started instead.
 */
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
  return (
    <div className="rounded-md border border-rule bg-panel p-4" data-testid="run-progress">
      <div className="flex items-center justify-between gap-4">
        <p className="text-sm font-medium" role="status" aria-live="polite">
          {run.status === 'queued' ? 'Waiting for a free worker…' : `Classifying ${run.climate.hours.toLocaleString('en')} hours…`}
          {run.status === 'running' && run.startedAt && (
            <span className="num ml-2 text-xs font-normal text-ink-soft" data-testid="run-started">
              started {new Date(run.startedAt).toLocaleTimeString('en-GB')}
            </span>
          )}
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
      <p className="mt-2 text-xs text-ink-soft">The results fill this page by themselves when the run finishes; you can leave and come back.</p>
      {cancel.isError && <p className="mt-2 text-xs text-signal-bad">{cancel.error.message}</p>}
    </div>
  );
}
