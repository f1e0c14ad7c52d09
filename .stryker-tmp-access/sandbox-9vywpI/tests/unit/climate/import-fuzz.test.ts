/**
 * Whatever arrives, importClimateText returns a report and never throws; when it accepts a file,
 * the series keeps its invariants (strictly hourly, flags consistent with the values).
 */
// @ts-nocheck

import fc from 'fast-check';
import { describe, it } from 'vitest';
import { decodeClimateBytes, importClimateText } from '../../../shared/climate';
import { checkResult } from '../../support/climate-invariants';

const cell = fc.oneof(
  fc.constantFrom('', 'NA', '-', '"', '""', '"a,b"', '24:00', '2021-02-29T00:00Z', '9999', '-0', '1e400', '\u0000', '°C', 'Temp (F)'),
  fc.double({ noNaN: false }).map(String),
  fc.integer({ min: -100, max: 3000 }).map(String),
  fc.date({ min: new Date(Date.UTC(1000, 0, 1)), max: new Date(Date.UTC(9999, 0, 1)), noInvalidDate: true }).map((d) => d.toISOString()),
  fc.string({ maxLength: 12 }),
);
const headerCell = fc.constantFrom(
  'timestamp',
  'dry_bulb_c',
  'relative_humidity_pct',
  'dew_point_c',
  'wet_bulb_c',
  'humidity_ratio_gkg',
  'pressure_kpa',
  'Year',
  'Month',
  'Day',
  'Hour',
  'Date',
  'Time',
  'Temp (F)',
  'RH %',
  'Station Pressure (inHg)',
  'x',
  '',
);
const csvLike = fc
  .record({
    delimiter: fc.constantFrom(',', ';', '\t'),
    newline: fc.constantFrom('\n', '\r\n', '\r'),
    header: fc.array(headerCell, { minLength: 0, maxLength: 7 }),
    rows: fc.array(fc.array(cell, { minLength: 0, maxLength: 7 }), { maxLength: 30 }),
    comment: fc.boolean(),
    bom: fc.boolean(),
  })
  .map(
    ({ delimiter, newline, header, rows, comment, bom }) =>
      (bom ? '\ufeff' : '') + (comment ? `# synthetic${newline}` : '') + [header, ...rows].map((r) => r.join(delimiter)).join(newline),
  );

/** A plausible hourly file with random damage: the path where most of the importer runs. */
const damagedHourly = fc
  .record({
    hours: fc.integer({ min: 1, max: 60 }),
    drop: fc.array(fc.nat({ max: 59 }), { maxLength: 20 }),
    spoil: fc.array(fc.tuple(fc.nat({ max: 59 }), fc.nat({ max: 2 }), cell), { maxLength: 10 }),
    shuffle: fc.boolean(),
    maxGapHours: fc.integer({ min: 0, max: 12 }),
    timeZone: fc.constantFrom('UTC', 'Europe/Warsaw', 'America/Phoenix'),
  })
  .map(({ hours, drop, spoil, shuffle, maxGapHours, timeZone }) => {
    const rows: string[][] = [];
    for (let h = 0; h < hours; h++) {
      if (drop.includes(h)) continue;
      const t = new Date(Date.UTC(2021, 9, 30, h)).toISOString().slice(0, 16);
      rows.push([t, (10 + Math.sin(h)).toFixed(1), (70 + 10 * Math.cos(h)).toFixed(1)]);
    }
    for (const [r, c, value] of spoil) if (rows[r]) rows[r][c] = value;
    if (shuffle) rows.reverse();
    const text = `timestamp,dry_bulb_c,relative_humidity_pct\n${rows.map((r) => r.join(',')).join('\n')}\n`;
    return { text, options: { maxGapHours, timeZone } };
  });

describe('importClimateText never throws', () => {
  it('on random bytes decoded as an upload would be', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 2000 }), (bytes) => {
        checkResult(importClimateText(decodeClimateBytes(bytes)));
      }),
      { numRuns: 300 },
    );
  }, 30_000);

  it('on random CSV-like text', () => {
    fc.assert(
      fc.property(csvLike, (text) => {
        checkResult(importClimateText(text));
      }),
      { numRuns: 500 },
    );
  }, 30_000);

  it('on damaged hourly files, keeping the series invariants', () => {
    fc.assert(
      fc.property(damagedHourly, ({ text, options }) => {
        checkResult(importClimateText(text, options));
      }),
      { numRuns: 300 },
    );
  }, 30_000);

  it('on arguments that are not what the types say', () => {
    const odd = [undefined, null, 42, {}, [], new Uint8Array(3)] as unknown[];
    for (const value of odd) {
      checkResult(importClimateText(value as string));
      checkResult(importClimateText('timestamp,dry_bulb_c,relative_humidity_pct\n2021-01-01T00:00Z,1,50\n', value as never));
      checkResult(
        importClimateText('timestamp,dry_bulb_c,relative_humidity_pct\n2021-01-01T00:00Z,1,50\n', {
          mapping: value as never,
          maxGapHours: value as never,
          timeZone: value as never,
          site: value as never,
        }),
      );
    }
  });
});
