/**
 * The hourly results as JSON, column-wise: the same columns, units and rounding as the hourly CSV
 * (shared/scenario/hourly-csv.ts), so either download reads the same. A missing value is null.
 */
// @ts-nocheck

import { MODE, MODE_NAMES } from '../scenario/classify';
import { HOURLY_CSV_COLUMNS, HYBRID_HOURLY_CSV_COLUMNS, type HourlyCsvInput } from '../scenario/hourly-csv';
import { standardTimeIso } from '../time-zone';

export type HourlyColumn = (typeof HOURLY_CSV_COLUMNS)[number];
export type HybridHourlyColumn = (typeof HYBRID_HOURLY_CSV_COLUMNS)[number];

export interface HourlyJson {
  columns: readonly (HourlyColumn | HybridHourlyColumn)[];
  units: Partial<Record<HourlyColumn | HybridHourlyColumn, string>>;
  /** One array per column, one entry per hour in series order (UTC). */
  hours: { timestamp: string[]; mode: string[]; local_standard_time: string[] } & Record<
    Exclude<HourlyColumn, 'timestamp' | 'mode' | 'local_standard_time'>,
    (number | null)[]
  > & {
      /** Hybrid runs only. */
      liquid_mode?: string[];
      air_mode?: string[];
      liquid_mechanical_fraction?: (number | null)[];
    };
}

export const hybridHourlyUnits: Record<HybridHourlyColumn, string> = {
  liquid_mode: 'the liquid loop: free | adiabatic | mechanical | no_data',
  air_mode: 'the air loop: free | adiabatic | mechanical | no_data',
  liquid_mechanical_fraction: "share of the liquid loop's load on compressors, 0–1",
};

export const hourlyUnits: Record<HourlyColumn, string> = {
  timestamp: 'ISO 8601, UTC',
  mode: 'free | adiabatic | mechanical | no_data',
  dry_bulb_c: '°C',
  wet_bulb_c: '°C',
  dew_point_c: '°C',
  relative_humidity_pct: '%',
  humidity_ratio_gkg: 'g/kg dry air',
  enthalpy_kjkg: 'kJ/kg dry air',
  mechanical_fraction: 'share of the cooling load on compressors, 0–1',
  humidified: '1 for free cooling with humidification, else 0; empty for runs before engine 2.0.0',
  local_standard_time: 'ISO 8601, site standard time (no daylight saving), no offset suffix',
};

function column(values: Float64Array, decimals: number, scale = 1): (number | null)[] {
  const factor = 10 ** decimals;
  // Half-way cases away from zero, as the CSV writer rounds them.
  return Array.from(values, (v) => (Number.isFinite(v) ? (Math.sign(v) * Math.round(Math.abs(v * scale) * factor)) / factor || 0 : null));
}

export function hourlyJson(input: HourlyCsvInput): HourlyJson {
  const n = input.modes.length;
  const mechanical = column(input.mechanicalFraction, 3);
  for (let i = 0; i < n; i++) if (input.modes[i] === MODE.noData) mechanical[i] = null;
  const loops = input.loops ?? null;
  const loopHours = loops
    ? {
        liquid_mode: Array.from(loops.liquidModes, (m) => MODE_NAMES[m] ?? 'no_data'),
        air_mode: Array.from(loops.airModes, (m) => MODE_NAMES[m] ?? 'no_data'),
        liquid_mechanical_fraction: column(loops.liquidMechanicalFraction, 3).map((v, i) => (input.modes[i] === MODE.noData ? null : v)),
      }
    : {};
  return {
    columns: loops ? [...HOURLY_CSV_COLUMNS, ...HYBRID_HOURLY_CSV_COLUMNS] : HOURLY_CSV_COLUMNS,
    units: loops ? { ...hourlyUnits, ...hybridHourlyUnits } : hourlyUnits,
    hours: {
      timestamp: Array.from(input.timestampsMs, (ms) => new Date(ms).toISOString().slice(0, 16) + 'Z'),
      mode: Array.from(input.modes, (m) => MODE_NAMES[m] ?? 'no_data'),
      dry_bulb_c: column(input.dryBulbC, 2),
      wet_bulb_c: column(input.wetBulbC, 2),
      dew_point_c: column(input.dewPointC, 2),
      relative_humidity_pct: column(input.rhPct, 2),
      humidity_ratio_gkg: column(input.humidityRatio, 3, 1000),
      enthalpy_kjkg: column(input.enthalpyKJPerKg, 2),
      mechanical_fraction: mechanical,
      humidified: Array.from(input.modes, (m, i) => (m === MODE.noData || input.humidified === null ? null : input.humidified[i] === 1 ? 1 : 0)),
      local_standard_time: Array.from(input.timestampsMs, (ms) => standardTimeIso(ms, input.utcOffsetMinutes)),
      ...loopHours,
    },
  };
}
