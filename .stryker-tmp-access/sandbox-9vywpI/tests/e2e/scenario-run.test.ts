// @ts-nocheck
import { readFileSync } from 'node:fs';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { chartsDrawn, collectPageErrors, expectNoPageErrors } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Synthetic test weather: 72 hours of July, never above 22 °C (tests/fixtures/api/three-days.csv).
const threeDays = readFileSync(new URL('../fixtures/api/three-days.csv', import.meta.url));
// Three synthetic years for an invented mild maritime site (sample-weather/generate.ts), for the run page at full size.
const threeYears = readFileSync(new URL('../../sample-weather/kelderwick-point.csv', import.meta.url));
const directAirSample = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

let h: BrowserHarness;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let firstRunId: number;
let secondRunId: number;
let scenarioId: number;

/** Errors the page logs or throws; each test must end with none. */
let pageErrors: string[] = [];

beforeAll(async () => {
  h = await startBrowserHarness();
  engineer = personWithSession(h.testApp.db, 'idris.calloway@example.test');
  viewer = personWithSession(h.testApp.db, 'client.reviewer@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Harbour hall retrofit', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  const { site } = await h.api<{ site: { id: number } }>(
    engineer,
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Saltmarsh Point', elevationM: 120 }),
  );
  await h.api(engineer, 'POST', `/projects/${projectId}/sites/${site.id}/climate-files?fileName=three-days.csv`, threeDays, 'text/csv');
  pageErrors = collectPageErrors(h.page);
  await h.signInAs(engineer);
  await h.page.goto(h.baseUrl);
  await h.useUnits('SI');
});
afterAll(() => h?.close());
afterEach(() => expectNoPageErrors(pageErrors));

describe('an engineer designing, running and comparing scenarios', () => {
  it('creates a scenario, sees the quick preview, saves and runs it, and reads the run page', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/scenarios/new`);
    await page.getByLabel('Name').fill('Direct air, 24 °C supply');
    await page.getByLabel('Supply air setpoint').fill('24');
    // The preview covers all 72 hours of the file once typing pauses.
    await expect.poll(() => page.getByTestId('mode-preview').innerText(), { timeout: 15_000 }).toContain('72 h');
    // An out-of-range value is refused next to its field, in the person's units.
    await page.getByLabel('Rise across the IT').fill('90');
    await expect.poll(() => page.getByText('Enter a number from 1 to 40 K.').isVisible()).toBe(true);
    await h.shot('scenario-editor-invalid-si');
    await page.getByLabel('Rise across the IT').fill('12');
    await h.shot('scenario-editor-si');

    await page.getByRole('button', { name: 'Save and run' }).click();
    await page.waitForURL(/\/runs\/\d+$/, { timeout: 15_000 });
    firstRunId = Number(page.url().split('/').pop());
    await expect.poll(() => page.getByTestId('run-status').innerText(), { timeout: 20_000 }).toBe('done');
    const hoursTable = await page.getByTestId('mode-hours').innerText();
    // 72 hours in the file; none above 22 °C, so with a 24 °C supply and 1 K fan heat no hour needs compressors for
    // temperature, and its moisture stays under the A1 17 °C dew-point limit (as tests/api/runs.test.ts finds).
    expect(hoursTable).toMatch(/All hours\s+72/);
    expect(hoursTable).toMatch(/Mechanical\s+0\s+0\.0 %/);
    expect(await page.getByTestId('ppue').innerText()).toMatch(/^1\.\d{3}$/);
    await chartsDrawn(page);
    await expect.poll(() => page.getByTestId('bin-table').locator('tbody tr').count(), { timeout: 15_000 }).toBeGreaterThan(2);
    // Sorting the bins by their hour count puts the fullest bin first (or last), as the heading says.
    const binTable = page.getByTestId('bin-table');
    await binTable.getByRole('button', { name: 'All (h)' }).click();
    const sortedBy = await binTable.getByRole('columnheader', { name: /All \(h\)/ }).getAttribute('aria-sort');
    expect(['ascending', 'descending']).toContain(sortedBy);
    const totals = (await binTable.locator('tbody tr td:nth-last-child(2)').allInnerTexts()).map((t) => Number(t.replace(/,/g, '')));
    const ordered = [...totals].sort((x, y) => (sortedBy === 'ascending' ? x - y : y - x));
    expect(totals).toEqual(ordered);
    expect(await page.getByTestId('run-inputs').innerText()).toContain('system.supplyAirC');
    expect(await page.getByText('Read these results as estimates').isVisible()).toBe(true);
    await h.shot('run-page-si');
    await h.useUnits('IP');
    await chartsDrawn(page);
    expect(await page.getByTestId('run-inputs').innerText()).toContain('75.2 °F');
    // In IP the bins are 5 °F on a 0 °F grid, whole-degree edges (three-days.csv peaks at 22.0 °C = 71.6 °F, °F = 1.8 °C + 32).
    const firstBin = () => page.getByTestId('bin-table').locator('tbody tr th').first().innerText();
    await expect.poll(firstBin, { timeout: 30_000 }).toMatch(/^70(\.0)? to 75(\.0)?$/);
    expect(await page.getByText('Bins of 5 °F of outdoor dry-bulb').count()).toBe(1);
    await h.shot('run-page-ip');
  });

  it('edits the scenario in IP units, runs it again and compares the two runs', async () => {
    const page = h.page;
    await page.getByRole('link', { name: 'Open scenario' }).click();
    await page.waitForURL(/\/scenarios\/\d+$/);
    scenarioId = Number(page.url().split('/').pop());
    // 59 °F is 15 °C exactly: the form keeps SI whatever the person types in.
    await page.getByLabel('Supply air setpoint').fill('59');
    await page.getByLabel('Name').fill('Direct air, 15 °C supply');
    await h.shot('scenario-editor-ip');
    // Leaving with unsaved edits asks first; staying keeps them.
    page.once('dialog', (dialog) => void dialog.dismiss());
    await page.getByRole('link', { name: 'Air-state calculator' }).click();
    expect(page.url()).toMatch(/\/scenarios\/\d+$/);
    expect(await page.getByLabel('Supply air setpoint').inputValue()).toBe('59');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await expect.poll(() => page.getByText('Unsaved changes').isVisible()).toBe(false);
    await expect.poll(() => page.getByTestId('scenario-runs').innerText()).toContain('Saltmarsh Point');
    const stored = await h.api<{ scenario: { scenario: { system: { supplyAirC: number } } } }>(
      engineer,
      'GET',
      `/projects/${projectId}/scenarios/${scenarioId}`,
    );
    expect(stored.scenario.scenario.system.supplyAirC).toBeCloseTo(15, 9);

    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await page.waitForURL(/\/runs\/\d+$/);
    secondRunId = Number(page.url().split('/').pop());
    await expect.poll(() => page.getByTestId('run-status').innerText(), { timeout: 20_000 }).toBe('done');

    await page.goto(`${h.baseUrl}/projects/${projectId}/compare?runs=${firstRunId},${secondRunId}`);
    const table = page.getByTestId('comparison-table');
    await table.waitFor();
    const text = await table.innerText();
    expect(text).toContain('baseline');
    expect(text).toContain('Direct air, 15 °C supply');
    await chartsDrawn(page);
    await h.shot('compare-ip');
    await h.useUnits('SI');
    await chartsDrawn(page);
    await h.shot('compare-si');
  });

  it('offers the water-side fields and words a cross-field refusal in the editor’s terms', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/scenarios/new`);
    await page.getByLabel('Water-side economiser').check();
    await page.getByLabel('Heat rejection').selectOption('dry-cooler');
    await page.getByLabel('Chilled-water supply').fill('30');
    await expect.poll(() => page.getByText('“Chilled-water supply” must be below “supply air setpoint”.').isVisible()).toBe(true);
    expect(await page.getByLabel('Approach', { exact: true }).isVisible()).toBe(true);
    await h.shot('scenario-editor-water-side-si');
    // A cooling tower brings its own inputs: freeze protection, drift and basin heaters (engine 2.0.0).
    await page.getByLabel('Heat rejection').selectOption('cooling-tower');
    expect(await page.getByLabel('Tower freeze-protection wet-bulb').isVisible()).toBe(true);
    expect(await page.getByLabel('Tower drift').inputValue()).toBe('0.02');
    await h.shot('scenario-editor-tower-si');
    page.once('dialog', (dialog) => void dialog.accept());
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Projects' }).click();
    await page.waitForURL(`${h.baseUrl}/`);
  });

  it('shows the envelope library and the air-state calculator', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/envelopes`);
    await expect.poll(() => page.getByTestId('envelope-entry').count()).toBeGreaterThan(5);
    await page.getByLabel('Name', { exact: true }).fill('Client hall limits');
    await page.getByRole('textbox', { name: /Dry-bulb, lowest/ }).fill('18');
    await page.getByRole('textbox', { name: /Dry-bulb, highest/ }).fill('29');
    await page.getByRole('textbox', { name: /Dew point, lowest/ }).fill('-9');
    await page.getByRole('textbox', { name: /Dew point, highest/ }).fill('15');
    await page.getByRole('textbox', { name: /RH, lowest/ }).fill('8');
    await page.getByRole('textbox', { name: /RH, highest/ }).fill('70');
    await page.getByRole('button', { name: 'Add envelope' }).click();
    await expect.poll(() => page.getByTestId('envelope-entry').filter({ hasText: 'Client hall limits' }).count()).toBe(1);
    await chartsDrawn(page);
    await h.shot('envelopes-si');
    await h.useUnits('IP');
    await chartsDrawn(page);
    expect(await page.getByTestId('envelope-entry').first().innerText()).toContain('64.4–80.6 °F dry-bulb');
    await h.shot('envelopes-ip');
    await h.useUnits('SI');
    // Deleting asks first; the published presets stay.
    page.once('dialog', (dialog) => void dialog.accept());
    await page.getByTestId('envelope-entry').filter({ hasText: 'Client hall limits' }).getByRole('button', { name: 'Delete' }).click();
    await expect.poll(() => page.getByTestId('envelope-entry').filter({ hasText: 'Client hall limits' }).count()).toBe(0);
    expect(await page.getByTestId('envelope-entry').count()).toBeGreaterThan(5);

    await page.getByRole('link', { name: 'Air-state calculator' }).click();
    await page.waitForURL('**/calculator');
    // 30 °C, 50 % RH at 101.325 kPa: psychrolib 1.1.1 GetTWetBulbFromRelHum(30, 0.5, 101325) = 22.005 °C (reference library).
    const state = page.getByTestId('calculated-state');
    await expect.poll(() => state.innerText()).toMatch(/Wet-bulb \(thermodynamic\)\s+22\.0 °C/);
    await chartsDrawn(page);
    await h.shot('calculator-si');
    // A third property over-determines the state; the engine's own words are shown.
    await page.getByLabel(/^Dew point/).fill('10');
    await expect.poll(() => page.getByTestId('calculator-refusal').innerText()).toContain('moist air has three independent properties');
    await h.shot('calculator-refused');
    await h.useUnits('IP');
    await page.getByLabel(/^Dry-bulb/).fill('86');
    await page.getByLabel(/^Relative humidity/).fill('50');
    // 22.005 °C = 71.6 °F.
    await expect.poll(() => state.innerText()).toMatch(/Wet-bulb \(thermodynamic\)\s+71\.6 °F/);
    await chartsDrawn(page);
    await h.shot('calculator-ip');
    await h.useUnits('SI');
  });
});

describe('a run still computing', () => {
  it('says it is running and since when, with no made-up progress bar, and can be cancelled', async () => {
    // The pool finishes a 72-hour run in milliseconds, so the server's answers for one run are held at "running" here.
    const { run } = await h.api<{ run: Record<string, unknown> }>(engineer, 'GET', `/projects/${projectId}/runs/${firstRunId}`);
    let state: Record<string, unknown> = {
      ...run,
      id: 9001,
      status: 'running',
      progress: 0,
      startedAt: '2026-03-02T09:15:07Z',
      results: null,
      finishedAt: null,
    };
    const page = h.page;
    await page.route(`**/api/projects/${projectId}/runs/9001`, (route) => route.fulfill({ json: { run: state } }));
    await page.route(`**/api/projects/${projectId}/runs/9001/cancel`, (route) => {
      state = { ...state, status: 'cancelled' };
      return route.fulfill({ json: { run: state } });
    });
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/9001`);
    await page.getByTestId('run-progress').waitFor();
    expect(await page.getByTestId('run-progress').getByRole('status').innerText()).toMatch(/^Classifying [\d,]+ hours…/);
    expect(await page.getByTestId('run-started').innerText()).toBe(`started ${new Date('2026-03-02T09:15:07Z').toLocaleTimeString('en-GB')}`);
    expect(await page.getByTestId('run-progress').getByRole('progressbar').count()).toBe(0);
    await h.shot('run-page-running-si');
    await page.getByRole('button', { name: 'Cancel run' }).click();
    await expect.poll(() => page.getByTestId('run-status').innerText()).toBe('cancelled');
    expect(await page.getByText('The run was cancelled').isVisible()).toBe(true);
    await page.unrouteAll();
  });
});

