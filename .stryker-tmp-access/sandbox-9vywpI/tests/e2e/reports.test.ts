// @ts-nocheck
import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { screenshotFolder, startBrowserHarness, type BrowserHarness } from '../support/browser';
import { chartsDrawn, collectPageErrors, expectNoPageErrors } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Three synthetic years for an invented mild maritime site (sample-weather/generate.ts), so the report has every section at full size.
const threeYears = readFileSync(new URL('../../sample-weather/kelderwick-point.csv', import.meta.url));
const directAirSample = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

let h: BrowserHarness;
let owner: TestPerson;
let viewer: TestPerson;
let projectId: number;
let runA: number;
let runB: number;
let pageErrors: string[] = [];
/** Refusals a test expects the browser to log (a 401 or 410 answer is logged as a failed resource). */
let expectedRefusals: RegExp | null = null;

/** The page as print shows it (screenshot), and the PDF the browser makes of it; returns the PDF's page count. */
async function printed(name: string): Promise<number> {
  const page = h.page;
  await page.emulateMedia({ media: 'print' });
  await h.shot(`${name}-print`);
  const pdf = await page.pdf({ format: 'A4', printBackground: true });
  writeFileSync(path.join(screenshotFolder, `${name}.pdf`), pdf);
  const letter = await page.pdf({ format: 'Letter', printBackground: true });
  await page.emulateMedia({ media: 'screen' });
  expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
  const pages = (buffer: Buffer) => buffer.toString('latin1').match(/\/Type\s*\/Page[^s]/g)?.length ?? 0;
  expect(pages(letter)).toBeGreaterThan(1);
  return pages(pdf);
}

beforeAll(async () => {
  h = await startBrowserHarness();
  owner = personWithSession(h.testApp.db, 'odile.brennan@example.test');
  viewer = personWithSession(h.testApp.db, 'tamsin.reeve@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Kelderwick hall options', [
    [owner, 'owner'],
    [viewer, 'viewer'],
  ]);
  const { site } = await h.api<{ site: { id: number } }>(
    owner,
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Kelderwick Point', elevationM: 14, timeZone: 'Europe/London' }),
  );
  const { climateFile } = await h.api<{ climateFile: { id: number } }>(
    owner,
    'POST',
    `/projects/${projectId}/sites/${site.id}/climate-files?fileName=kelderwick-point.csv`,
    threeYears,
    'text/csv',
  );
  const warm = { ...directAirSample, name: 'Direct air, 25 °C supply (synthetic demo)' };
  const cool = { ...directAirSample, name: 'Direct air, 20 °C supply (synthetic demo)', system: { ...directAirSample.system, supplyAirC: 20 } };
  const ids: number[] = [];
  for (const scenario of [warm, cool]) {
    const { scenario: stored } = await h.api<{ scenario: { id: number } }>(owner, 'POST', `/projects/${projectId}/scenarios`, JSON.stringify({ scenario }));
    ids.push(stored.id);
  }
  const { runs } = await h.api<{ runs: { id: number }[] }>(
    owner,
    'POST',
    `/projects/${projectId}/runs`,
    JSON.stringify({ scenarioIds: ids, climateFileIds: [climateFile.id] }),
  );
  [runA, runB] = runs.map((r) => r.id);
  await h.testApp.runQueue.idle();
  pageErrors = collectPageErrors(h.page, { ignoreConsole: (text) => expectedRefusals?.test(text) ?? false });
  await h.signInAs(owner);
  await h.page.goto(h.baseUrl);
  await h.useUnits('SI');
});
afterAll(() => h?.close());
afterEach(() => {
  expectedRefusals = null;
  expectNoPageErrors(pageErrors);
});

