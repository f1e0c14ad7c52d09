// @ts-nocheck
import { readFileSync } from 'node:fs';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { chartsDrawn, collectPageErrors, expectNoPageErrors } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Three synthetic years for an invented mild maritime site (sample-weather/generate.ts), 26,280 hours.
const threeYears = readFileSync(new URL('../../sample-weather/kelderwick-point.csv', import.meta.url));
const directAirSample = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

let h: BrowserHarness;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let scenarioId: number;
let a2ScenarioId: number;
let climateFileId: number;
let lineSweepUrl: string;
let pageErrors: string[] = [];

// Sweep pages draw several charts as their points finish: this file waits longer for them than the default 15 s.
const manyCharts = { timeoutMs: 20_000 };

beforeAll(async () => {
  h = await startBrowserHarness();
  engineer = personWithSession(h.testApp.db, 'oona.vasquez@example.test');
  viewer = personWithSession(h.testApp.db, 'site.reviewer@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Kelderwick setpoint study', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  const { site } = await h.api<{ site: { id: number } }>(
    engineer,
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Kelderwick Point', elevationM: 14, timeZone: 'Europe/London' }),
  );
  const upload = await h.api<{ climateFile: { id: number } }>(
    engineer,
    'POST',
    `/projects/${projectId}/sites/${site.id}/climate-files?fileName=kelderwick-point.csv`,
    threeYears,
    'text/csv',
  );
  climateFileId = upload.climateFile.id;
  const { scenario } = await h.api<{ scenario: { id: number } }>(
    engineer,
    'POST',
    `/projects/${projectId}/scenarios`,
    JSON.stringify({ scenario: directAirSample }),
  );
  scenarioId = scenario.id;
  // The same design held to the A2 allowable class (ASHRAE TC 9.9 2021 as in shared/scenario/envelopes.ts, recalled from memory):
  // its 21 °C dew-point limit leaves this maritime file no hour that needs compressors for moisture.
  const a2 = {
    ...directAirSample,
    name: 'Direct outdoor air, A2 allowable (synthetic demo)',
    envelope: {
      presetId: 'ashrae-2021-a2',
      dryBulbMinC: 10,
      dryBulbMaxC: 35,
      dewPointMinC: -12,
      dewPointMaxC: 21,
      rhMinPct: 8,
      rhMaxPct: 80,
      altitudeDerating: { aboveElevationM: 900, metresPerKelvin: 300 },
    },
  };
  a2ScenarioId = (await h.api<{ scenario: { id: number } }>(engineer, 'POST', `/projects/${projectId}/scenarios`, JSON.stringify({ scenario: a2 }))).scenario
    .id;
  pageErrors = collectPageErrors(h.page);
  await h.signInAs(engineer);
  await h.page.goto(h.baseUrl);
  await h.useUnits('SI');
});
afterAll(() => h?.close());
afterEach(() => expectNoPageErrors(pageErrors));

describe('an engineer sweeping the supply setpoint', () => {
  it('starts a sweep from the scenario, sees the point count and refused points, then progress and charts', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/scenarios/${a2ScenarioId}`);
    await page.getByRole('link', { name: 'Sweep an input of this scenario' }).click();
    await page.waitForURL(/\/sweeps\/new\?scenario=\d+$/);
    // The supply setpoint is offered first, from 18 to 30 °C by 1 K: 13 points.
    await expect.poll(() => page.getByTestId('point-count').innerText(), { timeout: 10_000 }).toBe('13');
    await page.getByLabel('From (°C)').fill('16');
    await page.getByLabel('To (°C)').fill('48');
    // 16…48 °C is 33 points; the scenario schema allows the setpoint up to 45 °C, so 46, 47 and 48 are refused by name.
    await expect.poll(() => page.getByTestId('point-count').innerText(), { timeout: 10_000 }).toBe('33');
    const errors = await page.getByTestId('sweep-errors').innerText();
    expect(errors).toContain('system.supplyAirC = 46 is refused: system.supplyAirC must be a number from 5 to 45 °C (got 46)');
    expect(await page.getByRole('button', { name: /Start sweep/ }).isDisabled()).toBe(true);
    await h.shot('sweep-new-refused-si');
    await page.getByLabel('To (°C)').fill('30');
    await expect.poll(() => page.getByTestId('point-count').innerText(), { timeout: 10_000 }).toBe('15');
    await h.shot('sweep-new-si');
    await page.getByRole('button', { name: 'Start sweep of 15 runs' }).click();
    await page.waitForURL(/\/sweeps\/\d+$/, { timeout: 15_000 });
    lineSweepUrl = page.url();
    // Progress shows from the first moment (the page's code may still be loading as the address changes).
    await expect.poll(() => page.getByTestId('sweep-progress').isVisible(), { timeout: 10_000 }).toBe(true);
    await expect.poll(() => page.getByTestId('sweep-progress').innerText(), { timeout: 60_000 }).toContain('15 of 15 points done');
    await chartsDrawn(page, manyCharts);
    await expect.poll(() => page.locator('figure svg').count(), { timeout: 20_000 }).toBeGreaterThanOrEqual(4);
    expect(await page.getByTestId('sweep-table').locator('tbody tr').count()).toBe(15);
    expect(await page.getByText('Read these results as estimates').isVisible()).toBe(true);
    await h.shot('sweep-line-si');

    // The table agrees with the run it links to.
    const sweepId = Number(lineSweepUrl.split('/').pop());
    const { sweep } = await h.api<{ sweep: { points: { runId: number; results: { hours: { mechanical: number; total: number } } }[] } }>(
      engineer,
      'GET',
      `/projects/${projectId}/sweeps/${sweepId}`,
    );
    // 2021–2023 hourly, none missing: 3 × 8760 hours at every point.
    expect(sweep.points.every((p) => p.results.hours.total === 26_280)).toBe(true);
    const mechanical = sweep.points.map((p) => p.results.hours.mechanical);
    // Issue 5's invariant: raising the setpoint never adds mechanical hours.
    expect(mechanical.every((m, i) => i === 0 || m <= mechanical[i - 1])).toBe(true);
    // The page names the first swept point with zero mechanical hours, as the API's figures give it.
    const firstZero = mechanical.findIndex((m) => m === 0);
    expect(firstZero).toBeGreaterThan(0);
    expect(await page.getByTestId('zero-mechanical').innerText()).toBe(`Mechanical hours reach zero from ${(16 + firstZero).toFixed(1)} °C.`);
    await h.useUnits('IP');
    await chartsDrawn(page, manyCharts);
    expect(await page.getByTestId('sweep-axes').innerText()).toContain('60.8 … 86.0 °F');
    // 16 °C + n K in °F: 60.8 + 1.8 n (exact conversion).
    expect(await page.getByTestId('zero-mechanical').innerText()).toBe(`Mechanical hours reach zero from ${(60.8 + 1.8 * firstZero).toFixed(1)} °F.`);
    await h.shot('sweep-line-ip');
    // The form takes the range in °F: the suggested 18…30 °C by 1 K reads 64.4…86 °F by 1.8 °F, still 13 points.
    await page.goto(`${h.baseUrl}/projects/${projectId}/sweeps/new?scenario=${a2ScenarioId}`);
    await expect.poll(() => page.getByTestId('point-count').innerText(), { timeout: 10_000 }).toBe('13');
    expect(await page.getByLabel('From (°F)').inputValue()).toBe('64.4');
    expect(await page.getByLabel('Step (Δ°F)').inputValue()).toBe('1.8');
    await h.shot('sweep-new-ip');
    await h.useUnits('SI');
  });

  it('sweeps a grid of supply setpoint and evaporative effectiveness and draws it as a heat map', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/sweeps/new?scenario=${a2ScenarioId}`);
    await expect.poll(() => page.getByTestId('point-count').innerText(), { timeout: 10_000 }).toBe('13');
    await page.getByLabel('From (°C)').fill('20');
    await page.getByLabel('To (°C)').fill('28');
    await page.getByLabel('Step (K)').fill('2');
    await page.getByRole('button', { name: /Add a second input/ }).click();
    await page.getByLabel('Input').nth(1).selectOption('system.evaporativeEffectiveness');
    await page.getByLabel('From').nth(1).fill('0');
    await page.getByLabel('To').nth(1).fill('0.8');
    await page.getByLabel('Step').nth(1).fill('0.2');
    await expect.poll(() => page.getByTestId('point-count').innerText(), { timeout: 10_000 }).toBe('25');
    await page.getByRole('button', { name: 'Start sweep of 25 runs' }).click();
    await page.waitForURL(/\/sweeps\/\d+$/, { timeout: 15_000 });
    await expect.poll(() => page.getByTestId('sweep-progress').innerText(), { timeout: 60_000 }).toContain('25 of 25 points done');
    await chartsDrawn(page, manyCharts);
    await page.getByText('Table of the same figures').click();
    expect(await page.getByTestId('heat-map-table').locator('tbody tr').count()).toBe(5);
    // Points at 24 °C and above have no mechanical hours on this file (the line sweep above): their cells are outlined.
    expect(await page.locator('figure svg [stroke-dasharray="3,2"] rect').count()).toBe(15);
    await h.shot('sweep-grid-si');
    await h.useUnits('IP');
    await chartsDrawn(page, manyCharts);
    await page.getByTestId('heat-map-metric').selectOption('waterL');
    await chartsDrawn(page, manyCharts);
    expect(await page.getByTestId('heat-map-table').textContent()).toContain('Water use (US gal)');
    await h.shot('sweep-grid-ip');
    await h.useUnits('SI');
  });
});

