/**
 * Belcher morphing speed: a synthetic 30-year hourly series (262,800 hours) morphed by shift-and-stretch with
 * humidity stretched through specific humidity. The reference is one pass of the engine's bulk states over the
 * same series in the same run (the psychrometric work the morph cannot avoid: q from the parent's state).
 */
// @ts-nocheck

import type { ClimateSeries } from '../../shared/climate';
import { morphClimate, zeroFactors } from '../../shared/morphing';
import { bulkStates } from '../../shared/psychrometrics';
import type { BenchSuite } from './suite';

const HOURS = 262_800;
const HOUR_MS = 3_600_000;

function syntheticSeries(): ClimateSeries {
  const start = Date.UTC(1991, 0, 1);
  const s: ClimateSeries = {
    timestampsMs: new Float64Array(HOURS),
    dryBulbC: new Float64Array(HOURS),
    humidity: { kind: 'relative-humidity-pct', values: new Float64Array(HOURS) },
    pressurePa: null,
    flags: new Uint8Array(HOURS),
  };
  for (let h = 0; h < HOURS; h++) {
    s.timestampsMs[h] = start + h * HOUR_MS;
    s.dryBulbC[h] = 12 + 9 * Math.sin((2 * Math.PI * h) / 8766) + 4 * Math.sin((2 * Math.PI * h) / 24);
    s.humidity.values[h] = 70 - 15 * Math.sin((2 * Math.PI * h) / 24);
  }
  return s;
}

function best(runs: number, f: () => void): number {
  let fastest = Infinity;
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    f();
    fastest = Math.min(fastest, performance.now() - t0);
  }
  return fastest;
}

export const suite: BenchSuite = {
  name: 'morphing',
  async run({ log }) {
    const series = syntheticSeries();
    const months = zeroFactors().map((m, i) => ({ ...m, deltaMeanK: 1.5 + i / 12, deltaMaxK: 2 + i / 10, deltaMinK: 1.2, humidityChangePct: 3 }));
    const factors = { dryBulbMethod: 'shift-and-stretch' as const, humidityMethod: 'stretch' as const, months };
    log(`morphing ${HOURS.toLocaleString('en')} hours`);
    const morphMs = best(3, () => {
      const out = morphClimate({ series, factors, utcOffsetMinutes: 60, elevationM: 0 });
      if (!out.ok) throw new Error(out.problems.join('; '));
    });
    const statesMs = best(3, () => void bulkStates({ dryBulbC: series.dryBulbC, humidity: series.humidity, pressurePa: 101_325 }));
    return {
      'morphing.hours': HOURS,
      'morphing.30y.ms': Math.round(morphMs),
      'morphing.bulkStates.30y.ms': Math.round(statesMs),
      // Target: a morph costs at most 3 passes of the bulk states (it does one, plus linear passes).
      'morphing.ratioToBulkStates': Math.round((100 * morphMs) / statesMs) / 100,
    };
  },
};