describe('the report of a run', () => {
  it('renders every section, prints without the app around it, and makes a PDF of several pages', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runA}/report`);
    await page.getByTestId('report-title').waitFor();
    expect(await page.getByTestId('report-title').innerText()).toBe('Direct air, 25 °C supply (synthetic demo)');
    // 2021–2023 hourly with none missing: 3 × 8,760 hours, all measured.
    expect(await page.getByTestId('report-mode-hours').innerText()).toMatch(/All hours\s+26,280\s+100\.0 %/);
    expect(await page.getByTestId('completeness').innerText()).toBe('100.0 % of hours have data');
    expect(await page.getByTestId('report-envelope').innerText()).toContain('5th edition (2021)');
    expect(await page.getByTestId('report-years').locator('tbody tr').count()).toBe(3);
    expect(await page.getByTestId('report-method').innerText()).toContain('ISO/IEC 30134-9');
    expect(await page.getByText('Read these results as estimates').isVisible()).toBe(true);
    // The figures are the run's own.
    const { run } = await h.api<{ run: { results: { hours: { free: number; mechanical: number }; energy: { partialPue: number } } } }>(
      owner,
      'GET',
      `/projects/${projectId}/runs/${runA}`,
    );
    expect(await page.getByTestId('report-ppue').innerText()).toBe(run.results.energy.partialPue.toFixed(3));
    expect(await page.getByTestId('report-headline').innerText()).toContain(`${run.results.hours.free.toLocaleString('en')} h`);
    // Up to 13 mechanical hours in 26,280 (under 0.05 %) are not rounded away to 0.0 % (nor free cooling up to 100.0 %).
    if (run.results.hours.mechanical > 0 && run.results.hours.mechanical <= 13) {
      expect(await page.getByTestId('report-mode-hours').innerText()).toMatch(/Mechanical\s+\d+\s+< 0\.1 %/);
    }
    // The monthly chart, and the hours on the charts: the design on the moist-air chart and the modes by day and hour.
    await page.getByTestId('report-hour-charts').waitFor({ timeout: 60_000 });
    await chartsDrawn(page, { atLeast: 3, timeoutMs: 30_000 });
    expect(await page.getByTestId('report-hour-charts').getByTestId('region-table').innerText()).toContain('Free cooling');
    await h.shot('report-run-si');

    // The button hands the page to the browser's print dialog (stubbed here: headless Chromium has none).
    await page.evaluate(() => {
      const w = window as unknown as { printCalls: number };
      w.printCalls = 0;
      window.print = () => void w.printCalls++;
    });
    await page.getByRole('button', { name: 'Print or save as PDF' }).click();
    expect(await page.evaluate(() => (window as unknown as { printCalls: number }).printCalls)).toBe(1);

    const pdfPages = await printed('report-run-si');
    expect(pdfPages).toBeGreaterThan(1);
    // In print the app's header and the report's controls are gone.
    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Print or save as PDF' }).isVisible()).toBe(false);
    await page.emulateMedia({ media: 'screen' });

    await h.useUnits('IP');
    await chartsDrawn(page);
    // 25 °C supply is 77.0 °F.
    expect(await page.getByTestId('report-inputs').innerText()).toContain('77.0 °F');
    expect(await page.getByTestId('report-site').innerText()).toContain('46 ft'); // 14 m = 45.9 ft
    await h.shot('report-run-ip');
    await printed('report-run-ip');
    await h.useUnits('SI');
  }, 180_000);

  it('offers the downloads on the report and the run page, with the server’s file names', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runA}`);
    await expect.poll(() => page.getByTestId('run-status').innerText(), { timeout: 15_000 }).toBe('done');
    await page.getByTestId('download-menu').locator('summary').click();
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: /Summary \(CSV\)/ }).click()]);
    expect(download.suggestedFilename()).toBe(`run-${runA}-direct-air-25-c-supply-synthetic-demo-summary.csv`);
    await h.shot('run-page-downloads-si');
  });
});

