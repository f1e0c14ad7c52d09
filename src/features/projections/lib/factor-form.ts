import { z } from 'zod';
import { dryBulbMethods, humidityMethods, projectionRequestSchema, type MonthFactor } from '../../../../shared/morphing';
import { fromDisplay, toDisplay } from '@/lib/quantity';
import type { UnitSystem } from '@/lib/unit-system';

export type FactorKey = keyof MonthFactor;

/** What the form holds: the twelve rows as typed, in the person's unit system. */
export interface FactorFormValues {
  name: string;
  source: string;
  factors: {
    dryBulbMethod: (typeof dryBulbMethods)[number];
    humidityMethod: (typeof humidityMethods)[number];
    months: Record<FactorKey, string>[];
  };
}

/**
 * Temperature changes are differences: in IP °F difference = 1.8 × K (no +32). Humidity change in % is the
 * same in both systems; the absolute shift is g/kg in SI and gr/lb in IP.
 */
const convert: Record<FactorKey, { toSi: (shown: number, s: UnitSystem) => number; fromSi: (si: number, s: UnitSystem) => number }> = {
  deltaMeanK: { toSi: (v, s) => fromDisplay('temperatureDifference', s, v), fromSi: (v, s) => toDisplay('temperatureDifference', s, v) },
  deltaMaxK: { toSi: (v, s) => fromDisplay('temperatureDifference', s, v), fromSi: (v, s) => toDisplay('temperatureDifference', s, v) },
  deltaMinK: { toSi: (v, s) => fromDisplay('temperatureDifference', s, v), fromSi: (v, s) => toDisplay('temperatureDifference', s, v) },
  humidityChangePct: { toSi: (v) => v, fromSi: (v) => v },
  humidityShiftGPerKg: { toSi: (v, s) => 1000 * fromDisplay('humidityRatio', s, v), fromSi: (v, s) => toDisplay('humidityRatio', s, v / 1000) },
};

const factorKeys = Object.keys(convert) as FactorKey[];

/** Typed text to SI; NaN for empty or unreadable text, which the schema then refuses by name. */
export function typedToSi(key: FactorKey, system: UnitSystem, text: string): number {
  const t = text.trim().replace(',', '.').replace('−', '-');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)$/.test(t)) return Number.NaN;
  return convert[key].toSi(Number(t), system);
}

/** SI factors to the text shown in the table (rounded to what a person would type). */
export function siToTyped(months: MonthFactor[], system: UnitSystem): Record<FactorKey, string>[] {
  return months.map(
    (m) => Object.fromEntries(factorKeys.map((k) => [k, String(Math.round(convert[k].fromSi(m[k], system) * 1000) / 1000)])) as Record<FactorKey, string>,
  );
}

/** The typed table to SI, then the shared request schema; errors land on the typed cells (same paths). */
export function factorFormSchema(system: UnitSystem) {
  return z
    .object({
      name: z.string(),
      source: z.string(),
      factors: z.object({
        dryBulbMethod: z.enum(dryBulbMethods),
        humidityMethod: z.enum(humidityMethods),
        months: z.array(z.record(z.string(), z.string())),
      }),
    })
    .transform((v): z.input<typeof projectionRequestSchema> => ({
      name: v.name.trim() || undefined,
      source: v.source.trim() || undefined,
      factors: {
        ...v.factors,
        months: v.factors.months.map((row) => Object.fromEntries(factorKeys.map((k) => [k, typedToSi(k, system, row[k] ?? '')])) as MonthFactor),
      },
    }))
    .pipe(projectionRequestSchema);
}

/** The schema's SI wording in the person's units: "at most 15 K" reads "at most 27 °F" in IP. */
export function inDisplayUnits(message: string, system: UnitSystem): string {
  if (system === 'SI') return message;
  return message
    .replace(/(−?\d+(?:\.\d+)?) K\b/g, (_, v: string) =>
      `${Math.round(toDisplay('temperatureDifference', 'IP', Number(v.replace('−', '-'))) * 10) / 10} °F`.replace('-', '−'),
    )
    .replace(/(−?\d+(?:\.\d+)?) g\/kg/g, (_, v: string) =>
      `${Math.round(toDisplay('humidityRatio', 'IP', Number(v.replace('−', '-')) / 1000))} gr/lb`.replace('-', '−'),
    )
    .replace('(K)', '(°F)')
    .replace('(g/kg)', '(gr/lb)');
}
