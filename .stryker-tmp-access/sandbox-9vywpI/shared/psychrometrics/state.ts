/**
 * The full moist-air state from a request of named properties, with the phase rule made explicit.
 * Moist air (dry air and water vapour, one phase) has three independent intensive properties:
 * pressure plus two others. Air in equilibrium with liquid water or ice has one fewer: the state
 * lies on the saturation curve, so pressure plus one property fixes it. A request that gives too
 * few or too many properties is refused, and so is one whose vapour content exceeds saturation.
 */
// @ts-nocheck

import { standardPressurePa } from './atmosphere';
import { dryBulbFromEnthalpy, enthalpyKJPerKg, humidityRatioFromEnthalpy } from './enthalpy';
import {
  degreeOfSaturation,
  dewPointFromHumidityRatio,
  frostPointFromHumidityRatio,
  humidityRatioFromDewPoint,
  humidityRatioFromRh,
  rhPctFromHumidityRatio,
  saturationHumidityRatio,
  specificHumidity,
  vapourPressureFromHumidityRatio,
} from './moisture';
import { saturationTemperatureFromEnthalpy } from './saturated-enthalpy';
import { moistAirDensityKgPerM3, specificVolumeM3PerKg } from './volume';
import { humidityRatioFromWetBulb, wetBulbFromHumidityRatio } from './wet-bulb';
import { requireFinite, requireHumidityRatio, requirePressurePa, requireRhPct, requireTemperatureC, SATURATION_SLACK } from './validate';

/** Named properties of a request; give pressure (or elevation) plus two properties, or one with `saturated: true`. */
export interface MoistAirRequest {
  /** Barometric pressure, Pa. Give this or elevationM. */
  pressurePa?: number;
  /** Elevation, m: pressure from the standard atmosphere (ASHRAE 2017 ch. 1 eq. 3). */
  elevationM?: number;
  dryBulbC?: number;
  rhPct?: number;
  dewPointC?: number;
  wetBulbC?: number;
  humidityRatio?: number;
  enthalpyKJPerKg?: number;
  /** Air saturated over liquid water (supercooled below 0 °C, the RH = 100 % curve): one property fixes the state. */
  saturated?: boolean;
}

/** Every property of a one-phase moist-air state, SI. */
export interface MoistAirState {
  pressurePa: number;
  dryBulbC: number;
  /** kg water per kg dry air. */
  humidityRatio: number;
  /** Relative humidity over liquid water, also below 0 °C (WMO-No. 8). */
  rhPct: number;
  /** Dew point over liquid water, also below 0 °C; NaN for perfectly dry air. */
  dewPointC: number;
  /**
   * Frost point, over ice: a separate quantity, meaningful only when the vapour pressure is below the
   * triple point's (dew point below about 0 °C); NaN otherwise and for dry air.
   */
  frostPointC: number;
  /** Thermodynamic wet-bulb (ASHRAE 2017 ch. 1 eq. 33/35). */
  wetBulbC: number;
  /** kJ per kg dry air, dry air and liquid water at 0 °C as zero. */
  enthalpyKJPerKg: number;
  vapourPressurePa: number;
  /** m³ per kg dry air. */
  specificVolumeM3PerKg: number;
  /** kg moist air per m³. */
  densityKgPerM3: number;
  degreeOfSaturation: number;
  /** kg water per kg moist air. */
  specificHumidity: number;
}

export type StateRequestProblem = 'under-determined' | 'over-determined' | 'unsupported-pair' | 'supersaturated';

/** A request the phase rule or the physics refuses; `problem` says which way. */
export class StateRequestError extends RangeError {
  readonly problem: StateRequestProblem;
  constructor(problem: StateRequestProblem, message: string) {
    super(message);
    this.name = 'StateRequestError';
    this.problem = problem;
  }
}

const PROPERTY_NAMES = ['dryBulbC', 'rhPct', 'dewPointC', 'wetBulbC', 'humidityRatio', 'enthalpyKJPerKg'] as const;
type PropertyName = (typeof PROPERTY_NAMES)[number];

