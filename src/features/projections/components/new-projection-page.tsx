import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useMemo, useRef, useState } from 'react';
import { useForm, useWatch, type FieldErrors, type Resolver } from 'react-hook-form';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { MORPHING_CITATION, MONTH_NAMES, parseFactorsCsv, zeroFactors, type ProjectionRequest } from '../../../../shared/morphing';
import { Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ProjectCrumb } from '@/components/ui/project-crumb';
import { ApiError } from '@/lib/api-client';
import { useProjectRole } from '@/lib/api/projects';
import { useUnitSystem, type UnitSystem } from '@/lib/unit-system';
import { useCreateProjection } from '../api/create-projection';
import { useClimateFiles } from '@/lib/api/climate-files';
import { usePreviewProjection } from '../api/preview-projection';
import { factorFormSchema, inDisplayUnits, siToTyped, typedToSi, type FactorFormValues, type FactorKey } from '../lib/factor-form';
import { FactorTableEditor } from './factor-table-editor';
import { MonthlyComparison } from './monthly-comparison';
import { ProjectionCaution } from './projection-caution';
import { UnitsSwitch } from './units-switch';

/** /projects/:projectId/projections/new?from=FILEID — change factors in, a preview, then a stored projection. */
export function NewProjectionPage() {
  const projectId = Number(useParams().projectId);
  const [search] = useSearchParams();
  const fromId = Number(search.get('from'));
  const { canEdit } = useProjectRole(projectId);
  const files = useClimateFiles(projectId);
  const parent = files.data?.climateFiles.find((f) => f.id === fromId);

  return (
    <div className="space-y-4">
      <header>
        <ProjectCrumb projectId={projectId} />
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h1 className="text-xl font-semibold">Make a future-climate projection</h1>
          <UnitsSwitch />
        </div>
        {parent && (
          <p className="text-sm text-ink-soft">
            From{' '}
            <Link to={`/projects/${projectId}/climate-files/${parent.id}`} className="text-harbour underline-offset-2 underline hover:decoration-2">
              {parent.name}
            </Link>{' '}
            · {parent.siteName} · <span className="num">{parent.hours.toLocaleString('en')}</span> hours
          </p>
        )}
      </header>
      {files.isPending && <div role="progressbar" className="h-64 animate-pulse rounded bg-mist" aria-label="Loading the climate file" />}
      {files.isError && (
        <Notice tone="bad" title="The climate files could not be loaded">
          {files.error.message}
        </Notice>
      )}
      {files.data && !parent && (
        <Notice tone="warn" title="Choose the file to start from">
          Open a climate file of this project and press <em>Make a future-climate projection</em> there.{' '}
          <Link to={`/projects/${projectId}`} className="text-harbour underline">
            Back to the project
          </Link>
        </Notice>
      )}
      {parent && !canEdit && (
        <Notice tone="info" title="Only engineers and owners make projections">
          Ask an engineer of the project to make one.
        </Notice>
      )}
      {parent && canEdit && <ProjectionForm projectId={projectId} parentId={parent.id} parentName={parent.name} />}
    </div>
  );
}

