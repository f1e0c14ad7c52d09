/**
 * The scenario: one cooling design applied to a climate and an inlet envelope. The same JSON
 * is accepted by the API and by the command line; field names are a contract.
 */
import { z } from 'zod';

const between = (min: number, max: number, unit: string) => {
  const message = `must be a number from ${min} to ${max}${unit ? ` ${unit}` : ''}`;
  return z.number({ error: message }).min(min, { error: message }).max(max, { error: message });
};

const fraction = (max = 1) => between(0, max, '');

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
  fanHeatK: between(0, 10, 'K'),
  evaporativeEffectiveness: fraction(),
};

export const directAirSchema = z.object({ kind: z.literal('direct-air'), ...commonSystem });

export const indirectAirSchema = z.object({
  kind: z.literal('indirect-air'),
  ...commonSystem,
  heatExchangerEffectiveness: between(0.05, 1, ''),
  /** Scavenger (outdoor) air mass flow per unit of hall air mass flow; 1 is common practice. */
  scavengerAirRatio: between(0.1, 5, '').default(1),
});

export const waterSideSchema = z.object({
  kind: z.literal('water-side'),
  ...commonSystem,
  chilledWaterSupplyC: between(0, 35, '°C'),
  chilledWaterDeltaTK: between(1, 20, 'K'),
  approachK: between(0, 20, 'K'),
  heatRejection: z.enum(['dry-cooler', 'cooling-tower'], { error: "must be 'dry-cooler' or 'cooling-tower'" }),
  /** Air temperature rise across the dry cooler, which sets its air flow; 10 K is common practice. */
  dryCoolerAirRiseK: between(2, 30, 'K').default(10),
});

export const systemSchema = z.discriminatedUnion('kind', [directAirSchema, indirectAirSchema, waterSideSchema], {
  error: "kind must be 'direct-air', 'indirect-air' or 'water-side'",
});

export const energySchema = z.object({
  itLoadKw: between(0.001, 1e7, 'kW'),
  /** Compressor COP (cooling kW per electric kW) at copReferenceC outdoor dry-bulb. */
  mechanicalCop: between(0.5, 30, ''),
  /** COP change per K of outdoor dry-bulb above copReferenceC (negative: worse when hotter). */
  copSlopePerK: between(-2, 2, 'per K').default(0),
  copReferenceC: between(-40, 60, '°C').default(35),
  /** Floor on the temperature-adjusted COP, so a steep slope cannot give zero or negative COP. */
  copMin: between(0.5, 30, '').default(1),
  /** Hall (and supply) fan power as a fraction of IT load, every hour with data. */
  fanPowerFraction: fraction(0.5).default(0.05),
  /** Pump power as a fraction of IT load: water-side every hour, air-side only while the evaporative stage runs. */
  pumpPowerFraction: fraction(0.5).default(0.01),
  /** Heat-rejection or scavenger fan power as a fraction of IT load (water-side and indirect-air, every hour). */
  heatRejectionFanFraction: fraction(0.5).default(0.02),
  /** Blowdown volume per volume evaporated; 1/(cycles of concentration − 1), 0.33 ≈ 4 cycles (common practice). */
  blowdownRatio: fraction(5).default(0.33),
  /** Share of a cooling tower's heat rejected by evaporation; 0.85 is a common-practice rule of thumb. */
  towerEvaporationShare: fraction().default(0.85),
});

export const scenarioSchema = z
  .object({
    name: z.string({ error: 'must be a text' }).trim().min(1, { error: 'must not be empty' }).max(200, { error: 'must be at most 200 characters' }),
    elevationM: between(-500, 6000, 'm'),
    envelope: envelopeSchema,
    system: systemSchema,
    energy: energySchema,
  })
  .refine((s) => s.system.kind !== 'water-side' || s.system.chilledWaterSupplyC < s.system.supplyAirC, {
    error: 'chilledWaterSupplyC must be below supplyAirC',
    path: ['system', 'chilledWaterSupplyC'],
  });

export type Scenario = z.infer<typeof scenarioSchema>;
export type ScenarioInput = z.input<typeof scenarioSchema>;
export type ScenarioSystem = Scenario['system'];
export type ScenarioEnvelope = Scenario['envelope'];
export type ScenarioEnergy = Scenario['energy'];

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
