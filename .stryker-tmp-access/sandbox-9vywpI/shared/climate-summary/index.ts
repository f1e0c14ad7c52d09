// @ts-nocheck
import type { ClimateSeries } from '../climate';
import { bulkStates, humidityRatioFromDewPoint, hourlyPressurePa } from '../psychrometrics';
import { designConditions, type DesignConditions } from './design-conditions';
import { civilFromDays, MS_PER_DAY } from '../calendar';
import { monthlyStats, type MonthlyStat } from './monthly';

export type { DesignConditions, MonthlyStat };

export interface ClimateSummary {
  years: Array<{ year: number; hours: number; measuredHours: number; filledHours: number; missingHours: number }>;
  completenessPct: number;
  monthly: { dryBulbC: MonthlyStat[]; dewPointC: MonthlyStat[] };
  design: DesignConditions;
  meanPressurePa: number;
}

/** What a climate file holds: coverage per year, monthly statistics and design conditions. */
export function summariseClimate(series: ClimateSeries, elevationM: number): ClimateSummary {
  const { pressurePa, sitePressurePa: fallbackPressurePa } = hourlyPressurePa(series, elevationM);
  const state = bulkStates({ dryBulbC: series.dryBulbC, humidity: series.humidity, pressurePa });
  let pressureSum = 0;
  let pressureN = 0;
  if (series.pressurePa) {
    for (const p of series.pressurePa) {
      if (p !== p) continue;
      pressureSum += p;
      pressureN++;
    }
  }
  const meanPressurePa = pressureN ? pressureSum / pressureN : fallbackPressurePa;

  const byYear = new Map<number, { hours: number; measuredHours: number; filledHours: number; missingHours: number }>();
  let usable = 0;
  const civil = { year: 0, month: 0, day: 0 };
  for (let i = 0; i < series.timestampsMs.length; i++) {
    civilFromDays(Math.floor(series.timestampsMs[i] / MS_PER_DAY), civil);
    const year = civil.year;
    let y = byYear.get(year);
    if (!y) byYear.set(year, (y = { hours: 0, measuredHours: 0, filledHours: 0, missingHours: 0 }));
    y.hours++;
    const flag = series.flags[i];
    if (flag === 0) y.measuredHours++;
    else if (flag === 1) y.filledHours++;
    else y.missingHours++;
    if (flag !== 2 && state.wetBulbC[i] === state.wetBulbC[i]) usable++;
  }

  return {
    years: [...byYear].map(([year, y]) => ({ year, ...y })).sort((a, b) => a.year - b.year),
    completenessPct: series.timestampsMs.length ? (100 * usable) / series.timestampsMs.length : 0,
    monthly: {
      dryBulbC: monthlyStats(series.timestampsMs, series.dryBulbC),
      dewPointC: monthlyStats(series.timestampsMs, state.dewPointC),
    },
    design: designConditions(series.dryBulbC, state.wetBulbC, state.dewPointC, (dp) => humidityRatioFromDewPoint(dp, meanPressurePa)),
    meanPressurePa,
  };
}
