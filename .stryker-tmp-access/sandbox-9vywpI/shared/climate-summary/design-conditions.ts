// @ts-nocheck
import { exceededValue, sortedFinite } from './quantile';

export interface DesignValue {
  /** Percentage of hours in the file that exceed the value. */
  exceedPct: number;
  valueC: number;
  /** Mean of the other quantity over hours whose value lies within ±coincidenceBandK of valueC. */
  meanCoincidentC: number;
}

export interface DesignConditions {
  /** Always true: these come from the uploaded file, not from a published station table. */
  computedFromFile: true;
  hoursUsed: number;
  coincidenceBandK: number;
  dryBulb: DesignValue[];
  wetBulb: DesignValue[];
  dewPoint: { exceedPct: number; valueC: number; humidityRatioKgPerKg: number; meanCoincidentDryBulbC: number } | null;
}

const coincidenceBandK = 0.5;

function meanWhereNear(key: Float64Array, other: Float64Array, centre: number): number {
  let sum = 0;
  let n = 0;
  for (let i = 0; i < key.length; i++) {
    const k = key[i];
    const o = other[i];
    if (k === k && o === o && Math.abs(k - centre) <= coincidenceBandK) {
      sum += o;
      n++;
    }
  }
  return n ? sum / n : NaN;
}

/**
 * Cooling design conditions by the cumulative-frequency method of ASHRAE Handbook—Fundamentals
 * ch. 14 (annual percentiles 0.4, 1 and 2 %, with mean coincident values), computed from whatever
 * hours the file holds. The coincident mean uses hours within ±0.5 K of the design value, our choice
 * for files of any resolution. `humidityRatioAtDewPoint` turns the 1 % dew point into kg/kg at the
 * file's typical pressure.
 */
export function designConditions(
  dryBulbC: Float64Array,
  wetBulbC: Float64Array,
  dewPointC: Float64Array,
  humidityRatioAtDewPoint: (dewPointC: number) => number,
): DesignConditions {
  const sortedDb = sortedFinite(dryBulbC);
  const sortedWb = sortedFinite(wetBulbC);
  const sortedDp = sortedFinite(dewPointC);
  const levels = [0.4, 1, 2];
  const dp1 = exceededValue(sortedDp, 1);
  return {
    computedFromFile: true,
    hoursUsed: sortedDb.length,
    coincidenceBandK,
    dryBulb: levels.map((exceedPct) => {
      const valueC = exceededValue(sortedDb, exceedPct);
      return { exceedPct, valueC, meanCoincidentC: meanWhereNear(dryBulbC, wetBulbC, valueC) };
    }),
    wetBulb: levels.map((exceedPct) => {
      const valueC = exceededValue(sortedWb, exceedPct);
      return { exceedPct, valueC, meanCoincidentC: meanWhereNear(wetBulbC, dryBulbC, valueC) };
    }),
    dewPoint:
      dp1 === dp1
        ? {
            exceedPct: 1,
            valueC: dp1,
            humidityRatioKgPerKg: humidityRatioAtDewPoint(dp1),
            meanCoincidentDryBulbC: meanWhereNear(dewPointC, dryBulbC, dp1),
          }
        : null,
  };
}
