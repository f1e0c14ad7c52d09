/**
 * A published-format file through the wizard: an EPW fixture is recognised without any choice, its header is set
 * beside a site that disagrees (elevation, UTC offset), the header fills a new site's form, and the stored file's
 * page shows where it comes from and the typical year's source months. Fixtures are synthetic.
 */
// @ts-nocheck

import { fileURLToPath } from 'node:url';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { collectPageErrors, expectNoPageErrors, failedResourceLoad, startInSi } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

const epwFile = fileURLToPath(new URL('../fixtures/weather/synthetic-typical-year.epw', import.meta.url));
const blockFile = fileURLToPath(new URL('../fixtures/weather/synthetic-header-block.csv', import.meta.url));

let h: BrowserHarness;
let projectId: number;
let siteId: number;
let engineer: TestPerson;
let pageErrors: string[] = [];

beforeAll(async () => {
  h = await startBrowserHarness();
  engineer = personWithSession(h.testApp.db, 'ines.marwood@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Highland hall study', [[engineer, 'engineer']]);
  const created = await h.api<{ site: { id: number } }>(
    engineer,
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Ridge hall', elevationM: 900, timeZone: 'Europe/London' }),
  );
  siteId = created.site.id;
  await h.signInAs(engineer);
  pageErrors = collectPageErrors(h.page, { ignoreConsole: failedResourceLoad });
  await startInSi(h.page);
});
afterEach(() => expectNoPageErrors(pageErrors));
afterAll(() => h?.close());

describe('an engineer uploading an EPW file', () => {
  it(
    'sees the format recognised, the header against the site, a new site filled from it, and the typical year on the file page',
    { timeout: 120_000 },
    async () => {
      const page = h.page;
      await page.goto(`${h.baseUrl}/projects/${projectId}/climate-files/new?siteId=${siteId}`);
      await page.getByRole('button', { name: 'Continue with Ridge hall' }).click();
      await page.getByLabel('File', { exact: true }).setInputFiles(epwFile);
      await page.getByRole('button', { name: 'Read the file' }).click();

      const format = page.getByTestId('recognised-format');
      await format.waitFor();
      expect(await format.innerText()).toContain('Recognised as EPW');
      const origin = page.getByTestId('file-origin');
      expect(await origin.innerText()).toContain('Quellmoor Synthetic Station, Nordmark, Invented Land');
      // The site is 650 m higher and on UTC+0 standard time: both disagreements are named.
      expect(await origin.innerText()).toContain('650 m apart, more than 50 m');
      expect(await origin.innerText()).toContain('Europe/London has standard time UTC+00:00');
      expect(await page.getByTestId('typical-year').innerText()).toContain('Jan 2004 · Feb 1999');
      await h.shot('climate-upload-epw-mapping-si');

      // The header fills a new site's form.
      await origin.getByRole('button', { name: 'New site from this header' }).click();
      const form = page.getByRole('form', { name: 'New site' });
      expect(await form.getByLabel('Site name').inputValue()).toBe('Quellmoor Synthetic Station, Nordmark');
      expect(await form.getByLabel('Elevation (m)').inputValue()).toBe('250');
      expect(await form.getByLabel('Latitude (°, optional)').inputValue()).toBe('51.25');
      expect(await form.getByLabel('Time zone').inputValue()).toBe('UTC+01:00');
      await h.shot('climate-upload-epw-new-site');

      // Stored against the chosen site, warnings and all.
      await page.getByRole('button', { name: 'Continue to the report' }).click();
      await page.getByTestId('validation-report').waitFor();
      await page.getByRole('button', { name: 'Store climate file' }).click();
      await page.waitForURL(/\/climate-files\/\d+$/);
      await page.getByRole('heading', { name: 'synthetic-typical-year' }).waitFor();
      expect(await page.getByTestId('recognised-format').innerText()).toContain('EPW');
      expect(await page.getByTestId('typical-year').innerText()).toContain('placed in 2001');
      await expect.poll(() => page.locator('figure svg').count(), { timeout: 20_000 }).toBeGreaterThanOrEqual(2);
      await h.shot('climate-file-epw-si', 300);
      await h.useUnits('IP');
      await expect.poll(() => page.getByTestId('file-origin').innerText()).toContain('ft');
      await h.shot('climate-file-epw-ip', 300);
    },
  );

  it('fills a new site from a weather file header in the site form', { timeout: 60_000 }, async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}`);
    await page.getByRole('button', { name: 'Add site' }).click();
    const form = page.getByRole('form', { name: 'New site' });
    await form.getByLabel("Fill from a weather file's header (optional)").setInputFiles(blockFile);
    await expect.poll(() => form.getByLabel('Elevation (ft)').or(form.getByLabel('Elevation (m)')).inputValue()).not.toBe('0');
    expect(await form.getByLabel('Latitude (°, optional)').inputValue()).toBe('46.125');
    expect(await form.getByLabel('Longitude (°, optional)').inputValue()).toBe('9.875');
    expect(await form.getByText('Filled from the header of synthetic-header-block.csv').isVisible()).toBe(true);
    await h.shot('site-form-filled-from-header');
  });
});
