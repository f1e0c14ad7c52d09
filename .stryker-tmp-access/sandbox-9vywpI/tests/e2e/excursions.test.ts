// @ts-nocheck
import { readFileSync } from 'node:fs';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import path from 'node:path';
import { screenshotFolder, startBrowserHarness, type BrowserHarness } from '../support/browser';
import { collectPageErrors, expectNoPageErrors } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Three synthetic years for an invented mild maritime site (sample-weather/generate.ts; labelled synthetic in the file).
const threeYears = readFileSync(new URL('../../sample-weather/kelderwick-point.csv', import.meta.url));
const directAirSample = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

let h: BrowserHarness;
let operator: TestPerson;
let projectId: number;
const runIds: number[] = [];
/** The same file on a site an hour east of UTC: its local calendar years are cut by an hour at each end. */
let shiftedRunId: number;
let pageErrors: string[] = [];

/** A close-up of the panel holding `testId`, for reading figures the full page shrinks. */
async function panelShot(testId: string, name: string) {
  await h.page.locator('section', { has: h.page.getByTestId(testId) }).screenshot({ path: path.join(screenshotFolder, `${name}.png`) });
}

beforeAll(async () => {
  h = await startBrowserHarness();
  operator = personWithSession(h.testApp.db, 'wren.okafor@example.test');
  projectId = projectWithMembers(h.testApp.db, 'North hall setpoint review', [[operator, 'engineer']]);
  const { site } = await h.api<{ site: { id: number } }>(
    operator,
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Kelderwick Point', elevationM: 20, timeZone: 'UTC' }),
  );
  const { climateFile } = await h.api<{ climateFile: { id: number } }>(
    operator,
    'POST',
    `/projects/${projectId}/sites/${site.id}/climate-files?fileName=kelderwick-point.csv`,
    threeYears,
    'text/csv',
  );
  for (const supplyAirC of [25, 20]) {
    const { scenario } = await h.api<{ scenario: { id: number } }>(
      operator,
      'POST',
      `/projects/${projectId}/scenarios`,
      JSON.stringify({ scenario: { ...directAirSample, name: `Direct air, ${supplyAirC} °C supply`, system: { ...directAirSample.system, supplyAirC } } }),
    );
    const { runs } = await h.api<{ runs: { id: number }[] }>(
      operator,
      'POST',
      `/projects/${projectId}/runs`,
      JSON.stringify({ scenarioIds: [scenario.id], climateFileIds: [climateFile.id] }),
    );
    runIds.push(runs[0].id);
  }
  const east = await h.api<{ site: { id: number } }>(
    operator,
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Kelderwick East', elevationM: 20, timeZone: 'Europe/Oslo' }),
  );
  const eastFile = await h.api<{ climateFile: { id: number } }>(
    operator,
    'POST',
    `/projects/${projectId}/sites/${east.site.id}/climate-files?fileName=kelderwick-point.csv`,
    threeYears,
    'text/csv',
  );
  const { scenario } = await h.api<{ scenario: { id: number } }>(
    operator,
    'POST',
    `/projects/${projectId}/scenarios`,
    JSON.stringify({ scenario: directAirSample }),
  );
  const shifted = await h.api<{ runs: { id: number }[] }>(
    operator,
    'POST',
    `/projects/${projectId}/runs`,
    JSON.stringify({ scenarioIds: [scenario.id], climateFileIds: [eastFile.climateFile.id] }),
  );
  shiftedRunId = shifted.runs[0].id;
  await h.testApp.runQueue.idle();
  pageErrors = collectPageErrors(h.page);
  await h.signInAs(operator);
  await h.page.goto(h.baseUrl);
  await h.useUnits('SI');
}, 120_000);
afterAll(() => h?.close());
afterEach(() => expectNoPageErrors(pageErrors));

