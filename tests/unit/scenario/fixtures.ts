/**
 * Test fixtures for the scenario engine: scenarios built through the real schema, and outdoor
 * hours whose moisture and wet-bulb come from psychrolib (the reference library), so the engine's
 * psychrometrics are not used to make its own test inputs.
 */
import { parseScenario, type Scenario, type ScenarioInput } from '../../../shared/scenario';
import type { OutdoorHours } from '../../../shared/scenario/classify';
import { tightPsychrolib as psy } from '../psychrometrics/reference-psychrolib';

export const SEA_LEVEL_PA = 101_325;

/** ASHRAE TC 9.9 2021 recommended range (recalled from memory), as in envelopes.ts. */
export const RECOMMENDED = { dryBulbMinC: 18, dryBulbMaxC: 27, dewPointMinC: -9, dewPointMaxC: 15, rhMinPct: 0, rhMaxPct: 70 };

type SystemInput = ScenarioInput['system'];

/** Fan power of the fixtures: 1 K of fan heat at their 12 K rise across the IT. */
export const FIXTURE_FAN_POWER_FRACTION = 1 / 12;

/** Design fan heat of a scenario, K (the classifier's plant input). */
export const plantOf = (scenario: Scenario) => ({ fanHeatK: scenario.energy.fanPowerFraction * scenario.system.itDeltaTK });

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
): Scenario {
  const parsed = parseScenario({
    name: `test ${kind}`,
    elevationM: overrides.elevationM ?? 0,
    envelope: { ...RECOMMENDED, ...overrides.envelope },
    system: { ...SYSTEM_DEFAULTS[kind], ...overrides.system },
    // Fan power 1/12 of IT at a 12 K rise gives 1 K of fan heat (ΔT_fan = fanPowerFraction · ΔT_IT).
    energy: { itLoadKw: 1000, mechanicalCop: 4, fanPowerFraction: FIXTURE_FAN_POWER_FRACTION, ...overrides.energy },
  });
  if (!parsed.ok) throw new Error(parsed.errors.join('; '));
  return parsed.scenario;
}

export interface ReferenceState {
  t: number;
  w: number;
  twb: number;
}

/** Outdoor state from dry-bulb and dew point at pressurePa, by psychrolib. */
export function stateFromDewPoint(t: number, dewPointC: number, pressurePa = SEA_LEVEL_PA): ReferenceState {
  const w = psy.GetHumRatioFromTDewPoint(dewPointC, pressurePa);
  return { t, w, twb: psy.GetTWetBulbFromHumRatio(t, w, pressurePa) };
}

/** Outdoor state from dry-bulb and relative humidity (%) at pressurePa, by psychrolib. */
export function stateFromRh(t: number, rhPct: number, pressurePa = SEA_LEVEL_PA): ReferenceState {
  const w = psy.GetHumRatioFromRelHum(t, rhPct / 100, pressurePa);
  return { t, w, twb: psy.GetTWetBulbFromHumRatio(t, w, pressurePa) };
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
