/**
 * psychrolib (npm, dev only) as the reference library, set to SI. Its solvers stop at a fixed
 * 0.001 K tolerance kept in a private variable, so `tightPsychrolib` loads a second copy of the same
 * source with that tolerance replaced, to compare dew point and wet-bulb at the 0.005 K the tests need.
 * Used by tests and the benchmark only, never by product code.
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';

export interface Psychrolib {
  SI: number;
  SetUnitSystem(system: number): void;
  GetSatVapPres(tC: number): number;
  GetHumRatioFromRelHum(tC: number, rh: number, pressurePa: number): number;
  GetHumRatioFromVapPres(vapourPressurePa: number, pressurePa: number): number;
  GetVapPresFromHumRatio(w: number, pressurePa: number): number;
  GetHumRatioFromTDewPoint(dewPointC: number, pressurePa: number): number;
  GetHumRatioFromTWetBulb(tC: number, wetBulbC: number, pressurePa: number): number;
  GetTDewPointFromHumRatio(tC: number, w: number, pressurePa: number): number;
  GetTWetBulbFromHumRatio(tC: number, w: number, pressurePa: number): number;
  GetRelHumFromHumRatio(tC: number, w: number, pressurePa: number): number;
  GetMoistAirEnthalpy(tC: number, w: number): number;
  GetSatHumRatio(tC: number, pressurePa: number): number;
  GetSatAirEnthalpy(tC: number, pressurePa: number): number;
  GetMoistAirVolume(tC: number, w: number, pressurePa: number): number;
  GetStandardAtmPressure(elevationM: number): number;
}

const require = createRequire(import.meta.url);
const sourcePath = require.resolve('psychrolib');

function load(tolerance: number | null): Psychrolib {
  let source = readFileSync(sourcePath, 'utf8');
  if (tolerance !== null) {
    const original = 'PSYCHROLIB_TOLERANCE = 0.001;';
    if (!source.includes(original)) throw new Error('psychrolib source changed: its SI tolerance line was not found');
    source = source.replace(original, `PSYCHROLIB_TOLERANCE = ${tolerance};`);
  }
  const module = { exports: {} as Psychrolib };
  new Function('module', 'exports', source)(module, module.exports);
  module.exports.SetUnitSystem(module.exports.SI);
  return module.exports;
}

/** psychrolib as published, SI units, its own 0.001 K tolerance. */
export const psychrolib: Psychrolib = load(null);

/** psychrolib in SI with its solver tolerance tightened to 1e-7 K. */
export const tightPsychrolib: Psychrolib = load(1e-7);