describe('year-to-year statistics of a three-year file', () => {
  it('shows median, P10, P90 and worst years on the run page, in SI and IP', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runIds[1]}`);
    await page.getByTestId('year-table').waitFor({ timeout: 20_000 });
    const stats = await page.getByTestId('year-statistics').innerText();
    expect(stats).toContain('Median year');
    expect(stats).toContain('P90 year');
    expect(stats).toContain('Standard deviation');
    const notes = await page.getByTestId('year-notes').innerText();
    expect(notes).toMatch(/Worst year: \d{4}/);
    expect(notes).toContain('nearest rank');
    // The file covers 2021–2023 whole (synthetic, hourly), so no year is set aside as partial.
    expect(notes).toContain('over 3 full calendar years');
    expect(notes).not.toContain('Left out as partial');
    await h.shot('run-year-statistics-si');
    await panelShot('year-table', 'run-year-statistics-panel-si');
    await h.useUnits('IP');
    await page.getByTestId('year-table').waitFor({ timeout: 20_000 });
    await panelShot('year-table', 'run-year-statistics-panel-ip');
    await h.useUnits('SI');
  });

  it("counts a year an hour short on the site's clock as whole, and leaves out the hour that spills into the next", async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${shiftedRunId}`);
    await page.getByTestId('year-table').waitFor({ timeout: 20_000 });
    // The file runs 2021-01-01 00:00 to 2023-12-31 23:00 UTC; on UTC+01:00 standard time 2021 starts an hour late
    // (8,759 of 8,760 h, within a day of whole, so it counts) and 2024 holds one hour: partial, so the statistics
    // are over 2021–2023.
    const notes = await page.getByTestId('year-notes').innerText();
    expect(notes).toContain('over 3 full calendar years');
    expect(notes).not.toContain('2021 (');
    expect(notes).toContain('2024 (1 of 8,784 h)');
    expect(await page.getByTestId('year-table').innerText()).toContain('partial · left out');
    await panelShot('year-table', 'run-year-statistics-partial-si');
  });

  it("shows each run's mechanical-hour spread on the compare page", async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/compare?runs=${runIds.join(',')}`);
    const table = page.getByTestId('year-spread-table');
    await table.waitFor({ timeout: 20_000 });
    await expect.poll(() => table.innerText()).toMatch(/Run \d+[\s\S]*Run \d+/);
    expect(await table.innerText()).not.toContain('loading');
    await h.shot('compare-year-spread-si');
    await panelShot('year-spread-table', 'compare-year-spread-panel-si');
  });
});

describe('an operator checking a proposed setpoint for excursions', () => {
  it('works out a floating supply, in SI and IP, and prints without the navigation', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runIds[1]}/excursions`);
    await page.getByTestId('excursion-figures').waitFor({ timeout: 30_000 });
    // The run's own 20 °C setpoint, held: mixing keeps every hour at 20 °C or a coil holds it, so inside 18–27 °C for dry-bulb.
    expect(await page.getByTestId('proposal-summary').innerText()).toContain('supply setpoint 20.0 °C');

    // Propose letting the supply float up to 30 °C (typed in SI).
    await page.getByLabel('Let the supply float up before evaporative cooling or compressors start').check();
    await page.getByLabel('Float up to').fill('30');
    await page.getByRole('button', { name: 'Work it out' }).click();
    await page.waitForURL(/floatUpToC=30/);
    await expect.poll(() => page.getByTestId('proposal-summary').innerText(), { timeout: 30_000 }).toContain('floating up to 30.0 °C');
    const figures = await page.getByTestId('excursion-figures').innerText();
    expect(figures).toContain('Longest consecutive excursion');
    expect(figures).toMatch(/Time-weighted X-factor[\s\S]*\d\.\d{3}/);
    expect(await page.getByTestId('x-factor-table').innerText()).toContain('1.00');
    expect(await page.getByText('Recalled from memory').first().isVisible()).toBe(true);
    expect(await page.getByTestId('method-notes').innerText()).toContain('only the hourly limit can');
    expect(await page.getByText('Read these results as estimates').isVisible()).toBe(true);
    await h.shot('excursions-si');

    await h.useUnits('IP');
    await page.getByTestId('excursion-figures').waitFor({ timeout: 30_000 });
    // 30 °C is 86 °F; the limit of 20 K/h is 36 °F/h.
    expect(await page.getByTestId('proposal-summary').innerText()).toContain('86.0 °F');
    expect(await page.getByTestId('rate-of-change').innerText()).toContain('36.0 °F/h');
    await h.shot('excursions-ip');

    // A setpoint typed in °F travels in SI: 77 °F is 25 °C.
    await page.getByLabel('Supply setpoint at the IT inlet').fill('77');
    await page.getByRole('button', { name: 'Work it out' }).click();
    await page.waitForURL(/supplyAirC=25(&|$)/);
    await expect.poll(() => page.getByTestId('proposal-summary').innerText(), { timeout: 30_000 }).toContain('supply setpoint 77.0 °F');
    // A ceiling below the setpoint is refused beside the field, without a request.
    await page.getByLabel('Float up to').fill('70');
    await page.getByRole('button', { name: 'Work it out' }).click();
    await expect.poll(() => page.getByText('Enter a ceiling at or above the setpoint.').isVisible()).toBe(true);

    await h.useUnits('SI');
    await page.getByTestId('excursion-figures').waitFor({ timeout: 30_000 });
    await page.emulateMedia({ media: 'print' });
    expect(await page.locator('header.bg-harbour').isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Work it out' }).isVisible()).toBe(false);
    expect(await page.getByTestId('excursion-figures').isVisible()).toBe(true);
    await h.shot('excursions-print');
    await page.emulateMedia({ media: 'screen' });
  });
});