function ProjectionForm({ projectId, parentId, parentName }: { projectId: number; parentId: number; parentName: string }) {
  const navigate = useNavigate();
  const { unitSystem } = useUnitSystem();
  const resolver = useMemo(() => zodResolver(factorFormSchema(unitSystem)) as unknown as Resolver<FactorFormValues, unknown, ProjectionRequest>, [unitSystem]);
  const form = useForm<FactorFormValues, unknown, ProjectionRequest>({
    defaultValues: {
      name: `${parentName} — projection`,
      source: '',
      factors: { dryBulbMethod: 'shift-and-stretch', humidityMethod: 'stretch', months: siToTyped(zeroFactors(), unitSystem) },
    },
    resolver,
  });
  const { register, handleSubmit, formState, setValue, getValues } = form;
  const dryBulbMethod = useWatch({ control: form.control, name: 'factors.dryBulbMethod' });
  const humidityMethod = useWatch({ control: form.control, name: 'factors.humidityMethod' });
  const preview = usePreviewProjection(projectId, parentId);
  const create = useCreateProjection(projectId, parentId);
  const [csvErrors, setCsvErrors] = useState<string[] | null>(null);
  const [csvLoaded, setCsvLoaded] = useState<string | null>(null);

  // The table holds typed text: when the unit system changes, the same SI values are shown in the new units.
  const shownIn = useRef<UnitSystem>(unitSystem);
  useEffect(() => {
    if (shownIn.current === unitSystem) return;
    const before = shownIn.current;
    shownIn.current = unitSystem;
    const months = getValues('factors.months').map((row) =>
      Object.fromEntries((Object.keys(row) as FactorKey[]).map((k) => [k, typedToSi(k, before, row[k])])),
    ) as unknown as Parameters<typeof siToTyped>[0];
    setValue(
      'factors.months',
      siToTyped(months, unitSystem).map((row, m) => keepUnreadable(row, getValues(`factors.months.${m}`), months[m])),
    );
  }, [unitSystem, getValues, setValue]);

  async function loadCsv(file: File | undefined) {
    if (!file) return;
    const result = parseFactorsCsv(await file.text());
    if (!result.ok) {
      setCsvErrors(result.errors);
      setCsvLoaded(null);
      return;
    }
    setCsvErrors(null);
    setCsvLoaded(file.name);
    setValue('factors.months', siToTyped(result.months, unitSystem), { shouldValidate: formState.isSubmitted });
    preview.reset();
  }

  const problems = formProblems(formState.errors).map((p) => inDisplayUnits(p, unitSystem));
  const serverError = create.error ?? preview.error;
  const serverProblems = serverError instanceof ApiError ? ((serverError.details as { problems?: string[] } | undefined)?.problems ?? null) : null;

  return (
    <form
      className="space-y-4"
      noValidate
      onSubmit={handleSubmit(async (request) => {
        const { climateFile } = await create.mutateAsync(request);
        navigate(`/projects/${projectId}/projections/${climateFile.id}`);
      })}
    >
      <ProjectionCaution />
      <div className="grid gap-4 xl:grid-cols-[minmax(0,1fr)_24rem]">
        <Panel
          title="Monthly change factors"
          actions={
            <label className="cursor-pointer rounded border border-rule bg-panel px-2.5 py-1 text-xs hover:bg-mist focus-within:outline-2 focus-within:outline-harbour">
              Load factors from CSV
              <input
                type="file"
                accept=".csv,text/csv,text/plain"
                className="sr-only"
                onChange={(e) => void loadCsv(e.target.files?.[0])}
                data-testid="factors-csv"
              />
            </label>
          }
        >
          {csvErrors && (
            <div className="mb-3">
              <Notice tone="bad" title="The factor table was not loaded">
                <ul className="list-disc pl-5">
                  {csvErrors.map((e) => (
                    <li key={e}>{e}</li>
                  ))}
                </ul>
              </Notice>
            </div>
          )}
          {csvLoaded && <p className="mb-2 text-xs text-signal-ok">Loaded from {csvLoaded}. Check the table before you save.</p>}
          <FactorTableEditor register={register} errors={formState.errors} dryBulbMethod={dryBulbMethod} humidityMethod={humidityMethod} />
          <p className="mt-2 text-xs text-ink-soft">
            Temperature changes are differences ({unitSystem === 'SI' ? '1 K' : '1.8 °F = 1 K'}). A CSV has a header row and one row per month:
            <span className="num"> month, delta_mean_k, delta_max_k, delta_min_k, humidity_change_pct</span> (or
            <span className="num"> _f</span> for °F differences, <span className="num">humidity_shift_g_per_kg</span>); lines starting with # are comments.
          </p>
        </Panel>

        <div className="space-y-4">
          <Panel title="Method">
            <fieldset className="space-y-1 text-sm">
              <legend className="mb-1 text-xs font-medium text-ink-soft">Dry-bulb</legend>
              <label className="flex gap-2">
                <input type="radio" value="shift-and-stretch" {...register('factors.dryBulbMethod')} /> Shift and stretch: the mean moves by ΔT mean, the daily
                range by ΔT max − ΔT min
              </label>
              <label className="flex gap-2">
                <input type="radio" value="shift" {...register('factors.dryBulbMethod')} /> Shift: every hour moves by ΔT mean
              </label>
            </fieldset>
            <fieldset className="mt-3 space-y-1 text-sm">
              <legend className="mb-1 text-xs font-medium text-ink-soft">Humidity, through specific humidity q</legend>
              <label className="flex gap-2">
                <input type="radio" value="stretch" {...register('factors.humidityMethod')} /> Stretch: q × (1 + change / 100)
              </label>
              <label className="flex gap-2">
                <input type="radio" value="shift" {...register('factors.humidityMethod')} /> Shift: q + change
              </label>
            </fieldset>
            <p className="mt-3 text-xs text-ink-soft">Then back to relative humidity at the new dry-bulb and the hour's pressure, bounded to 0–100 %.</p>
          </Panel>
          <Panel title="Name and source">
            <label className="block text-sm">
              Name
              <input {...register('name')} className="mt-1 w-full rounded border border-rule bg-panel px-2 py-1" />
            </label>
            <label className="mt-3 block text-sm">
              Where the factors come from <span className="text-ink-soft">(optional)</span>
              <input
                {...register('source')}
                placeholder="e.g. a regional projection, period and scenario"
                className="mt-1 w-full rounded border border-rule bg-panel px-2 py-1"
              />
            </label>
          </Panel>
        </div>
      </div>

      {problems.length > 0 && (
        <Notice tone="bad" title="Some factors need a look">
          <ul className="list-disc pl-5">
            {problems.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
        </Notice>
      )}
      {serverError && (
        <Notice tone="bad" title={create.error ? 'The projection was not saved' : 'The preview could not be made'}>
          {serverProblems ? (
            <ul className="list-disc pl-5">
              {serverProblems.map((p) => (
                <li key={p}>{inDisplayUnits(p, unitSystem)}</li>
              ))}
            </ul>
          ) : (
            serverError.message
          )}
        </Notice>
      )}

      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          onClick={handleSubmit((request) => preview.mutate(request))}
          className="rounded border border-rule bg-panel px-3 py-1.5 text-sm hover:bg-mist"
          disabled={preview.isPending}
        >
          {preview.isPending ? 'Previewing…' : 'Preview monthly means'}
        </button>
        <button
          type="submit"
          className="rounded bg-harbour px-3 py-1.5 text-sm text-paper hover:bg-harbour-soft disabled:opacity-60"
          disabled={create.isPending}
        >
          {create.isPending ? 'Saving…' : 'Save projection'}
        </button>
      </div>

      {preview.data && (
        <Panel title="Preview: today and the projection">
          <MonthlyComparison today={preview.data.comparison.parent} projection={preview.data.comparison.projection} />
          <p className="mt-2 text-xs text-ink-soft">
            Relative humidity bounded to 100 % in <span className="num">{preview.data.clampedHighHours.toLocaleString('en')}</span> hours and to 0 % in{' '}
            <span className="num">{preview.data.clampedLowHours.toLocaleString('en')}</span>. Nothing is stored until you save.
          </p>
        </Panel>
      )}
      <p className="text-xs text-ink-faint">Method: {MORPHING_CITATION}</p>
    </form>
  );
}

/** Keeps what the person typed when it could not be read, rather than replacing it with "NaN". */
function keepUnreadable(converted: Record<FactorKey, string>, typed: Record<FactorKey, string>, si: Record<FactorKey, number>) {
  return Object.fromEntries((Object.keys(converted) as FactorKey[]).map((k) => [k, Number.isNaN(si[k]) ? typed[k] : converted[k]])) as Record<
    FactorKey,
    string
  >;
}

/** Every refused field in words naming its month, from the form's nested errors. */
function formProblems(errors: FieldErrors<FactorFormValues>): string[] {
  const out: string[] = [];
  const months = errors.factors?.months as unknown as (Record<string, { message?: string }> | undefined)[] | { message?: string } | undefined;
  if (Array.isArray(months)) {
    months.forEach((row, m) => {
      if (!row) return;
      for (const [, e] of Object.entries(row)) if (e?.message) out.push(`${MONTH_NAMES[m]}: ${e.message}`);
    });
  } else if (months?.message) out.push(months.message);
  if (errors.name?.message) out.push(`Name: ${errors.name.message}`);
  if (errors.source?.message) out.push(`Source: ${errors.source.message}`);
  return out;
}
