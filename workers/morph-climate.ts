import type { ClimateSeries } from '../shared/climate';
import { monthlyClimate, morphClimate as morph, type MonthlyClimate, type MorphClimateInput, type MorphedClimate } from '../shared/morphing';

export type MorphClimateTaskResult =
  | { ok: false; problems: string[] }
  | (Omit<MorphedClimate, 'series'> & { series: ClimateSeries | null; parentMonthly: MonthlyClimate; projectionMonthly: MonthlyClimate });

/**
 * Piscina task: a future-climate series by Belcher morphing and the monthly statistics of parent and
 * projection side by side; `keepSeries: false` (a preview) sends back only the statistics.
 */
export function morphClimate(input: MorphClimateInput & { keepSeries: boolean }): MorphClimateTaskResult {
  const out = morph(input);
  if (!out.ok) return out;
  const { utcOffsetMinutes, elevationM } = input;
  return {
    ...out,
    series: input.keepSeries ? out.series : null,
    parentMonthly: monthlyClimate(input.series, utcOffsetMinutes, elevationM),
    projectionMonthly: monthlyClimate(out.series, utcOffsetMinutes, elevationM),
  };
}
