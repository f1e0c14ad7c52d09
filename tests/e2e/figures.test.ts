/**
 * Issue 17, the figures as people read them: sweeps that show what breaks the envelope, one elevation, whole
 * summary CSVs, fan groups, chart-local unit switches, IP that is whole, compare on near-zero bases, wording,
 * and the signed-out and viewer edges.
 */
import { readFileSync } from 'node:fs';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { chartsDrawn, collectPageErrors, expectNoPageErrors } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Three synthetic years for an invented mild maritime site (sample-weather/generate.ts), 26,280 hours, with station pressure.
const threeYears = readFileSync(new URL('../../sample-weather/kelderwick-point.csv', import.meta.url));
const directAirSample = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

let h: BrowserHarness;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let scenarioId: number;
let climateFileId: number;
let pageErrors: string[] = [];

const manyCharts = { timeoutMs: 20_000 };
/** The invented site stands at 1,400 m: the A1 class's 32 °C maximum is derated there. */
const SITE_ELEVATION_M = 1400;

beforeAll(async () => {
  h = await startBrowserHarness();
  engineer = personWithSession(h.testApp.db, 'ilse.marquand@example.test');
  viewer = personWithSession(h.testApp.db, 'client.reader@example.test');
  projectId = projectWithMembers(h.testApp.db, 'High plateau study (synthetic)', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  const { site } = await h.api<{ site: { id: number } }>(
    engineer,
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Plateau hall (synthetic)', elevationM: SITE_ELEVATION_M, timeZone: 'Europe/London' }),
  );
  const upload = await h.api<{ climateFile: { id: number } }>(engineer, 'POST', `/projects/${projectId}/sites/${site.id}/climate-files?fileName=kelderwick-point.csv`, threeYears, 'text/csv');
  climateFileId = upload.climateFile.id;
  const { scenario } = await h.api<{ scenario: { id: number } }>(engineer, 'POST', `/projects/${projectId}/scenarios`, JSON.stringify({ scenario: directAirSample }));
  scenarioId = scenario.id;
  pageErrors = collectPageErrors(h.page);
  await h.signInAs(engineer);
  await h.page.goto(h.baseUrl);
  await h.useUnits('SI');
});
afterAll(() => h?.close());
afterEach(() => expectNoPageErrors(pageErrors));

describe('a supply sweep past the derated envelope (defect 1)', () => {
  it('warns in the form, marks the breaking points in chart, table and CSV, and leaves them out of "reach zero"', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/sweeps/new?scenario=${scenarioId}`);
    await expect.poll(() => page.getByTestId('point-count').innerText(), { timeout: 10_000 }).toBe('13');
    await page.getByLabel('From (°C)').fill('27');
    await page.getByLabel('To (°C)').fill('32');
    await expect.poll(() => page.getByTestId('point-count').innerText(), { timeout: 10_000 }).toBe('6');
    // A1 allowable: 32 °C, lowered 1 K per 300 m above 900 m (ASHRAE TC 9.9 2021 footnote, recalled from memory):
    // at 1,400 m 32 − 500/300 = 30.33 °C, so 31 and 32 °C break it.
    const warning = await page.getByTestId('sweep-envelope-warning').innerText();
    expect(warning).toContain('maximum 30.3 °C, derated for the site\'s 1,400 m');
    expect(warning).toContain('31.0 °C; 32.0 °C');
    await h.shot('figures-sweep-warning-si');
    await page.getByRole('button', { name: 'Start sweep of 6 runs' }).click();
    await page.waitForURL(/\/sweeps\/\d+$/, { timeout: 15_000 });
    await expect.poll(() => page.getByTestId('sweep-progress').innerText(), { timeout: 90_000 }).toContain('6 of 6 points done');
    await chartsDrawn(page, manyCharts);
    expect(await page.getByTestId('zero-mechanical').innerText()).toContain('Left out: 31.0 °C and 32.0 °C, where the supply setpoint is outside the inlet envelope');
    expect(await page.getByTestId('envelope-breaking-notice').isVisible()).toBe(true);
    const table = page.getByTestId('sweep-table');
    expect(await table.locator('tr[data-breaks-envelope="yes"]').count()).toBe(2);
    expect(await table.locator('thead').innerText()).toContain('Outside envelope (h)');
    // Each breaking point's every hour is an excursion: 26,280 hours of data.
    expect(await table.locator('tr[data-breaks-envelope="yes"]').first().innerText()).toContain('26,280');
    expect(await page.getByRole('figure', { name: /Hours outside the envelope \(h\) against/ }).count()).toBe(1);
    await h.shot('figures-sweep-si');
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download CSV (SI)' }).click()]);
    const csv = readFileSync((await download.path())!, 'utf8').split('\r\n');
    const head = csv[0].split(',');
    const at = (row: string, name: string) => row.split(',')[head.indexOf(name)];
    expect(head).toContain('outside_envelope_h');
    expect(csv.slice(1, 7).map((row) => at(row, 'breaks_envelope'))).toEqual(['no', 'no', 'no', 'no', 'yes', 'yes']);
    expect(at(csv[5], 'outside_envelope_h')).toBe('26280');
    await h.useUnits('IP');
    await chartsDrawn(page, manyCharts);
    expect(await page.getByTestId('zero-mechanical').innerText()).toContain('Left out: 87.8 °F and 89.6 °F');
    await h.shot('figures-sweep-ip');
    await h.useUnits('SI');
  });
});
