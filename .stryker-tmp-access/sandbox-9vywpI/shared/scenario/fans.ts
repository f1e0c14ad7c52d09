/**
 * Hall fans and pumps through the year: the fan affinity laws (flow ∝ speed, power ∝ speed³; ASHRAE
 * Handbook—HVAC Systems and Equipment, fans chapter — recalled from memory) and the fan heat they add.
 */
// @ts-nocheck

import { CP_AIR_KJ_PER_KG_K } from './air';

/**
 * Speed of a fan or pump, as a fraction of design, when its flow follows a load fraction: the load itself,
 * never below the minimum speed.
 */
export function speedFraction(loadFraction: number, minSpeedFraction: number): number {
  return loadFraction > minSpeedFraction ? loadFraction : minSpeedFraction;
}

/**
 * Power of a fan or pump at a speed fraction s, kW: P = P_design · s³ (affinity law, the same system curve).
 * @param designKw power at design flow, kW
 */
export function affinityPowerKw(designKw: number, speed: number): number {
  return designKw * speed * speed * speed;
}

/**
 * Temperature rise of the hall air through its fans at design, K: ΔT_fan = P_fan / (ṁ·cp) with the design
 * air flow ṁ = P_IT / (cp·ΔT_IT), so ΔT_fan = (P_fan / P_IT)·ΔT_IT = fanPowerFraction · itDeltaTK (all fan
 * power ends as heat in the air stream; sensible heat balance, cp of dry air, ASHRAE Handbook—Fundamentals
 * (2017) ch. 1 eq. 32). At part load the flow falls with the load and the fan heat with the square of the
 * speed; the classifier takes the design value, the warmest the fans make the air.
 */
export function designFanHeatK(fanPowerFraction: number, itDeltaTK: number): number {
  if (!(fanPowerFraction >= 0)) throw new RangeError(`fanPowerFraction must be 0 or above, got ${fanPowerFraction}`);
  if (!(itDeltaTK > 0)) throw new RangeError(`itDeltaTK must be above 0, got ${itDeltaTK}`);
  return fanPowerFraction * itDeltaTK;
}

/**
 * Fan heat, K, of air flow ṁ (kg dry air/s) moved by fan power P (kW): ΔT = P / (ṁ·cp).
 */
export function fanHeatK(fanKw: number, airKgPerS: number): number {
  if (!(airKgPerS > 0)) throw new RangeError(`airKgPerS must be above 0, got ${airKgPerS}`);
  return fanKw / (airKgPerS * CP_AIR_KJ_PER_KG_K);
}
