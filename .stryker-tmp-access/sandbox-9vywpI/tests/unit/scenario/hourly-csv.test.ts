/**
 * The byte-level hourly CSV writer: numbers as JavaScript's own toFixed would write them, the
 * exact column contract, empty cells for missing values.
 */
// @ts-nocheck

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { HOURLY_CSV_COLUMNS, MODE, writeFixed, writeHourlyCsv, type HourlyCsvInput } from '../../../shared/scenario';
import { hourlyJson } from '../../../shared/report/hourly-json';

const decoder = new TextDecoder();

function fixed(x: number, decimals: number): string {
  const buf = new Uint8Array(64);
  return decoder.decode(buf.subarray(0, writeFixed(buf, 0, x, decimals)));
}

function csvText(input: HourlyCsvInput): string {
  const parts: string[] = [];
  writeHourlyCsv(input, (bytes) => parts.push(decoder.decode(bytes)));
  return parts.join('');
}

describe('writeFixed', () => {
  it('writes what Number.prototype.toFixed writes, away from half-way ties', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: 0, max: 4 }), (x, decimals) => {
        const scaled = Math.abs(x) * 10 ** decimals;
        fc.pre(Math.abs(scaled - Math.floor(scaled) - 0.5) > 1e-6); // toFixed and Math.round differ on exact binary ties
        const expected = x.toFixed(decimals);
        expect(fixed(x, decimals)).toBe(/^-0\.?0*$/.test(expected) ? expected.slice(1) : expected);
      }),
    );
  });

  it('writes nothing for NaN and no minus sign for a value that rounds to zero', () => {
    expect(fixed(Number.NaN, 2)).toBe('');
    expect(fixed(-0.0004, 3)).toBe('0.000');
    expect(fixed(-12.345678, 2)).toBe('-12.35');
    expect(fixed(1e20, 2)).toBe('100000000000000000000.00');
  });
});

