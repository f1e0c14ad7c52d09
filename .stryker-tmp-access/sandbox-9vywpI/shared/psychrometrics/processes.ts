/**
 * Air-side processes the scenarios need: adiabatic mixing, sensible heating and cooling,
 * evaporative (adiabatic) cooling along the constant wet-bulb line, cooling and dehumidifying to
 * a coil leaving state, and the moisture at which a dry-bulb meets a dew-point or RH limit.
 * Energies are per kg of dry air; sign: positive when added to the air.
 */
// @ts-nocheck

import { CP_LIQUID_WATER } from './constants';
import { dryBulbFromEnthalpy, enthalpyKJPerKg } from './enthalpy';
import {
  dewPointFromHumidityRatio,
  humidityRatioFromDewPoint,
  humidityRatioFromRh,
  saturationHumidityRatio,
  vapourPressureFromHumidityRatio,
} from './moisture';
import { dewPointAtLnPressure } from './saturation';
import { humidityRatioFromWetBulb, wetBulbFromHumidityRatio } from './wet-bulb';
import { requireHumidityRatio, requireInRange, requireNonNegative, requirePressurePa, requireRhPct, requireTemperatureC, SATURATION_SLACK } from './validate';

/** A moist-air point on a chart or in a process: dry-bulb °C and humidity ratio kg/kg. */
export interface AirPoint {
  dryBulbC: number;
  humidityRatio: number;
}

/** A stream of moist air: a point with its dry-air mass (kg, or kg/s: only the ratio matters). */
export interface AirStream extends AirPoint {
  dryAirMass: number;
}

export interface MixedAir extends AirPoint {
  enthalpyKJPerKg: number;
  /** True when the mixture lies above the saturation curve: fog forms in the mixing box. */
  supersaturated: boolean;
}

/**
 * Adiabatic mixing of two moist-air streams: humidity ratio and enthalpy are the dry-air-mass-weighted
 * means; the dry-bulb follows from them. Flags a mixture that would be supersaturated (fog).
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1, adiabatic mixing of two streams (eq. 46–48).
 */
export function mixAirStreams(a: AirStream, b: AirStream, pressurePa: number): MixedAir {
  requirePressurePa('pressurePa', pressurePa);
  const massA = requireNonNegative('a.dryAirMass', a.dryAirMass);
  const massB = requireNonNegative('b.dryAirMass', b.dryAirMass);
  if (massA + massB === 0) throw new RangeError('a.dryAirMass + b.dryAirMass must be > 0 kg');
  const hA = enthalpyKJPerKg(requireTemperatureC('a.dryBulbC', a.dryBulbC), requireHumidityRatio('a.humidityRatio', a.humidityRatio));
  const hB = enthalpyKJPerKg(requireTemperatureC('b.dryBulbC', b.dryBulbC), requireHumidityRatio('b.humidityRatio', b.humidityRatio));
  const total = massA + massB;
  const humidityRatio = (massA * a.humidityRatio + massB * b.humidityRatio) / total;
  const h = (massA * hA + massB * hB) / total;
  const dryBulbC = dryBulbFromEnthalpy(h, humidityRatio);
  const supersaturated = humidityRatio > saturationHumidityRatio(dryBulbC, pressurePa) * (1 + SATURATION_SLACK);
  return { dryBulbC, humidityRatio, enthalpyKJPerKg: h, supersaturated };
}

export interface SensibleResult extends AirPoint {
  /** Heat added to the air, kJ/kg dry air (negative when cooled). */
  sensibleKJPerKg: number;
}

/**
 * Sensible heating or cooling at constant humidity ratio to leavingDryBulbC. Cooling below the dew
 * point is refused (that is {@link coolAndDehumidify}).
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32 at constant W.
 */
export function sensibleHeatOrCool(entering: AirPoint, leavingDryBulbC: number, pressurePa: number): SensibleResult {
  const w = requireHumidityRatio('entering.humidityRatio', entering.humidityRatio);
  const hIn = enthalpyKJPerKg(requireTemperatureC('entering.dryBulbC', entering.dryBulbC), w);
  requireTemperatureC('leavingDryBulbC', leavingDryBulbC);
  requirePressurePa('pressurePa', pressurePa);
  if (w > 0 && leavingDryBulbC < dewPointFromHumidityRatio(w, pressurePa)) {
    throw new RangeError(`leavingDryBulbC = ${leavingDryBulbC} °C is below the dew point of the entering air: moisture would condense`);
  }
  return { dryBulbC: leavingDryBulbC, humidityRatio: w, sensibleKJPerKg: enthalpyKJPerKg(leavingDryBulbC, w) - hIn };
}

export interface EvaporativeResult extends AirPoint {
  wetBulbC: number;
  /** Water evaporated into the air, kg per kg dry air. */
  waterKgPerKg: number;
}

/**
 * Direct evaporative (adiabatic) cooling at saturation effectiveness ε: the leaving dry-bulb is
 * t − ε·(t − t*), on the constant thermodynamic wet-bulb line t* of the entering air, whose humidity
 * ratio follows from the psychrometric equation at the leaving dry-bulb.
 * @param effectiveness 0…1 (saturation effectiveness of the pad or spray)
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 33/35 (constant t*); ASHRAE Handbook—HVAC
 * Systems and Equipment, evaporative air-cooling equipment, for the definition of effectiveness.
 */
