import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useId, useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import type { SitePrefill } from '../../../../shared/climate/formats/site-check';
import { siteInputSchema } from '../../../../shared/schemas/climate-file';
import { ApiError } from '@/lib/api-client';
import { formatQuantity, fromDisplay, toDisplay, unitOf } from '@/lib/quantity';
import { useUnitSystem, type UnitSystem } from '@/lib/unit-system';
import { useCreateSite } from '../api/create-site';
import { useUpdateSite } from '../api/update-site';
import type { Site } from '@/lib/api/sites';

/** Blank for "not given"; otherwise a number within the range, named in the message. */
const optionalCoordinate = (label: string, limit: number) =>
  z
    .string()
    .trim()
    .transform((s) => (s === '' ? null : Number(s.replace(',', '.'))))
    .pipe(
      z
        .number({ error: `${label} must be a number` })
        .min(-limit, `${label} must be between −${limit} and ${limit}`)
        .max(limit, `${label} must be between −${limit} and ${limit}`)
        .nullable(),
    );

/** The site form in the person's units; on submit the elevation goes back to metres and the shared schema checks the whole. */
function siteFormSchema(system: UnitSystem) {
  const [min, max] = [-450, 6000].map((m) => Math.round(toDisplay('elevation', system, m)));
  const unit = unitOf('elevation', system);
  return z.object({
    name: z.string().trim().min(1, 'Give the site a name').max(120, 'Keep the name under 120 characters'),
    latitude: optionalCoordinate('Latitude', 90),
    longitude: optionalCoordinate('Longitude', 180),
    elevation: z
      .number({ error: `Enter the elevation in ${unit}` })
      .min(min, `Elevation must be at least ${min} ${unit}`)
      .max(max, `Elevation must be at most ${max} ${unit}`),
    timeZone: siteInputSchema.shape.timeZone,
  });
}

/** The form's fields from prefill values (elevation in the person's units; blank where nothing is given). */
function formValues(p: SitePrefill, system: UnitSystem) {
  return {
    name: p.name ?? '',
    latitude: p.latitude === undefined ? '' : String(p.latitude),
    longitude: p.longitude === undefined ? '' : String(p.longitude),
    elevation: p.elevationM === undefined ? 0 : Math.round(toDisplay('elevation', system, p.elevationM) * 10) / 10,
    timeZone: p.timeZone ?? 'UTC',
  };
}

const inputClass = 'w-full rounded border border-rule bg-panel px-2 py-1.5 text-sm aria-[invalid=true]:border-signal-bad';

