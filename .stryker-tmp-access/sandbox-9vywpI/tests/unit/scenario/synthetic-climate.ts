/**
 * Synthetic (invented) hourly climates for tests and the benchmark: an annual cycle, a daily cycle
 * with RH falling as the day warms, and deterministic noise, so every run sees the same hours.
 * Not a real place.
 */
// @ts-nocheck

import type { ScenarioSeries } from '../../../shared/scenario';

export interface SyntheticClimate {
  name: string;
  elevationM: number;
  meanC: number;
  seasonalK: number;
  dailyK: number;
  rhMean: number;
  rhSpread: number;
}

/** Deterministic noise in [0, 1) from an hour index and a seed (a sine hash, enough for test data). */
export function noise(i: number, seed: number): number {
  const x = Math.sin(i * 12.9898 + seed * 78.233) * 43_758.5453;
  return x - Math.floor(x);
}

export interface SyntheticOptions {
  hours: number;
  /** Take every step-th hour (1: all). */
  step?: number;
  seed?: number;
  /** Put the arrays on a SharedArrayBuffer, so pool threads read them without a copy. */
  shared?: boolean;
}

/** Hourly series from 1991-01-01 UTC with dry-bulb and RH; no station pressure. */
export function syntheticSeries(climate: SyntheticClimate, { hours, step = 1, seed = 1, shared = false }: SyntheticOptions): ScenarioSeries {
  const n = Math.floor(hours / step);
  const array = (): Float64Array => (shared ? new Float64Array(new SharedArrayBuffer(n * 8)) : new Float64Array(n));
  const series: ScenarioSeries = {
    timestampsMs: array(),
    dryBulbC: array(),
    humidity: { kind: 'relative-humidity-pct', values: array() },
    pressurePa: null,
  };
  const t0 = Date.UTC(1991, 0, 1);
  for (let k = 0; k < n; k++) {
    // With a step, shift by k mod step so the sampled hours cover every time of day.
    const i = k * step + (step > 1 ? k % step : 0);
    const day = (i % 8760) / 24;
    const daily = Math.sin((2 * Math.PI * ((i % 24) - 9)) / 24);
    series.timestampsMs[k] = t0 + i * 3_600_000;
    series.dryBulbC[k] = climate.meanC - climate.seasonalK * Math.cos((2 * Math.PI * (day - 20)) / 365) + climate.dailyK * daily + 3 * (noise(i, seed) - 0.5);
    series.humidity.values[k] = Math.min(100, Math.max(3, climate.rhMean - 0.6 * climate.rhSpread * daily + climate.rhSpread * (noise(i, seed + 1) - 0.5)));
  }
  return series;
}

export const MILD_MARITIME: SyntheticClimate = {
  name: 'mild maritime (synthetic)',
  elevationM: 20,
  meanC: 11,
  seasonalK: 7,
  dailyK: 4,
  rhMean: 78,
  rhSpread: 15,
};
export const HOT_HUMID: SyntheticClimate = { name: 'hot humid (synthetic)', elevationM: 10, meanC: 22, seasonalK: 7, dailyK: 5, rhMean: 65, rhSpread: 30 };
export const HOT_DRY_HIGH: SyntheticClimate = {
  name: 'hot dry at altitude (synthetic)',
  elevationM: 1600,
  meanC: 20,
  seasonalK: 10,
  dailyK: 8,
  rhMean: 25,
  rhSpread: 15,
};
