import { energySchema, type HeatReuseInput, type LiquidLoop, type Scenario, type SingleSystem } from '../../../../shared/scenario/schema';
import type { SystemKind } from './scenario-fields';

/**
 * The editor holds every system field at once, so switching the system kind keeps what was typed for
 * the other kinds; the shared schema keeps only the chosen kind's fields when the form is submitted.
 */
export interface ScenarioFormValues {
  name: string;
  envelope: Scenario['envelope'];
  system: {
    kind: SystemKind;
    supplyAirC: number;
    itDeltaTK: number;
    evaporativeEffectiveness: number;
    heatExchangerEffectiveness: number;
    scavengerAirRatio: number;
    chilledWaterSupplyC: number;
    chilledWaterDeltaTK: number;
    approachK: number;
    heatRejection: 'dry-cooler' | 'cooling-tower';
    dryCoolerAirRiseK: number;
    freezeProtectionWetBulbC: number;
    /** Hybrid halls: the share of IT heat to liquid, the liquid loop, the air loop (any single kind) and heat reuse. */
    liquidShare: number;
    liquid: LiquidLoop;
    air: AirLoopValues;
    heatReuse?: HeatReuseInput;
  };
  energy: Scenario['energy'];
}

/** The air loop of a hybrid as the editor holds it: every single kind's fields at once, as for the hall itself. */
export type AirLoopValues = Omit<ScenarioFormValues['system'], 'kind' | 'liquidShare' | 'liquid' | 'air' | 'heatReuse'> & { kind: SingleSystem['kind'] };

/** Heat reuse as a new hybrid offers it: a low-temperature heating network at 45 °C taking half the heat (illustrative). */
export const newHeatReuse: HeatReuseInput = { thresholdC: 45, reusedShare: 0.5, heatPump: false };

/** Every single system kind's fields as a new scenario starts them: the hall's own, and a new hybrid's air loop. */
const newAirSystemFields: Omit<AirLoopValues, 'kind'> = {
  supplyAirC: 24,
  itDeltaTK: 12,
  evaporativeEffectiveness: 0.85,
  heatExchangerEffectiveness: 0.7,
  scavengerAirRatio: 1,
  chilledWaterSupplyC: 18,
  chilledWaterDeltaTK: 6,
  approachK: 5,
  heatRejection: 'cooling-tower',
  dryCoolerAirRiseK: 10,
  freezeProtectionWetBulbC: 2,
};

/** A new scenario's starting point: direct outdoor air on the 2021 A1 allowable class (figures as in the envelope presets). */
export const newScenarioValues: ScenarioFormValues = {
  name: 'New scenario',
  envelope: {
    presetId: 'ashrae-2021-a1',
    dryBulbMinC: 15,
    dryBulbMaxC: 32,
    dewPointMinC: -12,
    dewPointMaxC: 17,
    rhMinPct: 8,
    rhMaxPct: 80,
    altitudeDerating: { aboveElevationM: 900, metresPerKelvin: 300 },
  },
  system: {
    kind: 'direct-air',
    ...newAirSystemFields,
    // The example hybrid: 80 % to W32 facility water on dry coolers, the rest to indirect air.
    liquidShare: 0.8,
    liquid: {
      kind: 'water-side',
      facilityWaterClassId: 'ashrae-2021-w32',
      chilledWaterSupplyC: 32,
      chilledWaterDeltaTK: 10,
      approachK: 5,
      heatRejection: 'dry-cooler',
      evaporativeEffectiveness: 0,
      cduApproachK: 2,
      dryCoolerAirRiseK: 10,
      freezeProtectionWetBulbC: 2,
    },
    air: { kind: 'indirect-air', ...newAirSystemFields },
  },
  // The shared schema's defaults for every energy input but the two it requires.
  energy: energySchema.parse({ itLoadKw: 1000, mechanicalCop: 4.5 }),
};

/** A stored scenario as editor values: its own fields over the defaults of the kinds it does not use. */
export function toFormValues(scenario: Scenario): ScenarioFormValues {
  return {
    name: scenario.name,
    envelope: { ...scenario.envelope },
    system:
      scenario.system.kind === 'hybrid'
        ? {
            ...newScenarioValues.system,
            ...scenario.system,
            liquid: { ...newScenarioValues.system.liquid, ...scenario.system.liquid },
            air: { ...newScenarioValues.system.air, ...scenario.system.air },
          }
        : { ...newScenarioValues.system, ...scenario.system },
    energy: { ...newScenarioValues.energy, ...scenario.energy },
  };
}

/** Value at a dotted path such as "system.supplyAirC". */
export function valueAtPath(values: unknown, path: string): unknown {
  return path.split('.').reduce<unknown>((at, key) => (at && typeof at === 'object' ? (at as Record<string, unknown>)[key] : undefined), values);
}
