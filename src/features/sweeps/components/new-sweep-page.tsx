import { useState } from 'react';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ProjectCrumb } from '@/components/ui/project-crumb';
import { useProjectRole } from '@/lib/api/projects';
import { useUnitSystem } from '@/lib/unit-system';
import {
  axisValues,
  MAX_SWEEP_POINTS,
  prepareSweep,
  supplyOutsideEnvelope,
  sweepPointCount,
  sweepSpecSchema,
  SWEEP_INPUTS,
  type SupplyOutsideEnvelope,
  type SweepPointValues,
  type SweepSpecInput,
} from '../../../../shared/sweep';
import { formatQuantity } from '@/lib/quantity';
import { useClimateFiles } from '@/lib/api/climate-files';
import { useCreateSweep } from '../api/create-sweep';
import { useScenarios } from '@/lib/api/scenarios';
import { formatSweepValue, sweepPointParts, sweepUnit } from '@/lib/sweep-value';
import { applicableInputs, AxisFields, draftFor, type AxisDraft } from './axis-fields';

const specAxis = (a: AxisDraft) =>
  a.input === 'envelope.presetId' ? { input: a.input, presetIds: a.presetIds } : { input: a.input, from: a.from, to: a.to, step: a.step };

/** The points whose supply setpoint breaks the envelope at the chosen site, named before the sweep starts. */
function OutsideEnvelopeWarning({
  outside,
  total,
  elevationM,
}: {
  outside: { values: SweepPointValues; found: SupplyOutsideEnvelope }[];
  total: number;
  elevationM: number;
}) {
  const { unitSystem } = useUnitSystem();
  const shown = outside.slice(0, 6).map((o) =>
    sweepPointParts(o.values, unitSystem)
      .map((part) => part.value)
      .join(' × '),
  );
  const first = outside[0].found;
  const limit = `${first.side === 'above' ? 'maximum' : 'minimum'} ${formatQuantity('temperature', unitSystem, first.limitC)}${first.derated ? `, derated for the site's ${formatQuantity('elevation', unitSystem, elevationM)}` : ''}`;
  return (
    <Notice tone="warn" title={`${outside.length} of ${total} points break the inlet envelope`}>
      <p data-testid="sweep-envelope-warning">
        At {outside.length === 1 ? 'this point' : 'these points'} the supply setpoint is outside the envelope's dry-bulb limits ({limit}):{' '}
        <span className="num">{shown.join('; ')}</span>
        {outside.length > shown.length && ` and ${outside.length - shown.length} more`}. Every hour of {outside.length === 1 ? 'it' : 'them'} will be an
        excursion. The sweep page marks them and leaves them out of where mechanical hours reach zero.
      </p>
    </Notice>
  );
}

