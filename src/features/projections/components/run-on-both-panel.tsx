import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { useScenarios } from '@/lib/api/scenarios';
import { useRunOnBoth } from '../api/run-on-both';

/** One scenario on today's file and on the projection, then the comparison of the two runs. */
export function RunOnBothPanel({
  projectId,
  parentFileId,
  projectionFileId,
  canEdit,
}: {
  projectId: number;
  parentFileId: number | null;
  projectionFileId: number;
  canEdit: boolean;
}) {
  const scenarios = useScenarios(projectId);
  const run = useRunOnBoth(projectId);
  const [scenarioId, setScenarioId] = useState<number | null>(null);
  if (parentFileId === null) {
    return (
      <p className="text-sm text-ink-soft">
        Today's file was deleted, so there is nothing to run beside the projection. The projection still runs on its own from any scenario.
      </p>
    );
  }
  if (scenarios.isPending) return <div role="progressbar" className="h-10 animate-pulse rounded bg-mist" aria-label="Loading scenarios" />;
  if (scenarios.isError)
    return (
      <Notice tone="bad" title="Scenarios could not be loaded">
        {scenarios.error.message}
      </Notice>
    );
  const list = scenarios.data.scenarios;
  if (list.length === 0) {
    return (
      <p className="text-sm text-ink-soft">
        No scenarios yet.{' '}
        <Link to={`/projects/${projectId}/scenarios/new`} className="text-harbour underline">
          Make a scenario
        </Link>
        , then run it here on both files.
      </p>
    );
  }
  const chosen = scenarioId ?? list[0].id;
  const runs = run.data?.runs;
  const baseline = runs?.find((r) => r.climateFileId === parentFileId);
  return (
    <div className="space-y-2 text-sm">
      <div className="flex flex-wrap items-end gap-2">
        <label className="text-sm">
          Scenario
          <select value={chosen} onChange={(e) => setScenarioId(Number(e.target.value))} className="ml-2 rounded border border-rule bg-panel px-2 py-1">
            {list.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        </label>
        {canEdit && (
          <button
            type="button"
            disabled={run.isPending}
            onClick={() => run.mutate({ scenarioId: chosen, parentFileId, projectionFileId })}
            className="rounded bg-harbour px-3 py-1.5 text-paper hover:bg-harbour-soft disabled:opacity-60"
          >
            {run.isPending ? 'Queuing…' : 'Run on today and on the projection'}
          </button>
        )}
      </div>
      {!canEdit && <p className="text-xs text-ink-soft">Engineers and owners start runs; the comparison page shows the runs already made.</p>}
      {run.isError && (
        <Notice tone="bad" title="The runs were not started">
          {run.error.message}
        </Notice>
      )}
      {runs && baseline && (
        <p data-testid="run-on-both-result">
          {runs.every((r) => r.reused)
            ? `Both runs already existed (runs #${runs.map((r) => r.id).join(' and #')}); they are reused, not run again.`
            : runs.some((r) => r.reused)
              ? `Run #${runs.find((r) => r.reused)!.id} already existed and is reused; run #${runs.find((r) => !r.reused)!.id} is queued.`
              : 'Two runs queued.'}{' '}
          <Link
            to={`/projects/${projectId}/compare?runs=${runs.map((r) => r.id).join(',')}&baseline=${baseline.id}`}
            className="font-medium text-harbour underline"
          >
            Compare today with the projection
          </Link>{' '}
          (the runs finish in a few seconds).
        </p>
      )}
    </div>
  );
}
