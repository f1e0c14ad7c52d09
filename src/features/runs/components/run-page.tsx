import { Link, useParams } from 'react-router-dom';
import { utcOffsetLabel } from '../../../../shared/time-zone';
import { hallAirSystem, usesEvaporativeWater } from '../../../../shared/scenario/hybrid';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useRun, type RunRecord } from '@/lib/api/runs';
import { useProjectRole } from '@/lib/api/projects';
import { runDisplayName, sweepPointParts } from '@/lib/sweep-value';
import { useUnitSystem } from '@/lib/unit-system';
import { engineNoteText } from '@/lib/engine-notes';
import { ResultCautions } from '@/components/ui/result-cautions';
import { EnergyWaterCards } from './energy-water-cards';
import { HeatReuseCard } from './heat-reuse-card';
import { HybridLoopsPanel } from './hybrid-loops-panel';
import { ModeHoursPanel } from './mode-hours-panel';
import { MonthlyModeChart } from '@/components/charts/monthly-mode-chart';
import { RunHourViews } from './run-hour-views';
import { RunInputs } from './run-inputs';
import { RunStatus } from './run-status';
import { YearTable } from './year-table';
import { ProjectCrumb } from '@/components/ui/project-crumb';
import { DownloadMenu, runDownloadLinks } from '@/components/ui/download-menu';

const statusStyle: Record<RunRecord['status'], string> = {
  queued: 'bg-mist text-ink',
  running: 'bg-harbour text-paper',
  done: 'bg-signal-ok text-paper',
  failed: 'bg-signal-bad text-paper',
  cancelled: 'bg-rule text-ink',
};

/** /projects/:projectId/runs/:runId */
export function RunPage() {
  const params = useParams();
  const projectId = Number(params.projectId);
  const runId = Number(params.runId);
  const query = useRun(projectId, runId);
  const { canEdit } = useProjectRole(projectId);
  const { unitSystem } = useUnitSystem();

  if (query.isPending) return <div role="progressbar" className="h-96 animate-pulse rounded-md bg-mist" aria-label="Loading run" />;
  if (query.isError) {
    return (
      <Notice tone="bad" title="This run could not be opened">
        {query.error.message} It may have been deleted; open the project to see its runs.
      </Notice>
    );
  }
  const run = query.data.run;
  const results = run.status === 'done' ? run.results : null;
  const evaporative = usesEvaporativeWater(run.scenario.system);
  return (
    <div className="space-y-4">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <ProjectCrumb projectId={projectId} />
          <h1 className="text-xl font-semibold">{runDisplayName(run.scenario.name, run.sweepPoint, unitSystem)}</h1>
          <p className="text-sm text-ink-soft">
            {run.climate.site.name} · {run.climate.name} · {run.climate.hours.toLocaleString('en')} hours
          </p>
          <p className="text-xs text-ink-soft" data-testid="run-engine">
            Made by <span className="num">{run.engineVersion}</span>
          </p>
          {run.sweepId !== null && (
            <p className="text-sm text-ink-soft" data-testid="run-sweep-point">
              Point of sweep{' '}
              <Link to={`/projects/${projectId}/sweeps/${run.sweepId}`} className="text-harbour underline underline-offset-2">
                {run.sweepName ?? `#${run.sweepId}`}
              </Link>
              {run.sweepPoint && ': '}
              {run.sweepPoint &&
                sweepPointParts(run.sweepPoint, unitSystem).map((part, i) => (
                  <span key={part.path}>
                    {i > 0 && ', '}
                    {part.label} = <span className="num">{part.value}</span>
                  </span>
                ))}
            </p>
          )}
        </div>
        <div className="flex items-center gap-2 text-sm print:hidden">
          <span className={`rounded px-2 py-0.5 text-xs font-medium ${statusStyle[run.status]}`} data-testid="run-status">
            {run.status}
          </span>
          {run.scenarioId !== null && (
            <Link to={`/projects/${projectId}/scenarios/${run.scenarioId}`} className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist">
              Open scenario
            </Link>
          )}
          {results && (
            <>
              <Link to={`/projects/${projectId}/compare?runs=${run.id}`} className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist">
                Compare with other runs
              </Link>
              <Link to={`/projects/${projectId}/runs/${run.id}/excursions`} className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist">
                Excursions
              </Link>
              <Link to={`/projects/${projectId}/runs/${run.id}/report`} className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist">
                Report
              </Link>
              <DownloadMenu links={runDownloadLinks(`/api/projects/${projectId}/runs/${run.id}/downloads`, unitSystem)} />
            </>
          )}
        </div>
      </header>

      {!results && <RunStatus run={run} canEdit={canEdit} />}

      {results && (
        <>
          {results.warnings.length > 0 && (
            <Notice tone="warn" title="Notes from the engine">
              <ul className="list-disc pl-5">
                {results.warnings.map((w) => (
                  <li key={w}>{engineNoteText(w, unitSystem)}</li>
                ))}
              </ul>
            </Notice>
          )}
          <div className="grid gap-4 xl:grid-cols-[24rem_minmax(0,1fr)]">
            <ModeHoursPanel results={results} engineVersion={run.engineVersion} />
            <Panel title="Hours per mode by month">
              <MonthlyModeChart byMonth={results.hoursByMonth} zoneLabel={utcOffsetLabel(run.climate.utcOffsetMinutes)} engineVersion={run.engineVersion} />
            </Panel>
          </div>
          <EnergyWaterCards results={results} engineVersion={run.engineVersion} system={run.scenario.system} />
          <HybridLoopsPanel results={results} zoneLabel={utcOffsetLabel(run.climate.utcOffsetMinutes)} engineVersion={run.engineVersion} />
          {results.heatReuse && <HeatReuseCard reuse={results.heatReuse} />}
          {results.hoursByYear.length > 1 && (
            <Panel title="By calendar year">
              <YearTable years={results.hoursByYear} engineVersion={run.engineVersion} />
            </Panel>
          )}
          <RunHourViews run={run} />
          <Panel title="Inputs as run">
            <RunInputs run={run} />
          </Panel>
          <ResultCautions systemKind={hallAirSystem(run.scenario.system).kind} evaporative={evaporative} hybrid={run.scenario.system.kind === 'hybrid'} />
        </>
      )}
    </div>
  );
}
