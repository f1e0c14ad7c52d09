// @ts-nocheck
import { cleanedSeriesCsv, type ClimateSeries } from '../shared/climate';
import { monthlyClimate, morphClimate as morph, type MonthlyClimate, type MorphClimateInput, type MorphedClimate } from '../shared/morphing';

export type MorphClimateTaskResult =
  | { ok: false; problems: string[] }
  | (Omit<MorphedClimate, 'series'> & {
      series: ClimateSeries | null;
      /** The series as the cleaned hourly CSV (UTF-8), the body of the projection's original; null with the series. */
      seriesCsv: Uint8Array | null;
      parentMonthly: MonthlyClimate;
      projectionMonthly: MonthlyClimate;
    });

const encoder = new TextEncoder();

/**
 * Piscina task: a future-climate series by Belcher morphing and the monthly statistics of parent and
 * projection side by side; `keepSeries: false` (a preview) sends back only the statistics. The series' CSV is written
 * here too: for a century of hours it takes seconds, which the server's main thread must not spend.
 */
export function morphClimate(input: MorphClimateInput & { keepSeries: boolean }): MorphClimateTaskResult {
  const out = morph(input);
  if (!out.ok) return out;
  const { utcOffsetMinutes, elevationM } = input;
  return {
    ...out,
    series: input.keepSeries ? out.series : null,
    seriesCsv: input.keepSeries ? encoder.encode(cleanedSeriesCsv(out.series)) : null,
    parentMonthly: monthlyClimate(input.series, utcOffsetMinutes, elevationM),
    projectionMonthly: monthlyClimate(out.series, utcOffsetMinutes, elevationM),
  };
}
