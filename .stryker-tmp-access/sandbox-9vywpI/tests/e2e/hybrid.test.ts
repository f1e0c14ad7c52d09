// @ts-nocheck
import { readFileSync } from 'node:fs';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import path from 'node:path';
import { screenshotFolder, startBrowserHarness, type BrowserHarness } from '../support/browser';
import { chartsDrawn, collectPageErrors, expectNoPageErrors } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Synthetic test weather: 72 hours of July, 6.3…22.0 °C (tests/fixtures/api/three-days.csv).
const threeDays = readFileSync(new URL('../fixtures/api/three-days.csv', import.meta.url));
const dryBulbs = threeDays
  .toString('utf8')
  .split('\n')
  .filter((line) => /^\d{4}-/.test(line))
  .map((line) => Number(line.split(',')[1]));

let h: BrowserHarness;
let engineer: TestPerson;
let projectId: number;
let pageErrors: string[] = [];

beforeAll(async () => {
  h = await startBrowserHarness();
  engineer = personWithSession(h.testApp.db, 'liquid.designer@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Dense compute hall', [[engineer, 'engineer']]);
  const { site } = await h.api<{ site: { id: number } }>(
    engineer,
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Quillan Flats', elevationM: 40 }),
  );
  await h.api(engineer, 'POST', `/projects/${projectId}/sites/${site.id}/climate-files?fileName=three-days.csv`, threeDays, 'text/csv');
  pageErrors = collectPageErrors(h.page);
  await h.signInAs(engineer);
  await h.page.goto(h.baseUrl);
  await h.useUnits('SI');
});
afterAll(() => h?.close());
afterEach(() => expectNoPageErrors(pageErrors));

