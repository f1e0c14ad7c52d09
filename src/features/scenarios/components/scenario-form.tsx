import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState, type ReactNode } from 'react';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { scenarioSchema, type Scenario } from '../../../../shared/scenario/schema';
import { useDuplicateScenario } from '../api/duplicate-scenario';
import type { ListedClimateFile as ClimateFileListing } from '@/lib/api/climate-files';
import { useSaveScenario } from '../api/save-scenario';
import { energyFields, envelopeFields, fieldsFor, systemFields, systemKinds } from '../lib/scenario-fields';
import type { ScenarioFormValues } from '../lib/scenario-form';
import { useDebouncedValue } from '../lib/use-debounced-value';
import { useLeaveGuard } from '../lib/use-leave-guard';
import { EnvelopePicker } from './envelope-picker';
import { HybridFields } from './hybrid-fields';
import { LoadProfileField } from './load-profile-field';
import { DesignChartPreview } from './design-chart-preview';
import { ModePreview } from './mode-preview';
import { QuantityField } from './quantity-field';
import { RunPanel } from './run-panel';
import { SiteElevations } from './site-elevations';
import { ScenarioRuns } from './scenario-runs';
import { ProjectCrumb } from '@/components/ui/project-crumb';
import { ChoiceCard } from '@/components/ui/choice-card';

/** The energy inputs a system uses; a hybrid's are its liquid loop's (pumps, heat-rejection fans, tower) and the hall fans. */
function energyFieldsFor(system: ScenarioFormValues['system']) {
  if (system.kind !== 'hybrid') return fieldsFor(energyFields, system.kind, system.kind === 'water-side' ? system.heatRejection : undefined);
  const tower = system.liquid.heatRejection === 'cooling-tower' || (system.air.kind === 'water-side' && system.air.heatRejection === 'cooling-tower');
  return fieldsFor(energyFields, 'water-side', tower ? 'cooling-tower' : 'dry-cooler');
}

const resolver = zodResolver(scenarioSchema) as unknown as Resolver<ScenarioFormValues, unknown, Scenario>;

