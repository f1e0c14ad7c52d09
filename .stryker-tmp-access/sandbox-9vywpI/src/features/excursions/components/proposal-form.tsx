// @ts-nocheck
import { useForm, type Resolver } from 'react-hook-form';
import { fromDisplay, toDisplay, unitOf } from '@/lib/quantity';
import { useUnitSystem, type UnitSystem } from '@/lib/unit-system';
import {
  proposalQuerySchema,
  ALLOWABLE_PRESET_IDS,
  RECOMMENDED_PRESET_IDS,
  RUN_ENVELOPE,
  type ProposalQuery,
} from '../../../../shared/excursions/proposal-query';
import { ENVELOPE_PRESETS } from '../../../../shared/scenario/envelopes';

interface FormValues {
  supplyAirC: string;
  floats: boolean;
  floatUpToC: string;
  control: string;
  recommended: string;
  allowable: string;
}

const presetLabel = (id: string) => (id === RUN_ENVELOPE ? "The run's envelope" : (ENVELOPE_PRESETS.find((p) => p.id === id)?.label ?? id));
const shown = (siC: number, system: UnitSystem) => String(Math.round(toDisplay('temperature', system, siC) * 10) / 10);

/** Reads the boxes in the person's units, converts to SI and checks with the API's own schema. */
function proposalResolver(system: UnitSystem): Resolver<FormValues, unknown, ProposalQuery> {
  return async (values) => {
    const toSi = (text: string) => (text.trim() === '' ? undefined : Number.isFinite(Number(text)) ? fromDisplay('temperature', system, Number(text)) : text);
    const candidate = {
      supplyAirC: toSi(values.supplyAirC),
      floatUpToC: values.floats ? toSi(values.floatUpToC) : undefined,
      control: values.control,
      recommended: values.recommended,
      allowable: values.allowable,
    };
    const parsed = proposalQuerySchema.safeParse(candidate);
    if (parsed.success) return { values: parsed.data, errors: {} };
    const range = `${shown(5, system)}–${shown(45, system)} ${unitOf('temperature', system)}`;
    const errors: Record<string, { type: string; message: string }> = {};
    for (const issue of parsed.error.issues) {
      const field = String(issue.path[0] ?? 'supplyAirC');
      const message = issue.message.startsWith('must be a number from')
        ? `Enter a number from ${range}.`
        : issue.message.startsWith('must be at or above')
          ? 'Enter a ceiling at or above the setpoint.'
          : issue.message;
      errors[field] = { type: issue.code, message };
    }
    return { values: {}, errors };
  };
}

/**
 * The operator's proposal: supply setpoint, an optional ceiling the supply may float up to, the envelope the
 * controls work to, and the recommended range and allowable class the hours are checked against.
 */
