/**
 * A finished run's hours as typed columns in one binary message, for the run page and its charts: the engine's
 * own outdoor states (the run's climate series at the run's elevation, shared/scenario outdoorStates) beside the
 * stored modes. No object per hour, no timestamps when the hours lie on a regular grid.
 *
 * Layout (all numbers little-endian):
 *   bytes 0–3    ASCII "THC1"
 *   bytes 4–7    uint32: byte length H of the JSON header
 *   bytes 8…8+H  the header, UTF-8 JSON (HourColumnsHeader): hours, startMs, stepMs, sitePressurePa, modeNames, the
 *                dry-bulb bins when asked for, and
 *                for each column its name, type ('float64' | 'float32' | 'uint8'), byte offset from the start of the
 *                message and element count (= hours)
 *   then each column's elements at its offset; every offset is a multiple of 8, so a column is read in place as a
 *   typed-array view, without a copy.
 * Hour i is at startMs + i × stepMs (UTC ms). When the hours are not evenly spaced, stepMs is null and a float64
 * column `timestampsMs` carries every hour's time. Missing values are NaN in float columns; mode 3 means no data.
 */
// @ts-nocheck


import type { BinTable } from './dry-bulb-bins';

const MAGIC = [0x54, 0x48, 0x43, 0x31]; // "THC1"
const PREFIX_BYTES = 8;
const ALIGN = 8;

export type HourColumnType = 'float64' | 'float32' | 'uint8';

/** Every column the server can send, with its element type. Units are in the names; see HOUR_COLUMN_NOTES. */
export const HOUR_COLUMN_TYPES = {
  modes: 'uint8',
  humidified: 'uint8',
  flags: 'uint8',
  dryBulbC: 'float32',
  humidityRatio: 'float32',
  wetBulbC: 'float32',
  dewPointC: 'float32',
  rhPct: 'float32',
  enthalpyKJPerKg: 'float32',
  pressurePa: 'float32',
  mechanicalFraction: 'float32',
} as const satisfies Record<string, HourColumnType>;

export type HourColumnName = keyof typeof HOUR_COLUMN_TYPES;
export const HOUR_COLUMN_NAMES = Object.keys(HOUR_COLUMN_TYPES) as HourColumnName[];

/** What each column holds, for the API's readers. */
export const HOUR_COLUMN_NOTES: Record<HourColumnName, string> = {
  modes: 'mode code per hour: 0 free cooling, 1 adiabatic assist, 2 mechanical, 3 no data',
  humidified: '1 for a free-cooling hour in which the media only add moisture, else 0; all 0 for runs before engine 2.0.0',
  flags: 'the climate series flags per hour (bitmask, shared/climate HOUR_FLAG)',
  dryBulbC: 'outdoor dry-bulb, °C',
  humidityRatio: 'outdoor humidity ratio, kg/kg dry air',
  wetBulbC: 'outdoor wet-bulb, °C',
  dewPointC: 'outdoor dew point over water, °C',
  rhPct: 'outdoor relative humidity over water, %',
  enthalpyKJPerKg: 'outdoor enthalpy, kJ/kg dry air',
  pressurePa: 'the pressure the engine used for the hour (station, or the standard atmosphere at the elevation), Pa',
  mechanicalFraction: 'share of the cooling load on compressors, 0–1',
};

export interface HourColumnsHeader {
  hours: number;
  /** UTC ms of the first hour; null for a run without hours. */
  startMs: number | null;
  /** ms between hours (3 600 000); null when the hours are not evenly spaced (then a timestampsMs column is sent). */
  stepMs: number | null;
  /** One pressure for charts, Pa: the mean station pressure where the file has one, else the standard atmosphere at the elevation. */
  sitePressurePa: number;
  modeNames: readonly string[];
  /**
   * Asked for with `bins`: hours per mode and the mean coincident wet-bulb in dry-bulb bins, from the full-precision
   * states, so a page that shows only the bins needs no wet-bulb column.
   */
  dryBulbBins?: BinTable & { widthK: number; originC: number };
  columns: Array<{ name: string; type: HourColumnType; offset: number; length: number }>;
}

export type HourColumnArray = Float64Array | Float32Array | Uint8Array;

export interface HourColumns extends Omit<HourColumnsHeader, 'columns'> {
  columns: Partial<Record<HourColumnName | 'timestampsMs', HourColumnArray>>;
}

