// @ts-nocheck
import { readFileSync } from 'node:fs';
import { eq } from 'drizzle-orm';
import { fileURLToPath } from 'node:url';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { sites } from '../../server/db/schema';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { collectPageErrors, expectNoPageErrors, failedResourceLoad, startInSi } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { psychrolib } from '../unit/psychrometrics/reference-psychrolib';

const sampleFile = fileURLToPath(new URL('../../sample-weather/zimna-dolina.csv', import.meta.url));

let h: BrowserHarness;
let projectId: number;
let viewer: TestPerson;
let engineer: TestPerson;
/** Errors the page logs (React warnings, uncaught exceptions); a refused request's own log line is expected. */
let pageErrors: string[] = [];

beforeAll(async () => {
  h = await startBrowserHarness();
  engineer = personWithSession(h.testApp.db, 'marta.oyelaran@example.test');
  viewer = personWithSession(h.testApp.db, 'kofi.lindqvist@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Valley campus study', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  await h.signInAs(engineer);
  pageErrors = collectPageErrors(h.page, { ignoreConsole: failedResourceLoad });
  // Start every journey in SI; the IP screenshots switch on the page.
  await startInSi(h.page);
});
afterEach(() => expectNoPageErrors(pageErrors));
afterAll(() => h?.close());

describe('an engineer adding hourly weather to a project', () => {
  it('opens the project, creates a site, uploads a file through the mapping and the report, and sees the climate file page', { timeout: 120_000 }, async () => {
    const page = h.page;
    await page.goto(h.baseUrl);
    await page.getByRole('link', { name: 'Valley campus study' }).click();
    await page.waitForURL(`**/projects/${projectId}`);
    await expect.poll(() => page.getByRole('heading', { name: 'Valley campus study' }).isVisible()).toBe(true);
    await expect.poll(() => page.getByText('No climate files yet.').isVisible()).toBe(true);
    await h.screenshot('project-overview-empty');

    await page.getByRole('link', { name: 'Upload climate file' }).click();
    await page.waitForURL(`**/projects/${projectId}/climate-files/new`);
    // No site yet: the wizard opens the site form.
    await page.getByLabel('Site name').fill('Zimna Dolina');
    await page.getByLabel('Elevation (m)').fill('412');
    await page.getByLabel('Time zone').fill('Europe/Warsaw');
    await page.getByRole('button', { name: 'Save site' }).click();
    await page.getByRole('button', { name: 'Continue with Zimna Dolina' }).click();

    await page.getByLabel('File', { exact: true }).setInputFiles(sampleFile);
    expect(await page.getByLabel('Name in the project').inputValue()).toBe('zimna-dolina');
    // Slow the upload to about 300 kB/s so the progress bar can be seen moving through the 870 kB file.
    const cdp = await h.context.newCDPSession(page);
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: 300 * 1024 });
    await page.getByRole('button', { name: 'Read the file' }).click();
    const bar = page.getByRole('progressbar', { name: 'Reading the file' });
    await expect.poll(async () => Number((await bar.getAttribute('aria-valuenow')) ?? 0), { timeout: 10_000, interval: 50 }).toBeGreaterThan(0);
    expect(Number(await bar.getAttribute('aria-valuenow'))).toBeLessThan(100);
    await h.screenshot('climate-upload-progress');
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });

    // The mapping step: the detected layout of this semicolon file with decimal commas and hPa.
    await page.getByTestId('mapping-editor').waitFor();
    expect(await page.locator('#map-delimiter').inputValue()).toBe(';');
    expect(await page.getByLabel('Decimal separator').inputValue()).toBe(',');
    expect(await page.getByLabel('Pressure unit').inputValue()).toBe('hPa');
    expect(await page.getByLabel('Humidity measure').inputValue()).toBe('relative-humidity');
    // First row of the file: 01.01.2021 00:00 local (UTC+1 in winter), −9.6 °C, 983.2 hPa = 98.32 kPa.
    const firstRow = page.getByTestId('preview-table').locator('tbody tr').first();
    expect(await firstRow.innerText()).toMatch(/2020-12-31 23:00\s+2021-01-01 00:00\s+-9\.6\s+82\.1\s+98\.32/);
    await h.screenshot('climate-upload-mapping-si');

    await page.getByRole('button', { name: 'Continue to the report' }).click();
    await page.getByTestId('validation-report').waitFor();
    expect(await page.getByText('The file can be stored').isVisible()).toBe(true);
    await h.screenshot('climate-upload-report');

    await page.getByRole('button', { name: 'Store climate file' }).click();
    await page.waitForURL(/\/climate-files\/\d+$/);
    await page
      .getByRole('heading', { name: 'zimna-dolina' })
      .waitFor()
      .catch(async (e) => {
        await h.screenshot('climate-file-page-failed');
        throw e;
      });
    expect(await page.getByTestId('climate-file-facts').innerText()).toContain('2021–2023');
    expect(await page.getByTestId('design-label').innerText()).toContain('Computed from this file, not published station values');
    // Both charts drawn: the carpet and the moist-air chart each render an SVG.
    await expect.poll(() => page.locator('figure svg').count(), { timeout: 20_000 }).toBeGreaterThanOrEqual(2);
    await page.waitForTimeout(300);
    await h.screenshot('climate-file-page-si');

    // The moist-air chart's own switch is local to the chart (issue 17); the person's setting switches the page.
    await h.useUnits('IP');
    await expect.poll(() => page.getByRole('heading', { name: 'Monthly dry-bulb and dew point (°F)' }).isVisible()).toBe(true);
    // Pointing at the chart gives the state there in full, and the hours of the cell it falls in.
    await expect.poll(() => page.getByTestId('moist-air-chart').locator('figure svg').last().textContent()).toContain('gr/lb');
    const figure = page.getByTestId('moist-air-figure').locator('svg').first();
    await figure.scrollIntoViewIfNeeded();
    const box = (await figure.boundingBox())!;
    await page.mouse.move(box.x + box.width * 0.35, box.y + box.height * 0.85);
    await expect.poll(() => page.getByTestId('chart-hover').innerText()).toContain('Wet-bulb');
    expect(await page.getByTestId('chart-hover').innerText()).toMatch(/°F/);
    await h.screenshot('climate-file-page-ip-hover');
    // The text alternatives, and the page on a laptop and on a wide monitor.
    for (const summary of await page.getByText('Table of the same figures').all()) await summary.click();
    await expect.poll(() => page.getByTestId('moist-air-chart').innerText(), { timeout: 15_000 }).toMatch(/26,280 of 26,280 hours with data/);
    await page.setViewportSize({ width: 1280, height: 800 });
    await h.screenshot('climate-file-page-ip-tables-1280');
    await page.setViewportSize({ width: 1920, height: 1080 });
    await page.waitForTimeout(400);
    await h.screenshot('climate-file-page-ip-1920');
    await page.setViewportSize({ width: 1440, height: 900 });
    await page.getByRole('group', { name: 'Chart projection' }).getByRole('button', { name: 'h–x diagram' }).click();
    await page.waitForTimeout(500);
    await h.screenshot('climate-file-page-ip-hx');
  });

  it('shows the IP preview in the wizard with both unit systems side by side', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/climate-files/new`);
    await page.getByRole('button', { name: /Continue with/ }).click();
    await page.getByLabel('File', { exact: true }).setInputFiles(fileURLToPath(new URL('../fixtures/api/three-days.csv', import.meta.url)));
    await page.getByRole('button', { name: 'Read the file' }).click();
    await page.getByTestId('mapping-editor').waitFor();
    // 8.3 °C = 46.9 °F; 101.3 kPa = 29.91 inHg (NIST SP 811: 1 inHg = 3386.389 Pa).
    expect(await page.getByTestId('preview-table').locator('tbody tr').first().innerText()).toMatch(
      /2023-07-01 00:00\s+2023-07-01 02:00\s+8\.3\s+46\.9\s+88\.0\s+88\.0\s+101\.30\s+29\.91/,
    );
    await h.screenshot('climate-upload-mapping-ip');
    // Override the detected unit: read as °F, 8.3 °F is (8.3 − 32)/1.8 = −13.2 °C.
    await page.getByLabel('Dry-bulb unit').selectOption('F');
    expect(await page.getByText('Changed: the hours below still show the previous reading.').isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Read again with these choices' }).click();
    await expect.poll(() => page.getByTestId('preview-table').locator('tbody tr').first().innerText()).toMatch(/02:00\s+-13\.2\s+8\.3\s/);
    expect(await page.getByTestId('mapping-editor').innerText()).toContain('set by you');
    await page.goto(`${h.baseUrl}/projects/${projectId}`);
    await expect.poll(() => page.getByRole('link', { name: 'zimna-dolina' }).isVisible()).toBe(true);
    // Years on the site's clock: the file starts 1 January 2021 local time (31 December 2020 23:00 UTC).
    await expect.poll(() => page.getByRole('row', { name: /zimna-dolina/ }).innerText()).toContain('2021–2023');
    await h.screenshot('project-overview-ip');

    // A site entered in feet is stored in metres: 1000 ft × 0.3048 m/ft = 304.8 m (exact, NIST SP 811 App. B).
    await page.getByRole('button', { name: 'Add site' }).click();
    await page.getByLabel('Site name').fill('Ridge annex');
    await page.getByLabel('Elevation (ft)').fill('1000');
    await page.getByLabel('Latitude (°, optional)').fill('95');
    await page.getByRole('button', { name: 'Save site' }).click();
    expect(await page.getByText('Latitude must be between −90 and 90').isVisible()).toBe(true);
    await page.getByLabel('Latitude (°, optional)').fill('49.8');
    await page.getByRole('button', { name: 'Save site' }).click();
    await expect.poll(() => page.getByRole('row', { name: /Ridge annex/ }).innerText()).toMatch(/1,000 ft/);
    const stored = h.testApp.db.select().from(sites).where(eq(sites.name, 'Ridge annex')).get()!;
    expect(stored.elevationM).toBeCloseTo(304.8, 9);
    expect(stored.latitude).toBe(49.8);

    // The site page: the standard-atmosphere pressure at 304.8 m is 97 717 Pa = 28.86 inHg
    // (ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 3; cross-checked with psychrolib GetStandardAtmPressure).
    await page.getByRole('link', { name: 'Ridge annex' }).click();
    await page.getByTestId('site-facts').waitFor();
    expect(psychrolib.GetStandardAtmPressure(304.8) / 3386.389).toBeCloseTo(28.856, 3);
    expect(await page.getByTestId('site-facts').innerText()).toMatch(/1,000 ft[\s\S]*28\.86 inHg/);
    expect(await page.getByText('No climate files for this site yet.').isVisible()).toBe(true);
    expect(await page.getByTestId('site-facts').innerText()).toContain('49.800°, –');
    await h.screenshot('site-page-ip');
    // Uploading from the site's page starts with that site chosen.
    await page.getByRole('link', { name: 'Upload climate file' }).click();
    expect(await page.getByRole('button', { name: 'Continue with Ridge annex' }).isEnabled()).toBe(true);
    await page.goBack();
    await page.getByRole('button', { name: 'Edit site' }).click();
    await page.getByLabel('Elevation (ft)').fill('1100');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await expect.poll(() => page.getByTestId('site-facts').innerText()).toMatch(/1,100 ft[\s\S]*28\.75 inHg/);
    await page.getByRole('button', { name: 'Delete…' }).click();
    await page.getByRole('button', { name: 'Delete site and files' }).click();
    await page.waitForURL(`**/projects/${projectId}`);
    await expect.poll(() => page.getByRole('row', { name: /Ridge annex/ }).count()).toBe(0);
  });

  it('reports a damaged file by line, column and value, and refuses one without humidity before anything is stored', async () => {
    const page = h.page;
    const rows = Array.from({ length: 72 }, (_, i) => {
      const t = new Date(Date.UTC(2023, 0, 1, i)).toISOString().slice(0, 16) + 'Z';
      const dryBulb = i === 1 ? 'abc' : i === 4 ? '95' : (3 + (i % 5)).toFixed(1);
      return `${t},${dryBulb},80`;
    });
    const damaged = Buffer.from(`timestamp,dry_bulb_c,relative_humidity_pct\n${rows.join('\n')}\n`);
    await page.goto(`${h.baseUrl}/projects/${projectId}/climate-files/new`);
    await page.getByRole('radio', { name: /Zimna Dolina/ }).check();
    await page.getByRole('button', { name: 'Continue with Zimna Dolina' }).click();
    await page.getByLabel('File', { exact: true }).setInputFiles({ name: 'damaged.csv', mimeType: 'text/csv', buffer: damaged });
    await page.getByRole('button', { name: 'Read the file' }).click();
    await page.getByTestId('mapping-editor').waitFor();
    await page.getByRole('button', { name: 'Continue to the report' }).click();
    const report = page.getByTestId('validation-report');
    await report.waitFor();
    // Line 1 is the header, so the second hour is line 3 and the fifth is line 6.
    const text = await report.innerText();
    expect(text).toMatch(/3\s+dry_bulb_c\s+abc/);
    expect(text).toMatch(/6\s+dry_bulb_c\s+95/);
    await h.screenshot('climate-upload-report-damaged');

    // Should the server refuse the file at the last step (422), the wizard shows the server's report and stores nothing.
    const refusedReport = {
      ok: false,
      summary: 'Not imported: every data row was rejected.',
      timeLayout: null,
      stepMinutes: null,
      firstTimestamp: null,
      lastTimestamp: null,
      years: [],
      maxGapHours: 6,
      timeZone: 'Europe/Warsaw',
      counts: {
        lines: 3,
        rows: 1,
        rowsRejected: 1,
        cellsUnreadable: 0,
        impossibleValues: 0,
        clampedValues: 0,
        duplicateTimestamps: 0,
        rowsAveraged: 0,
        nonHourlySteps: 0,
        daylightSavingJumps: 0,
        hours: 0,
        measuredHours: 0,
        filledHours: 0,
        missingHours: 0,
        gaps: 0,
        longestGapHours: 0,
        issuesNotListed: 0,
      },
      issues: [
        { kind: 'unparsable-time', severity: 'error', line: 2, column: 'timestamp', value: '2023-13-45', message: 'The time "2023-13-45" cannot be read.' },
      ],
    };
    await page.route(/\/climate-files\?/, (route) =>
      route.fulfill({
        status: 422,
        contentType: 'application/json',
        body: JSON.stringify({ error: { code: 'import_rejected', message: refusedReport.summary, details: { report: refusedReport } } }),
      }),
    );
    await page.getByRole('button', { name: 'Store climate file' }).click();
    await expect.poll(() => page.getByText('The server refused the file; nothing was stored.').isVisible()).toBe(true);
    expect(await report.innerText()).toMatch(/2\s+timestamp\s+2023-13-45/);
    await page.unroute(/\/climate-files\?/);

    const noHumidity = Buffer.from(
      `timestamp,dry_bulb_c\n${rows
        .slice(0, 24)
        .map((r) => r.split(',').slice(0, 2).join(','))
        .join('\n')}\n`,
    );
    await page.getByRole('button', { name: 'Back to the mapping' }).click();
    await page.getByRole('button', { name: 'Back' }).click();
    await page.getByLabel('File', { exact: true }).setInputFiles({ name: 'no-humidity.csv', mimeType: 'text/csv', buffer: noHumidity });
    await page.getByRole('button', { name: 'Read the file' }).click();
    await page.getByTestId('mapping-editor').waitFor();
    await page.getByRole('button', { name: 'Continue to the report' }).click();
    await expect.poll(() => page.getByText('The file cannot be stored as it is').isVisible()).toBe(true);
    expect(await page.getByRole('button', { name: 'Store climate file' }).isDisabled()).toBe(true);
    await h.screenshot('climate-upload-report-refused');
  });

  it('lets a viewer read the project and the climate file but offers no upload', async () => {
    const page = h.page;
    await h.signInAs(viewer);
    await page.goto(`${h.baseUrl}/projects/${projectId}`);
    await expect.poll(() => page.getByText('Your role: viewer').isVisible()).toBe(true);
    expect(await page.getByRole('link', { name: 'Upload climate file' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Add site' }).count()).toBe(0);
    await h.screenshot('project-overview-viewer');
    await page.getByRole('link', { name: 'zimna-dolina' }).click();
    await page.getByTestId('design-label').waitFor();
    await expect.poll(() => page.locator('figure svg').count(), { timeout: 20_000 }).toBeGreaterThanOrEqual(2);
    // Both downloads: the cleaned series in the canonical columns, and the original bytes.
    const [cleaned] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Cleaned hourly CSV' }).click()]);
    const csv = readFileSync((await cleaned.path())!, 'utf8').split('\n');
    expect(csv[0]).toBe('timestamp,dry_bulb_c,relative_humidity_pct,pressure_kpa,flag');
    expect(csv[1]).toBe('2020-12-31T23:00:00Z,-9.6,82.1,98.32,measured');
    const [original] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: /Original file/ }).click()]);
    expect(readFileSync((await original.path())!).equals(readFileSync(sampleFile))).toBe(true);
    expect(await page.getByRole('button', { name: 'Delete…' }).count()).toBe(0);
  });

  it('lists scenarios and recent runs with their status and hours by mode on the overview', async () => {
    const page = h.page;
    await h.signInAs(engineer);
    const headers = { 'x-tramontane-request': '1', 'content-type': 'application/json' };
    const scenario = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));
    const made = await page.request.post(`${h.baseUrl}/api/projects/${projectId}/scenarios`, { headers, data: { scenario } });
    expect(made.status()).toBe(201);
    const scenarioId = (await made.json()).scenario.id;
    const files = await (await page.request.get(`${h.baseUrl}/api/projects/${projectId}/climate-files`)).json();
    const run = await page.request.post(`${h.baseUrl}/api/projects/${projectId}/runs`, {
      headers,
      data: { scenarioIds: [scenarioId], climateFileIds: [files.climateFiles[0].id] },
    });
    expect(run.status()).toBe(202);
    const runId = (await run.json()).runs[0].id;

    await page.goto(`${h.baseUrl}/projects/${projectId}`);
    await page.getByRole('link', { name: scenario.name }).waitFor();
    const row = page.getByTestId('runs-table').getByRole('row', { name: new RegExp(`#${runId}`) });
    // The overview follows the run until it is done, then shows its share of hours by mode.
    await expect.poll(() => row.innerText(), { timeout: 30_000 }).toContain('done');
    expect(await row.getByRole('img').getAttribute('aria-label')).toMatch(/^Free cooling \d+ %/);
    await h.screenshot('project-overview-with-runs');
    await row.getByRole('link', { name: `#${runId}` }).click();
    await page.waitForURL(`**/projects/${projectId}/runs/${runId}`);
  });

  it('lets an engineer delete a climate file after confirming', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}`);
    await page.getByRole('link', { name: 'zimna-dolina' }).click();
    await page.getByRole('button', { name: 'Delete…' }).click();
    await page.getByRole('button', { name: 'Keep it' }).click();
    await page.getByRole('button', { name: 'Delete…' }).click();
    await page.getByRole('alertdialog', { name: 'Delete climate file' }).getByRole('button', { name: 'Delete', exact: true }).click();
    await page.waitForURL(`**/projects/${projectId}`);
    await expect.poll(() => page.getByText('No climate files yet.').isVisible()).toBe(true);
  });
});
