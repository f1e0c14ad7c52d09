/**
 * The scenario: one cooling design applied to a climate and an inlet envelope. The same JSON
 * is accepted by the API and by the command line; field names are a contract.
 */
// @ts-nocheck

import { z } from 'zod';
import { withoutControlCharacters } from '../schemas/plain-text';

const between = (min: number, max: number, unit: string) => {
  const message = `must be a number from ${min} to ${max}${unit ? ` ${unit}` : ''}`;
  return z.number({ error: message }).min(min, { error: message }).max(max, { error: message });
};

const fraction = (max = 1) => between(0, max, '');

/**
 * An input that no longer exists: accepted only when absent, refused with a message naming what replaced it
 * (shared/scenario/migrate.ts turns a saved scenario that still carries it into the new inputs).
 */
const retired = (replacement: string) => {
  const message = `is retired: ${replacement} (saved scenarios are migrated by migrateScenario)`;
  return z.undefined({ error: message }).optional();
};

/** Retired inputs and what replaced each, by path; one wording for the schema, the migration and the docs. */
export const RETIRED_INPUTS = {
  'system.fanHeatK': 'fan heat is now derived from energy.fanPowerFraction and the air flow; set energy.fanPowerFraction',
  'energy.copSlopePerK': 'compressor COP now follows its lift, calibrated to energy.mechanicalCop at the rating conditions',
  'energy.copReferenceC': 'compressor COP now follows its lift, calibrated to energy.mechanicalCop at the rating conditions',
  'energy.copMin': 'compressor COP now follows its lift (with a lift floor), calibrated to energy.mechanicalCop at the rating conditions',
  'energy.blowdownRatio': 'set energy.cyclesOfConcentration instead (blowdown = evaporation / (cycles − 1) − drift)',
  'energy.towerEvaporationShare': 'the tower evaporation now follows the conditions (saturated leaving air, Merkel); nothing to set',
} as const;

export const altitudeDeratingSchema = z.object({
  aboveElevationM: between(0, 9000, 'm'),
  metresPerKelvin: between(1, 10_000, 'm per K'),
});

export const envelopeSchema = z
  .object({
    presetId: z.string().max(80).optional(),
    dryBulbMinC: between(-20, 60, '°C'),
    dryBulbMaxC: between(-20, 60, '°C'),
    dewPointMinC: between(-60, 40, '°C'),
    dewPointMaxC: between(-60, 40, '°C'),
    rhMinPct: between(0, 100, '%'),
    rhMaxPct: between(0, 100, '%'),
    altitudeDerating: altitudeDeratingSchema.optional(),
  })
  .refine((e) => e.dryBulbMinC < e.dryBulbMaxC, { error: 'dryBulbMinC must be below dryBulbMaxC', path: ['dryBulbMaxC'] })
  .refine((e) => e.dewPointMinC < e.dewPointMaxC, { error: 'dewPointMinC must be below dewPointMaxC', path: ['dewPointMaxC'] })
  .refine((e) => e.rhMinPct < e.rhMaxPct, { error: 'rhMinPct must be below rhMaxPct', path: ['rhMaxPct'] });

const commonSystem = {
  supplyAirC: between(5, 45, '°C'),
  itDeltaTK: between(1, 40, 'K'),
  fanHeatK: retired(RETIRED_INPUTS['system.fanHeatK']),
  evaporativeEffectiveness: fraction(),
};

export const directAirSchema = z.object({ kind: z.literal('direct-air'), ...commonSystem });

export const indirectAirSchema = z.object({
  kind: z.literal('indirect-air'),
  ...commonSystem,
  heatExchangerEffectiveness: between(0.05, 1, ''),
  /**
   * Scavenger (outdoor) air mass flow per unit of hall air mass flow; 1 is common practice. The exchanger's
   * effectiveness follows it (ε-NTU, cross-flow both unmixed) from heatExchangerEffectiveness, rated at 1.
   */
  scavengerAirRatio: between(0.1, 5, '').default(1),
});

export const waterSideSchema = z.object({
  kind: z.literal('water-side'),
  ...commonSystem,
  chilledWaterSupplyC: between(0, 35, '°C'),
  chilledWaterDeltaTK: between(1, 20, 'K'),
  approachK: between(0, 20, 'K'),
  heatRejection: z.enum(['dry-cooler', 'cooling-tower'], { error: "must be 'dry-cooler' or 'cooling-tower'" }),
  /** Air temperature rise across the dry cooler at design, which sets its design air flow; 10 K is common practice. */
  dryCoolerAirRiseK: between(2, 30, 'K').default(10),
  /**
   * Cooling tower: below this outdoor wet-bulb the tower runs dry (water bypasses the fill, no evaporation,
   * the water approaches the dry-bulb) and its basin heaters run. 2 °C is a common-practice setting.
   */
  freezeProtectionWetBulbC: between(-20, 10, '°C').default(2),
});

/** The single systems: one of them cools the whole hall (or, in a hybrid, the hall air). */
export const singleSystemSchema = z.discriminatedUnion('kind', [directAirSchema, indirectAirSchema, waterSideSchema], {
  error: "kind must be 'direct-air', 'indirect-air' or 'water-side'",
});

