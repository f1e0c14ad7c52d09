import { Link, useNavigate, useParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ProjectCrumb } from '@/components/ui/project-crumb';
import { useProjectRole } from '@/lib/api/projects';
import { useUnitSystem } from '@/lib/unit-system';
import { SWEEP_INPUTS, zeroMechanical, zeroMechanicalText } from '../../../../shared/sweep';
import { hallAirSystem, usesEvaporativeWater } from '../../../../shared/scenario/hybrid';
import { ResultCautions } from '@/components/ui/result-cautions';
import { useCancelSweep } from '../api/cancel-sweep';
import { useDeleteSweep } from '../api/delete-sweep';
import { useSweep, type SweepRecord } from '@/lib/api/sweeps';
import { formatSweepValue, formatSweepValueWithUnit } from '@/lib/sweep-value';
import { SweepHeatMap } from './sweep-heat-map';
import { SweepLineCharts } from './sweep-line-charts';
import { SweepPointsTable } from './sweep-points-table';
import { SweepProgressBar } from './sweep-progress';

/** "Supply air setpoint 18.0 … 30.0 °C by 1.0 K (13 values)". */
function AxisSummary({ axis }: { axis: SweepRecord['axes'][number] }) {
  const { unitSystem } = useUnitSystem();
  const values = axis.values;
  const first = formatSweepValue(axis.input, unitSystem, values[0]);
  const last = formatSweepValueWithUnit(axis.input, unitSystem, values[values.length - 1]);
  return (
    <span>
      {SWEEP_INPUTS[axis.input].label} <span className="num">{values.length > 1 ? `${first} … ${last}` : last}</span> ({values.length}{' '}
      {values.length === 1 ? 'value' : 'values'})
    </span>
  );
}

/** The cautions every set of results carries (product brief), for the sweep's system. */
function SweepCautions({ sweep }: { sweep: SweepRecord }) {
  const system = sweep.baseScenario.system;
  const evaporative = usesEvaporativeWater(system) || sweep.axes.some((a) => a.input === 'system.evaporativeEffectiveness');
  return <ResultCautions systemKind={hallAirSystem(system).kind} evaporative={evaporative} hybrid={system.kind === 'hybrid'} />;
}

