// @ts-nocheck
import type { ClimateSeries } from '../../shared/climate';
import { saveClimateFile } from '../../server/climate/store';
import type { Db } from '../../server/db/client';

/**
 * A synthetic hourly series of `hours` hours from 1926-01-01T00:00Z (not measured weather): dry-bulb and
 * relative humidity follow made-up yearly and daily waves with three decimals, pressure drifts around
 * 101.3 kPa, and every 97th hour is missing (NaN, flag 2) and every 89th filled (flag 1), so every branch
 * of the writers is used. The same call always gives the same series.
 */
export function syntheticLongSeries(hours: number): ClimateSeries {
  const timestampsMs = new Float64Array(hours);
  const dryBulbC = new Float64Array(hours);
  const rh = new Float64Array(hours);
  const pressurePa = new Float64Array(hours);
  const flags = new Uint8Array(hours);
  const start = Date.UTC(1926, 0, 1);
  for (let i = 0; i < hours; i++) {
    timestampsMs[i] = start + i * 3_600_000;
    const yearly = Math.sin((2 * Math.PI * i) / 8760);
    const daily = Math.sin((2 * Math.PI * i) / 24);
    dryBulbC[i] = 11 + 13 * yearly + 4.5 * daily + ((i * 7919) % 1000) / 1234;
    rh[i] = 65 - 20 * daily + ((i * 104729) % 100) / 7;
    pressurePa[i] = 101_300 + 800 * Math.sin((2 * Math.PI * i) / 131) + (i % 13);
    if (i % 97 === 5) {
      dryBulbC[i] = NaN;
      rh[i] = NaN;
      pressurePa[i] = NaN;
      flags[i] = 2;
    } else if (i % 89 === 3) flags[i] = 1;
  }
  return { timestampsMs, dryBulbC, humidity: { kind: 'relative-humidity-pct', values: rh }, pressurePa, flags };
}

/** Stores a synthetic series as a climate file of the site, as an import would, and gives its id. */
export function storeLongClimateFile(db: Db, projectId: number, siteId: number, series: ClimateSeries, name = 'Synthetic long record'): number {
  const hours = series.timestampsMs.length;
  const report = {
    ok: true,
    summary: `Synthetic series of ${hours} hours.`,
    timeLayout: 'ISO 8601',
    stepMinutes: 60,
    firstTimestamp: new Date(series.timestampsMs[0]).toISOString(),
    lastTimestamp: new Date(series.timestampsMs[hours - 1]).toISOString(),
    years: [],
    maxGapHours: 6,
    timeZone: 'UTC',
    humidityOverIce: false,
    counts: { measuredHours: hours, filledHours: 0, missingHours: 0, hours },
    issues: [],
  };
  const row = saveClimateFile(db, {
    projectId,
    siteId,
    name,
    originalFileName: `${name}.csv`,
    bytes: Buffer.from('synthetic'),
    imported: { ok: true, series, report: report as never, mapping: {} as never },
    createdBy: null,
  });
  return row.id;
}