/**
 * The liquid loop of a hybrid hall: a facility-water loop to the coolant distribution units (CDUs), cooled like a
 * water-side system (dry cooler or tower, with or without wetting, a trim chiller for the rest). Its supply can be
 * far warmer than a chilled-water plant's (the facility-water classes, shared/scenario/facility-water.ts).
 */
export const liquidLoopSchema = z.object({
  kind: z.literal('water-side', { error: "must be 'water-side'" }),
  /** Facility-water class the supply was taken from (facility-water.ts), or absent for a typed (custom) supply. */
  facilityWaterClassId: z.string().max(40).optional(),
  /** Facility-water supply to the CDUs, °C. */
  chilledWaterSupplyC: between(2, 60, '°C'),
  /** Facility-water rise across the CDUs, K: the return is supply + ΔT. */
  chilledWaterDeltaTK: between(1, 30, 'K'),
  approachK: between(0, 20, 'K'),
  heatRejection: z.enum(['dry-cooler', 'cooling-tower'], { error: "must be 'dry-cooler' or 'cooling-tower'" }),
  evaporativeEffectiveness: fraction(),
  /** The CDU's approach: technology-coolant supply = facility-water supply + this, K. Shown; the hours do not depend on it. */
  cduApproachK: between(0, 20, 'K'),
  dryCoolerAirRiseK: between(2, 30, 'K').default(10),
  freezeProtectionWetBulbC: between(-20, 10, '°C').default(2),
});

/**
 * Heat reuse from the liquid loop's return water: worth reusing in an hour when the return (supply + ΔT) is at
 * least thresholdC, or, with a heat pump, lifted to thresholdC. reusedShare is how much of the available heat
 * a heating network takes.
 */
export const heatReuseSchema = z.object({
  thresholdC: between(20, 95, '°C'),
  reusedShare: fraction(),
  heatPump: z.boolean({ error: 'must be true or false' }).default(false),
});

export const hybridSchema = z.object({
  kind: z.literal('hybrid'),
  /** Share of the IT heat taken by the liquid loop (cold plates, CDUs); the rest goes to the hall air. */
  liquidShare: fraction(),
  liquid: liquidLoopSchema,
  air: singleSystemSchema,
  heatReuse: heatReuseSchema.optional(),
});

export const systemSchema = z.discriminatedUnion('kind', [directAirSchema, indirectAirSchema, waterSideSchema, hybridSchema], {
  error: "kind must be 'direct-air', 'indirect-air', 'water-side' or 'hybrid'",
});

const loadFraction = z
  .number({ error: 'must be a number from 0 to 1' })
  .min(0, { error: 'must be a number from 0 to 1' })
  .max(1, { error: 'must be a number from 0 to 1' });

/** Hours in the profile of an hourly IT load: a 365-day year (29 February repeats 28 February). */
export const LOAD_PROFILE_HOURS = 8760;

/** A scenario's or load profile's name: 1–200 characters of text without control characters. */
const plainName = z
  .string({ error: 'must be a text' })
  .trim()
  .min(1, { error: 'must not be empty' })
  .max(200, { error: 'must be at most 200 characters' })
  .refine(...withoutControlCharacters(''));

/**
 * IT load through the years, as fractions of energy.itLoadKw (the design load):
 * constant; a ramp by calendar year from the first year of the weather (the last value holds after the
 * list ends); or a profile per hour of the local standard-time year.
 */
export const itLoadProfileSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('constant') }),
    z.object({
      kind: z.literal('yearly-ramp'),
      fractions: z.array(loadFraction).min(1, { error: 'must list at least one year' }).max(100, { error: 'must list at most 100 years' }),
    }),
    z.object({
      kind: z.literal('hourly-profile'),
      name: plainName,
      fractions: z.array(loadFraction).length(LOAD_PROFILE_HOURS, { error: `must hold ${LOAD_PROFILE_HOURS} hourly values` }),
    }),
  ],
  { error: "kind must be 'constant', 'yearly-ramp' or 'hourly-profile'" },
);

