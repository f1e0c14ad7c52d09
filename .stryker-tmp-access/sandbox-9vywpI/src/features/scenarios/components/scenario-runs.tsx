// @ts-nocheck
import { Link } from 'react-router-dom';
import { Panel } from '@/components/ui/panel';
import { foldSweepPoints, freeShareText, sweepRowSummary } from '@/lib/run-list-folding';
import { useScenarioRuns } from '../api/get-scenario-runs';

/** Earlier runs of this scenario, newest first, each with its headline figures; a sweep of it is one line. */
export function ScenarioRuns({ projectId, scenarioId }: { projectId: number; scenarioId: number }) {
  const { runs, isPending, isError, error } = useScenarioRuns(projectId, scenarioId);
  const { entries, hiddenSweeps } = foldSweepPoints(runs, { runs: 12, sweeps: 6 });
  // Comparing a sweep's points is the sweep page's work; the link compares the plain runs.
  const done = runs.filter((r) => r.status === 'done' && r.sweepId === null);
  return (
    <Panel title="Runs of this scenario">
      {isPending && <div role="progressbar" className="h-16 animate-pulse rounded bg-mist" aria-label="Loading runs" />}
      {isError && <p className="text-xs text-signal-bad">Runs could not be loaded: {error?.message}</p>}
      {!isPending && runs.length === 0 && <p className="text-sm text-ink-soft">Not run yet.</p>}
      {entries.length > 0 && (
        <ul className="space-y-1.5 text-sm" data-testid="scenario-runs">
          {entries.map((entry) => {
            if (entry.kind === 'sweep') {
              const row = entry.sweep;
              return (
                <li key={`sweep-${row.sweepId}`} data-testid="scenario-sweep-row">
                  <Link to={`/projects/${projectId}/sweeps/${row.sweepId}`} className="flex items-baseline justify-between gap-2 underline hover:decoration-2">
                    <span>
                      <span className="rounded border border-rule px-1 text-xs text-ink-soft">sweep</span> {row.name}
                      <span className="num block text-xs text-ink-soft">{sweepRowSummary(row)}</span>
                    </span>
                    <span className="num shrink-0 text-xs text-ink-soft">{row.freeShare ? freeShareText(row.freeShare) : row.active ? 'running' : '–'}</span>
                  </Link>
                </li>
              );
            }
            const r = entry.run;
            return (
              <li key={r.id}>
                <Link to={`/projects/${projectId}/runs/${r.id}`} className="flex items-baseline justify-between gap-2 underline hover:decoration-2">
                  <span>
                    <span className="num text-xs text-ink-faint">#{r.id}</span> {r.climate.site.name} · {r.climate.name}
                  </span>
                  <span className="num text-xs text-ink-soft">
                    {r.results ? `${((100 * r.results.hours.free) / Math.max(1, r.results.hours.total)).toFixed(0)} % free` : r.status}
                  </span>
                </Link>
              </li>
            );
          })}
        </ul>
      )}
      {hiddenSweeps > 0 && (
        <p className="mt-2 text-xs text-ink-soft">
          {hiddenSweeps} older sweep{hiddenSweeps === 1 ? '' : 's'} of this scenario {hiddenSweeps === 1 ? 'is' : 'are'} on the project overview's Sweeps panel.
        </p>
      )}
      {done.length > 1 && (
        <Link
          to={`/projects/${projectId}/compare?runs=${done
            .slice(0, 6)
            .map((r) => r.id)
            .join(',')}`}
          className="mt-2 inline-block text-sm text-harbour underline underline-offset-2"
        >
          Compare these runs
        </Link>
      )}
    </Panel>
  );
}
