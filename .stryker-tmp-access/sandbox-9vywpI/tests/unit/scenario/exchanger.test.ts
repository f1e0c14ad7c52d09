/**
 * The indirect exchanger by ε-NTU, cross-flow with both streams unmixed. The engine's relation (Incropera, DeWitt,
 * Bergman & Lavine, "Fundamentals of Heat and Mass Transfer", Table 11.3) is checked against the exact series
 * solution of the same arrangement (Mason 1954, as tabulated in Kays & London, "Compact Heat Exchangers" —
 * written out here independently), and its hall-side effectiveness against the scavenger air ratio.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { crossFlowUnmixedEffectiveness, crossFlowUnmixedNtu, hallSideEffectiveness } from '../../../shared/scenario/exchanger';
import { makeScenario, outdoorHours, plantOf, RECOMMENDED, stateFromDewPoint } from './fixtures';
import { classifyHours } from '../../../shared/scenario/classify';

/** Exact ε of a cross-flow exchanger, both fluids unmixed: (1/(Cr·N)) Σₙ [1 − e^(−N) Σₘ≤ₙ N^m/m!]·[1 − e^(−CrN) Σₘ≤ₙ (CrN)^m/m!]. */
function exactCrossFlow(ntu: number, cr: number): number {
  const partial = (x: number, n: number) => {
    let term = 1;
    let sum = 1;
    for (let m = 1; m <= n; m++) {
      term *= x / m;
      sum += term;
    }
    return 1 - Math.exp(-x) * sum;
  };
  let total = 0;
  for (let n = 0; n < 200; n++) total += partial(ntu, n) * partial(cr * ntu, n);
  return total / (cr * ntu);
}

describe('cross-flow, both streams unmixed', () => {
  it.each([
    [0.5, 0.25],
    [1, 0.5],
    [1, 1],
    [2, 0.5],
    [2, 1],
    [4, 1],
  ])('NTU %s, Cr %s: within 0.015 of the exact series solution', (ntu, cr) => {
    expect(Math.abs(crossFlowUnmixedEffectiveness(ntu, cr) - exactCrossFlow(ntu, cr))).toBeLessThan(0.015);
  });

  it('reaches 1 − exp(−NTU) as Cr → 0, the limit of every arrangement (Incropera eq. 11.35a)', () => {
    expect(crossFlowUnmixedEffectiveness(2, 0)).toBeCloseTo(1 - Math.exp(-2), 12);
  });

  it('inverts: the NTU for ε = 0.7 at Cr = 1 gives ε = 0.7 back', () => {
    const ntu = crossFlowUnmixedNtu(0.7, 1);
    expect(ntu).toBeGreaterThan(2);
    expect(crossFlowUnmixedEffectiveness(ntu, 1)).toBeCloseTo(0.7, 9);
  });
});

describe('hall-side effectiveness against the scavenger air ratio (UA held at its rating)', () => {
  it('is the rated value at ratio 1, lower with less scavenger air, higher with more but below 1 − exp(−NTU₁)', () => {
    const ntu1 = crossFlowUnmixedNtu(0.7, 1);
    expect(hallSideEffectiveness(0.7, 1)).toBe(0.7);
    // Ratio 0.5: the scavenger side is C_min; NTU = 2·NTU₁, Cr = 0.5, the hall sees ε·0.5.
    expect(hallSideEffectiveness(0.7, 0.5)).toBeCloseTo(crossFlowUnmixedEffectiveness(2 * ntu1, 0.5) * 0.5, 12);
    expect(hallSideEffectiveness(0.7, 0.5)).toBeLessThan(0.5);
    expect(hallSideEffectiveness(0.7, 0.2)).toBeLessThan(0.2);
    expect(hallSideEffectiveness(0.7, 2)).toBeGreaterThan(0.7);
    expect(hallSideEffectiveness(0.7, 2)).toBeLessThan(1 - Math.exp(-ntu1));
  });

  it('makes the scavenger air ratio change the modes: ratios 1, 0.5 and 0.2 classify a mild hour differently (issue 12)', () => {
    const hour = outdoorHours([stateFromDewPoint(15, 5)]);
    const modes = [1, 0.5, 0.2].map((r) => {
      const scenario = makeScenario('indirect-air', { system: { scavengerAirRatio: r, evaporativeEffectiveness: 0 } });
      const out = classifyHours(scenario.system, RECOMMENDED, hour, plantOf(scenario));
      return [out.modes[0], out.mechanicalFraction[0]];
    });
    expect(modes[0][0]).toBe(0); // free at ratio 1
    expect(modes[1][1]).toBeGreaterThan(0); // partly mechanical at 0.5
    expect(modes[2][1]).toBeGreaterThan(modes[1][1]);
  });
});
