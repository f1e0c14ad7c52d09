/**
 * The IT load through the year: reading a profile file (errors name line and value), the built-in example, and
 * each hour's fraction for a run.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { exampleLoadProfile, hourlyLoadFractions, parseLoadProfileCsv } from '../../../shared/scenario/load-profile';
import { parseScenario } from '../../../shared/scenario';

const HOUR = 3_600_000;

describe('parseLoadProfileCsv', () => {
  const values = Array.from({ length: 8760 }, (_, h) => ((h % 24) / 24).toFixed(3));

  it('reads 8760 fractions after an optional header, taking the last cell of a line', () => {
    const plain = parseLoadProfileCsv(values.join('\n'));
    expect(plain.ok && plain.fractions.length).toBe(8760);
    const withHeader = parseLoadProfileCsv(`hour;fraction\r\n${values.map((v, h) => `${h};${v}`).join('\r\n')}\r\n`);
    expect(withHeader.ok && withHeader.fractions[23]).toBeCloseTo(23 / 24, 3);
  });

  it('names the line and the value of each bad entry, and the count when it is not 8760', () => {
    const bad = [...values];
    bad[4] = 'abc';
    bad[10] = '-0.1';
    bad[11] = '100';
    const r = parseLoadProfileCsv(`fraction\n${bad.join('\n')}`);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toEqual([
      'line 6: "abc" is not a number',
      'line 12: -0.1 is outside 0 to 1 (a fraction of the design IT load; 100 % is 1)',
      'line 13: 100 is outside 0 to 1 (a fraction of the design IT load; 100 % is 1)',
    ]);
    const short = parseLoadProfileCsv(values.slice(0, 8784 - 8760 + 100).join('\n'));
    expect(!short.ok && short.errors[0]).toMatch(/^the file has 124 hourly values; a load profile needs 8760/);
  });

  it('stops listing after 20 errors and says how many more', () => {
    const r = parseLoadProfileCsv(Array.from({ length: 8760 }, () => '2').join('\n'));
    expect(!r.ok && r.errors.length).toBe(21);
    expect(!r.ok && r.errors[20]).toBe('… and 8740 more values out of range or not numbers');
  });
});

describe('the example profile (synthetic)', () => {
  it('has 8760 fractions between 0.72 and 0.95, lower at night and at weekends, and passes the schema', () => {
    const p = exampleLoadProfile();
    expect(p).toHaveLength(8760);
    expect(Math.min(...p)).toBeGreaterThanOrEqual(0.72);
    expect(Math.max(...p)).toBeLessThanOrEqual(0.95);
    expect(p[16]).toBeGreaterThan(p[4]); // Monday 16:00 above 04:00
    expect(p[5 * 24 + 16]).toBeCloseTo(0.9 * p[16], 2); // Saturday
    const energy = { itLoadKw: 100, mechanicalCop: 4, itLoadProfile: { kind: 'hourly-profile', name: 'example', fractions: p } };
    const parsed = parseScenario({
      name: 'x',
      elevationM: 0,
      envelope: { dryBulbMinC: 18, dryBulbMaxC: 27, dewPointMinC: -9, dewPointMaxC: 15, rhMinPct: 0, rhMaxPct: 70 },
      system: { kind: 'direct-air', supplyAirC: 24, itDeltaTK: 12, evaporativeEffectiveness: 0 },
      energy,
    });
    expect(parsed.ok).toBe(true);
  });
});

describe('hourlyLoadFractions', () => {
  it('is 1 every hour for a constant load', () => {
    expect([...hourlyLoadFractions({ kind: 'constant' }, Float64Array.of(0, HOUR))]).toEqual([1, 1]);
  });

  it('ramps by local calendar year from the first year, holding the last value', () => {
    const t = Float64Array.of(Date.UTC(2020, 11, 31, 22), Date.UTC(2020, 11, 31, 23), Date.UTC(2022, 5, 1), Date.UTC(2030, 0, 1));
    // At UTC+1, 23:00 UTC on 31 December is already 2021 locally.
    expect([...hourlyLoadFractions({ kind: 'yearly-ramp', fractions: [0.3, 0.6, 0.9] }, t, 60)]).toEqual([0.3, 0.6, 0.9, 0.9]);
  });

  it('reads the profile by hour of the 365-day local standard-time year; 29 February repeats 28 February', () => {
    const fractions = Array.from({ length: 8760 }, (_, h) => h / 8760);
    const profile = { kind: 'hourly-profile' as const, name: 'ramp', fractions };
    const t = Float64Array.of(
      Date.UTC(2024, 0, 1, 0), // hour 0
      Date.UTC(2024, 1, 28, 5), // day 58, hour 5 → 58·24 + 5
      Date.UTC(2024, 1, 29, 5), // 29 February: as 28 February
      Date.UTC(2024, 2, 1, 5), // 1 March: day 59 of a 365-day year
      Date.UTC(2024, 11, 31, 23), // last hour
    );
    const out = hourlyLoadFractions(profile, t);
    expect([...out]).toEqual([0, fractions[58 * 24 + 5], fractions[58 * 24 + 5], fractions[59 * 24 + 5], fractions[8759]]);
    // Local standard time UTC−5: 05:00 UTC on 1 January is hour 0 locally.
    expect(hourlyLoadFractions(profile, Float64Array.of(Date.UTC(2021, 0, 1, 5)), -300)[0]).toBe(0);
  });
});
