/**
 * Inlet envelope presets from ASHRAE TC 9.9, "Thermal Guidelines for Data Processing
 * Environments". Every preset names its edition. None of these figures could be checked
 * against the guideline's text while writing this module, so every preset carries
 * `recalledFromMemory: true` and a note; a reviewer with the book should check them and
 * clear the flag.
 */
// @ts-nocheck


/** Maximum dry-bulb lowered by 1 K per `metresPerKelvin` above `aboveElevationM`. */
export interface AltitudeDerating {
  aboveElevationM: number;
  metresPerKelvin: number;
}

export interface EnvelopeLimits {
  dryBulbMinC: number;
  dryBulbMaxC: number;
  dewPointMinC: number;
  dewPointMaxC: number;
  rhMinPct: number;
  rhMaxPct: number;
  altitudeDerating?: AltitudeDerating;
}

export interface EnvelopePreset {
  id: string;
  label: string;
  edition: string;
  limits: EnvelopeLimits;
  recalledFromMemory: boolean;
  note: string;
}

const FIFTH_EDITION = 'ASHRAE TC 9.9 Thermal Guidelines for Data Processing Environments, 5th edition (2021)';
const FOURTH_EDITION = 'ASHRAE TC 9.9 Thermal Guidelines for Data Processing Environments, 4th edition (2015)';
const RECALLED = 'Limits and derating recalled from memory, not checked against the guideline text.';

// Derating rules as the guideline's table footnotes give them (recalled from memory):
// recommended range 1 °C per 300 m above 1800 m; A1 and A2 1 °C per 300 m above 900 m;
// A3 1 °C per 175 m above 900 m; A4 1 °C per 125 m above 900 m; H1 1 °C per 500 m above 900 m.
const RECOMMENDED_DERATING: AltitudeDerating = { aboveElevationM: 1800, metresPerKelvin: 300 };
const allowableDerating = (metresPerKelvin: number): AltitudeDerating => ({ aboveElevationM: 900, metresPerKelvin });

// The allowable classes share their low-humidity limit: −12 °C dew point and 8 % RH.
const allowable = (dryBulbMinC: number, dryBulbMaxC: number, dewPointMaxC: number, rhMaxPct: number, metresPerKelvin: number): EnvelopeLimits => ({
  dryBulbMinC,
  dryBulbMaxC,
  dewPointMinC: -12,
  dewPointMaxC,
  rhMinPct: 8,
  rhMaxPct,
  altitudeDerating: allowableDerating(metresPerKelvin),
});

const recommended = (rhMaxPct: number): EnvelopeLimits => ({
  dryBulbMinC: 18,
  dryBulbMaxC: 27,
  dewPointMinC: -9,
  dewPointMaxC: 15,
  rhMinPct: 0,
  rhMaxPct,
  altitudeDerating: RECOMMENDED_DERATING,
});

export const ENVELOPE_PRESETS: readonly EnvelopePreset[] = [
  {
    id: 'ashrae-2021-recommended',
    label: 'Recommended (2021)',
    edition: FIFTH_EDITION,
    limits: recommended(70),
    recalledFromMemory: true,
    note: `18–27 °C; −9 °C dew point to 15 °C dew point and 70 % RH. ${RECALLED}`,
  },
  {
    id: 'ashrae-2021-recommended-50rh',
    label: 'Recommended, 50 % RH (2021)',
    edition: FIFTH_EDITION,
    limits: recommended(50),
    recalledFromMemory: true,
    note: `The 2021 recommended range with its upper RH at 50 %, for rooms where gaseous pollutants raise corrosion risk. ${RECALLED}`,
  },
  {
    id: 'ashrae-2015-recommended-60rh',
    label: 'Recommended, 60 % RH (2015)',
    edition: FOURTH_EDITION,
    limits: recommended(60),
    recalledFromMemory: true,
    note: `18–27 °C; −9 °C dew point to 15 °C dew point and 60 % RH. ${RECALLED}`,
  },
  {
    id: 'ashrae-2021-a1',
    label: 'Allowable A1 (2021)',
    edition: FIFTH_EDITION,
    limits: allowable(15, 32, 17, 80, 300),
    recalledFromMemory: true,
    note: `15–32 °C; −12 °C dew point and 8 % RH to 17 °C dew point and 80 % RH. ${RECALLED}`,
  },
  {
    id: 'ashrae-2021-a2',
    label: 'Allowable A2 (2021)',
    edition: FIFTH_EDITION,
    limits: allowable(10, 35, 21, 80, 300),
    recalledFromMemory: true,
    note: `10–35 °C; −12 °C dew point and 8 % RH to 21 °C dew point and 80 % RH. ${RECALLED}`,
  },
  {
    id: 'ashrae-2021-a3',
    label: 'Allowable A3 (2021)',
    edition: FIFTH_EDITION,
    limits: allowable(5, 40, 24, 85, 175),
    recalledFromMemory: true,
    note: `5–40 °C; −12 °C dew point and 8 % RH to 24 °C dew point and 85 % RH. ${RECALLED}`,
  },
  {
    id: 'ashrae-2021-a4',
    label: 'Allowable A4 (2021)',
    edition: FIFTH_EDITION,
    limits: allowable(5, 45, 24, 90, 125),
    recalledFromMemory: true,
    note: `5–45 °C; −12 °C dew point and 8 % RH to 24 °C dew point and 90 % RH. ${RECALLED}`,
  },
  {
    id: 'ashrae-2021-h1',
    label: 'Allowable H1, high-density (2021)',
    edition: FIFTH_EDITION,
    limits: allowable(5, 25, 17, 80, 500),
    recalledFromMemory: true,
    note: `5–25 °C; −12 °C dew point and 8 % RH to 17 °C dew point and 80 % RH (its recommended range is 18–22 °C). ${RECALLED}`,
  },
];

/** The preset with this id, or undefined. */
export function findEnvelopePreset(id: string): EnvelopePreset | undefined {
  return ENVELOPE_PRESETS.find((preset) => preset.id === id);
}

/**
 * Maximum inlet dry-bulb (°C) after altitude derating: lowered by 1 K for every
 * `metresPerKelvin` of site elevation above `aboveElevationM`, never raised below it.
 * Rule as the ASHRAE TC 9.9 guideline's table footnotes state it (recalled from memory).
 */
export function deratedDryBulbMaxC(dryBulbMaxC: number, elevationM: number, derating: AltitudeDerating | undefined): number {
  if (!Number.isFinite(dryBulbMaxC)) throw new RangeError(`dryBulbMaxC must be a finite number, got ${dryBulbMaxC}`);
  if (!Number.isFinite(elevationM)) throw new RangeError(`elevationM must be a finite number, got ${elevationM}`);
  if (!derating) return dryBulbMaxC;
  if (!(derating.metresPerKelvin > 0)) throw new RangeError(`metresPerKelvin must be above 0, got ${derating.metresPerKelvin}`);
  const excessM = Math.max(0, elevationM - derating.aboveElevationM);
  return dryBulbMaxC - excessM / derating.metresPerKelvin;
}
