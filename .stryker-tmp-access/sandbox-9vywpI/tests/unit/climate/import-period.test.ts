// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { importClimateText } from '../../../shared/climate';
import { importPeriodWords } from '../../../shared/climate/import-period';

describe('the period an import summary names', () => {
  const first = Date.UTC(2021, 0, 1, 7); // 00:00 on 1 January at UTC−07:00
  const last = Date.UTC(2024, 0, 1, 6); // 23:00 on 31 December 2023 there

  it('is on the site standard time when the file is imported for a site, so a full year shows no next year', () => {
    expect(importPeriodWords(first, last, 'UTC-07:00')).toBe('2021-01-01 00:00 to 2023-12-31 23:00 site standard time (UTC−07:00)');
    // Europe/Paris: standard time UTC+01:00 all year in this wording (daylight saving is not standard time; IANA tz database).
    expect(importPeriodWords(Date.UTC(2021, 6, 1, 0), Date.UTC(2021, 6, 1, 5), 'Europe/Paris')).toBe(
      '2021-07-01 01:00 to 2021-07-01 06:00 site standard time (UTC+01:00)',
    );
  });

  it('stays in UTC without a site (the command line)', () => {
    expect(importPeriodWords(first, last, undefined)).toBe('2021-01-01T07:00Z to 2024-01-01T06:00Z');
  });

  it('is what the import report says', () => {
    const text = 'timestamp,dry_bulb_c,relative_humidity_pct\n2021-01-01T07:00Z,5,60\n2021-01-01T08:00Z,6,60\n';
    const result = importClimateText(text, { site: { elevationM: 0, timeZone: 'UTC-07:00' } });
    expect(result.report.summary).toContain('from 2021-01-01 00:00 to 2021-01-01 01:00 site standard time (UTC−07:00)');
  });
});
