import type { z } from 'zod';
import {
  directAirSchema,
  energySchema,
  envelopeSchema,
  heatReuseSchema,
  hybridSchema,
  indirectAirSchema,
  liquidLoopSchema,
  waterSideSchema,
  type Scenario,
} from '../../../../shared/scenario/schema';
import { inputLabel } from '../../../../shared/scenario/input-labels';
import type { FieldUnit } from './field-units';

export type SystemKind = Scenario['system']['kind'];
export type HeatRejection = Extract<Scenario['system'], { kind: 'water-side' }>['heatRejection'];

/** One numeric input of the scenario: where it lives, how it is shown, its allowed range (from the shared schema) and why it matters. */
export interface NumericField {
  path: string;
  label: string;
  unit: FieldUnit;
  min: number;
  max: number;
  help: string;
  /** Only shown for these system kinds; all kinds when absent. */
  kinds?: SystemKind[];
  /** Only shown for water-side systems with this heat rejection. */
  heatRejection?: HeatRejection;
}

type AnyNumber = z.ZodType & { minValue?: number | null; maxValue?: number | null; unwrap?: () => AnyNumber };

/** The range the shared schema allows for a field, reading through `.default()`. */
function rangeOf(schema: AnyNumber): { min: number; max: number } {
  const inner = schema.unwrap ? schema.unwrap() : schema;
  return { min: inner.minValue ?? Number.NEGATIVE_INFINITY, max: inner.maxValue ?? Number.POSITIVE_INFINITY };
}

function field(schema: AnyNumber, path: string, unit: FieldUnit, help: string, kinds?: SystemKind[]): NumericField {
  return { path, label: inputLabel(path), unit, help, kinds, ...rangeOf(schema) };
}

const sys = directAirSchema.shape;
const ind = indirectAirSchema.shape;
const ws = waterSideSchema.shape;
const en = energySchema.shape as unknown as Record<string, AnyNumber>;
const envelopeShape = envelopeSchema.shape;

export const systemFields: NumericField[] = [
  field(sys.supplyAirC, 'system.supplyAirC', 'temperature', 'Air temperature held at the IT inlet.'),
  field(sys.itDeltaTK, 'system.itDeltaTK', 'temperatureDifference', 'Return air is the supply plus this rise; sets the air flow.'),
  field(
    sys.evaporativeEffectiveness,
    'system.evaporativeEffectiveness',
    'ratio',
    'Share of the wet-bulb depression the evaporative stage removes; 0 means the design has none.',
  ),
  field(
    ind.heatExchangerEffectiveness,
    'system.heatExchangerEffectiveness',
    'ratio',
    'How close the air-to-air exchanger brings hall air to the outdoor (scavenger) air temperature.',
    ['indirect-air'],
  ),
  field(
    ind.scavengerAirRatio as AnyNumber,
    'system.scavengerAirRatio',
    'ratio',
    'Outdoor air mass flow through the exchanger per unit of hall air flow; 1 is common practice. Less scavenger air lowers the exchanger’s effectiveness (and its fan power).',
    ['indirect-air'],
  ),
  field(
    ws.chilledWaterSupplyC,
    'system.chilledWaterSupplyC',
    'temperature',
    'Water temperature leaving the plant to the hall coils; must be below the supply air.',
    ['water-side'],
  ),
  field(ws.chilledWaterDeltaTK, 'system.chilledWaterDeltaTK', 'temperatureDifference', 'Water temperature rise across the hall coils.', ['water-side']),
  field(
    ws.approachK,
    'system.approachK',
    'temperatureDifference',
    'Heat-rejection plus exchanger approach between outdoor (dry- or wet-bulb) and chilled-water temperature.',
    ['water-side'],
  ),
  {
    ...field(
      ws.dryCoolerAirRiseK as AnyNumber,
      'system.dryCoolerAirRiseK',
      'temperatureDifference',
      'Air temperature rise through the dry cooler at design, which sets its air flow (and a wetted cooler’s water); 10 K is common practice.',
      ['water-side'],
    ),
    heatRejection: 'dry-cooler',
  },
  {
    ...field(
      ws.freezeProtectionWetBulbC as AnyNumber,
      'system.freezeProtectionWetBulbC',
      'temperature',
      'Below this outdoor wet-bulb the tower runs dry with its basin heaters on; 2 °C is common practice.',
      ['water-side'],
    ),
    heatRejection: 'cooling-tower',
  },
];

