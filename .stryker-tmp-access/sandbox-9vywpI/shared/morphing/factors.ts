// @ts-nocheck
import { z } from 'zod';
import { withoutControlCharacters } from '../schemas/plain-text';

/** Month names for messages and tables, index 0 = January. */
export const MONTH_NAMES = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'] as const;

/** How dry-bulb is morphed: shift (every hour moves by ΔTmean) or shift-and-stretch (the daily range changes too). */
export const dryBulbMethods = ['shift-and-stretch', 'shift'] as const;
/** How specific humidity is morphed: stretch by a percent change, or shift by an absolute change in g/kg. */
export const humidityMethods = ['stretch', 'shift'] as const;
export type DryBulbMethod = (typeof dryBulbMethods)[number];
export type HumidityMethod = (typeof humidityMethods)[number];

// Bounds that catch a typing slip (a degree Fahrenheit typed as kelvin, a fraction typed as percent); no
// published climate projection for a month comes near them. Our own bounds, not from the paper.
const MAX_DELTA_K = 15;
const MIN_HUMIDITY_PCT = -90;
const MAX_HUMIDITY_PCT = 200;
const MAX_HUMIDITY_SHIFT_G_PER_KG = 20;

const kelvinChange = (what: string) =>
  z
    .number({ error: `${what} must be a number (K)` })
    .min(-MAX_DELTA_K, `${what} must be at least −${MAX_DELTA_K} K`)
    .max(MAX_DELTA_K, `${what} must be at most ${MAX_DELTA_K} K`);

/** One month's change factors, SI: temperature changes in K, humidity change in % of q or in g/kg. */
export const monthFactorSchema = z.object({
  /** ΔTmean_m, K: change of the monthly mean dry-bulb. */
  deltaMeanK: kelvinChange('ΔTmean'),
  /** ΔTmax_m, K: change of the monthly mean of daily maximum dry-bulb. */
  deltaMaxK: kelvinChange('ΔTmax'),
  /** ΔTmin_m, K: change of the monthly mean of daily minimum dry-bulb. */
  deltaMinK: kelvinChange('ΔTmin'),
  /** Change of specific humidity, % (used by the stretch method). */
  humidityChangePct: z
    .number({ error: 'the humidity change must be a number (%)' })
    .min(MIN_HUMIDITY_PCT, `the humidity change must be at least ${MIN_HUMIDITY_PCT} %`)
    .max(MAX_HUMIDITY_PCT, `the humidity change must be at most ${MAX_HUMIDITY_PCT} %`)
    .default(0),
  /** Change of specific humidity, g/kg (used by the shift method). */
  humidityShiftGPerKg: z
    .number({ error: 'the humidity shift must be a number (g/kg)' })
    .min(-MAX_HUMIDITY_SHIFT_G_PER_KG, `the humidity shift must be at least −${MAX_HUMIDITY_SHIFT_G_PER_KG} g/kg`)
    .max(MAX_HUMIDITY_SHIFT_G_PER_KG, `the humidity shift must be at most ${MAX_HUMIDITY_SHIFT_G_PER_KG} g/kg`)
    .default(0),
});
export type MonthFactor = z.infer<typeof monthFactorSchema>;

/** Twelve months of change factors and the method per quantity. */
export const changeFactorsSchema = z.object({
  dryBulbMethod: z.enum(dryBulbMethods),
  humidityMethod: z.enum(humidityMethods),
  months: z.array(monthFactorSchema).length(12, 'give change factors for all 12 months, January to December'),
});
export type ChangeFactors = z.infer<typeof changeFactorsSchema>;

/** Body of a request to make (or preview) a projection. */
export const projectionRequestSchema = z.object({
  name: z
    .string()
    .trim()
    .min(1, 'the name must not be empty')
    .max(120, 'the name must be at most 120 characters')
    .refine(...withoutControlCharacters('the name'))
    .optional(),
  /** Where the factors come from, in the user's words (a scenario, a period, a model run). */
  source: z.string().trim().max(300, 'the source must be at most 300 characters').optional(),
  factors: changeFactorsSchema,
});
export type ProjectionRequest = z.infer<typeof projectionRequestSchema>;

const fieldWords: Record<string, string> = {
  deltaMeanK: 'ΔTmean (deltaMeanK)',
  deltaMaxK: 'ΔTmax (deltaMaxK)',
  deltaMinK: 'ΔTmin (deltaMinK)',
  humidityChangePct: 'humidity change (humidityChangePct)',
  humidityShiftGPerKg: 'humidity shift (humidityShiftGPerKg)',
};

/**
 * Problems of a refused factor table in words that name the month and the field,
 * e.g. "March, ΔTmax (deltaMaxK): ΔTmax must be at most 15 K".
 */
export function describeFactorIssues(issues: readonly { path: readonly PropertyKey[]; message: string }[]): string[] {
  return issues.map((issue) => {
    const path = issue.path[0] === 'factors' ? issue.path.slice(1) : issue.path;
    if (path[0] === 'months' && typeof path[1] === 'number') {
      const month = MONTH_NAMES[path[1]] ?? `month ${path[1] + 1}`;
      const field = typeof path[2] === 'string' ? (fieldWords[path[2]] ?? path[2]) : undefined;
      return field ? `${month}, ${field}: ${issue.message}` : `${month}: ${issue.message}`;
    }
    return path.length ? `${path.map(String).join('.')}: ${issue.message}` : issue.message;
  });
}

/** Twelve months of no change: the starting table. */
export function zeroFactors(): MonthFactor[] {
  return MONTH_NAMES.map(() => ({ deltaMeanK: 0, deltaMaxK: 0, deltaMinK: 0, humidityChangePct: 0, humidityShiftGPerKg: 0 }));
}