export const energySchema = z.object({
  /** Design IT load, kW; the load profile gives each hour's share of it. */
  itLoadKw: between(0.001, 1e7, 'kW'),
  itLoadProfile: itLoadProfileSchema.default({ kind: 'constant' }),
  /**
   * Rated compressor COP (cooling kW per electric kW) at full load and the rating conditions of the condensing
   * side (AHRI 550/590: 35 °C entering air for air-cooled, 29.4 °C entering condenser water for water-cooled,
   * 6.7 °C leaving chilled water). The hour's COP follows its lift from there (shared/scenario/compressor.ts).
   */
  mechanicalCop: between(0.5, 30, ''),
  /** Evaporating temperature below the leaving air or chilled water, K; 5 K is common practice. */
  evaporatorApproachK: between(0, 20, 'K').default(5),
  /** Condensing temperature above the entering condensing air or water, K; 10 K is common practice. */
  condenserApproachK: between(0, 30, 'K').default(10),
  /** Lowest compressor capacity before it cycles on and off, as a fraction of design; 0.2 is common practice. */
  compressorMinTurndown: between(0.05, 1, '').default(0.2),
  /** Hall (and supply) fan power at design air flow, as a fraction of design IT load; fan heat follows from it. */
  fanPowerFraction: fraction(0.5).default(0.05),
  /** Lowest hall fan speed, as a fraction of design air flow (fan affinity law below it does not apply). */
  fanMinSpeedFraction: between(0.1, 1, '').default(0.3),
  /** Pump power at design flow as a fraction of design IT load: water-side every hour, air-side only while the evaporative stage runs. */
  pumpPowerFraction: fraction(0.5).default(0.01),
  /** Lowest pump speed, as a fraction of design flow. */
  pumpMinSpeedFraction: between(0.1, 1, '').default(0.3),
  /**
   * Heat-rejection fan power (dry cooler, tower) or scavenger fan power (at a scavenger air ratio of 1) at design,
   * as a fraction of design IT load.
   */
  heatRejectionFanFraction: fraction(0.5).default(0.02),
  /** Cycles of concentration of evaporative water (towers, media); blowdown = evaporation / (cycles − 1) − drift. 4 is common practice. */
  cyclesOfConcentration: between(1.5, 50, '').default(4),
  /** Tower drift, as a fraction of the circulating water; 0.0002 (0.02 %) is common practice for drift eliminators. */
  towerDriftFraction: between(0, 0.01, '').default(0.0002),
  /** Tower basin-heater power, as a fraction of design IT load, in hours below the freeze-protection wet-bulb. */
  basinHeaterFraction: fraction(0.05).default(0.001),
  copSlopePerK: retired(RETIRED_INPUTS['energy.copSlopePerK']),
  copReferenceC: retired(RETIRED_INPUTS['energy.copReferenceC']),
  copMin: retired(RETIRED_INPUTS['energy.copMin']),
  blowdownRatio: retired(RETIRED_INPUTS['energy.blowdownRatio']),
  towerEvaporationShare: retired(RETIRED_INPUTS['energy.towerEvaporationShare']),
});

export const scenarioSchema = z
  .object({
    name: plainName,
    /**
     * Only for the command line, which runs without a site (its --elevation wins). A run in the workspace always takes
     * its climate file's site's elevation; scenarios saved there carry none (migrateScenario removes an old one).
     */
    elevationM: between(-500, 6000, 'm').optional(),
    envelope: envelopeSchema,
    system: systemSchema,
    energy: energySchema,
  })
  .refine((s) => s.system.kind !== 'water-side' || s.system.chilledWaterSupplyC < s.system.supplyAirC, {
    error: 'chilledWaterSupplyC must be below supplyAirC',
    path: ['system', 'chilledWaterSupplyC'],
  })
  .refine((s) => s.system.kind !== 'hybrid' || s.system.air.kind !== 'water-side' || s.system.air.chilledWaterSupplyC < s.system.air.supplyAirC, {
    error: 'chilledWaterSupplyC must be below supplyAirC',
    path: ['system', 'air', 'chilledWaterSupplyC'],
  });

export type Scenario = z.infer<typeof scenarioSchema>;
export type ScenarioInput = z.input<typeof scenarioSchema>;
export type ScenarioSystem = Scenario['system'];
/** A system that cools with one plant: every kind but hybrid. */
export type SingleSystem = z.infer<typeof singleSystemSchema>;
export type HybridSystem = z.infer<typeof hybridSchema>;
export type LiquidLoop = z.infer<typeof liquidLoopSchema>;
export type HeatReuseInput = z.infer<typeof heatReuseSchema>;
export type ScenarioEnvelope = Scenario['envelope'];
export type ScenarioEnergy = Scenario['energy'];
export type ItLoadProfile = z.infer<typeof itLoadProfileSchema>;

/** A scenario as the workspace saves it: without an elevation of its own, since a run takes its site's. */
export function withoutOwnElevation(scenario: Scenario): Scenario {
  const { elevationM: _unused, ...rest } = scenario;
  return rest;
}

export type ParseScenarioResult = { ok: true; scenario: Scenario } | { ok: false; errors: string[] };

/** Validates scenario JSON; each error names its field path, e.g. "system.supplyAirC: must be a number from 5 to 45 °C (got 50)". */
export function parseScenario(input: unknown): ParseScenarioResult {
  const parsed = scenarioSchema.safeParse(input);
  if (parsed.success) return { ok: true, scenario: parsed.data };
  const errors = parsed.error.issues.map((issue) => {
    const field = issue.path.map(String).join('.') || 'scenario';
    const got = valueAt(input, issue.path);
    const shown = got === undefined ? (issue.code === 'invalid_type' ? ' (missing)' : '') : ` (got ${JSON.stringify(got)})`;
    return `${field}: ${issue.message}${typeof got === 'object' && got !== null ? '' : shown}`;
  });
  return { ok: false, errors };
}

function valueAt(input: unknown, path: readonly PropertyKey[]): unknown {
  let current: unknown = input;
  for (const key of path) {
    if (current === null || typeof current !== 'object') return undefined;
    current = (current as Record<PropertyKey, unknown>)[key];
  }
  return current;
}