/** Creates a site, or edits `site` when given; values are typed in the person's units. */
export function SiteForm({
  projectId,
  site,
  initial,
  onCreated,
  onCancel,
}: {
  projectId: number;
  site?: Site;
  /** Values a new site starts from (a weather file's header). */
  initial?: SitePrefill;
  /** Called with the saved site, new or edited. */
  onCreated?: (site: Site) => void;
  onCancel?: () => void;
}) {
  const { unitSystem } = useUnitSystem();
  const schema = useMemo(() => siteFormSchema(unitSystem), [unitSystem]);
  const zones = useMemo(() => (typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : []), []);
  const ids = useId();
  const create = useCreateSite(projectId);
  const update = useUpdateSite(projectId, site?.id ?? 0);
  const form = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: site
      ? {
          name: site.name,
          latitude: site.latitude === null ? '' : String(site.latitude),
          longitude: site.longitude === null ? '' : String(site.longitude),
          elevation: Math.round(toDisplay('elevation', unitSystem, site.elevationM) * 10) / 10,
          timeZone: site.timeZone,
        }
      : formValues(initial ?? {}, unitSystem),
  });
  // The form opens because someone asked for it: the caret goes to its first field.
  const { setFocus } = form;
  useEffect(() => setFocus('name'), [setFocus]);
  const [fillNote, setFillNote] = useState<string | null>(null);

  /** Fills the form from what a weather file's header says (its first 64 kB are read here, nothing is sent). */
  async function fillFromFile(file: File) {
    const { readFileHeaderOf } = await import('../lib/read-file-header');
    const found = await readFileHeaderOf(file);
    if (!found) {
      setFillNote(`${file.name} has no header with station data (EPW, header-block CSV or a station line); nothing was filled.`);
      return;
    }
    const values = formValues(found, unitSystem);
    for (const key of Object.keys(values) as (keyof typeof values)[]) {
      if (key in found || (key === 'elevation' && found.elevationM !== undefined)) form.setValue(key, values[key] as never, { shouldValidate: true });
    }
    setFillNote(`Filled from the header of ${file.name}: check each value before saving.`);
  }
  const errors = form.formState.errors;

  const submit = form.handleSubmit(async (values) => {
    const input = siteInputSchema.parse({ ...values, elevationM: fromDisplay('elevation', unitSystem, values.elevation), elevation: undefined });
    try {
      const saved = site ? (await update.mutateAsync(input)).site : (await create.mutateAsync(input)).site;
      if (!site) form.reset();
      onCreated?.(saved);
    } catch (e) {
      form.setError('root', { message: e instanceof ApiError ? e.message : 'The site could not be saved. Try again.' });
    }
  });

  const field = (name: 'name' | 'latitude' | 'longitude' | 'elevation' | 'timeZone', label: string, help: string, input: React.ReactNode) => (
    <div className="space-y-1">
      <label htmlFor={`${ids}-${name}`} className="block text-sm font-medium">
        {label}
      </label>
      {input}
      <p id={`${ids}-${name}-help`} className={`text-xs ${errors[name] ? 'text-signal-bad' : 'text-ink-soft'}`}>
        {errors[name]?.message ?? help}
      </p>
    </div>
  );
  const aria = (name: 'name' | 'latitude' | 'longitude' | 'elevation' | 'timeZone') => ({
    id: `${ids}-${name}`,
    'aria-invalid': errors[name] ? true : undefined,
    'aria-describedby': `${ids}-${name}-help`,
  });

  return (
    <form onSubmit={submit} className="space-y-3" noValidate aria-label={site ? `Edit ${site.name}` : 'New site'}>
      {!site && !initial && (
        <div className="text-sm">
          <label htmlFor={`${ids}-header-file`} className="block font-medium">
            Fill from a weather file's header (optional)
          </label>
          <input
            id={`${ids}-header-file`}
            type="file"
            className="mt-1 block text-xs"
            onChange={(e) => {
              const chosen = e.currentTarget.files?.[0];
              if (chosen) void fillFromFile(chosen);
            }}
          />
          <p className="text-xs text-ink-soft" role="status">
            {fillNote ?? 'EPW, header-block CSV or a CSV with a station line: name, position, elevation and UTC offset.'}
          </p>
        </div>
      )}
      <div className="grid gap-3 sm:grid-cols-2">
        {field('name', 'Site name', 'As the project calls it.', <input {...aria('name')} className={inputClass} {...form.register('name')} />)}
        {field(
          'elevation',
          `Elevation (${unitOf('elevation', unitSystem)})`,
          `Sets the pressure when a file has none; ${formatQuantity('elevation', unitSystem, 0)} is sea level.`,
          <input {...aria('elevation')} type="number" step="any" className={`num ${inputClass}`} {...form.register('elevation', { valueAsNumber: true })} />,
        )}
        {field(
          'latitude',
          'Latitude (°, optional)',
          'North positive, e.g. 52.37.',
          <input {...aria('latitude')} inputMode="decimal" className={`num ${inputClass}`} {...form.register('latitude')} />,
        )}
        {field(
          'longitude',
          'Longitude (°, optional)',
          'East positive, e.g. −6.26.',
          <input {...aria('longitude')} inputMode="decimal" className={`num ${inputClass}`} {...form.register('longitude')} />,
        )}
        {field(
          'timeZone',
          'Time zone',
          'IANA name such as Europe/Oslo (with daylight saving), or a fixed offset such as UTC-07:00 (standard time all year); reads local timestamps in files.',
          <>
            <input {...aria('timeZone')} list={`${ids}-zones`} className={inputClass} {...form.register('timeZone')} />
            <datalist id={`${ids}-zones`}>
              {zones.map((z) => (
                <option key={z} value={z} />
              ))}
            </datalist>
          </>,
        )}
      </div>
      {errors.root && (
        <p role="alert" className="text-sm text-signal-bad">
          {errors.root.message}
        </p>
      )}
      <div className="flex gap-2">
        <button
          type="submit"
          disabled={form.formState.isSubmitting}
          className="rounded bg-harbour px-4 py-2 text-sm text-paper hover:bg-harbour-soft disabled:opacity-50"
        >
          {site ? 'Save changes' : 'Save site'}
        </button>
        {onCancel && (
          <button type="button" onClick={onCancel} className="rounded border border-rule bg-panel px-4 py-2 text-sm hover:bg-mist">
            Cancel
          </button>
        )}
      </div>
    </form>
  );
}
