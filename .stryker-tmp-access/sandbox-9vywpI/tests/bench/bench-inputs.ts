/** The weather and design the scenario, sweep and command-line benches share (synthetic, invented). */
// @ts-nocheck

import type { ScenarioInput } from '../../shared/scenario';
import { syntheticSeries, type SyntheticClimate } from '../unit/scenario/synthetic-climate';

export const HOURS_PER_YEAR = 8760;

/** Temperate synthetic climate (invented). */
export const TEMPERATE: SyntheticClimate = { name: 'temperate (synthetic)', elevationM: 100, meanC: 12, seasonalK: 11, dailyK: 5, rhMean: 68, rhSpread: 30 };

/** `years` of the temperate climate, arrays over SharedArrayBuffers when `shared` (for the pool threads). */
export const syntheticYears = (years: number, shared = false) => syntheticSeries(TEMPERATE, { hours: years * HOURS_PER_YEAR, seed: 5, shared });

export const BENCH_SCENARIO: ScenarioInput = {
  name: 'bench direct air',
  elevationM: 100,
  envelope: { dryBulbMinC: 18, dryBulbMaxC: 27, dewPointMinC: -9, dewPointMaxC: 15, rhMinPct: 0, rhMaxPct: 70 },
  system: { kind: 'direct-air', supplyAirC: 24, itDeltaTK: 12, evaporativeEffectiveness: 0.8 },
  // Engine 1.0.0 ran this bench with fanHeatK 1 and copSlopePerK −0.08; fanPowerFraction 1/12 is its migration.
  energy: { itLoadKw: 1000, mechanicalCop: 4, fanPowerFraction: 1 / 12 },
};

/** Canonical CSV (UTC hour, dry-bulb °C to 0.1, RH % to 1) of a series' hours. */
export function canonicalCsv(series: { timestampsMs: Float64Array; dryBulbC: Float64Array; humidity: { values: Float64Array } }): string {
  const lines = ['timestamp,dry_bulb_c,relative_humidity_pct'];
  for (let i = 0; i < series.dryBulbC.length; i++) {
    lines.push(`${new Date(series.timestampsMs[i]).toISOString().slice(0, 16)}Z,${series.dryBulbC[i].toFixed(1)},${series.humidity.values[i].toFixed(0)}`);
  }
  return `${lines.join('\n')}\n`;
}