/** /projects/:projectId/sweeps/:sweepId — progress while the points run, then charts, a table and links to each run. */
export function SweepPage() {
  const params = useParams();
  const projectId = Number(params.projectId);
  const sweepId = Number(params.sweepId);
  const navigate = useNavigate();
  const { unitSystem } = useUnitSystem();
  const { canEdit } = useProjectRole(projectId);
  const query = useSweep(projectId, sweepId);
  const remove = useDeleteSweep(projectId, sweepId);
  const stop = useCancelSweep(projectId, sweepId);

  if (query.isPending) return <div role="progressbar" className="h-96 animate-pulse rounded-md bg-mist" aria-label="Loading sweep" />;
  if (query.isError) {
    return (
      <Notice tone="bad" title="This sweep could not be opened">
        {query.error.message} It may have been deleted;{' '}
        <Link className="underline" to={`/projects/${projectId}`}>
          open the project
        </Link>{' '}
        to see its sweeps.
      </Notice>
    );
  }
  const sweep = query.data.sweep;
  const inputs = sweep.axes.map((a) => a.input);
  const doneIds = sweep.points.filter((p) => p.status === 'done').map((p) => p.runId);
  const anyDone = doneIds.length > 0;
  const zero =
    inputs.length === 1
      ? zeroMechanical(
          sweep.points.map((p) => ({
            value: p.values[inputs[0]]!,
            mechanicalHours: p.results?.hours.mechanical ?? null,
            breaksEnvelope: p.results?.breaksEnvelope,
          })),
        )
      : null;
  const breaking = sweep.points.filter((p) => p.results?.breaksEnvelope).length;

  async function deleteSweep() {
    if (!window.confirm(`Delete the sweep "${sweep.name}" and its ${sweep.points.length} runs? Points still waiting are cancelled.`)) return;
    await remove.mutateAsync();
    navigate(`/projects/${projectId}`);
  }

  return (
    <div className="space-y-4">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <ProjectCrumb projectId={projectId} />
          <h1 className="text-xl font-semibold">{sweep.name}</h1>
          <p className="text-sm text-ink-soft">
            {sweep.baseScenarioId !== null ? (
              <Link to={`/projects/${projectId}/scenarios/${sweep.baseScenarioId}`} className="text-harbour underline underline-offset-2">
                {sweep.baseScenario.name}
              </Link>
            ) : (
              sweep.baseScenario.name
            )}{' '}
            ({sweep.baseScenario.system.kind}) on {sweep.climate.siteName} · {sweep.climate.name}
          </p>
          <p className="text-sm text-ink-soft" data-testid="sweep-axes">
            Swept:{' '}
            {sweep.axes.map((a, i) => (
              <span key={a.input}>
                {i > 0 && ' × '}
                <AxisSummary axis={a} />
              </span>
            ))}
          </p>
        </div>
        <div className="flex items-center gap-2 text-sm print:hidden">
          {doneIds.length >= 2 && (
            <Link to={`/projects/${projectId}/compare?runs=${doneIds.join(',')}`} className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist">
              Compare these runs
            </Link>
          )}
          {canEdit && !sweep.progress.finished && (
            <button
              type="button"
              onClick={() => stop.mutate()}
              disabled={stop.isPending}
              className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist disabled:opacity-50"
              title="Cancel the points still waiting or running; the finished points stay"
            >
              Stop the rest
            </button>
          )}
          {canEdit && (
            <button
              type="button"
              onClick={deleteSweep}
              disabled={remove.isPending}
              className="rounded border border-rule bg-panel px-3 py-1.5 hover:bg-mist disabled:opacity-50"
            >
              {sweep.progress.finished ? 'Delete sweep' : 'Stop and delete'}
            </button>
          )}
        </div>
      </header>
      {remove.isError && (
        <Notice tone="bad" title="The sweep was not deleted">
          {remove.error.message}
        </Notice>
      )}
      {stop.isError && (
        <Notice tone="bad" title="The sweep was not stopped">
          {stop.error.message}
        </Notice>
      )}

      <SweepProgressBar progress={sweep.progress} />
      {sweep.progress.failed > 0 && (
        <Notice tone="bad" title={`${sweep.progress.failed} ${sweep.progress.failed === 1 ? 'point' : 'points'} failed`}>
          Open a failed point's run from the table for its reason; the charts leave it out.
        </Notice>
      )}

      {breaking > 0 && (
        <Notice tone="warn" title={`${breaking} ${breaking === 1 ? 'point breaks' : 'points break'} the inlet envelope`}>
          <span data-testid="envelope-breaking-notice">
            Their supply setpoint is outside the envelope's dry-bulb limits (the maximum derated for the site's elevation), so every hour is an excursion. They
            are marked "outside envelope" in the charts and the table, and their hours per mode are not results a design can use.
          </span>
        </Notice>
      )}

      {anyDone && zero && (
        <Panel title="Results against the swept value">
          <p className="mb-3 text-sm font-medium" data-testid="zero-mechanical">
            {zeroMechanicalText(zero, (v) => formatSweepValueWithUnit(inputs[0], unitSystem, v))}
            {!sweep.progress.finished && <span className="font-normal text-ink-soft"> (so far; points are still running)</span>}
          </p>
          <SweepLineCharts input={inputs[0]} points={sweep.points} zero={zero} />
          <p className="mt-2 text-xs text-ink-soft">The table under "Points" holds the same figures.</p>
        </Panel>
      )}
      {anyDone && inputs.length === 2 && (
        <Panel title="Heat map">
          <SweepHeatMap rowInput={inputs[0]} columnInput={inputs[1]} points={sweep.points} />
        </Panel>
      )}

      <Panel title="Points">
        <p className="mb-2 text-xs text-ink-soft">
          Each point is an ordinary run of the base scenario with the swept {inputs.length === 1 ? 'value' : 'values'} set; open it for its monthly hours,
          carpet plot and inputs as run. Hours, energy and water are over the whole climate file.
        </p>
        <SweepPointsTable projectId={projectId} name={sweep.name} inputs={inputs} points={sweep.points} />
      </Panel>
      {anyDone && <SweepCautions sweep={sweep} />}
    </div>
  );
}