describe('the report of a comparison', () => {
  it('shows the runs side by side against the baseline, and prints', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/compare/report?runs=${runA},${runB}&baseline=${runB}`);
    await page.getByTestId('report-comparison').waitFor();
    expect(await page.getByTestId('report-title').innerText()).toBe(`2 runs compared against run ${runB}`);
    expect(await page.getByTestId('report-runs').innerText()).toContain(`Run ${runB} (baseline)`);
    expect(await page.getByTestId('report-inputs').innerText()).toContain('differs');
    await chartsDrawn(page);
    await h.shot('report-comparison-si');
    expect(await printed('report-comparison-si')).toBeGreaterThan(1);
    await h.useUnits('IP');
    await chartsDrawn(page);
    await h.shot('report-comparison-ip');
    await h.useUnits('SI');
  });
});

describe('share links', () => {
  it('an owner makes a public link that opens signed out, and after revoking it refuses', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runA}/report`);
    await page.getByTestId('report-title').waitFor();
    await page.getByRole('button', { name: 'Share' }).click();
    await page.getByLabel('Title readers see').fill('Kelderwick, 25 °C supply, for the client');
    await page.getByLabel('Public until').fill(new Date(Date.now() + 10 * 86_400_000).toISOString().slice(0, 10));
    await page.getByRole('button', { name: 'Create link' }).click();
    const linkBox = page.getByLabel('New share link');
    await linkBox.waitFor();
    const url = await linkBox.inputValue();
    expect(url).toMatch(new RegExp(`^${h.baseUrl}/shared/[A-Za-z0-9_-]{43}$`));
    await expect.poll(() => page.getByTestId('share-link').first().innerText()).toContain('public');
    await h.shot('report-share-panel-si');

    await h.signInAs(null);
    await page.goto(url);
    await page.getByTestId('report-title').waitFor();
    expect(await page.getByTestId('shared-note').innerText()).toContain('open to anyone with the link until');
    expect(await page.getByTestId('report-mode-hours').innerText()).toMatch(/All hours\s+26,280/);
    // Signed out, the link still draws the hourly charts (their hours come through the link's own download).
    await page.getByTestId('report-hour-charts').waitFor({ timeout: 60_000 });
    await chartsDrawn(page, { atLeast: 3, timeoutMs: 30_000 });
    await h.shot('report-shared-public-si');
    expect(await printed('report-shared-public')).toBeGreaterThan(1);

    await h.signInAs(owner);
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runA}/report`);
    await page.getByRole('button', { name: 'Share' }).click();
    page.once('dialog', (dialog) => void dialog.accept());
    await page.getByTestId('share-link').first().getByRole('button', { name: 'Revoke' }).click();
    await expect.poll(() => page.getByTestId('share-link').first().innerText()).toContain('revoked');

    await h.signInAs(null);
    expectedRefusals = /status of 410/;
    await page.goto(url);
    await page.getByTestId('shared-refused').waitFor();
    expect(await page.getByTestId('shared-refused').innerText()).toContain('This link was revoked');
    await h.shot('report-shared-revoked');
  }, 150_000);

  it('a members-only link asks a signed-out reader to sign in, and opens for a member', async () => {
    const { path: linkPath } = await h.api<{ path: string }>(
      owner,
      'POST',
      `/projects/${projectId}/share-links`,
      JSON.stringify({ target: 'comparison', runIds: [runB, runA], title: 'Both supply setpoints' }),
    );
    const page = h.page;
    expectedRefusals = /status of 401/;
    await page.goto(`${h.baseUrl}${linkPath}`);
    await page.getByTestId('shared-refused').waitFor();
    expect(await page.getByTestId('shared-refused').innerText()).toContain('Sign in to see this report');
    await h.shot('report-shared-members-signed-out');
    await h.signInAs(viewer);
    await page.goto(`${h.baseUrl}${linkPath}`);
    await page.getByTestId('report-comparison').waitFor();
    expect(await page.getByTestId('shared-note').innerText()).toContain('with the members of its project');
    // A viewer sees no Share button: only owners make links.
    expect(await page.getByRole('button', { name: 'Share' }).count()).toBe(0);
    await chartsDrawn(page);
    await h.shot('report-shared-members-viewer-si');
  });
});
