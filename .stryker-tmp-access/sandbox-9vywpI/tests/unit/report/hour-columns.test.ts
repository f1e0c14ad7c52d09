// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { decodeHourColumns, encodeHourColumns, evenStepMs, hourTimestampsMs } from '../../../shared/report/hour-columns';
import { runHourColumns } from '../../../shared/report/run-hour-columns';

const header = {
  hours: 3,
  startMs: Date.UTC(2024, 0, 1),
  stepMs: 3_600_000,
  sitePressurePa: 101_325,
  modeNames: ['free', 'adiabatic', 'mechanical', 'no_data'],
};
const copy = (bytes: Uint8Array) => bytes.slice().buffer as ArrayBuffer;

describe('the hour-columns message', () => {
  it('reads back every column in place, each starting on an 8-byte boundary', () => {
    const modes = Uint8Array.of(0, 2, 3);
    const dryBulbC = Float32Array.of(21.5, Number.NaN, -3.25);
    const bytes = encodeHourColumns(header, { modes, dryBulbC });
    expect(String.fromCharCode(...bytes.subarray(0, 4))).toBe('THC1');
    const back = decodeHourColumns(copy(bytes));
    expect(back).toMatchObject({ hours: 3, startMs: header.startMs, stepMs: 3_600_000, sitePressurePa: 101_325 });
    expect(Array.from(back.columns.modes!)).toEqual([0, 2, 3]);
    expect(Array.from(back.columns.dryBulbC!)).toEqual([21.5, Number.NaN, -3.25]);
    // views, not copies: the decoded arrays share the message's buffer
    expect(back.columns.dryBulbC!.byteOffset % 8).toBe(0);
    expect(back.columns.modes!.byteOffset % 8).toBe(0);
    expect(hourTimestampsMs(back)).toEqual(Float64Array.of(header.startMs, header.startMs + 3_600_000, header.startMs + 7_200_000));
  });

  it('refuses a column of another length, naming it, and a message that is not one', () => {
    expect(() => encodeHourColumns(header, { modes: Uint8Array.of(0, 1) })).toThrow(/column modes has 2 values for 3 hours/);
    expect(() => decodeHourColumns(new Uint8Array(16).buffer)).toThrow(RangeError);
    const cut = encodeHourColumns(header, { dryBulbC: Float32Array.of(1, 2, 3) }).slice(0, -8);
    expect(() => decodeHourColumns(cut.buffer as ArrayBuffer)).toThrow(/dryBulbC lies outside/);
  });

  it('sends every timestamp when the hours are not evenly spaced', () => {
    expect(evenStepMs([0, 3_600_000, 7_200_000])).toBe(3_600_000);
    expect(evenStepMs([0, 3_600_000, 10_800_000])).toBeNull();
    const timestampsMs = Float64Array.of(0, 3_600_000, 10_800_000);
    const series = {
      timestampsMs,
      dryBulbC: Float64Array.of(20, 21, 22),
      humidity: { kind: 'relative-humidity-pct' as const, values: Float64Array.of(50, 50, 50) },
      pressurePa: null,
    };
    const message = decodeHourColumns(
      copy(runHourColumns({ series, elevationM: 0, modes: Uint8Array.of(0, 0, 0), mechanicalFraction: new Float64Array(3), humidified: null }, ['modes'])),
    );
    expect(message.stepMs).toBeNull();
    expect(Array.from(hourTimestampsMs(message))).toEqual([0, 3_600_000, 10_800_000]);
    // no station pressure: the standard atmosphere at sea level, 101 325 Pa (ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 3)
    expect(message.sitePressurePa).toBeCloseTo(101_325, 6);
  });
});
