/**
 * Several files, one climate file: 30 years of hours (262,992 with the leap days of 1991–2020) uploaded as 30 yearly files against the
 * same hours as one canonical CSV, both through the worker pool as the upload route reads them (each file
 * an importClimate task, in parallel; a set then joined in time order by joinClimateFiles). Target: the
 * 30 yearly fixed-width station files import in under 2× the time of the one canonical CSV, in the same run.
 * All data is synthetic.
 */
// @ts-nocheck

import { availableParallelism } from 'node:os';
import { joinClimateFiles, type ImportResult } from '../../shared/climate';
import { createWorkerPool } from '../../workers/pool';
import type { BenchSuite } from './suite';

const FIRST_YEAR = 1991;
const YEARS = 30;
const HOUR_MS = 3_600_000;

interface Hour {
  t: number;
  dryBulbC: number;
  rhPct: number;
  dewPointC: number;
  pressureKpa: number;
}

/** Synthetic hours (seasonal and daily sines), by calendar year. */
function syntheticYears(): Hour[][] {
  const years: Hour[][] = [];
  const start = Date.UTC(FIRST_YEAR, 0, 1);
  for (let y = 0; y < YEARS; y++) {
    const hours: Hour[] = [];
    const from = Date.UTC(FIRST_YEAR + y, 0, 1);
    const to = Date.UTC(FIRST_YEAR + y + 1, 0, 1);
    for (let t = from; t < to; t += HOUR_MS) {
      const h = (t - start) / HOUR_MS;
      const dryBulbC = 12 + 9 * Math.sin((2 * Math.PI * h) / 8766) + 4 * Math.sin((2 * Math.PI * h) / 24);
      const rhPct = 70 - 15 * Math.sin((2 * Math.PI * h) / 24);
      // a synthetic dew point a few kelvin under the dry-bulb (not a psychrometric conversion: bench data only)
      hours.push({ t, dryBulbC, rhPct, dewPointC: dryBulbC - (100 - rhPct) / 5, pressureKpa: 100.5 + Math.sin(h / 50) });
    }
    years.push(hours);
  }
  return years;
}

const canonicalHeader = 'timestamp,dry_bulb_c,relative_humidity_pct,pressure_kpa';
const canonicalLine = (x: Hour) => `${new Date(x.t).toISOString().slice(0, 16)}Z,${x.dryBulbC.toFixed(1)},${x.rhPct.toFixed(1)},${x.pressureKpa.toFixed(2)}`;

/** One line of the fixed-width station records (shared/climate/formats/station-records.ts): UTC hour, tenths, −9999 missing. */
function stationLine(x: Hour): string {
  const d = new Date(x.t);
  const n = (v: number, width: number) => String(v).padStart(width);
  return [
    d.getUTCFullYear(),
    String(d.getUTCMonth() + 1).padStart(2, '0'),
    String(d.getUTCDate()).padStart(2, '0'),
    String(d.getUTCHours()).padStart(2, '0'),
    n(Math.round(x.dryBulbC * 10), 5),
    n(Math.round(x.dewPointC * 10), 5),
    n(Math.round(x.pressureKpa * 100), 5),
    n(200, 5),
    n(31, 5),
    n(4, 5),
    n(0, 5),
    n(-9999, 5),
  ].join(' ');
}

async function timed(work: () => Promise<boolean>): Promise<{ ms: number; ok: boolean }> {
  const t0 = performance.now();
  const ok = await work();
  return { ms: performance.now() - t0, ok };
}

async function bestOf(runs: number, work: () => Promise<boolean>): Promise<{ ms: number; ok: boolean }> {
  let best = { ms: Infinity, ok: true };
  for (let i = 0; i < runs; i++) {
    const r = await timed(work);
    best = { ms: Math.min(best.ms, r.ms), ok: best.ok && r.ok };
  }
  return best;
}

async function run(context: { log: (line: string) => void }): Promise<Record<string, number | string>> {
  const years = syntheticYears();
  const hours = years.reduce((n, y) => n + y.length, 0);
  const canonical = `${[canonicalHeader, ...years.flat().map(canonicalLine)].join('\n')}\n`;
  const canonicalYears = years.map((y) => `${[canonicalHeader, ...y.map(canonicalLine)].join('\n')}\n`);
  const stationYears = years.map((y) => `${y.map(stationLine).join('\n')}\n`);
  const pool = createWorkerPool({ threads: availableParallelism() });
  context.log(
    `climate-file-sets: ${hours} hours; one canonical CSV (${(canonical.length / 1e6).toFixed(1)} MB) against 30 yearly files, on ${pool.threads} pool threads`,
  );
  try {
    const one = async () => {
      const result: ImportResult = await pool.run('importClimate', { text: canonical, options: {} });
      return result.ok && result.series!.timestampsMs.length === hours;
    };
    const set = (texts: string[]) => async () => {
      const results: ImportResult[] = await Promise.all(texts.map((text) => pool.run('importClimate', { text, options: {} })));
      const joined = joinClimateFiles(
        results.map((result, i) => ({ fileName: `${FIRST_YEAR + i}`, bytes: texts[i].length, sha256: '', result })),
        6,
      );
      return joined.ok && joined.series!.timestampsMs.length === hours;
    };
    // warm the threads and their bundle once for each kind of work
    await one();
    await set(canonicalYears)();
    await set(stationYears)();
    const oneCsv = await bestOf(3, one);
    const yearlyCsv = await bestOf(3, set(canonicalYears));
    const yearlyFixedWidth = await bestOf(3, set(stationYears));
    const ratio = (a: number, b: number) => Math.round((a / b) * 100) / 100;
    return {
      'climate-file-sets.hours': hours,
      'climate-file-sets.ok': oneCsv.ok && yearlyCsv.ok && yearlyFixedWidth.ok ? 'yes' : 'NO',
      'climate-file-sets.threads': pool.threads,
      'climate-file-sets.oneCanonicalCsvMs': Math.round(oneCsv.ms),
      'climate-file-sets.thirtyYearlyCsvMs': Math.round(yearlyCsv.ms),
      'climate-file-sets.thirtyYearlyFixedWidthMs': Math.round(yearlyFixedWidth.ms),
      'climate-file-sets.yearlyCsvVsOne': ratio(yearlyCsv.ms, oneCsv.ms),
      // the target: under 2
      'climate-file-sets.yearlyFixedWidthVsOne': ratio(yearlyFixedWidth.ms, oneCsv.ms),
    };
  } finally {
    await pool.destroy();
  }
}

export const suite: BenchSuite = { name: 'climate-file-sets', run };
