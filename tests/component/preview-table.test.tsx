/**
 * The first hours of an upload as the importer read them, before anything is stored: in SI, and beside it in IP for
 * a person who works in IP; each hour in UTC and on the site's clock.
 */
import { render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { PreviewTable } from '@/features/climate-files/components/preview-table';
import { UnitSystemProvider } from '@/lib/unit-system';

/** Two synthetic hours (demo data): one measured, one filled. */
const HOURS = [
  { timestampMs: Date.UTC(2023, 6, 1, 0), dryBulbC: 8.3, humidity: 88, pressurePa: 101_300, flag: 0 },
  { timestampMs: Date.UTC(2023, 6, 1, 1), dryBulbC: 10, humidity: 80, pressurePa: null, flag: 1 },
];

function show(units: 'SI' | 'IP') {
  localStorage.setItem('tramontane.unitSystem', units);
  render(
    <UnitSystemProvider>
      <PreviewTable hours={HOURS} humidityKind="relative-humidity-pct" hasPressure firstLines={['time;t;rh;p']} timeZone="Europe/Warsaw" />
    </UnitSystemProvider>,
  );
  const table = screen.getByRole('table', { name: /^First 2 hours as read/ });
  const rows = within(table).getAllByRole('row');
  return {
    table,
    rows,
    cells: (i: number) =>
      within(rows[i])
        .getAllByRole('cell')
        .map((c) => c.textContent),
  };
}

afterEach(() => localStorage.clear());

describe('the upload preview table', () => {
  it('in SI: one column per quantity, the hour in UTC and on the site’s clock, and each hour’s flag', () => {
    const { table, cells } = show('SI');
    expect(screen.getByRole('table', { name: "First 2 hours as read (SI), in UTC and on the site's clock (Europe/Warsaw)." })).toBe(table);
    const headers = within(table)
      .getAllByRole('columnheader')
      .map((h) => h.textContent)
      .filter(Boolean);
    expect(headers).toEqual(['Hour (UTC)', 'Site time', 'Dry-bulb', 'Relative humidity', 'Pressure', 'Flag', '°C', '%', 'kPa']);
    // Warsaw keeps UTC+02:00 in July (EU summer time); 101 300 Pa = 101.30 kPa.
    expect(cells(2)).toEqual(['2023-07-01 00:00', '2023-07-01 02:00', '8.3', '88.0', '101.30', 'measured']);
    expect(cells(3)).toEqual(['2023-07-01 01:00', '2023-07-01 03:00', '10.0', '80.0', '–', 'filled']);
  });

  it('in IP: SI and IP side by side', () => {
    const { table, cells } = show('IP');
    expect(screen.getByRole('table', { name: /^First 2 hours as read, in SI and in IP,/ })).toBe(table);
    // 8.3 °C × 1.8 + 32 = 46.94 °F (NIST SP 811 App. B); 101 300 Pa / 3386.389 Pa per inHg = 29.91 inHg (ibid.).
    expect(cells(2)).toEqual(['2023-07-01 00:00', '2023-07-01 02:00', '8.3', '46.9', '88.0', '88.0', '101.30', '29.91', 'measured']);
    expect(screen.getByText('inHg')).toBeTruthy();
  });

  it('keeps the file’s first lines, as written, behind a disclosure', () => {
    show('SI');
    expect(screen.getByText('The first lines of the file, as written')).toBeTruthy();
    expect(screen.getByText('time;t;rh;p')).toBeTruthy();
  });
});