describe('writeHourlyCsv', () => {
  it('writes the contract columns, one row per hour in order, empty cells where there is no data', () => {
    const n = 70_000; // more than one chunk
    const t0 = Date.UTC(1999, 11, 31, 22);
    const input: HourlyCsvInput = {
      timestampsMs: Float64Array.from({ length: n }, (_, i) => t0 + i * 3_600_000),
      modes: Uint8Array.from({ length: n }, (_, i) => i % 4),
      dryBulbC: Float64Array.from({ length: n }, (_, i) => (i % 4 === MODE.noData ? Number.NaN : -5.5 + (i % 40))),
      wetBulbC: new Float64Array(n).fill(-1.234),
      dewPointC: new Float64Array(n).fill(-3),
      rhPct: new Float64Array(n).fill(55.555),
      humidityRatio: new Float64Array(n).fill(0.0123456),
      enthalpyKJPerKg: new Float64Array(n).fill(42.1),
      mechanicalFraction: Float64Array.from({ length: n }, (_, i) => (i % 4 === MODE.mechanical ? 0.25 : 0)),
      humidified: Uint8Array.from({ length: n }, (_, i) => (i % 8 === 0 ? 1 : 0)),
      // UTC−07:00 (a fixed-offset site): 1999-12-31 22:00 UTC is 15:00 on its standard time
      utcOffsetMinutes: -420,
    };
    const lines = csvText(input).split('\n');
    expect(lines[0]).toBe(HOURLY_CSV_COLUMNS.join(','));
    expect(lines[0]).toBe(
      'timestamp,mode,dry_bulb_c,wet_bulb_c,dew_point_c,relative_humidity_pct,humidity_ratio_gkg,enthalpy_kjkg,mechanical_fraction,humidified,local_standard_time',
    );
    expect(lines).toHaveLength(n + 2); // header, n rows, final empty string after the last newline
    expect(lines[1]).toBe('1999-12-31T22:00Z,free,-5.50,-1.23,-3.00,55.56,12.346,42.10,0.000,1,1999-12-31T15:00');
    expect(lines[3]).toBe('2000-01-01T00:00Z,mechanical,-3.50,-1.23,-3.00,55.56,12.346,42.10,0.250,0,1999-12-31T17:00');
    expect(lines[4]).toBe('2000-01-01T01:00Z,no_data,,-1.23,-3.00,55.56,12.346,42.10,,,1999-12-31T18:00');
    // 2000-01-01 07:00 UTC is midnight of the new year at UTC−07:00
    expect(lines[10]).toBe('2000-01-01T07:00Z,adiabatic,3.50,-1.23,-3.00,55.56,12.346,42.10,0.000,0,2000-01-01T00:00');
    const last = lines[n];
    expect(last.startsWith(new Date(t0 + (n - 1) * 3_600_000).toISOString().slice(0, 16))).toBe(true);
  });

  it('leaves the humidified column empty for a run made before engine 2.0.0 (no stored flags)', () => {
    const one = Float64Array.of(1);
    const lines = csvText({
      timestampsMs: Float64Array.of(0),
      modes: Uint8Array.of(MODE.free),
      dryBulbC: one,
      wetBulbC: one,
      dewPointC: one,
      rhPct: one,
      humidityRatio: one,
      enthalpyKJPerKg: one,
      mechanicalFraction: Float64Array.of(0),
      humidified: null,
      utcOffsetMinutes: 0,
    }).split('\n');
    expect(lines[1]).toBe('1970-01-01T00:00Z,free,1.00,1.00,1.00,1.00,1000.000,1.00,0.000,,1970-01-01T00:00');
  });

  it('appends liquid_mode, air_mode and liquid_mechanical_fraction after the other columns for a hybrid run', () => {
    const one = Float64Array.of(1, 1);
    const input: HourlyCsvInput = {
      timestampsMs: Float64Array.of(0, 3_600_000),
      modes: Uint8Array.of(MODE.mechanical, MODE.noData),
      dryBulbC: one,
      wetBulbC: one,
      dewPointC: one,
      rhPct: one,
      humidityRatio: one,
      enthalpyKJPerKg: one,
      mechanicalFraction: Float64Array.of(0.5, 0),
      humidified: Uint8Array.of(0, 0),
      utcOffsetMinutes: 0,
      loops: {
        liquidModes: Uint8Array.of(MODE.free, MODE.noData),
        airModes: Uint8Array.of(MODE.mechanical, MODE.noData),
        liquidMechanicalFraction: Float64Array.of(0, 0),
      },
    };
    const lines = csvText(input).split('\n');
    expect(lines[0]).toBe(`${HOURLY_CSV_COLUMNS.join(',')},liquid_mode,air_mode,liquid_mechanical_fraction`);
    expect(lines[1]).toBe('1970-01-01T00:00Z,mechanical,1.00,1.00,1.00,1.00,1000.000,1.00,0.500,0,1970-01-01T00:00,free,mechanical,0.000');
    expect(lines[2]).toBe('1970-01-01T01:00Z,no_data,1.00,1.00,1.00,1.00,1000.000,1.00,,,1970-01-01T01:00,no_data,no_data,');
    // The JSON download carries the same columns.
    const json = hourlyJson(input);
    expect(json.columns.slice(-3)).toEqual(['liquid_mode', 'air_mode', 'liquid_mechanical_fraction']);
    expect(json.hours.liquid_mode).toEqual(['free', 'no_data']);
    expect(json.hours.liquid_mechanical_fraction).toEqual([0, null]);
  });

  it('refuses columns of different lengths, naming the column', () => {
    const one = Float64Array.of(1);
    expect(() =>
      writeHourlyCsv(
        {
          timestampsMs: one,
          modes: Uint8Array.of(0),
          dryBulbC: one,
          wetBulbC: one,
          dewPointC: one,
          rhPct: new Float64Array(2),
          humidityRatio: one,
          enthalpyKJPerKg: one,
          mechanicalFraction: one,
          humidified: null,
          utcOffsetMinutes: 0,
        },
        () => {},
      ),
    ).toThrow(/rhPct has 2 hours/);
  });
});
