import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { unitOf } from '@/lib/quantity';
import { useUnitSystem } from '@/lib/unit-system';
import { envelopeSchema } from '../../../../shared/scenario/schema';
import { useCreateEnvelope, type NewEnvelope } from '../api/create-envelope';
import { blankEnvelopeForm, envelopeFormSchema, limitFields, type EnvelopeFormValues } from '../lib/envelope-form';
import { formatLimit } from '../lib/limit-format';

/** A project envelope: name, note and six limits typed in the person's units, checked by the shared schema. */
export function EnvelopeForm({ projectId, onCreated }: { projectId: number; onCreated: (id: number) => void }) {
  const { unitSystem } = useUnitSystem();
  const resolver = useMemo(() => zodResolver(envelopeFormSchema(unitSystem)) as unknown as Resolver<EnvelopeFormValues, unknown, NewEnvelope>, [unitSystem]);
  const { register, handleSubmit, formState, reset } = useForm<EnvelopeFormValues, unknown, NewEnvelope>({ defaultValues: blankEnvelopeForm, resolver });
  const create = useCreateEnvelope(projectId);

  return (
    <form
      noValidate
      aria-label="New envelope"
      className="space-y-2 text-sm"
      onSubmit={handleSubmit(async (envelope) => {
        const { envelope: created } = await create.mutateAsync(envelope);
        reset(blankEnvelopeForm);
        onCreated(created.id);
      })}
    >
      <label className="block">
        <span className="block">Name</span>
        <input {...register('name')} className="w-full rounded border border-rule bg-panel px-2 py-1" />
        {formState.errors.name && <span className="text-xs text-signal-bad">{formState.errors.name.message}</span>}
      </label>
      <div className="grid grid-cols-2 gap-x-3 gap-y-2">
        {limitFields.map((f) => {
          const error = formState.errors.limits?.[f.key]?.message;
          const schema = envelopeSchema.shape[f.key];
          const unit = f.kind === 'temperature' ? unitOf('temperature', unitSystem) : '%';
          const range = `${formatLimit(f.kind, unitSystem, schema.minValue ?? 0)} to ${formatLimit(f.kind, unitSystem, schema.maxValue ?? 0)} ${unit}`;
          return (
            <label key={f.key} className="block">
              <span className="block">
                {f.label} <span className="text-xs text-ink-soft">({unit})</span>
              </span>
              <input
                {...register(`limits.${f.key}`)}
                inputMode="decimal"
                aria-invalid={error ? true : undefined}
                className={`num w-full rounded border bg-panel px-2 py-1 text-right ${error ? 'border-signal-bad' : 'border-rule'}`}
              />
              {error && (
                <span role="alert" className="text-xs text-signal-bad">
                  {/^must be a number from/.test(error)
                    ? `Enter a number from ${range}.`
                    : error.replace(
                        /(\w+)(Min|Max)(C|Pct)/g,
                        (_m, q: string, end: string) =>
                          `${end === 'Min' ? 'lowest' : 'highest'} ${q === 'rh' ? 'RH' : q === 'dewPoint' ? 'dew point' : 'dry-bulb'}`,
                      )}
                </span>
              )}
            </label>
          );
        })}
      </div>
      <label className="block">
        <span className="block">Note (source, reason)</span>
        <textarea {...register('note')} rows={2} className="w-full rounded border border-rule bg-panel px-2 py-1" />
      </label>
      {create.isError && <p className="text-xs text-signal-bad">Not saved: {create.error.message}</p>}
      <button type="submit" disabled={create.isPending} className="rounded bg-harbour px-4 py-1.5 text-paper hover:bg-harbour-soft disabled:opacity-50">
        {create.isPending ? 'Saving…' : 'Add envelope'}
      </button>
    </form>
  );
}