export const envelopeFields: NumericField[] = [
  field(envelopeShape.dryBulbMinC, 'envelope.dryBulbMinC', 'temperature', 'Coldest inlet air the IT accepts.'),
  field(envelopeShape.dryBulbMaxC, 'envelope.dryBulbMaxC', 'temperature', 'Warmest inlet air, before any altitude derating.'),
  field(envelopeShape.dewPointMinC, 'envelope.dewPointMinC', 'temperature', 'Driest air allowed, as a dew point.'),
  field(envelopeShape.dewPointMaxC, 'envelope.dewPointMaxC', 'temperature', 'Moistest air allowed, as a dew point.'),
  field(envelopeShape.rhMinPct, 'envelope.rhMinPct', 'percent', 'Lower RH limit at the inlet.'),
  field(envelopeShape.rhMaxPct, 'envelope.rhMaxPct', 'percent', 'Upper RH limit at the inlet.'),
];

/** A tower-only energy input. */
const towerField = (f: NumericField): NumericField => ({ ...f, kinds: ['water-side'], heatRejection: 'cooling-tower' });

export const energyFields: NumericField[] = [
  field(en.itLoadKw, 'energy.itLoadKw', 'power', 'Design IT power of the hall; the load profile gives each hour’s share of it.'),
  field(
    en.mechanicalCop,
    'energy.mechanicalCop',
    'ratio',
    'Rated full-load COP at the rating conditions (35 °C / 95 °F air for air-cooled, 29.4 °C / 85 °F condenser water for water-cooled, 6.7 °C / 44 °F leaving water); the hour’s COP follows its lift.',
  ),
  field(en.evaporatorApproachK, 'energy.evaporatorApproachK', 'temperatureDifference', 'Evaporating temperature below the leaving air or chilled water.'),
  field(en.condenserApproachK, 'energy.condenserApproachK', 'temperatureDifference', 'Condensing temperature above the air or water entering the condenser.'),
  field(en.compressorMinTurndown, 'energy.compressorMinTurndown', 'shareAsPercent', 'Lowest compressor capacity before it cycles on and off.'),
  field(en.fanPowerFraction, 'energy.fanPowerFraction', 'shareAsPercent', 'Hall fan power at design flow as a share of IT load; the fan heat follows from it.'),
  field(en.fanMinSpeedFraction, 'energy.fanMinSpeedFraction', 'shareAsPercent', 'Fans follow the load down to this speed; power goes with speed cubed.'),
  field(
    en.pumpPowerFraction,
    'energy.pumpPowerFraction',
    'shareAsPercent',
    'Pump power at design flow as a share of IT load; water-side every hour, air-side only while the evaporative stage runs.',
  ),
  field(en.pumpMinSpeedFraction, 'energy.pumpMinSpeedFraction', 'shareAsPercent', 'Pumps follow the load down to this speed; power goes with speed cubed.'),
  field(
    en.heatRejectionFanFraction,
    'energy.heatRejectionFanFraction',
    'shareAsPercent',
    'Share of IT load for dry-cooler or tower fans, or scavenger fans at a scavenger air ratio of 1, at design.',
    ['water-side', 'indirect-air'],
  ),
  field(
    en.cyclesOfConcentration,
    'energy.cyclesOfConcentration',
    'ratio',
    'Dissolved solids in the circulating water over the make-up water; sets the blowdown. 4 is common practice.',
  ),
  towerField(
    field(en.towerDriftFraction, 'energy.towerDriftFraction', 'shareAsPercent', 'Water carried off as droplets, as a share of the circulating water.'),
  ),
  towerField(
    field(
      en.basinHeaterFraction,
      'energy.basinHeaterFraction',
      'shareAsPercent',
      'Basin-heater power in freeze-protection hours, as a share of IT load; take it from the tower’s data.',
    ),
  ),
];

export type LoadProfileKind = Scenario['energy']['itLoadProfile']['kind'];

/** The ways of giving the IT load through the year, for the editor's choice. */
export const loadProfileKinds: { kind: LoadProfileKind; label: string; help: string }[] = [
  { kind: 'constant', label: 'Constant', help: 'The design IT load every hour.' },
  {
    kind: 'yearly-ramp',
    label: 'Ramp by year',
    help: 'A share of the design load for each year from the first year of the weather; the last share holds after.',
  },
  { kind: 'hourly-profile', label: 'Hourly profile', help: 'A file of 8760 shares of the design load, one per hour of the year in local standard time.' },
];