const width: Record<HourColumnType, number> = { float64: 8, float32: 4, uint8: 1 };
const typeOf = (a: HourColumnArray): HourColumnType => (a instanceof Float64Array ? 'float64' : a instanceof Float32Array ? 'float32' : 'uint8');
const alignUp = (n: number) => Math.ceil(n / ALIGN) * ALIGN;
const LITTLE_ENDIAN = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;

/** The message for `columns`, each with `hours` elements. Throws RangeError for a column of another length. */
export function encodeHourColumns(header: Omit<HourColumnsHeader, 'columns'>, columns: HourColumns['columns']): Uint8Array {
  if (!LITTLE_ENDIAN) throw new RangeError('hour columns are written on little-endian machines only');
  const entries = Object.entries(columns) as Array<[string, HourColumnArray]>;
  for (const [name, values] of entries) {
    if (values.length !== header.hours) throw new RangeError(`column ${name} has ${values.length} values for ${header.hours} hours`);
  }
  // Offsets depend on the header's length and the header holds the offsets: lay out with room for the longest
  // offsets, then pad the header with spaces to the room taken.
  const layout = (bodyStart: number) => {
    let at = bodyStart;
    return entries.map(([name, values]) => {
      const column = { name, type: typeOf(values), offset: at, length: values.length };
      at = alignUp(at + values.byteLength);
      return column;
    });
  };
  const encoder = new TextEncoder();
  const draft = encoder.encode(JSON.stringify({ ...header, columns: layout(2 ** 31) }));
  const bodyStart = alignUp(PREFIX_BYTES + draft.length);
  const described = layout(bodyStart);
  const text = encoder.encode(JSON.stringify({ ...header, columns: described }));
  const end = described.length ? alignUp(described[described.length - 1].offset + entries[entries.length - 1][1].byteLength) : bodyStart;
  const out = new Uint8Array(end);
  out.set(MAGIC, 0);
  new DataView(out.buffer).setUint32(4, bodyStart - PREFIX_BYTES, true);
  out.fill(0x20, PREFIX_BYTES, bodyStart);
  out.set(text, PREFIX_BYTES);
  entries.forEach(([, values], k) => out.set(new Uint8Array(values.buffer, values.byteOffset, values.byteLength), described[k].offset));
  return out;
}

/** Reads a message made by encodeHourColumns; columns are views into `buffer`. Throws RangeError for anything else. */
export function decodeHourColumns(buffer: ArrayBuffer): HourColumns {
  const bytes = new Uint8Array(buffer);
  if (bytes.length < PREFIX_BYTES || MAGIC.some((b, i) => bytes[i] !== b)) throw new RangeError('not an hour-columns message');
  const headerBytes = new DataView(buffer).getUint32(4, true);
  if (PREFIX_BYTES + headerBytes > bytes.length) throw new RangeError('hour-columns header runs past the message');
  const header = JSON.parse(new TextDecoder().decode(bytes.subarray(PREFIX_BYTES, PREFIX_BYTES + headerBytes))) as HourColumnsHeader;
  const columns: HourColumns['columns'] = {};
  for (const c of header.columns) {
    if (c.offset % width[c.type] !== 0 || c.offset + c.length * width[c.type] > bytes.length) {
      throw new RangeError(`hour column ${c.name} lies outside the message`);
    }
    const View = c.type === 'float64' ? Float64Array : c.type === 'float32' ? Float32Array : Uint8Array;
    columns[c.name as HourColumnName] = new View(buffer, c.offset, c.length);
  }
  const { columns: _described, ...rest } = header;
  return { ...rest, columns };
}

/** Every hour's time, UTC ms: from startMs and stepMs, or the timestampsMs column of an uneven series. */
export function hourTimestampsMs(columns: HourColumns): Float64Array {
  const given = columns.columns.timestampsMs;
  if (given) return Float64Array.from(given);
  const out = new Float64Array(columns.hours);
  const start = columns.startMs ?? 0;
  const step = columns.stepMs ?? 0;
  for (let i = 0; i < out.length; i++) out[i] = start + i * step;
  return out;
}

/** The ms between consecutive hours when all are equal, else null. */
export function evenStepMs(timestampsMs: ArrayLike<number>): number | null {
  if (timestampsMs.length < 2) return 3_600_000;
  const step = timestampsMs[1] - timestampsMs[0];
  for (let i = 2; i < timestampsMs.length; i++) if (timestampsMs[i] - timestampsMs[i - 1] !== step) return null;
  return step;
}