export function ProposalForm({
  current,
  onSubmit,
  busy,
  allowableMaxC,
}: {
  current: ProposalQuery & { supplyAirC: number };
  onSubmit: (q: ProposalQuery) => void;
  busy: boolean;
  /** The chosen allowable class's maximum dry-bulb at the site, derated for its elevation, °C. */
  allowableMaxC: (allowableId: string) => number | null;
}) {
  const { unitSystem } = useUnitSystem();
  const unit = unitOf('temperature', unitSystem);
  const { register, handleSubmit, watch, formState } = useForm<FormValues, unknown, ProposalQuery>({
    resolver: proposalResolver(unitSystem),
    defaultValues: {
      supplyAirC: shown(current.supplyAirC, unitSystem),
      floats: current.floatUpToC !== undefined,
      floatUpToC: shown(current.floatUpToC ?? 32, unitSystem),
      control: current.control ?? RUN_ENVELOPE,
      recommended: current.recommended ?? RECOMMENDED_PRESET_IDS[0],
      allowable: current.allowable ?? ALLOWABLE_PRESET_IDS[0],
    },
  });
  const floats = watch('floats');
  const ceilingText = watch('floatUpToC');
  const allowableId = watch('allowable');
  const ceilingC =
    floats && ceilingText.trim() !== '' && Number.isFinite(Number(ceilingText)) ? fromDisplay('temperature', unitSystem, Number(ceilingText)) : null;
  const allowedMaxC = allowableMaxC(allowableId);
  // Compared at 0.05 K, so a ceiling typed in °F that rounds to the limit is not flagged.
  const ceilingAbove = ceilingC !== null && allowedMaxC !== null && ceilingC > allowedMaxC + 0.05;
  const { errors } = formState;
  const box =
    'w-24 rounded border border-rule bg-panel px-2 py-1 text-right num disabled:bg-paper disabled:text-ink-soft focus-visible:outline-2 focus-visible:outline-harbour';
  const select = 'w-full rounded border border-rule bg-panel px-2 py-1 text-sm focus-visible:outline-2 focus-visible:outline-harbour';
  return (
    <form
      onSubmit={handleSubmit(onSubmit)}
      className="grid gap-x-6 gap-y-3 text-sm md:grid-cols-2 xl:grid-cols-[1fr_1fr_1fr_auto]"
      aria-label="Proposal"
      noValidate
    >
      <div className="space-y-2">
        <label className="flex items-center justify-between gap-3">
          <span>Supply setpoint at the IT inlet</span>
          <span className="flex items-center gap-1">
            <input {...register('supplyAirC')} inputMode="decimal" className={box} aria-invalid={errors.supplyAirC ? true : undefined} />
            <span className="w-6 text-ink-soft">{unit}</span>
          </span>
        </label>
        {errors.supplyAirC && (
          <p className="text-xs text-signal-bad" role="alert">
            Setpoint: {errors.supplyAirC.message}
          </p>
        )}
        <label className="flex items-center gap-2">
          <input type="checkbox" {...register('floats')} className="size-4 accent-harbour" />
          <span>Let the supply float up before evaporative cooling or compressors start</span>
        </label>
        <label className={`flex items-center justify-between gap-3 ${floats ? '' : 'opacity-50'}`}>
          <span>Float up to</span>
          <span className="flex items-center gap-1">
            <input {...register('floatUpToC')} inputMode="decimal" disabled={!floats} className={box} aria-invalid={errors.floatUpToC ? true : undefined} />
            <span className="w-6 text-ink-soft">{unit}</span>
          </span>
        </label>
        {errors.floatUpToC && (
          <p className="text-xs text-signal-bad" role="alert">
            Float ceiling: {errors.floatUpToC.message}
          </p>
        )}
        {ceilingAbove && (
          <p className="rounded border border-signal-warn/50 bg-[#fdf3e1] px-2 py-1 text-xs" role="status" data-testid="float-ceiling-warning">
            The float ceiling {shown(ceilingC!, unitSystem)} {unit} is above the allowable maximum {shown(allowedMaxC!, unitSystem)} {unit} of{' '}
            {presetLabel(allowableId)} at this site (derated for its elevation): every hour the supply floats past it is an allowable excursion.
          </p>
        )}
      </div>
      <label className="block space-y-1">
        <span className="block">Envelope the controls work to</span>
        <select {...register('control')} className={select}>
          {[RUN_ENVELOPE, ...ENVELOPE_PRESETS.map((p) => p.id)].map((id) => (
            <option key={id} value={id}>
              {presetLabel(id)}
            </option>
          ))}
        </select>
        <span className="block text-xs text-ink-soft">Sets the moisture limits a direct-air system dehumidifies or humidifies to.</span>
      </label>
      <div className="space-y-2">
        <label className="block space-y-1">
          <span className="block">Recommended range to check against</span>
          <select {...register('recommended')} className={select}>
            {[...RECOMMENDED_PRESET_IDS, RUN_ENVELOPE].map((id) => (
              <option key={id} value={id}>
                {presetLabel(id)}
              </option>
            ))}
          </select>
        </label>
        <label className="block space-y-1">
          <span className="block">Allowable class to check against</span>
          <select {...register('allowable')} className={select}>
            {[...ALLOWABLE_PRESET_IDS, RUN_ENVELOPE].map((id) => (
              <option key={id} value={id}>
                {presetLabel(id)}
              </option>
            ))}
          </select>
        </label>
      </div>
      <div className="flex items-end">
        <button
          type="submit"
          disabled={busy}
          className="rounded bg-harbour px-4 py-1.5 text-paper hover:bg-harbour-soft focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-harbour disabled:opacity-60"
        >
          {busy ? 'Working out…' : 'Work it out'}
        </button>
      </div>
    </form>
  );
}