export function evaporativeCooling(entering: AirPoint, effectiveness: number, pressurePa: number): EvaporativeResult {
  requireInRange('effectiveness', effectiveness, 0, 1, '');
  const tC = requireTemperatureC('entering.dryBulbC', entering.dryBulbC);
  const w = requireHumidityRatio('entering.humidityRatio', entering.humidityRatio);
  const wetBulbC = wetBulbFromHumidityRatio(tC, w, pressurePa);
  const dryBulbC = tC - effectiveness * (tC - wetBulbC);
  const leavingW = effectiveness === 0 ? w : humidityRatioFromWetBulb(dryBulbC, wetBulbC, pressurePa);
  return { dryBulbC, humidityRatio: leavingW, wetBulbC, waterKgPerKg: leavingW - w };
}

export interface CoilResult extends AirPoint {
  /** Water condensed on the coil, kg per kg dry air. */
  condensateKgPerKg: number;
  /** Heat removed from the air by the coil, kJ/kg dry air (positive), net of the condensate's enthalpy. */
  totalCoolingKJPerKg: number;
  /** Part of totalCoolingKJPerKg from the change in dry-bulb at the entering humidity ratio. */
  sensibleCoolingKJPerKg: number;
  /** Remainder: the latent part. */
  latentCoolingKJPerKg: number;
}

/**
 * Cooling (and, below the entering dew point, dehumidifying) coil to a leaving dry-bulb. The leaving air
 * keeps the entering moisture unless that would exceed leavingRhPct at the leaving dry-bulb; then it
 * leaves at leavingRhPct (100 % is an ideal coil; 90–95 % is common practice for a real one).
 * Coil load: q = h1 − h2 − (W1 − W2)·hw, with hw = 4.186·t2 the condensate enthalpy.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1, moist-air cooling and dehumidification (eq. 41–42).
 */
export function coolAndDehumidify(entering: AirPoint, leavingDryBulbC: number, pressurePa: number, leavingRhPct = 100): CoilResult {
  const t1 = requireTemperatureC('entering.dryBulbC', entering.dryBulbC);
  const w1 = requireHumidityRatio('entering.humidityRatio', entering.humidityRatio);
  requireTemperatureC('leavingDryBulbC', leavingDryBulbC);
  if (leavingDryBulbC > t1)
    throw new RangeError(`leavingDryBulbC = ${leavingDryBulbC} °C is above entering.dryBulbC = ${t1} °C: a coil that heats is not cooling`);
  requireRhPct('leavingRhPct', leavingRhPct);
  const wCap = humidityRatioFromRh(leavingDryBulbC, leavingRhPct, pressurePa);
  const w2 = Math.min(w1, wCap);
  const h1 = enthalpyKJPerKg(t1, w1);
  const h2 = enthalpyKJPerKg(leavingDryBulbC, w2);
  const condensate = w1 - w2;
  const total = h1 - h2 - condensate * CP_LIQUID_WATER * leavingDryBulbC;
  const sensible = h1 - enthalpyKJPerKg(leavingDryBulbC, w1);
  return {
    dryBulbC: leavingDryBulbC,
    humidityRatio: w2,
    condensateKgPerKg: condensate,
    totalCoolingKJPerKg: total,
    sensibleCoolingKJPerKg: sensible,
    latentCoolingKJPerKg: total - sensible,
  };
}

/**
 * Humidity ratio, kg/kg, at which air meets a dew-point limit (the same at every dry-bulb). The limit is
 * read over liquid water also below 0 °C, as envelopes and weather data state dew points (WMO-No. 8).
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 36 (with eq. 6) and 20.
 */
export function humidityRatioAtDewPointLimit(dewPointLimitC: number, pressurePa: number): number {
  return humidityRatioFromDewPoint(dewPointLimitC, pressurePa);
}

/**
 * Humidity ratio, kg/kg, at which air at dry-bulb tC meets an RH limit.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 22 and 20.
 */
export function humidityRatioAtRhLimit(tC: number, rhLimitPct: number, pressurePa: number): number {
  return humidityRatioFromRh(tC, rhLimitPct, pressurePa);
}

/**
 * Dry-bulb, °C, at which air holding humidityRatio reaches rhLimitPct: below it the RH is higher.
 * Useful for "how far may this air be cooled before it breaks the RH limit".
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 22 with eq. 6 (RH over liquid water) inverted by Newton's method.
 */
export function dryBulbAtRhLimit(humidityRatio: number, rhLimitPct: number, pressurePa: number): number {
  requireHumidityRatio('humidityRatio', humidityRatio);
  requireInRange('rhLimitPct', rhLimitPct, Number.MIN_VALUE, 100, '%');
  const pw = vapourPressureFromHumidityRatio(humidityRatio, pressurePa);
  const t = pw > 0 ? dewPointAtLnPressure(Math.log(pw / (rhLimitPct / 100))) : Number.NaN;
  if (Number.isNaN(t)) throw new RangeError(`humidityRatio = ${humidityRatio} kg/kg reaches rhLimitPct = ${rhLimitPct} % outside −100…200 °C`);
  return t;
}

/** Limits on moisture an envelope may set; any may be absent. */
export interface MoistureLimits {
  dewPointMaxC?: number;
  rhMaxPct?: number;
}

/**
 * The largest humidity ratio, kg/kg, that air at dry-bulb tC may hold under both a dew-point and an
 * RH ceiling (the tighter wins); Infinity when neither is set. Throws if tC is at or above boiling.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 20, 22, 36.
 */
export function maxHumidityRatioForLimits(tC: number, limits: MoistureLimits, pressurePa: number): number {
  requireTemperatureC('tC', tC);
  let cap = Number.POSITIVE_INFINITY;
  if (limits.dewPointMaxC !== undefined) cap = Math.min(cap, humidityRatioAtDewPointLimit(limits.dewPointMaxC, pressurePa));
  if (limits.rhMaxPct !== undefined) cap = Math.min(cap, humidityRatioAtRhLimit(tC, limits.rhMaxPct, pressurePa));
  return cap;
}
