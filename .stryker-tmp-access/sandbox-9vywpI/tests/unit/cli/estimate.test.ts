/**
 * The command line as other tools call it: spawned as a process on small files, checking exit
 * codes, stdout JSON, stderr on bad input and the hourly CSV's columns and order.
 */
// @ts-nocheck

import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { tightPsychrolib as psy } from '../psychrometrics/reference-psychrolib';
import { hylandWexlerIcePa, hylandWexlerWaterPa } from '../psychrometrics/reference-over-water';

const root = path.resolve(import.meta.dirname, '../../..');
const dir = mkdtempSync(path.join(tmpdir(), 'estimate-cli-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const file = (name: string, text: string): string => {
  const full = path.join(dir, name);
  writeFileSync(full, text);
  return full;
};

/** The same command `npm run estimate` runs, without npm's start-up time. */
function estimate(args: string[]) {
  const result = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/estimate.ts', ...args], { cwd: root, encoding: 'utf8' });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

const SCENARIO = path.join(root, 'sample-weather/scenarios/direct-air-a1.json');
// Synthetic weather: a cool hour, a missing dry-bulb, a hot dry hour, a hot humid hour.
const WEATHER = file(
  'weather.csv',
  'timestamp,dry_bulb_c,dew_point_c\n2021-07-01T00:00Z,20,10\n2021-07-01T01:00Z,,10\n2021-07-01T02:00Z,31,12\n2021-07-01T03:00Z,35,22\n',
);
const COLUMNS =
  'timestamp,mode,dry_bulb_c,wet_bulb_c,dew_point_c,relative_humidity_pct,humidity_ratio_gkg,enthalpy_kjkg,mechanical_fraction,humidified,local_standard_time';
// Synthetic winter weather: a cold hour drier than the A1 lower limit (−12 °C dew point), and a mild one.
const WINTER = file('winter.csv', 'timestamp,dry_bulb_c,dew_point_c\n2021-01-04T00:00Z,-5,-25\n2021-01-04T01:00Z,8,2\n');

describe('estimate command line', { timeout: 30_000 }, () => {
  it('prints one JSON summary and writes one CSV row per hour in file order', () => {
    const hourly = path.join(dir, 'hourly.csv');
    const r = estimate(['--weather', WEATHER, '--scenario', SCENARIO, '--hourly', hourly, '--max-gap-hours', '0']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const summary = JSON.parse(r.stdout);
    expect(summary.engineVersion).toBe('scenario-engine 2.0.0');
    // The 35 °C / 22 °C dew-point hour is above the moisture limit: the coil carries all of it (not partial).
    expect(summary.hours).toEqual({ free: 1, adiabatic: 1, mechanical: 1, noData: 1, total: 4, humidified: 0, partialMechanical: 0 });
    expect(Object.keys(summary.water)).toEqual(
      expect.arrayContaining(['evaporatedL', 'humidificationL', 'evaporativeCoolingL', 'driftL', 'blowdownL', 'totalL']),
    );
    expect(summary.water.evaporatedL).toBeCloseTo(summary.water.humidificationL + summary.water.evaporativeCoolingL, 9);
    expect(summary.energy.partialPue).toBeGreaterThan(1);
    expect(summary.water.totalL).toBeGreaterThan(0);
    const lines = readFileSync(hourly, 'utf8').trimEnd().split('\n');
    expect(lines[0]).toBe(COLUMNS);
    expect(lines).toHaveLength(5);
    expect(lines.slice(1).map((line) => line.split(',').slice(0, 2))).toEqual([
      ['2021-07-01T00:00Z', 'free'],
      ['2021-07-01T01:00Z', 'no_data'],
      ['2021-07-01T02:00Z', 'adiabatic'],
      ['2021-07-01T03:00Z', 'mechanical'],
    ]);
    for (const line of lines.slice(1)) expect(line.split(',')).toHaveLength(11);
    expect(lines.slice(1).map((line) => line.split(',')[9])).toEqual(['0', '', '0', '0']);
    // without --utc-offset-minutes the site clock is UTC
    expect(lines[1].split(',')[10]).toBe('2021-07-01T00:00');
    // 20 °C with a 10 °C dew point at the scenario's 120 m: humidity ratio from psychrolib (reference library).
    const first = lines[1].split(',');
    expect(first[4]).toBe('10.00');
    expect(Number(first[6])).toBeCloseTo(psy.GetHumRatioFromTDewPoint(10, psy.GetStandardAtmPressure(120)) * 1000, 3);
  });

  it('runs the example hybrid hall: the loops and heat reuse in the summary, the loop columns after the others', () => {
    const hourly = path.join(dir, 'hybrid.csv');
    const scenario = path.join(root, 'sample-weather/scenarios/hybrid-w32-dry-cooler.json');
    const r = estimate(['--weather', WEATHER, '--scenario', scenario, '--hourly', hourly, '--max-gap-hours', '0']);
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const summary = JSON.parse(r.stdout);
    expect(summary.systemKind).toBe('hybrid');
    expect(summary.engineVersion).toBe('scenario-engine 2.0.0');
    // W32 facility water on dry coolers with a 5 K approach (the approach rule): free while T_db + 5 ≤ 32, so the
    // 20 °C hour is free and the 31 °C and 35 °C hours need the trim chiller.
    expect(summary.loops.liquid.hours).toMatchObject({ free: 1, adiabatic: 0, mechanical: 2, noData: 1, total: 4 });
    expect(Object.keys(summary.loops.air)).toEqual(expect.arrayContaining(['hours', 'energy', 'water']));
    // The hall is as demanding as its more demanding loop, hour by hour.
    expect(summary.hours.mechanical).toBeGreaterThanOrEqual(summary.loops.liquid.hours.mechanical);
    expect(summary.loops.liquid.energy.itKwh + summary.loops.air.energy.itKwh).toBeCloseTo(summary.energy.itKwh, 6);
    // Return 32 + 10 = 42 °C over the 40 °C threshold: the liquid loop's heat, 0.8 × 2000 kW, in the three hours with data.
    expect(summary.heatReuse).toMatchObject({ source: 'direct', returnWaterC: 42, availableHours: 3 });
    expect(summary.heatReuse.availableKwh).toBeCloseTo(3 * 1600, 6);
    const lines = readFileSync(hourly, 'utf8').trimEnd().split('\n');
    expect(lines[0]).toBe(`${COLUMNS},liquid_mode,air_mode,liquid_mechanical_fraction`);
    expect(lines.slice(1).map((line) => line.split(',').slice(11, 13))).toEqual([
      ['free', expect.any(String)],
      ['no_data', 'no_data'],
      ['mechanical', expect.any(String)],
      ['mechanical', expect.any(String)],
    ]);
    // 31 °C + 5 K = 36 °C water against 32 °C supply and a 10 K rise: the chiller carries (36 − 32) / 10 = 0.4.
    expect(lines[3].split(',')[13]).toBe('0.400');
  });

  it('counts a cold hour drier than the envelope as free cooling with humidification, its water apart', () => {
    const hourly = path.join(dir, 'winter-hourly.csv');
    const r = estimate(['--weather', WINTER, '--scenario', SCENARIO, '--hourly', hourly]);
    expect(r.stderr).toBe('');
    const summary = JSON.parse(r.stdout);
    expect(summary.hours).toMatchObject({ free: 2, adiabatic: 0, humidified: 1 });
    expect(summary.water.humidificationL).toBeGreaterThan(0);
    expect(summary.water.evaporativeCoolingL).toBe(0);
    const lines = readFileSync(hourly, 'utf8').trimEnd().split('\n');
    expect(lines.slice(1).map((line) => [line.split(',')[1], line.split(',')[9]])).toEqual([
      ['free', '1'],
      ['free', '0'],
    ]);
  });

  it('exits 2 on a retired input, naming its replacement', () => {
    const old = JSON.parse(readFileSync(SCENARIO, 'utf8'));
    old.system.fanHeatK = 1;
    const r = estimate(['--weather', WEATHER, '--scenario', file('old-scenario.json', JSON.stringify(old))]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/system\.fanHeatK: is retired: .*energy\.fanPowerFraction/);
  });

  it('takes an hourly IT load profile with --load-profile, and names the bad lines of one', () => {
    const fractions = Array.from({ length: 8760 }, () => '0.5');
    const good = file('profile.csv', `fraction\n${fractions.join('\n')}\n`);
    const full = JSON.parse(estimate(['--weather', WINTER, '--scenario', SCENARIO]).stdout);
    const half = JSON.parse(estimate(['--weather', WINTER, '--scenario', SCENARIO, '--load-profile', good]).stdout);
    expect(half.energy.itKwh).toBeCloseTo(full.energy.itKwh / 2, 6);
    fractions[99] = '1.5';
    const bad = estimate(['--weather', WINTER, '--scenario', SCENARIO, '--load-profile', file('bad-profile.csv', `fraction\n${fractions.join('\n')}\n`)]);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/line 101: 1\.5 is outside 0 to 1/);
  });

  it('runs through npm as documented', () => {
    const r = spawnSync('npm', ['run', '--silent', 'estimate', '--', '--weather', WEATHER, '--scenario', SCENARIO], { cwd: root, encoding: 'utf8' });
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).hours.total).toBe(4);
  });

  it('takes a column mapping from flags for a layout it would not guess', () => {
    const odd = file('odd.csv', 'when;temp;moist\n2021-07-01 00:00;20,5;10\n2021-07-01 01:00;21;10\n');
    const r = estimate([
      '--weather',
      odd,
      '--scenario',
      SCENARIO,
      '--time',
      'when',
      '--dry-bulb',
      'temp:C',
      '--humidity',
      'dew-point:moist:C',
      '--delimiter',
      'semicolon',
      '--decimal',
      'comma',
    ]);
    expect(r.stderr).toBe('');
    expect(JSON.parse(r.stdout).hours).toMatchObject({ free: 2, total: 2 });
  });

  it('exits 2 naming the missing flag', () => {
    const r = estimate(['--scenario', SCENARIO]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/--weather FILE is required/);
  });

  it('exits 2 naming the scenario field and its allowed range', () => {
    const bad = JSON.parse(readFileSync(SCENARIO, 'utf8'));
    bad.system.supplyAirC = 99;
    const r = estimate(['--weather', WEATHER, '--scenario', file('bad-scenario.json', JSON.stringify(bad))]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/system\.supplyAirC: must be a number from 5 to 45 °C \(got 99\)/);
  });

  it('exits 2 on a scenario that is not JSON', () => {
    const r = estimate(['--weather', WEATHER, '--scenario', file('broken.json', '{ "name": ')]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/not valid JSON/);
  });

  it('exits 2 when the weather file cannot be read', () => {
    const r = estimate(['--weather', path.join(dir, 'nowhere.csv'), '--scenario', SCENARIO]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/cannot read \(ENOENT\)/);
  });

  it('exits non-zero with the importer report on weather it cannot use', () => {
    const r = estimate(['--weather', file('header-only.csv', 'timestamp,dry_bulb_c,relative_humidity_pct\n'), '--scenario', SCENARIO]);
    expect(r.code).not.toBe(0);
    expect(r.stdout).toBe('');
    expect(r.stderr.length).toBeGreaterThan(10);
  });

  it('exits 2 on an elevation out of range or an unknown flag', () => {
    expect(estimate(['--weather', WEATHER, '--scenario', SCENARIO, '--elevation', 'high']).stderr).toMatch(/--elevation must be a number from -500 to 6000/);
    const unknown = estimate(['--weather', WEATHER, '--scenario', SCENARIO, '--colour', 'blue']);
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toMatch(/colour/);
  });

  it('uses --elevation for the pressure when the weather has none', () => {
    const low = JSON.parse(estimate(['--weather', WEATHER, '--scenario', SCENARIO]).stdout);
    const high = JSON.parse(estimate(['--weather', WEATHER, '--scenario', SCENARIO, '--elevation', '2000']).stdout);
    expect(high.site).toMatchObject({ elevationM: 2000, pressureSource: 'elevation' });
    // Same dew point at lower pressure holds more water per kg of dry air (ASHRAE 2017 ch. 1 eq. 20).
    expect(high.envelope.highHumidityRatioGPerKg).toBeGreaterThan(low.envelope.highHumidityRatioGPerKg);
    // A1 derating: 1 K per 300 m above 900 m (recalled from memory) → 32 − 1100/300.
    expect(high.envelope.dryBulbMaxC).toBeCloseTo(32 - 1100 / 300, 9);
  });

  it('reads sub-zero humidity over liquid water, or over ice with --humidity-over-ice, and writes it over water', () => {
    // Synthetic winter hours: RH 80 % at −10 °C and a dew point of −10 °C, at the scenario's 120 m.
    const rh = file('winter-rh.csv', 'timestamp,dry_bulb_c,relative_humidity_pct\n2021-01-10T00:00Z,-10,80\n2021-01-10T01:00Z,-10,80\n');
    const dew = file('winter-dew.csv', 'timestamp,dry_bulb_c,dew_point_c\n2021-01-10T00:00Z,-5,-10\n2021-01-10T01:00Z,-5,-10\n');
    const p = psy.GetStandardAtmPressure(120);
    const run = (weather: string, extra: string[]) => {
      const hourly = path.join(dir, `hourly-${path.basename(weather)}-${extra.length}.csv`);
      const r = estimate(['--weather', weather, '--scenario', SCENARIO, '--hourly', hourly, ...extra]);
      expect(r.stderr).toBe('');
      return { summary: JSON.parse(r.stdout), row: readFileSync(hourly, 'utf8').trimEnd().split('\n')[1].split(',') };
    };
    const water = run(rh, []);
    const ice = run(rh, ['--humidity-over-ice']);
    expect(water.summary.weather.humidityOverIce).toBe(false);
    expect(ice.summary.weather.humidityOverIce).toBe(true);
    // W by psychrolib's eq. 20 fed 80 % of pws over water (eq. 6) or over ice (eq. 5), evaluated apart from the engine.
    expect(Number(water.row[6])).toBeCloseTo(psy.GetHumRatioFromVapPres(0.8 * hylandWexlerWaterPa(-10), p) * 1000, 3);
    expect(Number(ice.row[6])).toBeCloseTo(psy.GetHumRatioFromVapPres(0.8 * hylandWexlerIcePa(-10), p) * 1000, 3);
    // relative_humidity_pct is over water: 80 % as given, or 80 % × pws,ice/pws,water = 72.56 % for the over-ice file.
    expect(water.row[5]).toBe('80.00');
    expect(Number(ice.row[5])).toBeCloseTo(72.56, 2);
    // A dew point of −10 °C comes back as −10 °C (it used to come back as a frost point, about −8.9 °C).
    expect(run(dew, []).row[4]).toBe('-10.00');
  });
});
