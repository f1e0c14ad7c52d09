/**
 * A site on a fixed UTC offset (UTC−07:00, as the importer recommends for files in local standard time):
 * an EPW typical year and a set of three yearly files go through the upload wizard, and a run on the set
 * reaches the run page with its years on the site's standard time. The wizard's preview used to crash
 * here with "Invalid time zone specified".
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { collectPageErrors, expectNoPageErrors, failedResourceLoad, startInSi } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Synthetic EPW typical-year fixture (invented station, tests/fixtures/weather/README.md).
const epw = readFileSync(new URL('../fixtures/weather/synthetic-typical-year.epw', import.meta.url));
const directAirSample = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

/**
 * One synthetic year (invented values, not a station): year, month, day, hour 1–24 (hour ending) in local
 * standard time, a seasonal and daily swing of dry-bulb and a relative humidity that falls as it warms.
 */
function yearFile(year: number): Buffer {
  const lines = ['Year,Month,Day,Hour,Dry bulb (C),RH (%)'];
  const start = Date.UTC(year, 0, 1);
  for (let h = 1; h <= 8760; h++) {
    const end = new Date(start + h * 3_600_000);
    const day = new Date(end.getTime() - 1);
    const hour = end.getUTCHours() === 0 ? 24 : end.getUTCHours();
    const season = Math.sin((2 * Math.PI * (h / 24 - 105)) / 365);
    const daily = Math.sin((2 * Math.PI * (hour - 9)) / 24);
    const dryBulbC = 14 + 11 * season + 6 * daily + (year - 2021);
    lines.push(`${day.getUTCFullYear()},${day.getUTCMonth() + 1},${day.getUTCDate()},${hour},${dryBulbC.toFixed(1)},${(62 - 18 * daily).toFixed(0)}`);
  }
  return Buffer.from(`${lines.join('\n')}\n`);
}

let h: BrowserHarness;
let engineer: TestPerson;
let projectId: number;

let pageErrors: string[] = [];

beforeAll(async () => {
  h = await startBrowserHarness();
  engineer = personWithSession(h.testApp.db, 'amara.velde@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Mesa hall study', [[engineer, 'engineer']]);
  await h.api(engineer, 'POST', `/projects/${projectId}/sites`, JSON.stringify({ name: 'Red Mesa', elevationM: 250, timeZone: 'UTC-07:00' }));

  await h.signInAs(engineer);
  pageErrors = collectPageErrors(h.page, { ignoreConsole: failedResourceLoad });
  await startInSi(h.page);
});
afterEach(() => expectNoPageErrors(pageErrors));
afterAll(() => h?.close());

async function openWizard() {
  const page = h.page;
  await page.goto(`${h.baseUrl}/projects/${projectId}/climate-files/new`);
  await page.getByRole('button', { name: 'Continue with Red Mesa' }).click();
}

