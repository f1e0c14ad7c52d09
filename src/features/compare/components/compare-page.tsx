import { useMemo } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useProjectRuns } from '@/lib/api/runs';
import { useRunTables } from '../api/get-run-tables';
import { compareRuns, withResults, type ComparedRun } from '../../../../shared/report/comparison';
import { ComparisonTable } from './comparison-table';
import { MonthlyComparisonChart } from '@/components/charts/monthly-comparison-chart';
import { RunPicker } from './run-picker';
import { YearSpreadTable } from './year-spread-table';
import { DifferingInputs } from './differing-inputs';
import { ProjectCrumb } from '@/components/ui/project-crumb';
import { mixedEngineNote } from '../../../../shared/report/mode-subsets';

const idList = (text: string | null) =>
  text
    ? text
        .split(',')
        .map(Number)
        .filter((n) => Number.isInteger(n) && n > 0)
    : [];

/** /projects/:projectId/compare?runs=1,2,3&baseline=1 — the choice lives in the address, so a comparison can be shared. */
export function ComparePage() {
  const projectId = Number(useParams().projectId);
  const [search, setSearch] = useSearchParams();
  const runsQuery = useProjectRuns(projectId);
  const runsParam = search.get('runs');
  const chosen = useMemo(() => idList(runsParam), [runsParam]);
  const done = useMemo(() => (runsQuery.data?.runs ?? []).filter((r) => r.status === 'done' && r.results), [runsQuery.data]);
  // In the order they were ticked, so the first ticked is the default baseline.
  const selected = useMemo(() => chosen.flatMap((id) => done.filter((r) => r.id === id)), [chosen, done]);
  const baselineParam = Number(search.get('baseline'));
  const baselineId = selected.some((r) => r.id === baselineParam) ? baselineParam : (selected[0]?.id ?? 0);
  const compared: ComparedRun[] = useMemo(() => withResults(selected), [selected]);
  const rows = useMemo(() => compareRuns(compared, baselineId), [compared, baselineId]);
  const tables = useRunTables(
    projectId,
    selected.map((r) => r.id),
  );
  // `tables` keeps its identity until a run's tables arrive, so the chart is not redrawn on every render.
  const monthlySeries = useMemo(() => (tables.every((t) => t) ? tables.map((t) => t!) : null), [tables]);
  const yearlyByRun = useMemo(() => new Map(tables.flatMap((t) => (t ? [[t.runId, t.hoursByYear] as const] : []))), [tables]);
  const anyMultiYear = [...yearlyByRun.values()].some((years) => years.length > 1);

  function update(runs: number[], baseline: number | null) {
    const next = new URLSearchParams();
    if (runs.length) next.set('runs', runs.join(','));
    if (baseline && runs.includes(baseline)) next.set('baseline', String(baseline));
    setSearch(next, { replace: true });
  }
  const toggle = (id: number) => update(chosen.includes(id) ? chosen.filter((x) => x !== id) : [...chosen, id], baselineId);

  return (
    <div className="space-y-4">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <ProjectCrumb projectId={projectId} />
          <h1 className="text-xl font-semibold">Compare runs</h1>
        </div>
        {selected.length >= 2 && (
          <Link
            to={`/projects/${projectId}/compare/report?runs=${selected.map((r) => r.id).join(',')}&baseline=${baselineId}`}
            className="rounded border border-rule bg-panel px-3 py-1.5 text-sm hover:bg-mist"
          >
            Report
          </Link>
        )}
      </header>
      <div className="grid gap-4 xl:grid-cols-[26rem_minmax(0,1fr)]">
        <Panel title="Runs">
          {runsQuery.isPending && <div role="progressbar" className="h-40 animate-pulse rounded bg-mist" aria-label="Loading runs" />}
          {runsQuery.isError && (
            <Notice tone="bad" title="Runs could not be loaded">
              {runsQuery.error.message}
            </Notice>
          )}
          {runsQuery.data && done.length === 0 && (
            <p className="text-sm text-ink-soft">No finished runs yet. Open a scenario, run it on a climate file, then come back to compare.</p>
          )}
          {done.length > 0 && (
            <RunPicker projectId={projectId} runs={done} chosen={chosen} baselineId={baselineId} onToggle={toggle} onBaseline={(id) => update(chosen, id)} />
          )}
        </Panel>
        <div className="min-w-0 space-y-4">
          {selected.length < 2 ? (
            <Notice title="Pick two or more runs">Tick the runs to compare on the left; the first one ticked is the baseline until you choose another.</Notice>
          ) : (
            <>
              {mixedEngineNote(selected) && (
                <Notice tone="warn" title="Different engine versions">
                  <span data-testid="mixed-engines">{mixedEngineNote(selected)}</span>
                </Notice>
              )}
              <Panel title="Side by side">
                <ComparisonTable rows={rows} runs={selected} compared={compared} baselineId={baselineId} />
              </Panel>
              <Panel title="Inputs that differ">
                <DifferingInputs runs={selected} scenarios={selected.map((r) => tables.find((t) => t?.runId === r.id)?.scenario)} />
              </Panel>
              <Panel title="Hours per mode by month">
                {monthlySeries ? (
                  <MonthlyComparisonChart series={monthlySeries} />
                ) : (
                  <div role="progressbar" className="h-80 animate-pulse rounded bg-mist" aria-label="Loading monthly hours" />
                )}
              </Panel>
              {anyMultiYear && (
                <Panel title="Year to year: mechanical hours">
                  <YearSpreadTable runs={selected} byRun={yearlyByRun} />
                </Panel>
              )}
              <Notice tone="warn" title="Read these results as estimates">
                They compare designs; they are not a design. Final design follows local codes, the IT manufacturers' limits and licensed engineering review.
                Direct outside air brings contamination, smoke and condensation risk; evaporative systems need water treatment and Legionella control under
                local rules.
              </Notice>
            </>
          )}
        </div>
      </div>
    </div>
  );
}
