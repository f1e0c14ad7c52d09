import { Link } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useProjectSweeps } from '@/lib/api/sweeps';
import { SWEEP_INPUTS } from '../../../../shared/sweep';

/** The project's sweeps with how far each has got; engineers and owners can start one. */
export function SweepsPanel({ projectId, canEdit }: { projectId: number; canEdit: boolean }) {
  const sweeps = useProjectSweeps(projectId);
  return (
    <Panel
      title="Sweeps"
      actions={
        canEdit ? (
          <Link to={`/projects/${projectId}/sweeps/new`} className="rounded border border-rule px-2.5 py-1 text-xs hover:bg-mist">
            New sweep
          </Link>
        ) : undefined
      }
    >
      {sweeps.isPending && <div role="progressbar" className="h-16 animate-pulse rounded bg-mist" aria-label="Loading sweeps" />}
      {sweeps.isError && (
        <Notice tone="bad" title="Sweeps could not be loaded">
          {sweeps.error.message}
        </Notice>
      )}
      {sweeps.data && sweeps.data.sweeps.length === 0 && (
        <p className="text-sm text-ink-soft">
          No sweeps yet.{' '}
          {canEdit
            ? 'Open a scenario and choose "Sweep an input" to run it over a range of setpoints, effectivenesses, approaches, envelopes or IT loads.'
            : 'Engineers start them from a scenario.'}
        </p>
      )}
      {sweeps.data && sweeps.data.sweeps.length > 0 && (
        <ul className="divide-y divide-rule/60 text-sm" data-testid="sweeps-list">
          {sweeps.data.sweeps.slice(0, 10).map((s) => (
            <li key={s.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 py-1.5">
              <div className="min-w-0">
                <Link to={`/projects/${projectId}/sweeps/${s.id}`} className="text-harbour underline-offset-2 underline hover:decoration-2">
                  {s.name}
                </Link>
                <p className="text-xs text-ink-soft">
                  {s.axes.map((a) => SWEEP_INPUTS[a.input].label).join(' × ')} · {s.climate.siteName} · {s.climate.name}
                </p>
              </div>
              <span className="num text-xs text-ink-soft">
                {s.progress.done}/{s.progress.total} done
                {s.progress.failed > 0 && <span className="text-signal-bad"> · {s.progress.failed} failed</span>}
                {!s.progress.finished && ` · ${Math.round(100 * s.progress.fraction)} %`}
              </span>
            </li>
          ))}
        </ul>
      )}
    </Panel>
  );
}