const SUPPORTED_PAIRS = 'dryBulbC with one of rhPct, dewPointC, wetBulbC, humidityRatio, enthalpyKJPerKg; or enthalpyKJPerKg with humidityRatio';

function resolvePressurePa(request: MoistAirRequest): number {
  const hasPressure = request.pressurePa !== undefined;
  const hasElevation = request.elevationM !== undefined;
  if (hasPressure && hasElevation) {
    throw new StateRequestError('over-determined', 'give pressurePa or elevationM, not both: each fixes the pressure');
  }
  if (!hasPressure && !hasElevation) {
    throw new StateRequestError('under-determined', 'pressurePa (or elevationM) is required: moist-air properties depend on pressure');
  }
  return hasPressure ? requirePressurePa('pressurePa', request.pressurePa as number) : standardPressurePa(request.elevationM as number);
}

function supersaturated(detail: string): StateRequestError {
  return new StateRequestError('supersaturated', `the request is supersaturated: ${detail}; such air would hold liquid water or ice (fog), not vapour alone`);
}

/** Humidity ratio of a one-phase request from dry-bulb plus one property, checking saturation first. */
function humidityRatioWithDryBulb(tC: number, name: PropertyName, value: number, pressurePa: number): number {
  const ws = saturationHumidityRatio(tC, pressurePa);
  switch (name) {
    case 'rhPct':
      requireFinite('rhPct', value);
      if (value > 100) throw supersaturated(`rhPct = ${value} % is above 100 %`);
      return humidityRatioFromRh(tC, requireRhPct('rhPct', value), pressurePa);
    case 'dewPointC':
      requireTemperatureC('dewPointC', value);
      if (value > tC) throw supersaturated(`dewPointC = ${value} °C is above dryBulbC = ${tC} °C`);
      return humidityRatioFromDewPoint(value, pressurePa);
    case 'wetBulbC':
      requireTemperatureC('wetBulbC', value);
      if (value > tC) throw supersaturated(`wetBulbC = ${value} °C is above dryBulbC = ${tC} °C`);
      return humidityRatioFromWetBulb(tC, value, pressurePa);
    case 'humidityRatio':
      requireHumidityRatio('humidityRatio', value);
      if (value > ws * (1 + SATURATION_SLACK)) {
        throw supersaturated(`humidityRatio = ${value} kg/kg exceeds saturation ${ws.toFixed(6)} kg/kg at ${tC} °C`);
      }
      return value;
    case 'enthalpyKJPerKg': {
      const w = humidityRatioFromEnthalpy(tC, value);
      if (w > ws * (1 + SATURATION_SLACK)) {
        throw supersaturated(`enthalpyKJPerKg = ${value} kJ/kg exceeds that of saturated air at ${tC} °C`);
      }
      return w;
    }
    default:
      throw new StateRequestError('unsupported-pair', `dryBulbC cannot pair with itself`);
  }
}

/** Dry-bulb and humidity ratio of saturated air fixed by one property. */
function saturatedPoint(name: PropertyName, value: number, pressurePa: number): { tC: number; w: number } {
  switch (name) {
    case 'dryBulbC':
    case 'dewPointC':
    case 'wetBulbC': {
      const tC = requireTemperatureC(name, value);
      return { tC, w: saturationHumidityRatio(tC, pressurePa) };
    }
    case 'humidityRatio': {
      const w = requireHumidityRatio('humidityRatio', value);
      return { tC: dewPointFromHumidityRatio(w, pressurePa), w };
    }
    case 'enthalpyKJPerKg': {
      const tC = saturationTemperatureFromEnthalpy(requireFinite('enthalpyKJPerKg', value), pressurePa);
      if (Number.isNaN(tC)) throw new RangeError(`enthalpyKJPerKg = ${value} kJ/kg has no saturated state at ${pressurePa} Pa`);
      return { tC, w: saturationHumidityRatio(tC, pressurePa) };
    }
    default:
      throw new StateRequestError(
        'over-determined',
        'rhPct is 100 % by definition for saturated air; give dryBulbC, dewPointC, wetBulbC, humidityRatio or enthalpyKJPerKg',
      );
  }
}