describe('a run over several years of weather', () => {
  it('draws the monthly hours, carpet, moist-air chart and bins of 26,280 hours', async () => {
    const { site } = await h.api<{ site: { id: number } }>(
      engineer,
      'POST',
      `/projects/${projectId}/sites`,
      JSON.stringify({ name: 'Kelderwick Point', elevationM: 14, timeZone: 'Europe/London' }),
    );
    const { climateFile } = await h.api<{ climateFile: { id: number } }>(
      engineer,
      'POST',
      `/projects/${projectId}/sites/${site.id}/climate-files?fileName=kelderwick-point.csv`,
      threeYears,
      'text/csv',
    );
    const scenario = { ...directAirSample, name: 'Direct air, 20 °C supply, evaporative assist', system: { ...directAirSample.system, supplyAirC: 20 } };
    const { scenario: stored } = await h.api<{ scenario: { id: number } }>(engineer, 'POST', `/projects/${projectId}/scenarios`, JSON.stringify({ scenario }));
    const { runs } = await h.api<{ runs: { id: number }[] }>(
      engineer,
      'POST',
      `/projects/${projectId}/runs`,
      JSON.stringify({ scenarioIds: [stored.id], climateFileIds: [climateFile.id] }),
    );
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runs[0].id}`);
    await expect.poll(() => page.getByTestId('run-status').innerText(), { timeout: 30_000 }).toBe('done');
    // 2021–2023 hourly, none missing: 3 × 8760 hours.
    expect(await page.getByTestId('mode-hours').innerText()).toMatch(/All hours\s+26,280/);
    await chartsDrawn(page);
    await expect.poll(() => page.getByTestId('bin-table').locator('tbody tr').count(), { timeout: 15_000 }).toBeGreaterThan(8);
    // The carpet's hover text is written for the cell under the pointer: 1 July, 12:00–13:00 on a 3-year file.
    const carpet = page.getByRole('figure', { name: /Cooling mode by day of year/ });
    const image = carpet.locator('[data-mark="raster"] image');
    // 1 July is day 183 of the leap-year calendar, column 182 of 365 once 29 February (not in 2021–2023) is closed.
    // The pointer moves on each try (by half a pixel, within the cell), in case the figure was drawn again meanwhile.
    let nudge = 0;
    const hoverText = async () => {
      await image.scrollIntoViewIfNeeded();
      const box = (await image.boundingBox())!;
      await page.mouse.move(box.x + (box.width * 181.5) / 365 + (nudge++ % 2) / 2, box.y + (box.height * 12.5) / 24);
      return carpet.locator('[data-mark="tip"]').textContent();
    };
    await expect.poll(hoverText, { timeout: 15_000 }).toMatch(/1 Jul, 12:00–13:00.*most frequent of 3 years/);
    await h.shot('run-page-years-si');
    await h.useUnits('IP');
    await chartsDrawn(page);
    await h.shot('run-page-years-ip');
    await h.useUnits('SI');
  }, 150_000);
});

describe('a viewer of the project', () => {
  it('sees the results and cannot edit or run', async () => {
    await h.signInAs(viewer);
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${firstRunId}`);
    await expect.poll(() => page.getByTestId('run-status').innerText(), { timeout: 15_000 }).toBe('done');
    expect(await page.getByTestId('mode-hours').innerText()).toMatch(/All hours\s+72/);
    await page.goto(`${h.baseUrl}/projects/${projectId}/scenarios/${scenarioId}`);
    // The editor also draws the design on the moist-air chart; on a busy machine that takes a while.
    await expect.poll(() => page.getByText('Read-only').isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByLabel('Supply air setpoint').isDisabled()).toBe(true);
    expect(await page.getByRole('button', { name: /Save/ }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /Run/ }).count()).toBe(0);
    await h.shot('scenario-viewer-si');
    // The server refuses the change too, whatever the screen shows.
    const res = await fetch(`${h.baseUrl}/api/projects/${projectId}/runs`, {
      method: 'POST',
      headers: { cookie: viewer.cookie, 'x-tramontane-request': '1', 'content-type': 'application/json' },
      body: JSON.stringify({ scenarioIds: [scenarioId], climateFileIds: [1] }),
    });
    expect(res.status).toBe(403);
  });
});