/** /projects/:projectId/sweeps/new?scenario=ID — one or two inputs of a saved scenario over a range, on one climate file. */
export function NewSweepPage() {
  const projectId = Number(useParams().projectId);
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const { unitSystem } = useUnitSystem();
  const { canEdit, role } = useProjectRole(projectId);
  const scenarios = useScenarios(projectId);
  const files = useClimateFiles(projectId);
  const createSweep = useCreateSweep(projectId);

  const [scenarioId, setScenarioId] = useState<number | null>(Number(search.get('scenario')) || null);
  const [fileId, setFileId] = useState<number | null>(null);
  const [axes, setAxes] = useState<AxisDraft[]>([]);
  const [name, setName] = useState('');

  const list = scenarios.data?.scenarios ?? [];
  const base = list.find((s) => s.id === scenarioId) ?? list[0];
  const file = files.data?.climateFiles.find((f) => f.id === fileId) ?? files.data?.climateFiles[0];

  // A new base scenario keeps the chosen inputs where they still apply, otherwise starts from the first that does.
  // Adjusted while rendering (React's pattern for state that follows a prop), not in an effect that renders twice.
  const [axesBase, setAxesBase] = useState<typeof base | undefined>(undefined);
  if (base && base !== axesBase) {
    setAxesBase(base);
    const offered = applicableInputs(base.scenario);
    const kept = axes.filter((a) => offered.includes(a.input));
    setAxes(kept.length ? kept : [draftFor(offered[0])]);
  }

  const spec: SweepSpecInput | null =
    base && file ? { scenarioId: base.id, climateFileId: file.id, axes: axes.map(specAxis), ...(name.trim() ? { name: name.trim() } : {}) } : null;
  // Checked as the server will check it, on every edit: 200 points parse in well under a frame.
  const check = (() => {
    if (!spec || !base || axes.length === 0) return null;
    const parsed = sweepSpecSchema.safeParse(spec);
    if (!parsed.success)
      return { count: 0, errors: parsed.error.issues.map((i) => `${SWEEP_INPUTS[axes[Number(i.path[1])]?.input]?.label ?? 'Sweep'}: ${i.message}`) };
    const prepared = prepareSweep(base.scenario, parsed.data.axes);
    return {
      count: sweepPointCount(parsed.data.axes),
      errors: prepared.ok ? [] : prepared.errors,
      axes: parsed.data.axes,
      points: prepared.ok ? prepared.points : [],
    };
  })();
  // Points whose supply setpoint the envelope (derated for this file's site) does not allow: warned before starting.
  const outside = (check?.points ?? []).flatMap((p) => {
    const found = file ? supplyOutsideEnvelope(p.scenario, file.siteElevationM) : null;
    return found ? [{ values: p.values, found }] : [];
  });

  async function start() {
    if (!spec) return;
    const { sweep } = await createSweep.mutateAsync(spec);
    navigate(`/projects/${projectId}/sweeps/${sweep.id}`);
  }

  const loading = scenarios.isPending || files.isPending;
  return (
    <div className="space-y-4">
      <header>
        <ProjectCrumb projectId={projectId} />
        <h1 className="text-xl font-semibold">Sweep an input</h1>
        <p className="max-w-3xl text-sm text-ink-soft">
          Vary one input of a saved scenario over a range (or two inputs, as a grid) on one climate file. Every point is an ordinary run on the worker pool; the
          sweep draws hours per mode, partial PUE, water and peak mechanical load against the swept value.
        </p>
      </header>
      {role && !canEdit && <Notice title="Viewers can read sweeps but not start them">Ask an engineer or owner of this project to start one.</Notice>}
      {loading && <div role="progressbar" className="h-64 animate-pulse rounded-md bg-mist" aria-label="Loading scenarios and climate files" />}
      {scenarios.isError && (
        <Notice tone="bad" title="Scenarios could not be loaded">
          {scenarios.error.message}
        </Notice>
      )}
      {!loading && list.length === 0 && (
        <Notice title="No scenario to sweep yet">
          Save a scenario first:{' '}
          <Link className="underline" to={`/projects/${projectId}/scenarios/new`}>
            new scenario
          </Link>
          .
        </Notice>
      )}
      {!loading && files.data?.climateFiles.length === 0 && (
        <Notice title="No climate file yet">
          A sweep runs on a climate file:{' '}
          <Link className="underline" to={`/projects/${projectId}/climate-files/new`}>
            upload one
          </Link>
          .
        </Notice>
      )}
      {base && file && (
        <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_26rem]">
          <Panel title="What to sweep">
            <div className="space-y-3 text-sm">
              <div className="grid gap-3 md:grid-cols-2">
                <label className="flex flex-col gap-0.5">
                  <span className="text-xs text-ink-soft">Base scenario</span>
                  <select className="rounded border border-rule bg-panel px-2 py-1" value={base.id} onChange={(e) => setScenarioId(Number(e.target.value))}>
                    {list.map((s) => (
                      <option key={s.id} value={s.id}>
                        {s.name} ({s.scenario.system.kind})
                      </option>
                    ))}
                  </select>
                </label>
                <label className="flex flex-col gap-0.5">
                  <span className="text-xs text-ink-soft">Climate file</span>
                  <select className="rounded border border-rule bg-panel px-2 py-1" value={file.id} onChange={(e) => setFileId(Number(e.target.value))}>
                    {files.data!.climateFiles.map((f) => (
                      <option key={f.id} value={f.id}>
                        {f.siteName} · {f.name} ({f.hours.toLocaleString('en')} h)
                      </option>
                    ))}
                  </select>
                </label>
              </div>
              {axes.map((axis, i) => (
                <AxisFields
                  key={i}
                  legend={i === 0 ? 'Input to sweep' : 'Second input (grid)'}
                  axis={axis}
                  scenario={base.scenario}
                  taken={axes[1 - i]?.input}
                  onChange={(next) => setAxes(axes.map((a, j) => (j === i ? next : a)))}
                />
              ))}
              {axes.length === 1 ? (
                applicableInputs(base.scenario).length > 1 && (
                  <button
                    type="button"
                    className="rounded border border-rule px-3 py-1 hover:bg-mist"
                    onClick={() => setAxes([...axes, draftFor(applicableInputs(base.scenario).find((p) => p !== axes[0].input)!)])}
                  >
                    Add a second input (grid, drawn as a heat map)
                  </button>
                )
              ) : (
                <button type="button" className="rounded border border-rule px-3 py-1 hover:bg-mist" onClick={() => setAxes(axes.slice(0, 1))}>
                  Sweep one input only
                </button>
              )}
              <label className="flex flex-col gap-0.5">
                <span className="text-xs text-ink-soft">Name (optional)</span>
                <input
                  className="rounded border border-rule bg-panel px-2 py-1"
                  value={name}
                  maxLength={200}
                  placeholder={`${base.name} · ${axes.map((a) => SWEEP_INPUTS[a.input].short).join(' × ')}`}
                  onChange={(e) => setName(e.target.value)}
                />
              </label>
            </div>
          </Panel>
          <Panel title="Points">
            <div className="space-y-3 text-sm" data-testid="sweep-preview">
              <p>
                <span className="num text-2xl font-semibold" data-testid="point-count">
                  {check?.count ?? 0}
                </span>{' '}
                {check?.count === 1 ? 'point' : 'points'} <span className="text-ink-soft">(at most {MAX_SWEEP_POINTS})</span>, each a run of{' '}
                <span className="num">{file.hours.toLocaleString('en')}</span> hours
              </p>
              {check?.axes?.map((a) => {
                const values = axisValues(a);
                const unit = sweepUnit(a.input, unitSystem);
                const shown = values.length > 10 ? [...values.slice(0, 4), '…', ...values.slice(-3)] : values;
                return (
                  <p key={a.input} className="text-ink-soft">
                    <span className="text-ink">{SWEEP_INPUTS[a.input].label}</span>: {values.length} values{' '}
                    <span className="num">{shown.map((v) => (v === '…' ? v : formatSweepValue(a.input, unitSystem, v))).join(', ')}</span>
                    {unit && ` ${unit}`}
                  </p>
                );
              })}
              {check && check.errors.length > 0 && (
                <Notice tone="bad" title="These points cannot be run">
                  <ul className="list-disc pl-5" data-testid="sweep-errors">
                    {check.errors.map((e) => (
                      <li key={e}>{e}</li>
                    ))}
                  </ul>
                  {unitSystem === 'IP' && <p className="mt-1 text-xs">These messages give values in SI, as the scenario stores them.</p>}
                </Notice>
              )}
              {outside.length > 0 && file && <OutsideEnvelopeWarning outside={outside} total={check?.count ?? 0} elevationM={file.siteElevationM} />}
              <button
                type="button"
                onClick={start}
                disabled={!canEdit || !check || check.count === 0 || check.errors.length > 0 || createSweep.isPending}
                className="w-full rounded bg-harbour px-4 py-2 text-paper hover:bg-harbour-soft disabled:opacity-50"
              >
                {createSweep.isPending ? 'Queueing…' : `Start sweep of ${check?.count ?? 0} runs`}
              </button>
              {createSweep.isError && <p className="text-xs text-signal-bad">The sweep was not started: {createSweep.error.message}</p>}
            </div>
          </Panel>
        </div>
      )}
    </div>
  );
}