export const systemKinds: { kind: SystemKind; label: string; help: string }[] = [
  { kind: 'direct-air', label: 'Direct outdoor air', help: 'Outdoor air enters the hall; humidity follows the weather.' },
  { kind: 'indirect-air', label: 'Indirect air-to-air', help: 'Hall air recirculates through an exchanger; outdoor air never enters.' },
  { kind: 'water-side', label: 'Water-side economiser', help: 'Chilled water cooled by a dry cooler or tower when the weather allows.' },
  { kind: 'hybrid', label: 'Hybrid hall (liquid + air)', help: 'Most heat to warm facility water through CDUs and cold plates; the rest to the hall air.' },
];

const liq = liquidLoopSchema.shape as unknown as Record<string, AnyNumber>;

/** A hybrid's share of IT heat to the liquid loop. */
export const liquidShareField = field(
  hybridSchema.shape.liquidShare,
  'system.liquidShare',
  'shareAsPercent',
  'Share of the IT heat the cold plates take to the facility water; the rest goes to the hall air.',
);

/** The liquid loop of a hybrid: facility water to the CDUs, cooled like a water-side system. */
export const liquidFields: NumericField[] = [
  field(
    liq.chilledWaterSupplyC,
    'system.liquid.chilledWaterSupplyC',
    'temperature',
    'Facility-water supply to the CDUs; a class sets its highest value, the equipment maker may set less.',
  ),
  field(
    liq.chilledWaterDeltaTK,
    'system.liquid.chilledWaterDeltaTK',
    'temperatureDifference',
    'Facility-water rise across the CDUs; the return (supply + rise) is what heat reuse can take.',
  ),
  field(
    liq.approachK,
    'system.liquid.approachK',
    'temperatureDifference',
    'Between the outdoor dry-bulb (wet-bulb for a tower) and the facility-water supply.',
  ),
  field(
    liq.cduApproachK,
    'system.liquid.cduApproachK',
    'temperatureDifference',
    'The CDU’s approach: coolant to the cold plates is the facility supply plus this.',
  ),
  field(
    liq.evaporativeEffectiveness,
    'system.liquid.evaporativeEffectiveness',
    'ratio',
    'Spray or pads on the dry cooler; 0 means a dry cooler without wetting.',
  ),
  {
    ...field(
      liq.dryCoolerAirRiseK,
      'system.liquid.dryCoolerAirRiseK',
      'temperatureDifference',
      'Air temperature rise through the dry cooler at design; 10 K is common practice.',
    ),
    heatRejection: 'dry-cooler',
  },
  {
    ...field(
      liq.freezeProtectionWetBulbC,
      'system.liquid.freezeProtectionWetBulbC',
      'temperature',
      'Below this outdoor wet-bulb the tower runs dry with its basin heaters on.',
    ),
    heatRejection: 'cooling-tower',
  },
];

const reuse = heatReuseSchema.shape as unknown as Record<string, AnyNumber>;

export const heatReuseFields: NumericField[] = [
  field(reuse.thresholdC, 'system.heatReuse.thresholdC', 'temperature', 'Water temperature a heating network needs; 45 °C suits a low-temperature network.'),
  field(
    reuse.reusedShare,
    'system.heatReuse.reusedShare',
    'shareAsPercent',
    'How much of the available heat the network takes (your assumption, not a contract).',
  ),
];

/** A field of the single systems moved under a hybrid's air loop ("system.supplyAirC" → "system.air.supplyAirC"). */
export const asAirLoopField = (f: NumericField): NumericField => ({ ...f, path: f.path.replace(/^system\./, 'system.air.') });

/** The fields that apply to a system kind (and, for water-side, to its heat rejection). */
export function fieldsFor(fields: NumericField[], kind: SystemKind, heatRejection?: HeatRejection): NumericField[] {
  return fields.filter((f) => (!f.kinds || f.kinds.includes(kind)) && (!f.heatRejection || (kind === 'water-side' && f.heatRejection === heatRejection)));
}

const labelByKey = new Map([...systemFields, ...envelopeFields, ...energyFields].map((f) => [f.path.split('.').pop()!, f.label.toLowerCase()]));

/** A schema message in words: "dryBulbMinC must be below dryBulbMaxC" → "“Dry-bulb, lowest” must be below “dry-bulb, highest”." */
export function inWords(message: string): string {
  const text = message.replace(/\b[a-z]+(?:[A-Z][a-z]*)+\b/g, (key) => (labelByKey.has(key) ? `“${labelByKey.get(key)}”` : key));
  const capital = text.replace(/^(“?)(\p{Ll})/u, (_m, quote: string, letter: string) => quote + letter.toUpperCase());
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}
