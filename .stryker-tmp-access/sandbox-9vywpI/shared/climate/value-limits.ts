/**
 * Physical plausibility limits for imported values, in SI. Values outside are impossible and
 * are dropped (reported); values just past a hard bound (RH a little above 100 %, dew point a
 * little above dry-bulb) are sensor or rounding noise and are clamped (reported).
 */
// @ts-nocheck

import type { HumidityQuantity } from './types';

/** Dry-bulb outside −70…60 °C is impossible at a weather station (limits set by the product brief). */
export const DRY_BULB_MIN_C = -70;
export const DRY_BULB_MAX_C = 60;
/** Station pressure outside 50…110 kPa is impossible below 5,500 m (limits set by the product brief). */
export const PRESSURE_MIN_PA = 50_000;
export const PRESSURE_MAX_PA = 110_000;
/** RH sensors read up to a few % above saturation in fog; common practice tolerance. */
export const RH_TOLERANCE_PCT = 3;
/** Dew point or wet-bulb above dry-bulb by up to this much is rounding or sensor lag; common practice tolerance. */
export const SATURATION_TOLERANCE_K = 0.5;
/** Dew point and wet-bulb share the dry-bulb floor, widened for very dry polar air (common practice). */
export const HUMIDITY_TEMPERATURE_MIN_C = -100;
/**
 * Loose ceiling for humidity ratio: saturation at 50 °C and sea level is about 0.087 kg/kg
 * (ASHRAE Handbook—Fundamentals 2017 ch. 1 table 2, recalled from memory), so 0.1 cannot occur outdoors.
 */
export const HUMIDITY_RATIO_MAX_KGKG = 0.1;

export type Verdict = 'ok' | 'clamped' | 'impossible';

/** Result of checking one humidity value: the value to keep and what happened to it. */
export const humidityCheck = { value: NaN, verdict: 'ok' as Verdict };

/**
 * Checks a humidity value (SI) against its own range and, for dew point and wet-bulb, against the
 * row's dry-bulb (NaN when unknown). Writes into humidityCheck (no allocation per row).
 */
export function checkHumidity(quantity: HumidityQuantity, value: number, dryBulbC: number): void {
  humidityCheck.value = value;
  humidityCheck.verdict = 'ok';
  switch (quantity) {
    case 'relative-humidity':
      if (value < -RH_TOLERANCE_PCT || value > 100 + RH_TOLERANCE_PCT) humidityCheck.verdict = 'impossible';
      else if (value > 100 || value < 0) {
        humidityCheck.value = value > 100 ? 100 : 0;
        humidityCheck.verdict = 'clamped';
      }
      return;
    case 'humidity-ratio':
      if (value < 0 || value > HUMIDITY_RATIO_MAX_KGKG) humidityCheck.verdict = 'impossible';
      return;
    default:
      if (value < HUMIDITY_TEMPERATURE_MIN_C || value > DRY_BULB_MAX_C) humidityCheck.verdict = 'impossible';
      else if (value > dryBulbC + SATURATION_TOLERANCE_K) humidityCheck.verdict = 'impossible';
      else if (value > dryBulbC) {
        humidityCheck.value = dryBulbC;
        humidityCheck.verdict = 'clamped';
      }
  }
}
