/** Column blobs: exact round trips, including NaN and the hour flags, from any byte offset. */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { decodeColumn, decodeFloat64Column, decodeUint8Column, encodeColumn } from '../../../shared/climate';

describe('encodeColumn / decodeColumn', () => {
  it('round-trips float64 values bit for bit, NaN and −0 included', () => {
    const values = new Float64Array([1.5, -0, NaN, Number.MAX_VALUE, -273.15, 1e-300, Infinity]);
    const blob = encodeColumn(values);
    expect(blob.length).toBe(16 + 8 * values.length);
    const back = decodeFloat64Column(blob);
    expect(new Uint8Array(back.buffer)).toEqual(new Uint8Array(values.buffer));
  });

  it('round-trips the uint8 flags', () => {
    const flags = new Uint8Array([0, 1, 2, 2, 0]);
    expect(Array.from(decodeUint8Column(encodeColumn(flags)))).toEqual([0, 1, 2, 2, 0]);
  });

  it('decodes a blob that starts at an odd offset of a larger buffer, as a driver may hand it over', () => {
    const blob = encodeColumn(new Float64Array([3, 4, 5]));
    const host = new Uint8Array(blob.length + 3);
    host.set(blob, 3);
    const view = Buffer.from(host.buffer, 3, blob.length);
    expect(Array.from(decodeColumn(view))).toEqual([3, 4, 5]);
  });

  it('encodes a subarray view, not its whole buffer', () => {
    const whole = new Float64Array([1, 2, 3, 4]);
    expect(Array.from(decodeFloat64Column(encodeColumn(whole.subarray(1, 3))))).toEqual([2, 3]);
  });

  it('refuses foreign, cut or mistyped blobs with a RangeError', () => {
    const blob = encodeColumn(new Float64Array([1, 2]));
    expect(() => decodeColumn(new Uint8Array([1, 2, 3]))).toThrow(RangeError);
    expect(() => decodeColumn(blob.subarray(0, blob.length - 1))).toThrow(RangeError);
    expect(() => decodeUint8Column(blob)).toThrow(RangeError);
    expect(() => encodeColumn([1, 2] as unknown as Float64Array)).toThrow(RangeError);
  });
});
