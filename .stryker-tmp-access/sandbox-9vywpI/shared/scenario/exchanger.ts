/**
 * The indirect air-to-air exchanger by the ε-NTU method. A plate exchanger between hall and scavenger air is a
 * single-pass cross-flow exchanger with both streams unmixed. Its rated effectiveness is taken at a
 * scavenger-to-hall capacity ratio of 1; the exchanger's conductance UA is held at its rated value, so at
 * another ratio only the capacities change (Incropera, DeWitt, Bergman & Lavine, "Fundamentals of Heat and
 * Mass Transfer", 6th ed., §11.4, Table 11.3 — the relation below is recalled from memory).
 */
// @ts-nocheck


/**
 * Effectiveness of a single-pass cross-flow exchanger, both fluids unmixed:
 * ε = 1 − exp[(1/Cr)·NTU^0.22·(exp(−Cr·NTU^0.78) − 1)]  (Incropera et al., Table 11.3, eq. 11.32; an
 * approximation of the exact series solution, within about 1 % of it).
 * @param ntu number of transfer units UA/Cmin, ≥ 0
 * @param cr capacity ratio Cmin/Cmax, 0…1 (0 gives 1 − exp(−NTU), the limit for every arrangement)
 */
export function crossFlowUnmixedEffectiveness(ntu: number, cr: number): number {
  if (!(ntu >= 0)) throw new RangeError(`ntu must be 0 or above, got ${ntu}`);
  if (!(cr >= 0 && cr <= 1)) throw new RangeError(`cr must be from 0 to 1, got ${cr}`);
  if (ntu === 0) return 0;
  if (cr < 1e-9) return 1 - Math.exp(-ntu);
  return 1 - Math.exp((Math.pow(ntu, 0.22) * (Math.exp(-cr * Math.pow(ntu, 0.78)) - 1)) / cr);
}

/** NTU beyond which the effectiveness is taken as reached (ε within 1e-6 of its limit at Cr = 1). */
const NTU_MAX = 200;

/**
 * NTU that gives `effectiveness` at capacity ratio `cr` in cross-flow, both unmixed: the inverse of
 * crossFlowUnmixedEffectiveness by bisection (ε rises monotonically with NTU).
 * @param effectiveness 0…1; 1 gives NTU_MAX
 */
export function crossFlowUnmixedNtu(effectiveness: number, cr: number): number {
  if (!(effectiveness >= 0 && effectiveness <= 1)) throw new RangeError(`effectiveness must be from 0 to 1, got ${effectiveness}`);
  if (effectiveness === 0) return 0;
  if (crossFlowUnmixedEffectiveness(NTU_MAX, cr) <= effectiveness) return NTU_MAX;
  let lo = 0;
  let hi = NTU_MAX;
  for (let k = 0; k < 100 && hi - lo > 1e-10; k++) {
    const mid = 0.5 * (lo + hi);
    if (crossFlowUnmixedEffectiveness(mid, cr) < effectiveness) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * Hall-side effectiveness of the exchanger at a scavenger-to-hall capacity ratio r (mass flow ratio; the
 * two streams' specific heats taken equal): (T_return − T_supply) / (T_return − T_scavenger).
 * With NTU₁ from the rated effectiveness at r = 1 and UA held, C_min = min(r, 1)·C_hall, so
 * NTU = NTU₁ / min(r, 1), Cr = min(r, 1/r), and the hall side sees ε·C_min / C_hall = ε·min(r, 1).
 * @param ratedEffectiveness effectiveness at r = 1, 0…1
 * @param scavengerAirRatio r, above 0
 */
export function hallSideEffectiveness(ratedEffectiveness: number, scavengerAirRatio: number): number {
  if (!(scavengerAirRatio > 0)) throw new RangeError(`scavengerAirRatio must be above 0, got ${scavengerAirRatio}`);
  if (scavengerAirRatio === 1) return ratedEffectiveness;
  const ntuAtOne = crossFlowUnmixedNtu(ratedEffectiveness, 1);
  const minShare = Math.min(scavengerAirRatio, 1);
  const cr = Math.min(scavengerAirRatio, 1 / scavengerAirRatio);
  return crossFlowUnmixedEffectiveness(ntuAtOne / minShare, cr) * minShare;
}