/**
 * The full moist-air state from pressure (or elevation) plus two properties — dry-bulb with one of RH,
 * dew point, wet-bulb, humidity ratio or enthalpy; or enthalpy with humidity ratio — or, with
 * `saturated: true`, pressure plus one property. Refuses under- and over-determined requests and
 * supersaturated ones with a {@link StateRequestError}; a bad value gives a RangeError naming it.
 * Source: ASHRAE Handbook—Fundamentals (2017) ch. 1 (eq. 3, 5, 6, 12, 20, 22, 23, 26, 32, 33, 35, 36).
 */
export function moistAirState(request: MoistAirRequest): MoistAirState {
  const pressurePa = resolvePressurePa(request);
  const given = PROPERTY_NAMES.filter((name) => request[name] !== undefined);
  const saturated = request.saturated === true;
  const needed = saturated ? 1 : 2;
  const rule = saturated
    ? 'saturated air (in equilibrium with liquid water, supercooled below 0 °C) has two independent properties: pressure plus one'
    : 'moist air has three independent properties: pressure plus two';
  if (given.length < needed) {
    throw new StateRequestError('under-determined', `${rule}; got pressure plus ${given.length} (${given.join(', ') || 'none'})`);
  }
  if (given.length > needed) {
    throw new StateRequestError('over-determined', `${rule}; got pressure plus ${given.length} (${given.join(', ')})`);
  }

  let tC: number;
  let w: number;
  if (saturated) {
    ({ tC, w } = saturatedPoint(given[0], request[given[0]] as number, pressurePa));
  } else if (given.includes('dryBulbC')) {
    tC = requireTemperatureC('dryBulbC', request.dryBulbC as number);
    const other = given.find((name) => name !== 'dryBulbC') as PropertyName;
    w = humidityRatioWithDryBulb(tC, other, request[other] as number, pressurePa);
  } else if (given.includes('enthalpyKJPerKg') && given.includes('humidityRatio')) {
    w = requireHumidityRatio('humidityRatio', request.humidityRatio as number);
    tC = requireTemperatureC('dryBulbC (from enthalpyKJPerKg)', dryBulbFromEnthalpy(request.enthalpyKJPerKg as number, w));
    if (w > saturationHumidityRatio(tC, pressurePa) * (1 + SATURATION_SLACK)) {
      throw supersaturated(`enthalpyKJPerKg and humidityRatio give ${tC.toFixed(3)} °C, below the dew point of ${w} kg/kg`);
    }
  } else {
    throw new StateRequestError('unsupported-pair', `the pair ${given.join(' + ')} is not supported; use ${SUPPORTED_PAIRS}`);
  }
  return stateFromDryBulbAndHumidityRatio(tC, w, pressurePa);
}

/** Every property of a one-phase state given dry-bulb, humidity ratio and pressure (already validated). */
function stateFromDryBulbAndHumidityRatio(tC: number, w: number, pressurePa: number): MoistAirState {
  const rhPct = rhPctFromHumidityRatio(tC, w, pressurePa);
  return {
    pressurePa,
    dryBulbC: tC,
    humidityRatio: w,
    rhPct,
    dewPointC: w > 0 ? Math.min(dewPointFromHumidityRatio(w, pressurePa), tC) : Number.NaN,
    frostPointC: w > 0 ? frostPointFromHumidityRatio(w, pressurePa) : Number.NaN,
    wetBulbC: wetBulbFromHumidityRatio(tC, w, pressurePa),
    enthalpyKJPerKg: enthalpyKJPerKg(tC, w),
    vapourPressurePa: vapourPressureFromHumidityRatio(w, pressurePa),
    specificVolumeM3PerKg: specificVolumeM3PerKg(tC, w, pressurePa),
    densityKgPerM3: moistAirDensityKgPerM3(tC, w, pressurePa),
    degreeOfSaturation: degreeOfSaturation(tC, w, pressurePa),
    specificHumidity: specificHumidity(w),
  };
}