describe('sweeping envelope presets', () => {
  it('draws hours per preset as bars, and a grid of presets × supply setpoint', async () => {
    const page = h.page;
    const presetIds = ['ashrae-2021-recommended', 'ashrae-2021-a1', 'ashrae-2021-a2', 'ashrae-2021-a3', 'ashrae-2021-a4'];
    const { sweep: line } = await h.api<{ sweep: { id: number } }>(
      engineer,
      'POST',
      `/projects/${projectId}/sweeps`,
      JSON.stringify({ scenarioId, climateFileId, axes: [{ input: 'envelope.presetId', presetIds }] }),
    );
    await page.goto(`${h.baseUrl}/projects/${projectId}/sweeps/${line.id}`);
    await expect.poll(() => page.getByTestId('sweep-progress').innerText(), { timeout: 60_000 }).toContain('5 of 5 points done');
    await chartsDrawn(page, manyCharts);
    expect(await page.getByTestId('sweep-table').innerText()).toContain('Allowable A4 (2021)');
    await h.shot('sweep-presets-si');
    const { sweep: grid } = await h.api<{ sweep: { id: number } }>(
      engineer,
      'POST',
      `/projects/${projectId}/sweeps`,
      JSON.stringify({
        scenarioId,
        climateFileId,
        axes: [
          { input: 'system.supplyAirC', from: 18, to: 27, step: 3 },
          { input: 'envelope.presetId', presetIds },
        ],
      }),
    );
    await page.goto(`${h.baseUrl}/projects/${projectId}/sweeps/${grid.id}`);
    await expect.poll(() => page.getByTestId('sweep-progress').innerText(), { timeout: 60_000 }).toContain('20 of 20 points done');
    await chartsDrawn(page, manyCharts);
    await h.useUnits('IP');
    await chartsDrawn(page, manyCharts);
    await h.shot('sweep-presets-grid-ip');
    await h.useUnits('SI');
  });
});

describe('a viewer', () => {
  it('sees the sweeps and their charts but cannot start one', async () => {
    await h.signInAs(viewer);
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}`);
    await expect.poll(() => page.getByTestId('sweeps-list').locator('li').count(), { timeout: 15_000 }).toBe(4);
    expect(await page.getByRole('link', { name: 'New sweep' }).count()).toBe(0);
    await h.shot('sweeps-panel-viewer');
    await page.goto(lineSweepUrl);
    await chartsDrawn(page, manyCharts);
    expect(await page.getByRole('button', { name: /Delete sweep/ }).count()).toBe(0);
    await page.goto(`${h.baseUrl}/projects/${projectId}/sweeps/new?scenario=${scenarioId}`);
    await expect.poll(() => page.getByText('Viewers can read sweeps but not start them').isVisible(), { timeout: 10_000 }).toBe(true);
    expect(await page.getByRole('button', { name: /Start sweep/ }).isDisabled()).toBe(true);
  });
});
