// @ts-nocheck
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { chartsDrawn, collectPageErrors, expectNoPageErrors, failedResourceLoad, startInSi } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Synthetic demo weather (a generated year for an invented cold continental site) and synthetic change factors.
const weather = readFileSync(new URL('../../sample-weather/zimna-dolina.csv', import.meta.url));
const factorsCsv = fileURLToPath(new URL('../fixtures/projections/warmer-decade.csv', import.meta.url));
const directAir = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

let h: BrowserHarness;
let engineer: TestPerson;
let projectId: number;
let parentId: number;
let pageErrors: string[] = [];
/** This file's screenshots wait a moment after scrolling to the top before they are taken. */
const settleMs = 200;

const units = (page: Page, system: 'SI' | 'IP') => page.getByRole('group', { name: 'Units' }).getByRole('button', { name: system }).click();
/** The July row of the monthly table, as text. */
const julyRow = (page: Page) => page.getByTestId('projection-monthly-table').locator('tbody tr').nth(6).innerText();

beforeAll(async () => {
  h = await startBrowserHarness();
  engineer = personWithSession(h.testApp.db, 'ines.varga@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Valley campus futures', [[engineer, 'engineer']]);
  const { site } = await h.api<{ site: { id: number } }>(
    engineer,
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Zimna Dolina', elevationM: 412, timeZone: 'Europe/Warsaw' }),
  );
  const file = await h.api<{ climateFile: { id: number } }>(
    engineer,
    'POST',
    `/projects/${projectId}/sites/${site.id}/climate-files?fileName=zimna-dolina.csv`,
    weather,
    'text/csv',
  );
  parentId = file.climateFile.id;
  await h.api(engineer, 'POST', `/projects/${projectId}/scenarios`, JSON.stringify({ scenario: directAir }));
  await h.signInAs(engineer);
  pageErrors = collectPageErrors(h.page, { ignoreConsole: failedResourceLoad });
  await startInSi(h.page);
});
afterEach(() => expectNoPageErrors(pageErrors));
afterAll(() => h?.close());

describe('an engineer making a future-climate projection', () => {
  it('loads factors from a CSV, previews in SI and IP, saves, and reads today beside the projection', { timeout: 180_000 }, async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/climate-files/${parentId}`);
    await page.getByRole('link', { name: 'Make a future-climate projection' }).click();
    await page.waitForURL(`**/projects/${projectId}/projections/new?from=${parentId}`);
    await page.getByTestId('factor-table').waitFor();

    await page.getByTestId('factors-csv').setInputFiles(factorsCsv);
    await expect.poll(() => page.getByLabel('July, ΔT mean (K)').inputValue()).toBe('2.4');
    expect(await page.getByLabel('July, ΔT daily max (K)').inputValue()).toBe('3.1');
    expect(await page.getByLabel('July, Specific humidity change (% of q)').inputValue()).toBe('1');
    // A typing slip is refused next to the month before anything goes to the server.
    await page.getByLabel('March, ΔT daily min (K)').fill('40');
    await page.getByRole('button', { name: 'Preview monthly means' }).click();
    await expect.poll(() => page.getByText('March: ΔTmin must be at most 15 K').isVisible()).toBe(true);
    await page.getByLabel('March, ΔT daily min (K)').fill('1.4');

    await page.getByRole('button', { name: 'Preview monthly means' }).click();
    await page.getByTestId('projection-monthly-table').waitFor({ timeout: 30_000 });
    await chartsDrawn(page);
    // Shift-and-stretch moves July's monthly mean by exactly ΔTmean = 2.4 K (Belcher, Hacker and Powell 2005).
    expect(await julyRow(page)).toMatch(/\+2\.4$/);
    await h.shot('projection-new-si', settleMs);

    // IP: the same factors shown as °F differences (× 1.8, no +32), the table in °F.
    await units(page, 'IP');
    await expect.poll(() => page.getByLabel('July, ΔT mean (°F)').inputValue()).toBe('4.32');
    expect(await julyRow(page)).toMatch(/\+4\.3$/);
    await h.shot('projection-new-ip', settleMs);

    await page.getByLabel('Name', { exact: true }).fill('Zimna Dolina, warmer decade');
    await page.getByLabel(/Where the factors come from/).fill('synthetic factors for a demonstration');
    await page.getByRole('button', { name: 'Save projection' }).click();
    await page.waitForURL(/\/projections\/\d+$/, { timeout: 30_000 });
    // The stored name says it is a projection, so pickers that show only names say so too.
    await page.getByRole('heading', { name: 'Zimna Dolina, warmer decade (projection)' }).waitFor();
    expect(await page.getByText('A projection, not a forecast').isVisible()).toBe(true);
    await chartsDrawn(page);
    // Still IP: July's mean daily max moved by 3.1 K = 5.58 °F difference; the table row ends with the mean's +4.3 °F.
    expect(await julyRow(page)).toMatch(/\+4\.3$/);
    expect(await page.getByTestId('projection-factors').locator('tbody tr').nth(6).innerText()).toMatch(/\+4\.3\s+\+5\.6\s+\+3\.2\s+\+1\.0/);
    await h.shot('projection-page-ip', settleMs);

    await units(page, 'SI');
    await expect.poll(() => julyRow(page)).toMatch(/\+2\.4$/);
    await page.getByRole('button', { name: 'Run on today and on the projection' }).click();
    await page.getByRole('link', { name: 'Compare today with the projection' }).waitFor({ timeout: 15_000 });
    await page.getByRole('group', { name: 'Quantity' }).getByRole('button', { name: 'Dew point' }).click();
    await chartsDrawn(page);
    await h.shot('projection-page-si', settleMs);

    // Listed as a projection wherever the project's files are listed, and on its climate-file page.
    await page.goto(`${h.baseUrl}/projects/${projectId}`);
    const row = page.getByRole('row', { name: /^Zimna Dolina, warmer decade \(projection\)Projection/ });
    await row.waitFor();
    expect(await row.innerText()).toContain('PROJECTION');
    await row.getByRole('link', { name: 'Zimna Dolina, warmer decade (projection)' }).click();
    await expect.poll(() => page.getByText('A future-climate projection of zimna-dolina, not measured weather.').isVisible(), { timeout: 15_000 }).toBe(true);
    await h.shot('projection-climate-file-si', settleMs);
  });

  it('says which month the server refused, at laptop width', { timeout: 60_000 }, async () => {
    const page = h.page;
    await page.setViewportSize({ width: 1280, height: 800 });
    await page.goto(`${h.baseUrl}/projects/${projectId}/projections/new?from=${parentId}`);
    await page.getByTestId('factor-table').waitFor();
    // Within the table's bounds, but ΔTmax − ΔTmin = −30 K is more than July's whole mean daily range: refused by name.
    await page.getByLabel('July, ΔT daily max (K)').fill('-15');
    await page.getByLabel('July, ΔT daily min (K)').fill('15');
    await page.getByRole('button', { name: 'Preview monthly means' }).click();
    await expect.poll(() => page.getByText(/^July: ΔTmax − ΔTmin = -30\.00 K would remove/).isVisible(), { timeout: 15_000 }).toBe(true);
    await h.shot('projection-new-refused-si', settleMs);
    await page.setViewportSize({ width: 1440, height: 900 });
  });
});
