/** One dry-bulb bin: hours per mode and the mean coincident wet-bulb of the hours in it. */
// @ts-nocheck

export interface DryBulbBin {
  /** Lower edge, °C (inclusive). */
  fromC: number;
  /** Upper edge, °C (exclusive). */
  toC: number;
  /** Hours per mode code: [free, adiabatic, mechanical, no data]. */
  hours: [number, number, number, number];
  total: number;
  /** Mean wet-bulb of the bin's hours, °C; NaN when none has a wet-bulb. */
  meanWetBulbC: number;
}

/**
 * The bin grids the pages use, chosen for the unit rather than converted: 2 K from 0 °C in SI; 5 °F from 0 °F in IP
 * (5 °F = 5/1.8 K, 0 °F = (0 − 32)/1.8 °C; NIST SP 811, 2008, exact), so IP edges are whole °F.
 */
export const DRY_BULB_BIN_GRIDS = {
  SI: { widthK: 2, originC: 0, label: '2 K' },
  IP: { widthK: 5 / 1.8, originC: -32 / 1.8, label: '5 °F' },
} as const satisfies Record<'SI' | 'IP', { widthK: number; originC: number; label: string }>;

export interface BinTable {
  bins: DryBulbBin[];
  /** Hours left out because their dry-bulb is missing. */
  hoursWithoutDryBulb: number;
}

/**
 * Hours grouped into dry-bulb bins of `widthK` (2 K by default), highest bin first, each with hours
 * per mode and the mean coincident wet-bulb. Bins run on a grid anchored at `originC` ([20, 22), [22, 24)… from 0 °C;
 * IP bins of 5 °F anchored at 0 °F pass widthK 5/1.8 and originC −160/9, so their edges are whole °F),
 * and empty bins between the coldest and the warmest hour are kept so the table reads as a scale.
 */
export function dryBulbBins(modes: ArrayLike<number>, dryBulbC: ArrayLike<number>, wetBulbC: ArrayLike<number>, widthK = 2, originC = 0): BinTable {
  if (!(widthK > 0)) throw new RangeError(`widthK must be above 0, got ${widthK}`);
  if (modes.length !== dryBulbC.length || wetBulbC.length !== dryBulbC.length) {
    throw new RangeError(`modes (${modes.length}), dryBulbC (${dryBulbC.length}) and wetBulbC (${wetBulbC.length}) must have one value per hour`);
  }
  const counts = new Map<number, { hours: [number, number, number, number]; wbSum: number; wbCount: number }>();
  let hoursWithoutDryBulb = 0;
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < dryBulbC.length; i++) {
    const t = dryBulbC[i];
    const mode = modes[i];
    if (!Number.isFinite(t) || mode < 0 || mode > 3) {
      hoursWithoutDryBulb++;
      continue;
    }
    const k = Math.floor((t - originC) / widthK);
    let bin = counts.get(k);
    if (!bin) counts.set(k, (bin = { hours: [0, 0, 0, 0], wbSum: 0, wbCount: 0 }));
    bin.hours[mode]++;
    const wb = wetBulbC[i];
    if (Number.isFinite(wb)) {
      bin.wbSum += wb;
      bin.wbCount++;
    }
    if (k < lo) lo = k;
    if (k > hi) hi = k;
  }
  const bins: DryBulbBin[] = [];
  for (let k = hi; k >= lo; k--) {
    const bin = counts.get(k) ?? { hours: [0, 0, 0, 0] as [number, number, number, number], wbSum: 0, wbCount: 0 };
    bins.push({
      fromC: originC + k * widthK,
      toC: originC + (k + 1) * widthK,
      hours: bin.hours,
      total: bin.hours[0] + bin.hours[1] + bin.hours[2] + bin.hours[3],
      meanWetBulbC: bin.wbCount ? bin.wbSum / bin.wbCount : Number.NaN,
    });
  }
  return { bins, hoursWithoutDryBulb };
}
