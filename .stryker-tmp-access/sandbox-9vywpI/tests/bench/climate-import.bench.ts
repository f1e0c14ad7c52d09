/**
 * Climate import speed: a generated 30-year hourly file (262,800 rows) through importClimateText,
 * in the canonical layout and in a semicolon / decimal-comma / local-time layout. The reference is
 * a plain import of the same canonical text in the same run: papaparse on its fast path (no quotes, so
 * fastMode, rows as arrays), Number() per value and Date.parse per timestamp. Both sides get one warm-up and
 * the same number of timed passes.
 */
// @ts-nocheck

import Papa from 'papaparse';
import { importClimateText } from '../../shared/climate';
import { stationRecordsText, typicalYearEpwText } from './published-formats';
import type { BenchSuite } from './suite';

const YEARS = 30;
const HOUR_MS = 3_600_000;

function canonicalText(): { text: string; rows: number } {
  const start = Date.UTC(1991, 0, 1);
  const rows = Math.round((Date.UTC(1991 + YEARS, 0, 1) - start) / HOUR_MS);
  const lines = ['# synthetic benchmark data', 'timestamp,dry_bulb_c,relative_humidity_pct,pressure_kpa'];
  for (let h = 0; h < rows; h++) {
    const t = start + h * HOUR_MS;
    const db = 12 + 9 * Math.sin((2 * Math.PI * h) / 8766) + 4 * Math.sin((2 * Math.PI * h) / 24);
    const rh = 70 - 15 * Math.sin((2 * Math.PI * h) / 24);
    lines.push(`${new Date(t).toISOString().slice(0, 16)}Z,${db.toFixed(1)},${rh.toFixed(1)},${(100.5 + Math.sin(h / 50)).toFixed(2)}`);
  }
  return { text: `${lines.join('\n')}\n`, rows };
}

function localText(canonical: string): string {
  // the same values as day.month.year;hh:mm local standard time with decimal commas
  const out: string[] = ['Date;Time;Air temperature [°C];RH %;pressure [hPa]'];
  for (const line of canonical.split('\n')) {
    if (!line.startsWith('1') && !line.startsWith('2')) continue;
    const [ts, db, rh, p] = line.split(',');
    out.push(
      `${ts.slice(8, 10)}.${ts.slice(5, 7)}.${ts.slice(0, 4)};${ts.slice(11, 16)};${db.replace('.', ',')};${rh.replace('.', ',')};${(Number(p) * 10).toFixed(1).replace('.', ',')}`,
    );
  }
  return `${out.join('\r\n')}\r\n`;
}

function naiveImport(text: string): number {
  const parsed = Papa.parse<string[]>(text, { delimiter: ',', fastMode: true, skipEmptyLines: true, comments: '#' });
  let hours = 0;
  for (let r = 1; r < parsed.data.length; r++) {
    const [timestamp, dryBulb, rh] = parsed.data[r];
    if (Number.isFinite(Date.parse(timestamp)) && Number.isFinite(Number(dryBulb)) && Number.isFinite(Number(rh))) hours++;
  }
  return hours;
}

function bestOf(runs: number, work: () => void): number {
  let best = Infinity;
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    work();
    best = Math.min(best, performance.now() - t0);
  }
  return best;
}

async function run(context: { log: (line: string) => void }): Promise<Record<string, number | string>> {
  const { text, rows } = canonicalText();
  const local = localText(text);
  context.log(`climate-import: ${rows} rows (${(text.length / 1e6).toFixed(1)} MB canonical, ${(local.length / 1e6).toFixed(1)} MB local layout)`);
  let ok = true;
  importClimateText(text); // warm-up
  const canonicalMs = bestOf(5, () => {
    ok &&= importClimateText(text).ok;
  });
  const localMs = bestOf(5, () => {
    ok &&= importClimateText(local, { timeZone: 'Etc/GMT-1' }).ok;
  });
  // published formats: a typical-year EPW (target < 150 ms) and 30 years of fixed-width station records as one text
  const epw = typicalYearEpwText();
  importClimateText(epw);
  const epwMs = bestOf(5, () => {
    ok &&= importClimateText(epw).ok;
  });
  context.log(`climate-import: typical-year EPW (8760 records) in ${epwMs.toFixed(0)} ms (target < 150 ms)`);
  const station = stationRecordsText(1991, 1991 + YEARS - 1);
  const stationMs = bestOf(3, () => {
    ok &&= importClimateText(station).ok;
  });
  // process peak so far: the generated texts plus our imports (maxRSS only grows, so read it before the reference runs)
  const peakRssMb = process.resourceUsage().maxRSS / 1024;
  naiveImport(text);
  const naiveMs = bestOf(5, () => {
    if (naiveImport(text) !== rows) throw new Error('the plain import did not read every row');
  });
  // the floor under our figure: papaparse alone splitting the same text in its fast mode
  const splitOnlyMs = bestOf(5, () => Papa.parse<string[]>(text, { delimiter: ',', fastMode: true }));
  return {
    'climate-import.rows': rows,
    'climate-import.ok': ok ? 'yes' : 'NO',
    'climate-import.canonicalMs': Math.round(canonicalMs),
    'climate-import.rowsPerSecond': Math.round(rows / (canonicalMs / 1000)),
    'climate-import.localLayoutMs': Math.round(localMs),
    'climate-import.localLayoutRowsPerSecond': Math.round(rows / (localMs / 1000)),
    'climate-import.papaparseSplitOnlyMs': Math.round(splitOnlyMs),
    'climate-import.naiveMs': Math.round(naiveMs),
    'climate-import.speedupVsNaive': Math.round((naiveMs / canonicalMs) * 100) / 100,
    'climate-import.peakRssMb': Math.round(peakRssMb),
    'climate-import.epwTypicalYearMs': Math.round(epwMs),
    'climate-import.epwUnder150Ms': epwMs < 150 ? 'yes' : 'NO',
    'climate-import.fixedWidth30YearsMs': Math.round(stationMs),
    'climate-import.fixedWidthOverCanonical': Math.round((stationMs / canonicalMs) * 100) / 100,
  };
}

export const suite: BenchSuite = { name: 'climate-import', run };
