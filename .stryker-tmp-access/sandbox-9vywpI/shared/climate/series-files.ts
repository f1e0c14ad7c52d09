/**
 * What a stored climate series is written out as: the cleaned hourly CSV (the command line's canonical
 * columns, so it can be fed straight back in) and the file page's hours as JSON. Both are built on the
 * worker pool (workers/format-climate-series.ts): for a century of hours they take seconds.
 */
// @ts-nocheck

import { csvCell } from '../csv';
import type { ClimateSeries } from './types';

const canonicalHumidityColumn = {
  'relative-humidity-pct': 'relative_humidity_pct',
  'dew-point-c': 'dew_point_c',
  'wet-bulb-c': 'wet_bulb_c',
  'humidity-ratio-kgkg': 'humidity_ratio_gkg',
} as const;

const flagWords = ['measured', 'filled', 'missing'];

function round3(v: number): number {
  return Math.round(v * 1000) / 1000;
}

/** The cleaned series in the command line's canonical columns (values to 3 decimals, pressure in kPa, W in g/kg). */
export function cleanedSeriesCsv(s: ClimateSeries): string {
  const humidityScale = s.humidity.kind === 'humidity-ratio-kgkg' ? 1000 : 1;
  const header = ['timestamp', 'dry_bulb_c', canonicalHumidityColumn[s.humidity.kind], ...(s.pressurePa ? ['pressure_kpa'] : []), 'flag'];
  const lines = [header.join(',')];
  for (let i = 0; i < s.timestampsMs.length; i++) {
    const cells = [
      new Date(s.timestampsMs[i]).toISOString().replace('.000Z', 'Z'),
      csvCell(round3(s.dryBulbC[i])),
      csvCell(round3(s.humidity.values[i] * humidityScale)),
      ...(s.pressurePa ? [csvCell(round3(s.pressurePa[i] / 1000))] : []),
      flagWords[s.flags[i]] ?? 'missing',
    ];
    lines.push(cells.join(','));
  }
  return `${lines.join('\n')}\n`;
}

/** Index range [from, to) of the hours in one calendar year on a clock `offsetMinutes` from UTC (the site's standard time). */
export function yearWindow(timestampsMs: Float64Array, year: number, offsetMinutes: number): { from: number; to: number } {
  const offsetMs = offsetMinutes * 60_000;
  const start = Date.UTC(year, 0, 1) - offsetMs;
  const end = Date.UTC(year + 1, 0, 1) - offsetMs;
  const n = timestampsMs.length;
  let from = timestampsMs.findIndex((t) => t >= start);
  if (from < 0) from = n;
  const after = timestampsMs.findIndex((t) => t >= end);
  return { from, to: after < 0 ? n : after };
}

/** The hours of [from, to) as the file page reads them: JSON, values to 3 decimals, missing values null. */
export function seriesHoursJson(s: ClimateSeries, { from, to }: { from: number; to: number }): string {
  const pick = (a: Float64Array | null) => (a ? Array.from(a.subarray(from, to), round3) : null);
  return JSON.stringify({
    humidityKind: s.humidity.kind,
    timestampsMs: Array.from(s.timestampsMs.subarray(from, to)),
    dryBulbC: pick(s.dryBulbC),
    humidity: pick(s.humidity.values),
    pressurePa: pick(s.pressurePa),
    flags: Array.from(s.flags.subarray(from, to)),
  });
}
