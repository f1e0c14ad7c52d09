import { z } from 'zod';
import { fromDisplay } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';
import { envelopeSchema } from '../../../../shared/scenario/schema';

export const limitFields = [
  { key: 'dryBulbMinC', label: 'Dry-bulb, lowest', kind: 'temperature' },
  { key: 'dryBulbMaxC', label: 'Dry-bulb, highest', kind: 'temperature' },
  { key: 'dewPointMinC', label: 'Dew point, lowest', kind: 'temperature' },
  { key: 'dewPointMaxC', label: 'Dew point, highest', kind: 'temperature' },
  { key: 'rhMinPct', label: 'RH, lowest', kind: 'percent' },
  { key: 'rhMaxPct', label: 'RH, highest', kind: 'percent' },
] as const;

export type LimitKey = (typeof limitFields)[number]['key'];

/** What the form holds: the limits as typed, in the person's unit system. */
export interface EnvelopeFormValues {
  name: string;
  note: string;
  limits: Record<LimitKey, string>;
}

/** Typed text to SI: temperatures through the unit system, RH as is; NaN for empty or unreadable text. */
export function limitToSi(kind: 'temperature' | 'percent', system: UnitSystem, text: string): number {
  const t = text.trim().replace(',', '.');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) return Number.NaN;
  return kind === 'temperature' ? fromDisplay('temperature', system, Number(t)) : Number(t);
}

/** The server's envelope schema behind a conversion from what was typed; errors land on the typed fields. */
export function envelopeFormSchema(system: UnitSystem) {
  return z.object({
    name: z.string().trim().min(1, 'Give the envelope a name.').max(120, 'At most 120 characters.'),
    note: z.string().max(2000, 'At most 2,000 characters.'),
    limits: z
      .object(Object.fromEntries(limitFields.map((f) => [f.key, z.string()])) as Record<LimitKey, z.ZodString>)
      .transform((typed) => Object.fromEntries(limitFields.map((f) => [f.key, limitToSi(f.kind, system, typed[f.key])])) as Record<LimitKey, number>)
      .pipe(envelopeSchema),
  });
}

export const blankEnvelopeForm: EnvelopeFormValues = {
  name: '',
  note: '',
  limits: { dryBulbMinC: '', dryBulbMaxC: '', dewPointMinC: '', dewPointMaxC: '', rhMinPct: '', rhMaxPct: '' },
};
