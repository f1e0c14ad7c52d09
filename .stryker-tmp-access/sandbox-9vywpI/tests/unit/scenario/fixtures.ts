/**
 * Test fixtures for the scenario engine: scenarios built through the real schema, and outdoor
 * hours whose moisture and wet-bulb come from psychrolib (the reference library), so the engine's
 * psychrometrics are not used to make its own test inputs.
 */
// @ts-nocheck

import { parseScenario, type ScenarioInput, type SingleScenario } from '../../../shared/scenario';
import type { OutdoorHours } from '../../../shared/scenario/classify';
import { tightPsychrolib as psy } from '../psychrometrics/reference-psychrolib';
import { hylandWexlerIcePa, hylandWexlerWaterPa } from '../psychrometrics/reference-over-water';

export const SEA_LEVEL_PA = 101_325;

/** ASHRAE TC 9.9 2021 recommended range (recalled from memory), as in envelopes.ts. */
export const RECOMMENDED = { dryBulbMinC: 18, dryBulbMaxC: 27, dewPointMinC: -9, dewPointMaxC: 15, rhMinPct: 0, rhMaxPct: 70 };

type SystemInput = Exclude<ScenarioInput['system'], { kind: 'hybrid' }>;

/** Fan power of the fixtures: 1 K of fan heat at their 12 K rise across the IT. */
export const FIXTURE_FAN_POWER_FRACTION = 1 / 12;

/** Design fan heat of a scenario, K (the classifier's plant input). */
export const plantOf = (scenario: SingleScenario) => ({ fanHeatK: scenario.energy.fanPowerFraction * scenario.system.itDeltaTK });

const SYSTEM_DEFAULTS: Record<SystemInput['kind'], SystemInput> = {
  'direct-air': { kind: 'direct-air', supplyAirC: 24, itDeltaTK: 12, evaporativeEffectiveness: 0.8 },
  'indirect-air': { kind: 'indirect-air', supplyAirC: 24, itDeltaTK: 12, evaporativeEffectiveness: 0.8, heatExchangerEffectiveness: 0.7 },
  'water-side': {
    kind: 'water-side',
    supplyAirC: 24,
    itDeltaTK: 12,
    evaporativeEffectiveness: 0.8,
    chilledWaterSupplyC: 18,
    chilledWaterDeltaTK: 6,
    approachK: 5,
    heatRejection: 'dry-cooler',
  },
};

/** A valid scenario of the given kind, with overrides merged into system, envelope and energy. */
export function makeScenario(
  kind: SystemInput['kind'],
  overrides: { system?: Record<string, unknown>; envelope?: Record<string, unknown>; energy?: Record<string, unknown>; elevationM?: number } = {},
): SingleScenario {
  const parsed = parseScenario({
    name: `test ${kind}`,
    elevationM: overrides.elevationM ?? 0,
    envelope: { ...RECOMMENDED, ...overrides.envelope },
    system: { ...SYSTEM_DEFAULTS[kind], ...overrides.system },
    // Fan power 1/12 of IT at a 12 K rise gives 1 K of fan heat (ΔT_fan = fanPowerFraction · ΔT_IT).
    energy: { itLoadKw: 1000, mechanicalCop: 4, fanPowerFraction: FIXTURE_FAN_POWER_FRACTION, ...overrides.energy },
  });
  if (!parsed.ok) throw new Error(parsed.errors.join('; '));
  return parsed.scenario as SingleScenario;
}

export interface ReferenceState {
  t: number;
  w: number;
  twb: number;
}

/*
 * The humidity convention (WMO-No. 8): RH and dew point are over liquid water also below 0 °C, in the weather and in
 * envelope limits. psychrolib reads both over ice at and below 0.01 °C, so there it is fed the vapour pressure over
 * water (Hyland–Wexler eq. 6 evaluated apart from the engine, reference-over-water.ts) and computes W from it (eq. 20).
 */

/** W, kg/kg, of air whose dew point over liquid water is dewPointC, by psychrolib. */
export function wFromDewPoint(dewPointC: number, pressurePa: number): number {
  return dewPointC > 0.01 ? psy.GetHumRatioFromTDewPoint(dewPointC, pressurePa) : psy.GetHumRatioFromVapPres(hylandWexlerWaterPa(dewPointC), pressurePa);
}

/** W, kg/kg, at dry-bulb t and RH over liquid water rhPct, by psychrolib. */
export function wFromRh(t: number, rhPct: number, pressurePa: number): number {
  return t > 0.01 ? psy.GetHumRatioFromRelHum(t, rhPct / 100, pressurePa) : psy.GetHumRatioFromVapPres((rhPct / 100) * hylandWexlerWaterPa(t), pressurePa);
}

/**
 * psychrolib's wet-bulb; for air at or below 0.01 °C holding more vapour than saturation over ice allows (possible once
 * RH is over water) the dry-bulb, as the engine gives it: psychrolib's bracket from its frost point is then upside down.
 */
export function wetBulbOf(t: number, w: number, pressurePa: number): number {
  return t <= 0.01 && psy.GetVapPresFromHumRatio(w, pressurePa) >= hylandWexlerIcePa(t) ? t : psy.GetTWetBulbFromHumRatio(t, w, pressurePa);
}

/** Outdoor state from dry-bulb and dew point (over liquid water) at pressurePa, by psychrolib. */
export function stateFromDewPoint(t: number, dewPointC: number, pressurePa = SEA_LEVEL_PA): ReferenceState {
  const w = wFromDewPoint(dewPointC, pressurePa);
  return { t, w, twb: wetBulbOf(t, w, pressurePa) };
}

/** Outdoor state from dry-bulb and relative humidity (%, over liquid water) at pressurePa, by psychrolib. */
export function stateFromRh(t: number, rhPct: number, pressurePa = SEA_LEVEL_PA): ReferenceState {
  const w = wFromRh(t, rhPct, pressurePa);
  return { t, w, twb: wetBulbOf(t, w, pressurePa) };
}

/** Outdoor state from dry-bulb and wet-bulb at pressurePa, by psychrolib. */
export function stateFromWetBulb(t: number, wetBulbC: number, pressurePa = SEA_LEVEL_PA): ReferenceState {
  return { t, w: psy.GetHumRatioFromTWetBulb(t, wetBulbC, pressurePa), twb: wetBulbC };
}

/** Typed-array hours from reference states. */
export function outdoorHours(states: ReferenceState[], pressurePa = SEA_LEVEL_PA): OutdoorHours {
  return {
    dryBulbC: Float64Array.from(states, (s) => s.t),
    humidityRatio: Float64Array.from(states, (s) => s.w),
    wetBulbC: Float64Array.from(states, (s) => s.twb),
    pressurePa,
  };
}

export { psy };
