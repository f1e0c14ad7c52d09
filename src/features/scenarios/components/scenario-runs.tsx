import { Link } from 'react-router-dom';
import { Panel } from '@/components/ui/panel';
import { useScenarioRuns } from '../api/get-scenario-runs';

/** Earlier runs of this scenario, newest first, each with its headline figures. */
export function ScenarioRuns({ projectId, scenarioId }: { projectId: number; scenarioId: number }) {
  const { runs, isPending, isError, error } = useScenarioRuns(projectId, scenarioId);
  const done = runs.filter((r) => r.status === 'done');
  return (
    <Panel title="Runs of this scenario">
      {isPending && <div className="h-16 animate-pulse rounded bg-mist" aria-label="Loading runs" />}
      {isError && <p className="text-xs text-signal-bad">Runs could not be loaded: {error?.message}</p>}
      {!isPending && runs.length === 0 && <p className="text-sm text-ink-soft">Not run yet.</p>}
      {runs.length > 0 && (
        <ul className="space-y-1.5 text-sm" data-testid="scenario-runs">
          {runs.slice(0, 12).map((r) => (
            <li key={r.id}>
              <Link to={`/projects/${projectId}/runs/${r.id}`} className="flex items-baseline justify-between gap-2 hover:underline">
                <span>
                  <span className="num text-xs text-ink-faint">#{r.id}</span> {r.climate.site.name} · {r.climate.name}
                </span>
                <span className="num text-xs text-ink-soft">
                  {r.results ? `${((100 * r.results.hours.free) / Math.max(1, r.results.hours.total)).toFixed(0)} % free` : r.status}
                </span>
              </Link>
            </li>
          ))}
        </ul>
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