describe('weather files for a site on a fixed UTC offset', () => {
  it('uploads an EPW typical year: the preview shows the site clock at UTC−07:00 instead of crashing', { timeout: 120_000 }, async () => {
    const page = h.page;
    await openWizard();
    await page.getByLabel('File', { exact: true }).setInputFiles({ name: 'quellmoor-typical.epw', mimeType: 'text/plain', buffer: epw });
    await page.getByRole('button', { name: 'Read the file' }).click();
    const first = page.getByTestId('preview-table').locator('tbody tr').first();
    // EPW record 1: 31 January hour 1 at the file's UTC+01:00, the hour from 00:00 local = 30 Jan 23:00 UTC,
    // which is 16:00 on 30 January at the site's UTC−07:00 (typical year placed in 2001).
    await expect.poll(() => first.innerText(), { timeout: 20_000 }).toMatch(/2001-01-30 23:00\s+2001-01-30 16:00/);
    await h.shot('file-sets-epw-mapping-si');
    await page.getByRole('button', { name: 'Continue to the report' }).click();
    await page.getByTestId('validation-report').waitFor();
    // the file's header offset disagrees with the site's zone, and the report says so
    expect(await page.getByTestId('validation-report').innerText()).toContain('UTC+01:00');
    await page.getByRole('button', { name: 'Store climate file' }).click();
    await page.waitForURL(/\/climate-files\/\d+$/);
    await page.getByRole('heading', { name: 'quellmoor-typical' }).waitFor();
  });

  it('uploads three yearly files as one climate file, then runs a scenario on it and reads the run page', { timeout: 180_000 }, async () => {
    const page = h.page;
    await openWizard();
    await page
      .getByLabel('File', { exact: true })
      .setInputFiles([2023, 2021, 2022].map((y) => ({ name: `red-mesa-${y}.csv`, mimeType: 'text/csv', buffer: yearFile(y) })));
    await page.getByLabel('Times written without a UTC offset are').selectOption('site-standard');
    expect(await page.getByTestId('chosen-files').innerText()).toMatch(
      /3 files, .* in all[\s\S]*red-mesa-2021\.csv[\s\S]*red-mesa-2022\.csv[\s\S]*red-mesa-2023\.csv/,
    );
    expect(await page.getByLabel('Name in the project').inputValue()).toBe('red-mesa-2021–red-mesa-2023 (3 files)');
    await h.shot('file-sets-chosen-si');

    // Slow the upload so the one progress bar over the whole set is seen moving.
    const cdp = await h.context.newCDPSession(page);
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: 200 * 1024 });
    await page.getByRole('button', { name: 'Read the 3 files' }).click();
    const bar = page.getByRole('progressbar', { name: 'Reading 3 files' });
    await expect.poll(async () => Number((await bar.getAttribute('aria-valuenow')) ?? 0), { timeout: 15_000, interval: 50 }).toBeGreaterThan(0);
    expect(Number(await bar.getAttribute('aria-valuenow'))).toBeLessThan(100);
    await h.screenshot('file-sets-progress');
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });

    await page.getByTestId('mapping-editor').waitFor({ timeout: 30_000 });
    // Hour ending 1 on 1 January 2021 at UTC−07:00: the hour from 00:00 local, 07:00 UTC.
    expect(await page.getByTestId('preview-table').locator('tbody tr').first().innerText()).toMatch(/2021-01-01 07:00\s+2021-01-01 00:00/);
    await page.getByRole('button', { name: 'Continue to the report' }).click();
    const files = page.getByTestId('files-of-set');
    await files.waitFor();
    const rows = await files.locator('tbody tr').allInnerTexts();
    expect(rows.map((r) => r.split('\t')[0])).toEqual(['red-mesa-2021.csv', 'red-mesa-2022.csv', 'red-mesa-2023.csv']);
    // each file: 8,760 hours on lines 2–8761
    for (const row of rows) expect(row).toMatch(/8,760\s+2–8761/);
    expect(await page.getByTestId('validation-report').innerText()).toContain(
      'Imported 26280 hours from 3 files, 2021-01-01 00:00 to 2023-12-31 23:00 site standard time (UTC−07:00)',
    );
    await h.shot('file-sets-report-si');
    await page.getByRole('button', { name: 'Store 3 files as one climate file' }).click();
    await page.waitForURL(/\/climate-files\/\d+$/);
    await page.getByRole('heading', { name: 'red-mesa-2021–red-mesa-2023 (3 files)' }).waitFor();
    // the file page counts years on the site's standard time: the three years, no phantom 2024
    await expect.poll(() => page.getByTestId('climate-file-facts').innerText()).toContain('2021–2023');
    await h.shot('file-sets-file-page-si');

    const { scenario } = await h.api<{ scenario: { id: number } }>(
      engineer,
      'POST',
      `/projects/${projectId}/scenarios`,
      JSON.stringify({ scenario: directAirSample }),
    );
    await page.goto(`${h.baseUrl}/projects/${projectId}/scenarios/${scenario.id}`);
    const setChoice = page.getByLabel(/Red Mesa · red-mesa-2021–red-mesa-2023 \(3 files\)/);
    const epwChoice = page.getByLabel(/Red Mesa · quellmoor-typical/);
    if (!(await setChoice.isChecked())) await setChoice.check();
    if (await epwChoice.isChecked()) await epwChoice.uncheck();
    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await page.waitForURL(/\/runs\/\d+$/);
    await expect.poll(() => page.getByTestId('run-status').innerText(), { timeout: 60_000 }).toBe('done');
    expect(await page.getByTestId('run-climate').innerText()).toContain('26,280 (2021-01-01 to 2023-12-31, site standard time UTC−07:00)');
    const years = await page.getByTestId('year-table').locator('tbody tr th').allInnerTexts();
    // year rows (the statistics rows below them are named, not numbered): three full years, no partial or phantom year
    expect(years.filter((y) => /^\d{4}/.test(y.trim())).map((y) => y.trim().slice(0, 4))).toEqual(['2021', '2022', '2023']);
    expect(years.join(' ')).not.toContain('partial');
    await h.shot('file-sets-run-page-si');
    // the report gives the same period on the site's standard time
    const runUrl = page.url();
    await page.goto(`${runUrl}/report`);
    await expect.poll(() => page.getByTestId('report-title').isVisible(), { timeout: 20_000 }).toBe(true);
    expect(await page.locator('section[aria-labelledby="job-title"]').innerText()).toContain('From 2021-01-01 to 2023-12-31 (site standard time)');
    expect(await page.getByTestId('report-years').innerText()).not.toContain('2024');
    await h.shot('file-sets-report-page-si');
    await page.goto(runUrl);
    await h.useUnits('IP');
    await page.reload();
    await expect.poll(() => page.getByTestId('run-status').innerText()).toBe('done');
    await h.shot('file-sets-run-page-ip');
    await openWizard();
    await page
      .getByLabel('File', { exact: true })
      .setInputFiles([2021, 2022].map((y) => ({ name: `red-mesa-${y}.csv`, mimeType: 'text/csv', buffer: yearFile(y) })));
    await page.getByRole('button', { name: 'Read the 2 files' }).click();
    await page.getByRole('button', { name: 'Continue to the report' }).click();
    await page.getByTestId('files-of-set').waitFor();
    await h.shot('file-sets-report-ip');
  });

  it('marks the typical-year EPW run’s partial year in the report as the run page does', { timeout: 120_000 }, async () => {
    const page = h.page;
    const { climateFiles } = await h.api<{ climateFiles: { id: number; name: string }[] }>(engineer, 'GET', `/projects/${projectId}/climate-files`);
    const epwFile = climateFiles.find((f) => f.name === 'quellmoor-typical')!;
    const { scenarios } = await h.api<{ scenarios: { id: number }[] }>(engineer, 'GET', `/projects/${projectId}/scenarios`);
    const { runs } = await h.api<{ runs: { id: number }[] }>(
      engineer,
      'POST',
      `/projects/${projectId}/runs`,
      JSON.stringify({ scenarioIds: [scenarios[0].id], climateFileIds: [epwFile.id] }),
    );
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runs[0].id}`);
    await expect.poll(() => page.getByTestId('run-status').innerText(), { timeout: 60_000 }).toBe('done');
    // 72 hours of the typical year 2001 (8,760 in the calendar year)
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runs[0].id}/report`);
    await expect.poll(() => page.getByTestId('report-years').isVisible(), { timeout: 20_000 }).toBe(true);
    expect(await page.getByTestId('report-years').innerText()).toContain('partial · left out');
    expect(await page.getByTestId('report-partial-years').innerText()).toBe(
      "Left out as partial (more than a day short of the calendar year's hours): 2001 (72 of 8,760 h).",
    );
    await h.shot('file-sets-report-partial-ip');
  });
});
