/**
 * The published-format readers under random damage, as import-fuzz.test.ts does for the general
 * importer: random bytes behind each format's opening line and damaged versions of each synthetic
 * fixture give a report (accepted or refused with an error), never a crash, and an accepted file keeps
 * the series invariants.
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { decodeClimateBytes, importClimateText } from '../../../shared/climate';
import { checkResult } from '../../support/climate-invariants';
import { damage, damaged } from '../../support/weather-damage';

const fixture = (name: string) => readFileSync(path.resolve(import.meta.dirname, '../../fixtures/weather', name), 'utf8');
const FIXTURES = {
  epw: fixture('synthetic-typical-year.epw'),
  'header-block-csv': fixture('synthetic-header-block.csv'),
  'fixed-width-station': fixture('synthetic-station-records.txt'),
} as const;

describe('the published-format readers never throw', () => {
  for (const [id, text] of Object.entries(FIXTURES)) {
    it(`on damaged versions of the ${id} fixture`, () => {
      fc.assert(
        fc.property(fc.array(damage, { minLength: 1, maxLength: 8 }), fc.constantFrom('UTC', 'Europe/Berlin', 'UTC-07:00'), (damages, timeZone) => {
          const result = importClimateText(damaged(text, damages), { timeZone, site: { elevationM: 300, timeZone } });
          checkResult(result);
        }),
        { numRuns: 250 },
      );
    }, 60_000);
  }

  it('on random bytes behind each format’s opening lines', () => {
    const openings = [
      FIXTURES.epw.split('\r\n').slice(0, 8).join('\r\n') + '\r\n',
      'Latitude (decimal degrees):\t46.1\nLongitude (decimal degrees):\t9.8\ntime(UTC),T2m,RH,SP\n',
      '2019 12 31 00    55    20 10180   200    31     4     0 -9999\n',
    ];
    fc.assert(
      fc.property(fc.constantFrom(...openings), fc.uint8Array({ maxLength: 1500 }), (opening, bytes) => {
        checkResult(importClimateText(opening + decodeClimateBytes(bytes)));
      }),
      { numRuns: 300 },
    );
  }, 60_000);

  it('keeps recognising each fixture with one broken data line, and names the line', () => {
    for (const [id, text] of Object.entries(FIXTURES)) {
      const lines = text.split(/\r?\n/);
      const at = 30; // a data line in each fixture
      lines[at] = lines[at].slice(0, 6);
      const result = importClimateText(lines.join('\n'));
      expect(result.mapping.format?.id).toBe(id);
      expect(result.ok).toBe(true);
      expect(result.report.issues).toContainEqual(expect.objectContaining({ kind: 'unparsable-time', line: at + 1 }));
    }
  });
});
