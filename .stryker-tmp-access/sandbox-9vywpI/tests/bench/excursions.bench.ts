/**
 * Excursion analysis speed (issue #8): one operator's proposal over a 30-year synthetic series —
 * inlet states, excursion counts, events, rate of change and X-factor — in hours per second, and
 * whether it stays under the ~50 ms a request may block the server (it runs on the pool when not).
 */
// @ts-nocheck

import { analyseProposal } from '../../shared/excursions';
import { findEnvelopePreset, parseScenario } from '../../shared/scenario';
import { syntheticSeries, type SyntheticClimate } from '../unit/scenario/synthetic-climate';
import type { BenchSuite } from './suite';

// Temperate synthetic climate (invented), as the scenario bench uses.
const TEMPERATE: SyntheticClimate = { name: 'temperate (synthetic)', elevationM: 100, meanC: 12, seasonalK: 11, dailyK: 5, rhMean: 68, rhSpread: 30 };

export const suite: BenchSuite = {
  name: 'excursions',
  async run({ log }) {
    const series = syntheticSeries(TEMPERATE, { hours: 30 * 8760, seed: 5 });
    const parsed = parseScenario({
      name: 'bench direct air',
      elevationM: 100,
      envelope: findEnvelopePreset('ashrae-2021-a1')!.limits,
      system: { kind: 'direct-air', supplyAirC: 22, itDeltaTK: 12, evaporativeEffectiveness: 0.8 },
      energy: { itLoadKw: 1000, mechanicalCop: 4 },
    });
    if (!parsed.ok) throw new Error(parsed.errors.join('; '));
    const proposal = {
      supplyAirC: 22,
      floatUpToC: 30,
      control: parsed.scenario.envelope,
      recommended: findEnvelopePreset('ashrae-2021-recommended')!.limits,
      allowable: findEnvelopePreset('ashrae-2021-a1')!.limits,
    };
    const times: number[] = [];
    for (let k = 0; k < 5; k++) {
      const start = performance.now();
      analyseProposal(parsed.scenario, series, 100, proposal);
      times.push(performance.now() - start);
    }
    const bestMs = Math.min(...times);
    log(`excursions over 30 years: best of 5 ${bestMs.toFixed(0)} ms`);
    return {
      excursions30yMs: Math.round(bestMs),
      excursionsHoursPerS: Math.round(series.dryBulbC.length / (bestMs / 1000)),
      excursionsNeedsPool: bestMs > 50 ? 'yes' : 'no',
    };
  },
};
