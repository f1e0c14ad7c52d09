/**
 * Column blobs for SQLite: one typed array per quantity, stored as a 16-byte header and the raw
 * little-endian elements. Decoding copies into a fresh, aligned buffer (a blob read from SQLite
 * may start at any byte offset), so the result can be handed to a worker with transferList.
 *
 * Layout: bytes 0–3 "TMC1", byte 4 element type (1 = float64, 2 = uint8), bytes 5–7 zero,
 * bytes 8–11 element count (uint32 LE), bytes 12–15 zero, then the elements.
 */
// @ts-nocheck


import type { HumidityKind } from '../psychrometrics';
import type { ClimateSeries } from './types';

const MAGIC = [0x54, 0x4d, 0x43, 0x31]; // "TMC1"
const HEADER_BYTES = 16;
const FLOAT64 = 1;
const UINT8 = 2;
const LITTLE_ENDIAN = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;

export type ColumnArray = Float64Array | Uint8Array;

function swapBytes(bytes: Uint8Array, width: number): void {
  for (let i = 0; i < bytes.length; i += width) bytes.subarray(i, i + width).reverse();
}

/** A typed column as a self-describing blob (a Uint8Array; Buffer.from(blob.buffer) gives a Buffer without copying). */
export function encodeColumn(values: ColumnArray): Uint8Array {
  const isFloat = values instanceof Float64Array;
  if (!isFloat && !(values instanceof Uint8Array)) throw new RangeError('values must be a Float64Array or a Uint8Array');
  const blob = new Uint8Array(HEADER_BYTES + values.byteLength);
  blob.set(MAGIC, 0);
  blob[4] = isFloat ? FLOAT64 : UINT8;
  new DataView(blob.buffer).setUint32(8, values.length, true);
  const body = blob.subarray(HEADER_BYTES);
  body.set(new Uint8Array(values.buffer, values.byteOffset, values.byteLength));
  if (isFloat && !LITTLE_ENDIAN) swapBytes(body, 8);
  return blob;
}

function header(blob: Uint8Array): { type: number; length: number } {
  if (!(blob instanceof Uint8Array)) throw new RangeError('blob must be a Uint8Array or a Buffer');
  if (blob.length < HEADER_BYTES || MAGIC.some((b, i) => blob[i] !== b)) throw new RangeError('blob is not an encoded climate column');
  const type = blob[4];
  const length = new DataView(blob.buffer, blob.byteOffset, blob.byteLength).getUint32(8, true);
  const width = type === FLOAT64 ? 8 : type === UINT8 ? 1 : 0;
  if (width === 0) throw new RangeError(`blob has an unknown element type ${type}`);
  if (blob.length !== HEADER_BYTES + length * width) throw new RangeError('blob length does not match its element count');
  return { type, length };
}

/** The typed array of a blob made by encodeColumn (a fresh copy). Throws RangeError on a foreign or cut blob. */
export function decodeColumn(blob: Uint8Array): ColumnArray {
  const { type, length } = header(blob);
  const body = blob.subarray(HEADER_BYTES);
  if (type === UINT8) return new Uint8Array(body);
  const bytes = new Uint8Array(length * 8);
  bytes.set(body);
  if (!LITTLE_ENDIAN) swapBytes(bytes, 8);
  return new Float64Array(bytes.buffer);
}

/** decodeColumn for a column known to be float64. */
export function decodeFloat64Column(blob: Uint8Array): Float64Array {
  const column = decodeColumn(blob);
  if (!(column instanceof Float64Array)) throw new RangeError('blob holds a uint8 column, not float64');
  return column;
}

/** decodeColumn for a column known to be uint8 (the hour flags). */
export function decodeUint8Column(blob: Uint8Array): Uint8Array {
  const column = decodeColumn(blob);
  if (column instanceof Float64Array) throw new RangeError('blob holds a float64 column, not uint8');
  return column;
}

/** A stored climate series as its column blobs, as read from the database: cheap to read, decoded where it is used. */
export interface EncodedClimateSeries {
  humidityKind: HumidityKind;
  timestampsMs: Uint8Array;
  dryBulbC: Uint8Array;
  humidity: Uint8Array;
  pressurePa: Uint8Array | null;
  flags: Uint8Array;
}

/** The typed arrays of a stored series (each a fresh copy, so they can be transferred). */
export function decodeClimateSeries(encoded: EncodedClimateSeries): ClimateSeries {
  return {
    timestampsMs: decodeFloat64Column(encoded.timestampsMs),
    dryBulbC: decodeFloat64Column(encoded.dryBulbC),
    humidity: { kind: encoded.humidityKind, values: decodeFloat64Column(encoded.humidity) },
    pressurePa: encoded.pressurePa ? decodeFloat64Column(encoded.pressurePa) : null,
    flags: decodeUint8Column(encoded.flags),
  };
}
