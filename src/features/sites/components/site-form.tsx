import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useMemo } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { siteInputSchema } from '../../../../shared/schemas/climate-file';
import { ApiError } from '@/lib/api-client';
import { formatQuantity, fromDisplay, toDisplay, unitOf } from '@/lib/quantity';
import { useUnitSystem, type UnitSystem } from '@/lib/unit-system';
import { useCreateSite } from '../api/create-site';
import { useUpdateSite } from '../api/update-site';
import type { Site } from '../api/get-sites';

/** Blank for "not given"; otherwise a number within the range, named in the message. */
const optionalCoordinate = (label: string, limit: number) =>
  z
    .string()
    .trim()
    .transform((s) => (s === '' ? null : Number(s.replace(',', '.'))))
    .pipe(z.number({ error: `${label} must be a number` }).min(-limit, `${label} must be between −${limit} and ${limit}`).max(limit, `${label} must be between −${limit} and ${limit}`).nullable());

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

const inputClass = 'w-full rounded border border-rule bg-panel px-2 py-1.5 text-sm aria-[invalid=true]:border-signal-bad';

/** Creates a site, or edits `site` when given; values are typed in the person's units. */
export function SiteForm({
  projectId,
  site,
  onCreated,
  onCancel,
}: {
  projectId: number;
  site?: Site;
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
      : { name: '', latitude: '', longitude: '', elevation: 0, timeZone: 'UTC' },
  });
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
      <label htmlFor={`${ids}-${name}`} className="block text-sm font-medium">{label}</label>
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
      <div className="grid gap-3 sm:grid-cols-2">
        {field('name', 'Site name', 'As the project calls it.', <input {...aria('name')} className={inputClass} {...form.register('name')} />)}
        {field(
          'elevation',
          `Elevation (${unitOf('elevation', unitSystem)})`,
          `Sets the pressure when a file has none; ${formatQuantity('elevation', unitSystem, 0)} is sea level.`,
          <input {...aria('elevation')} type="number" step="any" className={`num ${inputClass}`} {...form.register('elevation', { valueAsNumber: true })} />,
        )}
        {field('latitude', 'Latitude (°, optional)', 'North positive, e.g. 52.37.', <input {...aria('latitude')} inputMode="decimal" className={`num ${inputClass}`} {...form.register('latitude')} />)}
        {field('longitude', 'Longitude (°, optional)', 'East positive, e.g. −6.26.', <input {...aria('longitude')} inputMode="decimal" className={`num ${inputClass}`} {...form.register('longitude')} />)}
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
      {errors.root && <p role="alert" className="text-sm text-signal-bad">{errors.root.message}</p>}
      <div className="flex gap-2">
        <button type="submit" disabled={form.formState.isSubmitting} className="rounded bg-harbour px-4 py-2 text-sm text-paper hover:bg-harbour-soft disabled:opacity-50">
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
