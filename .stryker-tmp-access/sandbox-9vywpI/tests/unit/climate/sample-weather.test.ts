/**
 * The committed sample weather: each file imports cleanly with the time zone sites.json gives,
 * covers three years, says it is synthetic, is physically plausible, and is exactly what the
 * seeded generator makes.
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { importClimateText, type ClimateSeries, type DetectedMapping } from '../../../shared/climate';
import { buildSampleWeather } from '../../../sample-weather/generate';

const folder = fileURLToPath(new URL('../../../sample-weather', import.meta.url));
interface Site {
  id: string;
  name: string;
  climate: string;
  file: string;
  importTimeZone: string;
  elevationM: number;
  timeZone: string;
  synthetic: boolean;
}
const { sites } = JSON.parse(readFileSync(path.join(folder, 'sites.json'), 'utf8')) as { sites: Site[] };
const imported = new Map<string, ClimateSeries>();
const mappings = new Map<string, DetectedMapping>();

function mean(values: Float64Array): number {
  let sum = 0;
  let n = 0;
  for (const v of values) if (Number.isFinite(v)) [sum, n] = [sum + v, n + 1];
  return sum / n;
}

describe('sample weather', { timeout: 30_000 }, () => {
  it('has four invented sites with the four climates asked for', () => {
    expect(sites.map((s) => s.climate).sort()).toEqual(['cold continental', 'hot dry at altitude', 'hot humid', 'mild maritime']);
    expect(sites.every((s) => s.synthetic)).toBe(true);
  });

  it.each(sites.map((s) => [s.file, s] as const))('%s imports cleanly and says it is synthetic', (file, site) => {
    const text = readFileSync(path.join(folder, file), 'utf8');
    expect(text.split('\n', 1)[0]).toMatch(/^# SYNTHETIC DATA/);
    expect(text.length).toBeLessThan(2_000_000);
    const result = importClimateText(text, { timeZone: site.importTimeZone });
    expect(result.ok).toBe(true);
    expect(result.report.issues.filter((i) => i.severity !== 'info')).toEqual([]);
    expect(result.mapping.confidence).toBeGreaterThanOrEqual(0.9);
    // years in the file's own clock: no stray UTC year at either end
    expect(result.report.years).toEqual([2021, 2022, 2023]);
    expect(result.report.counts.hours).toBeGreaterThanOrEqual(3 * 8760);
    expect(result.report.counts.missingHours).toBe(0);
    imported.set(site.id, result.series!);
    mappings.set(site.id, result.mapping);
  });

  it('uses a different layout for every file', () => {
    const layouts = sites.map((s) => {
      const m = mappings.get(s.id)!;
      return `${m.delimiter}|${m.decimalSeparator}|${m.time?.layout}|${m.dryBulb?.unit}|${m.humidity?.quantity}:${m.humidity?.unit}|${m.pressure?.unit}`;
    });
    expect(new Set(layouts).size).toBe(4);
  });

  it('is physically plausible: dew point never above dry-bulb, RH within 0–100 %, pressure near the standard atmosphere', () => {
    for (const site of sites) {
      const s = imported.get(site.id)!;
      let implausible = 0;
      for (let h = 0; h < s.dryBulbC.length; h++) {
        const w = s.humidity.values[h];
        if (s.humidity.kind === 'dew-point-c' && !(w <= s.dryBulbC[h])) implausible++;
        if (s.humidity.kind === 'relative-humidity-pct' && !(w >= 0 && w <= 100)) implausible++;
      }
      expect(implausible, site.file).toBe(0);
      if (s.pressurePa) {
        // standard atmosphere, ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 3; synthetic weather swings stay within ±4 kPa
        const standard = 101325 * (1 - 2.25577e-5 * site.elevationM) ** 5.2559;
        expect(Math.abs(mean(s.pressurePa) - standard)).toBeLessThan(1000);
      }
    }
  });

  it('has climates in the expected order of warmth', () => {
    const meanC = (id: string) => mean(imported.get(id)!.dryBulbC);
    expect(meanC('teluk-hijau')).toBeGreaterThan(meanC('mesa-alta'));
    expect(meanC('mesa-alta')).toBeGreaterThan(meanC('kelderwick-point'));
    expect(meanC('kelderwick-point')).toBeGreaterThan(meanC('zimna-dolina'));
  });

  it('is exactly what the seeded generator makes', () => {
    const { files, sitesJson } = buildSampleWeather();
    for (const { file, text } of files) expect(text === readFileSync(path.join(folder, file), 'utf8'), file).toBe(true);
    expect(sitesJson).toBe(readFileSync(path.join(folder, 'sites.json'), 'utf8'));
  });
});
