/**
 * The X-factor: relative failure rate of volume IT servers against inlet dry-bulb, 1.00 for equipment
 * held at 20 °C all year. Table from ASHRAE TC 9.9 (2011), "Thermal Guidelines for Data Processing
 * Environments – Expanded Data Center Classes and Usage Guidance" (white paper), its table of relative
 * failure rate versus dry-bulb ("average" column). The values below are RECALLED FROM MEMORY, not checked
 * against the paper; a reviewer with the paper should check them. The paper gives the table from 15 °C to
 * 45 °C; below and above it this module holds the end values rather than extrapolate.
 */
// @ts-nocheck


export interface XFactorPoint {
  dryBulbC: number;
  xFactor: number;
}

/** ASHRAE TC 9.9 (2011) white paper, relative failure rate, average column — recalled from memory. */
export const X_FACTOR_TABLE: readonly XFactorPoint[] = [
  { dryBulbC: 15, xFactor: 0.72 },
  { dryBulbC: 17.5, xFactor: 0.87 },
  { dryBulbC: 20, xFactor: 1.0 },
  { dryBulbC: 22.5, xFactor: 1.13 },
  { dryBulbC: 25, xFactor: 1.24 },
  { dryBulbC: 27.5, xFactor: 1.34 },
  { dryBulbC: 30, xFactor: 1.42 },
  { dryBulbC: 32.5, xFactor: 1.48 },
  { dryBulbC: 35, xFactor: 1.55 },
  { dryBulbC: 37.5, xFactor: 1.61 },
  { dryBulbC: 40, xFactor: 1.66 },
  { dryBulbC: 42.5, xFactor: 1.71 },
  { dryBulbC: 45, xFactor: 1.76 },
];

const FIRST = X_FACTOR_TABLE[0];
const LAST = X_FACTOR_TABLE[X_FACTOR_TABLE.length - 1];
const STEP_C = 2.5;

/**
 * X-factor at inlet dry-bulb inletC (°C): linear interpolation in the table above (2.5 K steps), held at
 * the end values outside 15–45 °C. NaN in, NaN out (bulk callers skip such hours).
 */
export function xFactorAt(inletC: number): number {
  if (inletC !== inletC) return Number.NaN;
  if (inletC <= FIRST.dryBulbC) return FIRST.xFactor;
  if (inletC >= LAST.dryBulbC) return LAST.xFactor;
  const position = (inletC - FIRST.dryBulbC) / STEP_C;
  const k = Math.floor(position);
  const lower = X_FACTOR_TABLE[k];
  const upper = X_FACTOR_TABLE[k + 1];
  return lower.xFactor + (position - k) * (upper.xFactor - lower.xFactor);
}
