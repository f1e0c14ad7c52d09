/**
 * The humidity convention on screen: the mapping step's "over ice below 0 °C" choice, the validation report that
 * records it, and the air-state calculator's dew point (over water) and frost point (over ice), in SI and IP.
 * Reference values: Hyland–Wexler eq. 5 and 6 (ASHRAE Handbook—Fundamentals 2017 ch. 1) evaluated apart from the
 * engine, and psychrolib's sub-zero dew point, which is a frost point.
 */
// @ts-nocheck

import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { collectPageErrors, expectNoPageErrors, failedResourceLoad, startInSi } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { directAirSample } from '../support/study-setup';
import { hylandWexlerIcePa, hylandWexlerWaterPa } from '../unit/psychrometrics/reference-over-water';

let h: BrowserHarness;
let projectId: number;
let engineer: TestPerson;
let pageErrors: string[] = [];

/** Synthetic winter hours at an invented site: RH 80 % at −10 °C, then −12 °C and −20 °C. */
const winter = Buffer.from(
  [
    'timestamp,dry_bulb_c,relative_humidity_pct',
    '2024-01-15T00:00Z,-10,80',
    '2024-01-15T01:00Z,-12,85',
    '2024-01-15T02:00Z,-20,90',
    '2024-01-15T03:00Z,-11,82',
  ].join('\n'),
);

beforeAll(async () => {
  h = await startBrowserHarness();
  engineer = personWithSession(h.testApp.db, 'tamsin.okafor@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Fellside winter study', [[engineer, 'engineer']]);
  await h.signInAs(engineer);
  pageErrors = collectPageErrors(h.page, { ignoreConsole: failedResourceLoad });
  await startInSi(h.page);
});
afterEach(() => expectNoPageErrors(pageErrors));
afterAll(() => h?.close());

describe('humidity below 0 °C', () => {
  it('reads a file stated over ice when the mapping step says so, and the report records it', { timeout: 120_000 }, async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/climate-files/new`);
    await page.getByLabel('Site name').fill('Fellside Moor');
    await page.getByLabel('Elevation (m)').fill('610');
    await page.getByLabel('Time zone').fill('Europe/London');
    await page.getByRole('button', { name: 'Save site' }).click();
    await page.getByRole('button', { name: 'Continue with Fellside Moor' }).click();
    await page.getByLabel('File', { exact: true }).setInputFiles({ name: 'fellside-winter.csv', mimeType: 'text/csv', buffer: winter });
    await page.getByRole('button', { name: 'Read the file' }).click();
    await page.getByTestId('mapping-editor').waitFor();
    const choice = page.getByLabel('The file gives relative humidity over ice below 0 °C');
    expect(await choice.isChecked()).toBe(false);
    const firstRow = () => page.getByTestId('preview-table').locator('tbody tr').first().innerText();
    expect(await firstRow()).toMatch(/-10\.0\s+80\.0/);

    await choice.check();
    expect(await page.getByText('Changed: the hours below still show the previous reading.').isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Read again with these choices' }).click();
    // 80 % over ice at −10 °C is 80 · pws,ice/pws,water = 72.6 % over water (eq. 5 over eq. 6).
    const converted = ((80 * hylandWexlerIcePa(-10)) / hylandWexlerWaterPa(-10)).toFixed(1);
    expect(converted).toBe('72.6');
    await expect.poll(firstRow).toMatch(new RegExp(`-10\\.0\\s+${converted.replace('.', '\\.')}`));
    await h.shot('humidity-over-ice-mapping-si');
    await h.useUnits('IP');
    // The wizard starts again after the reload; read the file with the choice ticked and look at the IP preview.
    await page.getByRole('button', { name: /Continue with/ }).click();
    await page.getByLabel('File', { exact: true }).setInputFiles({ name: 'fellside-winter.csv', mimeType: 'text/csv', buffer: winter });
    await page.getByRole('button', { name: 'Read the file' }).click();
    await page.getByTestId('mapping-editor').waitFor();
    await page.getByLabel('The file gives relative humidity over ice below 0 °C').check();
    await page.getByRole('button', { name: 'Read again with these choices' }).click();
    // −10 °C = 14.0 °F.
    await expect.poll(firstRow).toMatch(/-10\.0\s+14\.0\s+72\.6/);
    await h.shot('humidity-over-ice-mapping-ip');

    await page.getByRole('button', { name: 'Continue to the report' }).click();
    await page.getByTestId('validation-report').waitFor();
    expect(await page.getByTestId('report-humidity-reading').innerText()).toContain('over ice below 0 °C');
    expect(await page.getByTestId('validation-report').innerText()).toMatch(/converted to over liquid water in 4 hours/);
    await h.shot('humidity-over-ice-report-ip');
    await page.getByRole('button', { name: 'Store climate file' }).click();
    await page.waitForURL(/\/climate-files\/\d+$/);
    const fileId = Number(page.url().split('/').pop());

    // A run made from the file keeps the choice with its inputs; the run page and its report say how the humidity was read.
    const { scenario } = await h.api<{ scenario: { id: number } }>(
      engineer,
      'POST',
      `/projects/${projectId}/scenarios`,
      JSON.stringify({ scenario: directAirSample }),
    );
    const { runs } = await h.api<{ runs: Array<{ id: number }> }>(
      engineer,
      'POST',
      `/projects/${projectId}/runs`,
      JSON.stringify({ scenarioIds: [scenario.id], climateFileIds: [fileId] }),
    );
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runs[0].id}`);
    await expect.poll(() => page.getByTestId('run-status').innerText(), { timeout: 30_000 }).toBe('done');
    await expect.poll(() => page.getByTestId('run-humidity-reading').innerText()).toContain('over ice below 0 °C');
    await page.getByTestId('run-inputs').scrollIntoViewIfNeeded();
    await h.screenshot('humidity-over-ice-run-inputs-ip');
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runs[0].id}/report`);
    await expect.poll(() => page.getByTestId('humidity-reading').innerText()).toContain('over ice below 0 °C');
    await h.useUnits('SI');
  });

  it('shows the dew point over water and the frost point over ice in the calculator, in SI and IP', { timeout: 60_000 }, async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/calculator`);
    await page.getByTestId('calculated-state').waitFor();
    await page.getByLabel('Relative humidity (%)').fill('');
    await page.getByLabel('Dry-bulb (°C)').fill('-5');
    await page.getByLabel('Dew point (°C)').fill('-10');
    const state = page.getByTestId('calculated-state');
    // A dew point of −10 °C over water has the vapour pressure 286.56 Pa (eq. 6), which saturates over ice at −8.90 °C.
    await expect.poll(() => state.innerText()).toMatch(/Dew point \(over water\)\s+-?−?10\.0 °C/);
    expect(await state.innerText()).toMatch(/Frost point \(over ice\)\s+-?−?8\.9 °C/);
    await h.shot('calculator-frost-point-si');

    await h.useUnits('IP');
    await page.getByLabel('Relative humidity (%)').fill('');
    await page.getByLabel('Dry-bulb (°F)').fill('23');
    await page.getByLabel('Dew point (°F)').fill('14');
    // 23 °F = −5 °C, 14 °F = −10 °C; the frost point −8.90 °C = 16.0 °F.
    await expect.poll(() => state.innerText()).toMatch(/Frost point \(over ice\)\s+16\.0 °F/);
    await h.shot('calculator-frost-point-ip');
    await h.useUnits('SI');
  });
});
