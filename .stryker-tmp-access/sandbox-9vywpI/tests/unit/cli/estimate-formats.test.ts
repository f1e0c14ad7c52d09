/**
 * The command line on each published format, with no mapping flag: the synthetic fixtures of
 * tests/fixtures/weather are recognised, run and summarised (format, header, typical year).
 */
// @ts-nocheck

import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = path.resolve(import.meta.dirname, '../../..');
const SCENARIO = path.join(root, 'sample-weather/scenarios/direct-air-a1.json');
const fixture = (name: string) => path.join(root, 'tests/fixtures/weather', name);

function estimate(args: string[]) {
  const result = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/estimate.ts', ...args], { cwd: root, encoding: 'utf8' });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

describe('estimate on published formats, without flags', { timeout: 60_000 }, () => {
  it.each([
    ['synthetic-typical-year.epw', 'epw', 'dew-point-c'],
    ['synthetic-header-block.csv', 'header-block-csv', 'relative-humidity-pct'],
    ['synthetic-station-records.txt', 'fixed-width-station', 'dew-point-c'],
    ['synthetic-station-line.csv', null, 'dew-point-c'],
  ])('%s', (name, format, humidityKind) => {
    const r = estimate(['--weather', fixture(name), '--scenario', SCENARIO]);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const summary = JSON.parse(r.stdout);
    expect(summary.hours.total).toBe(72);
    expect(summary.weather.format).toBe(format);
    expect(summary.weather.humidityKind).toBe(humidityKind);
  });

  it('reports the EPW header and typical year', () => {
    const summary = JSON.parse(estimate(['--weather', fixture('synthetic-typical-year.epw'), '--scenario', SCENARIO]).stdout);
    expect(summary.weather.fileHeader).toMatchObject({ elevationM: 250, utcOffsetHours: 1 });
    expect(summary.weather.typicalYear.year).toBe(2001);
    expect(summary.weather.years).toEqual([2001]);
    const inMonth = (m: { free: number; adiabatic: number; mechanical: number; noData: number }) => m.free + m.adiabatic + m.mechanical + m.noData;
    expect(inMonth(summary.hoursByMonth[0]) + inMonth(summary.hoursByMonth[1])).toBe(72);
  });

  it('names what is off in an almost-EPW file on stderr, with exit code 2', () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'estimate-formats-'));
    try {
      const broken = path.join(dir, 'broken.epw');
      writeFileSync(broken, readFileSync(fixture('synthetic-typical-year.epw'), 'utf8').replace('7.125,1.0,250.0', '7.125,CET,250.0'));
      const r = estimate(['--weather', broken, '--scenario', SCENARIO]);
      expect(r.code).toBe(2);
      expect(r.stderr).toContain('EPW record 1 (LOCATION): the time zone field "CET" is not a UTC offset');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