describe('an engineer designing a hybrid hall', () => {
  it(
    'chooses the hybrid kind and a facility-water class, previews both loops, runs it and reads both loops and the heat reuse',
    { timeout: 180_000 },
    async () => {
      const page = h.page;
      await page.goto(`${h.baseUrl}/projects/${projectId}/scenarios/new`);
      await page.getByLabel('Name').fill('Hybrid hall, W17 facility water');
      await page.getByText('Hybrid hall (liquid + air)').click();
      await expect.poll(() => page.getByTestId('hybrid-fields').isVisible()).toBe(true);
      await page.getByRole('button', { name: 'W17', exact: true }).click();
      expect(await page.getByLabel('Facility-water supply').inputValue()).toBe('17');
      // The coolant after the CDU: 17 °C facility water + 2 K approach (definition of an approach).
      await expect.poll(() => page.getByTestId('coolant-supply').innerText()).toContain('19');
      await page.getByLabel(/Estimate the heat available/).check();
      // The dry cooler is free while T_db + 5 K ≤ 17 °C (approach rule, common practice): count those hours from the file itself.
      const liquidMechanical = dryBulbs.filter((t) => t + 5 > 17).length;
      await expect.poll(() => page.getByTestId('loop-liquid-mechanical').innerText(), { timeout: 20_000 }).toBe(`${liquidMechanical} h`);
      await h.shot('hybrid-editor-si');
      await page.getByTestId('mode-preview').screenshot({ path: path.join(screenshotFolder, 'hybrid-preview-si.png') });

      await page.getByRole('button', { name: 'Save and run' }).click();
      await page.waitForURL(/\/runs\/\d+$/, { timeout: 15_000 });
      await expect.poll(() => page.getByTestId('run-status').innerText(), { timeout: 30_000 }).toBe('done');
      await expect.poll(() => page.getByTestId('hybrid-loops').isVisible()).toBe(true);
      expect(await page.getByTestId('loop-liquid-mechanical').innerText()).toBe(`${liquidMechanical} h`);
      expect(await page.getByTestId('liquid-temperatures').innerText()).toContain('W17');
      // Return 17 + 10 = 27 °C is below the 45 °C a low-temperature network needs, with no heat pump: nothing offered.
      expect(await page.getByTestId('heat-reuse').innerText()).toContain('no heat is offered');
      expect(await page.getByText(/Liquid-cooled equipment sets its own coolant limits/).isVisible()).toBe(true);
      expect(await page.getByText(/Freeze protection of outdoor loops \(glycol\)/).isVisible()).toBe(true);
      await chartsDrawn(page);
      await h.shot('hybrid-run-si');
      // The loops and heat-reuse panels on their own, readable at full size.
      await page.getByTestId('hybrid-loops').screenshot({ path: path.join(screenshotFolder, 'hybrid-loops-si.png') });
      await page.getByTestId('heat-reuse').screenshot({ path: path.join(screenshotFolder, 'hybrid-heat-reuse-si.png') });
      await h.useUnits('IP');
      // 17 °C is 62.6 °F (× 9/5 + 32, NIST SP 811).
      await expect.poll(() => page.getByTestId('liquid-temperatures').innerText()).toContain('62.6');
      await h.shot('hybrid-run-ip');
      await page.getByTestId('hybrid-loops').screenshot({ path: path.join(screenshotFolder, 'hybrid-loops-ip.png') });
      const runUrl = page.url();
      // The saved hybrid in the editor, in IP: the same 17 °C supply in °F (× 9/5 + 32, NIST SP 811) is 62.6 °F.
      await page.getByRole('link', { name: 'Open scenario' }).click();
      await expect.poll(() => page.getByLabel('Facility-water supply').inputValue(), { timeout: 15_000 }).toBe('62.6');
      await page.getByTestId('hybrid-fields').screenshot({ path: path.join(screenshotFolder, 'hybrid-fields-ip.png') });
      await h.useUnits('SI');

      await page.goto(`${runUrl}/report`);
      await expect.poll(() => page.getByTestId('report-loops').isVisible(), { timeout: 15_000 }).toBe(true);
      expect(await page.getByText(/Liquid-cooled equipment sets its own coolant limits/).isVisible()).toBe(true);
      await h.shot('hybrid-report-si');
    },
  );

  it('sweeps the liquid share against the facility-water supply and colours the grid by the liquid loop’s mechanical hours', async () => {
    const page = h.page;
    const { scenarios } = await h.api<{ scenarios: { id: number; name: string }[] }>(engineer, 'GET', `/projects/${projectId}/scenarios`);
    const hybridId = scenarios.find((s) => s.name === 'Hybrid hall, W17 facility water')!.id;
    const files = await h.api<{ climateFiles: { id: number }[] }>(engineer, 'GET', `/projects/${projectId}/climate-files`);
    const { sweep } = await h.api<{ sweep: { id: number } }>(
      engineer,
      'POST',
      `/projects/${projectId}/sweeps`,
      JSON.stringify({
        scenarioId: hybridId,
        climateFileId: files.climateFiles[0].id,
        axes: [
          { input: 'system.liquidShare', from: 0.6, to: 0.9, step: 0.3 },
          { input: 'system.liquid.chilledWaterSupplyC', from: 12, to: 27, step: 5 },
        ],
      }),
    );
    await page.goto(`${h.baseUrl}/projects/${projectId}/sweeps/${sweep.id}`);
    await expect.poll(() => page.getByTestId('sweep-progress').innerText(), { timeout: 90_000 }).toContain('8 of 8 points done');
    await page.getByTestId('heat-map-metric').selectOption('liquidMechanical');
    await chartsDrawn(page, { atLeast: 2 });
    await page.getByText('Table of the same figures').click();
    const table = await page.getByTestId('heat-map-table').innerText();
    // Each column's liquid-loop mechanical hours by the approach rule (T_db + 5 K > supply), counted from the file.
    for (const supplyC of [12, 17, 22, 27]) expect(table).toContain(String(dryBulbs.filter((t) => t + 5 > supplyC).length));
    await h.shot('hybrid-sweep-grid-si');
  });
});