export function ScenarioForm({
  projectId,
  scenarioId,
  initial,
  climateFiles,
  canEdit,
  roleKnown,
  notice,
}: {
  projectId: number;
  scenarioId: number | null;
  initial: ScenarioFormValues;
  climateFiles: ClimateFileListing[];
  canEdit: boolean;
  roleKnown: boolean;
  /** Shown under the title, above the form (the one-time notice of the start-up migration). */
  notice?: ReactNode;
}) {
  const navigate = useNavigate();
  const form = useForm<ScenarioFormValues, unknown, Scenario>({ defaultValues: initial, resolver, mode: 'onChange' });
  const { control, register, handleSubmit, setValue, reset, setError, formState } = form;
  const values = useWatch({ control }) as ScenarioFormValues;
  const kind = values.system.kind;
  const save = useSaveScenario(projectId, scenarioId);
  const duplicate = useDuplicateScenario(projectId);
  const [previewFileId, setPreviewFileId] = useState<number | null>(null);
  const { allowNextLeave } = useLeaveGuard(formState.isDirty && canEdit);
  const chosenPreviewFile = previewFileId ?? climateFiles[0]?.id ?? null;

  // The preview follows the form once typing pauses; an invalid form is not sent.
  const settledJson = useDebouncedValue(JSON.stringify(values), 600);
  const settled = useMemo(() => scenarioSchema.safeParse(JSON.parse(settledJson)), [settledJson]);
  // Checked at once (not debounced), so a preview of the last valid scenario is never shown as if it were current.
  const validNow = useMemo(() => scenarioSchema.safeParse(values).success, [values]);

  async function persist(scenario: Scenario): Promise<number | null> {
    try {
      const { scenario: saved } = await save.mutateAsync(scenario);
      reset(values);
      allowNextLeave();
      if (scenarioId === null) navigate(`/projects/${projectId}/scenarios/${saved.id}`, { replace: true });
      return saved.id;
    } catch (error) {
      // The server names each bad field "path: message"; put each message next to its field.
      const errors = error instanceof ApiError ? (error.details as { errors?: string[] } | undefined)?.errors : undefined;
      for (const line of errors ?? []) {
        const at = line.indexOf(': ');
        if (at > 0) setError(line.slice(0, at) as never, { message: line.slice(at + 2) });
      }
      return null;
    }
  }

  const readOnly = !canEdit;
  return (
    <form onSubmit={handleSubmit(persist)} noValidate className="space-y-4" aria-label="Scenario editor">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <ProjectCrumb projectId={projectId} />
          <h1 className="text-xl font-semibold">{scenarioId === null ? 'New scenario' : values.name || 'Untitled scenario'}</h1>
        </div>
        {canEdit && (
          <div className="flex items-center gap-2">
            {formState.isDirty && <span className="text-xs text-signal-warn">Unsaved changes</span>}
            {scenarioId !== null && (
              <button
                type="button"
                disabled={duplicate.isPending}
                onClick={async () => {
                  const { scenario } = await duplicate.mutateAsync(scenarioId);
                  navigate(`/projects/${projectId}/scenarios/${scenario.id}`);
                }}
                className="rounded border border-rule bg-panel px-3 py-1.5 text-sm hover:bg-mist"
              >
                Duplicate
              </button>
            )}
            <button
              type="submit"
              disabled={save.isPending || (!formState.isDirty && scenarioId !== null)}
              className="rounded bg-harbour px-4 py-1.5 text-sm text-paper hover:bg-harbour-soft disabled:opacity-50"
            >
              {save.isPending ? 'Saving…' : scenarioId === null ? 'Save scenario' : 'Save changes'}
            </button>
          </div>
        )}
      </div>

      {notice}
      {roleKnown && readOnly && (
        <Notice title="Read-only">You can read this scenario and its runs; editing and running need the engineer or owner role in this project.</Notice>
      )}
      {save.isError && !(save.error instanceof ApiError && save.error.code === 'invalid_scenario') && (
        <Notice tone="bad" title="The scenario was not saved">
          {save.error.message}
        </Notice>
      )}
      {save.isError && save.error instanceof ApiError && save.error.code === 'invalid_scenario' && (
        <Notice tone="bad" title="The server refused some fields">
          The messages are next to each field.
        </Notice>
      )}

      <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_26rem]">
        <fieldset disabled={readOnly} className="min-w-0 space-y-4">
          <Panel title="Design">
            <div className="grid grid-cols-1 items-baseline sm:grid-cols-[minmax(11rem,15rem)_1fr] gap-x-3 gap-y-2">
              <label htmlFor="scenario-name" className="text-sm">
                Name
              </label>
              <div>
                <input
                  id="scenario-name"
                  {...register('name')}
                  aria-invalid={formState.errors.name ? true : undefined}
                  className="w-full max-w-xl rounded border border-rule bg-panel px-2 py-1 text-sm disabled:bg-paper disabled:text-ink-soft"
                />
                {formState.errors.name && (
                  <p role="alert" className="text-xs font-medium text-signal-bad">
                    Name {formState.errors.name.message}
                  </p>
                )}
              </div>
            </div>
            <fieldset className="mt-3">
              <legend className="text-sm">System kind</legend>
              <div className="mt-1 grid gap-2 md:grid-cols-2 2xl:grid-cols-4">
                {systemKinds.map((k) => (
                  <ChoiceCard key={k.kind} selected={kind === k.kind} label={k.label} help={k.help}>
                    <input type="radio" value={k.kind} {...register('system.kind')} className="mt-1 accent-harbour" />
                  </ChoiceCard>
                ))}
              </div>
            </fieldset>
            <SiteElevations projectId={projectId} climateFiles={climateFiles} />
          </Panel>

          <Panel title="Setpoints, effectivenesses and approaches">
            {kind === 'water-side' && (
              <div className="grid grid-cols-1 items-baseline sm:grid-cols-[minmax(11rem,15rem)_1fr] gap-x-3 pb-1.5">
                <label htmlFor="heat-rejection" className="text-sm">
                  Heat rejection
                </label>
                <div>
                  <select
                    id="heat-rejection"
                    {...register('system.heatRejection')}
                    className="rounded border border-rule bg-panel px-2 py-1 text-sm disabled:bg-paper disabled:text-ink-soft"
                  >
                    <option value="cooling-tower">Cooling tower (wet-bulb)</option>
                    <option value="dry-cooler">Dry cooler (dry-bulb, optional spray)</option>
                  </select>
                  <p className="text-xs text-ink-soft">
                    A tower follows the wet-bulb; a dry cooler the dry-bulb, helped by the evaporative stage if it has one.
                  </p>
                </div>
              </div>
            )}
            {kind === 'hybrid' ? (
              <HybridFields control={control} register={register} setValue={setValue} system={values.system} disabled={readOnly} />
            ) : (
              fieldsFor(systemFields, kind, values.system.kind === 'water-side' ? values.system.heatRejection : undefined).map((f) => (
                <QuantityField key={f.path} control={control} field={f} disabled={readOnly} />
              ))
            )}
          </Panel>

          <Panel title="Inlet envelope">
            <EnvelopePicker
              projectId={projectId}
              value={values.envelope}
              disabled={readOnly}
              onPick={(envelope) => setValue('envelope', envelope, { shouldDirty: true, shouldValidate: true })}
            />
            <div className="mt-2">
              {envelopeFields.map((f) => (
                <QuantityField key={f.path} control={control} field={f} disabled={readOnly} />
              ))}
            </div>
          </Panel>

          <Panel title="Energy and water inputs">
            <LoadProfileField
              value={values.energy.itLoadProfile ?? { kind: 'constant' }}
              itLoadKw={values.energy.itLoadKw}
              disabled={readOnly}
              onChange={(profile) => setValue('energy.itLoadProfile', profile, { shouldDirty: true, shouldValidate: true })}
            />
            {energyFieldsFor(values.system).map((f) => (
              <QuantityField key={f.path} control={control} field={f} disabled={readOnly} />
            ))}
          </Panel>
        </fieldset>

        <aside className="space-y-4 xl:sticky xl:top-4 xl:self-start">
          {canEdit && (
            <Panel title="Quick preview">
              {climateFiles.length === 0 ? (
                <p className="text-sm text-ink-soft">Upload a climate file to the project to see hours per mode while you edit.</p>
              ) : (
                <ModePreview
                  projectId={projectId}
                  scenario={settled.success && validNow ? settled.data : null}
                  invalid={!validNow}
                  climateFiles={climateFiles}
                  climateFileId={chosenPreviewFile}
                  onClimateFileChange={setPreviewFileId}
                />
              )}
            </Panel>
          )}
          {climateFiles.length > 0 && (
            <Panel title="The design on the moist-air chart">
              <DesignChartPreview projectId={projectId} climateFileId={chosenPreviewFile} values={values} />
            </Panel>
          )}
          {canEdit && (
            <RunPanel
              projectId={projectId}
              scenarioId={scenarioId}
              climateFiles={climateFiles}
              beforeRun={() =>
                new Promise<number | null>((resolve) => {
                  if (scenarioId !== null && !formState.isDirty) return resolve(scenarioId);
                  void handleSubmit(
                    async (s) => resolve(await persist(s)),
                    () => resolve(null),
                  )();
                })
              }
            />
          )}
          {scenarioId !== null && <ScenarioRuns projectId={projectId} scenarioId={scenarioId} />}
        </aside>
      </div>
    </form>
  );
}
