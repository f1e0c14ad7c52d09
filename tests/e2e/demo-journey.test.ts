import { fileURLToPath } from 'node:url';
import type { Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../server/demo/seed';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { chartsDrawn, collectPageErrors, expectNoPageErrors, failedResourceLoad, startInSi } from '../support/e2e-helpers';

/*
 * The newcomer's tour of the demo workspace, through the real sign-in: the local provider's picker
 * page, the code flow and the session cookie the app sets. Everything here is synthetic demo data.
 */

// Three synthetic years (2021–2023) for the invented Kelderwick Point, the same bytes the demo imported.
const kelderwickFile = fileURLToPath(new URL('../../sample-weather/kelderwick-point.csv', import.meta.url));
const demoProject = 'Larchfield campus study (demo)';
const ourScenario = 'Direct air, 18 °C supply (tour)';
// The demo run to compare with: the sample direct-air scenario on the demo's own Kelderwick Point file.
const demoScenario = 'Direct outdoor air, A1 allowable, 25 °C supply (synthetic demo)';

let h: BrowserHarness;
let projectId: number;
let ourRunId: number;
let demoRunId: number;
/** Uncaught exceptions and console errors; the viewer's refused write logs one expected line, filtered below. */
let pageErrors: string[] = [];

beforeAll(async () => {
  h = await startBrowserHarness();
  seedDemo(h.testApp.db);
  // The demo's 12 queued runs (3 scenarios × 4 sites), finished as `npm start` would finish them.
  h.testApp.runQueue.resume();
  await h.testApp.runQueue.idle();
  pageErrors = collectPageErrors(h.page, { ignoreConsole: failedResourceLoad });
  // Start in SI whatever an earlier run of the browser left behind; the IP screenshots switch on the page.
  await startInSi(h.page);
});
afterEach(async (context) => {
  if (context.task.result?.state === 'fail') await h.screenshot(`demo-failed-${context.task.name.slice(0, 40).replace(/\W+/g, '-')}`);
  expectNoPageErrors(pageErrors);
});
afterAll(() => h?.close());

/** From the header's sign-in button through the provider's picker page, back to the app signed in. */
async function signInAs(name: string) {
  await h.page.getByTestId('sign-in').click();
  await h.page.getByRole('heading', { name: 'Local sign-in' }).waitFor();
  expect(h.page.url().startsWith(h.testApp.provider.issuer)).toBe(true);
  await h.page.getByRole('button', { name: new RegExp(name) }).click();
  await expect.poll(() => h.page.getByTestId('account').innerText(), { timeout: 10_000 }).toContain(name);
}

/** Hours per mode as the run page's table shows them, parsed back into numbers. */
async function modeHours(page: Page) {
  const text = await page.getByTestId('mode-hours').innerText();
  const hours = (label: string) => Number(new RegExp(`${label}\\s+([\\d,]+)`).exec(text)?.[1].replaceAll(',', ''));
  return { free: hours('Free cooling'), adiabatic: hours('Adiabatic assist'), mechanical: hours('Mechanical'), total: hours('All hours') };
}

describe('a newcomer touring the demo workspace', () => {
  it('signs in as the demo engineer through the provider page and opens the demo project', async () => {
    const page = h.page;
    await page.goto(h.baseUrl);
    await page.getByTestId('sign-in').waitFor();
    await h.shot('demo-01-signed-out');
    await page.getByTestId('sign-in').click();
    await page.getByRole('heading', { name: 'Local sign-in' }).waitFor();
    await h.shot('demo-02-provider-picker');
    await page.goBack();
    await signInAs('Tobias Ferrand');
    await page.getByRole('link', { name: demoProject }).click();
    await page.waitForURL(/\/projects\/\d+$/);
    projectId = Number(page.url().split('/').pop());
    await page.getByRole('heading', { name: demoProject }).waitFor();
    await expect.poll(() => page.getByText('Your role: engineer').isVisible()).toBe(true);
    // Four invented sites and three sample scenarios; the overview lists the ten latest of the 12 demo runs, all done.
    await expect.poll(() => page.getByRole('row', { name: /Kelderwick Point synthetic/ }).count()).toBeGreaterThan(0);
    await expect.poll(() => page.getByTestId('runs-table').getByText('done', { exact: true }).count(), { timeout: 10_000 }).toBe(10);
    await h.shot('demo-03-project-overview');
  });

  it('uploads the Kelderwick Point sample through the mapping step and the report', async () => {
    const page = h.page;
    await page.getByRole('link', { name: 'Upload climate file' }).click();
    await page.waitForURL(`**/projects/${projectId}/climate-files/new`);
    await page.getByRole('radio', { name: /Kelderwick Point/ }).check();
    await h.shot('demo-04-upload-site');
    await page.getByRole('button', { name: 'Continue with Kelderwick Point' }).click();
    await page.getByLabel('File', { exact: true }).setInputFiles(kelderwickFile);
    expect(await page.getByLabel('Name in the project').inputValue()).toBe('kelderwick-point');
    await page.getByRole('button', { name: 'Read the file' }).click();
    await page.getByTestId('mapping-editor').waitFor();
    // The canonical layout is recognised as it is: comma-separated, relative humidity, pressure in kPa.
    expect(await page.getByLabel('Humidity measure').inputValue()).toBe('relative-humidity');
    expect(await page.getByLabel('Pressure unit').inputValue()).toBe('kPa');
    await h.shot('demo-05-upload-mapping');
    await page.getByRole('button', { name: 'Continue to the report' }).click();
    await page.getByTestId('validation-report').waitFor();
    expect(await page.getByText('The file can be stored').isVisible()).toBe(true);
    await h.shot('demo-06-upload-report');
    await page.getByRole('button', { name: 'Store climate file' }).click();
    await page.waitForURL(/\/climate-files\/\d+$/);
    await page.getByRole('heading', { name: 'kelderwick-point' }).waitFor();
    expect(await page.getByTestId('climate-file-facts').innerText()).toContain('2021–2023');
    await chartsDrawn(page, { atLeast: 2 });
    await h.shot('demo-07-climate-file');
  });

  it('creates a scenario on the uploaded file, runs it and reads the numbers and charts', { timeout: 90_000 }, async () => {
    const page = h.page;
    await page.getByRole('link', { name: demoProject }).first().click();
    await page.waitForURL(`**/projects/${projectId}`);
    await page.getByRole('link', { name: 'New scenario' }).click();
    await page.waitForURL(`**/projects/${projectId}/scenarios/new`);
    await page.getByLabel('Name').fill(ourScenario);
    // Preview and run on the file just uploaded, not on the demo's copy of the same weather.
    const uploaded = /Kelderwick Point · kelderwick-point$/;
    const previewSelect = page.getByLabel('Climate file');
    const option = previewSelect.getByRole('option', { name: uploaded });
    await previewSelect.selectOption((await option.getAttribute('value'))!);
    const preview = page.getByTestId('mode-preview');
    const settledPreview = async () => ((await preview.getAttribute('class'))?.includes('opacity-40') ? '' : await preview.innerText());
    // 2021–2023 hourly without gaps: 3 × 8760 hours.
    await expect.poll(settledPreview, { timeout: 20_000 }).toContain('26,280 h');
    const atDefaultSupply = await preview.innerText();
    await page.getByLabel('Supply air setpoint').fill('18');
    // A cooler supply leaves fewer free-cooling hours; wait for the preview to follow the edit.
    await expect
      .poll(
        async () => {
          const now = await settledPreview();
          return now !== '' && now !== atDefaultSupply && !now.includes('updating');
        },
        { timeout: 20_000 },
      )
      .toBe(true);
    const previewFree = Number(/Free cooling\s+([\d,]+) h/.exec(await preview.innerText())?.[1].replaceAll(',', ''));
    for (const box of await page.getByRole('group', { name: 'On climate files' }).getByRole('checkbox').all()) {
      const label = (await box.locator('xpath=..').innerText()).trim();
      await box.setChecked(/^Kelderwick Point · kelderwick-point\b/.test(label));
    }
    await h.shot('demo-08-scenario-editor');

    await page.getByRole('button', { name: 'Save and run' }).click();
    await page.waitForURL(/\/runs\/\d+$/, { timeout: 15_000 });
    ourRunId = Number(page.url().split('/').pop());
    await expect.poll(() => page.getByTestId('run-status').innerText(), { timeout: 30_000 }).toBe('done');
    expect(await page.getByRole('heading', { name: ourScenario }).isVisible()).toBe(true);
    const hours = await modeHours(page);
    expect(hours.total).toBe(26_280);
    expect(hours.free + hours.adiabatic + hours.mechanical).toBe(26_280);
    expect(hours.free).toBeGreaterThan(0);
    // The quick preview and the run use the same engine on the same file: the same free-cooling hours.
    expect(hours.free).toBe(previewFree);
    // Energy from the editor's defaults: hall fans at 5 % of a 1,000 kW IT load every hour with data,
    // 0.05 × 1000 kW × 26,280 h = 1,314.0 MWh; IT energy 1000 kW × 26,280 h = 26,280.0 MWh.
    const mwhIn = async (row: RegExp) => Number(/([\d,.]+) MWh/.exec(await page.getByRole('row', { name: row }).first().innerText())?.[1].replaceAll(',', ''));
    expect(await mwhIn(/^Hall fans/)).toBe(1314);
    expect(await mwhIn(/^IT energy/)).toBe(26_280);
    // Partial PUE of the cooling, ISO/IEC 30134-2's partial PUE with cooling as the only infrastructure: (IT + cooling) / IT.
    const coolingMwh = await mwhIn(/^Cooling total/);
    // Shown to 3 decimals from unrounded energies, so within half a unit of the last digit (plus the 0.1 MWh rounding).
    expect(Math.abs(Number(await page.getByTestId('ppue').innerText()) - (26_280 + coolingMwh) / 26_280)).toBeLessThanOrEqual(0.0005 + 1e-5);
    expect(await page.getByTestId('wue').innerText()).toMatch(/L\/kWh$|^–$/);
    // Monthly hours, carpet and the moist-air chart each draw a figure; the bins follow.
    await chartsDrawn(page, { atLeast: 3 });
    await page.getByTestId('moist-air-chart').locator('figure svg').first().waitFor();
    await expect.poll(() => page.getByTestId('bin-table').locator('tbody tr').count(), { timeout: 15_000 }).toBeGreaterThan(8);
    expect(await page.getByText('Read these results as estimates').first().isVisible()).toBe(true);
    await h.shot('demo-09-run-si');

    // The chart's own switch turns the chart only (issue 17): run inputs stay in SI, the chart's axes go to IP.
    await page.getByTestId('moist-air-chart').getByRole('group', { name: 'Units of this chart' }).getByRole('button', { name: 'IP' }).click();
    await expect.poll(() => page.getByTestId('moist-air-chart').locator('figure svg').last().textContent(), { timeout: 30_000 }).toContain('gr/lb');
    expect(await page.getByTestId('run-inputs').innerText()).not.toContain('°F');
    // This person signed in through the provider page, so the harness cannot save the choice for them: the page saves
    // it to their settings as the settings page does (the app's request header included), then the harness reloads in
    // IP (else the saved SI would win).
    const saved = await page.evaluate(() =>
      fetch('/api/me', {
        method: 'PATCH',
        headers: { 'content-type': 'application/json', 'x-tramontane-request': '1' },
        body: JSON.stringify({ unitSystem: 'ip' }),
      }).then((r) => r.status),
    );
    expect(saved).toBe(200);
    await h.useUnits('IP');
    await expect.poll(() => page.getByTestId('run-inputs').innerText(), { timeout: 30_000 }).toContain('64.4 °F'); // 18 °C × 9/5 + 32 = 64.4 °F (exact)
    await chartsDrawn(page, { atLeast: 3 });
    // Not asserted here: the moist-air chart after this reload (seen in SI in this journey while the page reads IP; the
    // figures test sees it follow the setting). Left for the integrator with h/chart, who is replacing this chart.
    await h.shot('demo-10-run-ip');
  });

  it('compares the run with a demo run, in IP then SI', async () => {
    const page = h.page;
    await page.getByRole('link', { name: 'Compare with other runs' }).click();
    await expect.poll(() => new URL(page.url()).searchParams.get('runs')).toBe(String(ourRunId));
    const picker = page.getByTestId('run-picker');
    // The page opens with the run just made ticked; its row shows once the project's run list has caught up.
    await expect.poll(() => picker.getByRole('checkbox', { name: `Compare run ${ourRunId}` }).isChecked(), { timeout: 10_000 }).toBe(true);
    const demoRow = picker.getByRole('row').filter({ hasText: demoScenario }).filter({ hasText: 'Kelderwick Point synthetic' });
    await expect.poll(() => demoRow.count()).toBe(1);
    demoRunId = Number((await demoRow.getByRole('link').innerText()).match(/#(\d+)/)![1]);
    // The tick follows the address, which updates a moment after the click; wait for it rather than expect it at once.
    await demoRow.getByRole('checkbox').click();
    await expect.poll(() => demoRow.getByRole('checkbox').isChecked()).toBe(true);
    await expect.poll(() => new URL(page.url()).searchParams.get('runs')).toBe(`${ourRunId},${demoRunId}`);
    const table = page.getByTestId('comparison-table');
    await table.waitFor();
    const text = await table.innerText();
    expect(text).toContain('baseline');
    expect(text).toContain(ourScenario);
    expect(text).toContain(demoScenario);
    // The free-cooling row: the demo run's hours and its difference from the baseline (our run), as the API gives them.
    const hoursOf = async (id: number) => {
      const res = await page.request.get(`${h.baseUrl}/api/projects/${projectId}/runs/${id}`);
      return ((await res.json()) as { run: { results: { hours: { free: number } } } }).run.results.hours.free;
    };
    const [oursFree, demoFree] = [await hoursOf(ourRunId), await hoursOf(demoRunId)];
    const diff = demoFree - oursFree;
    const freeRow = await table.getByRole('row', { name: /^Free cooling/ }).innerText();
    expect(freeRow).toContain(`${oursFree.toLocaleString('en')} h`);
    expect(freeRow).toContain(`${diff > 0 ? '+' : ''}${diff.toLocaleString('en')} h`);
    await chartsDrawn(page);
    await h.shot('demo-11-compare-ip');

    // Back to SI through the person's settings, as a newcomer would find it.
    await page.goto(`${h.baseUrl}/settings`);
    await page.getByRole('radio', { name: 'SI' }).click();
    await expect.poll(() => page.getByRole('radio', { name: 'SI' }).getAttribute('aria-checked')).toBe('true');
    await page.goBack();
    await table.waitFor();
    await chartsDrawn(page);
    expect(await table.innerText()).toContain('baseline');
    await h.shot('demo-12-compare-si');
  });

  it('as the demo viewer: the results are there, editing is refused', async () => {
    const page = h.page;
    await page.getByRole('button', { name: 'Sign out', exact: true }).click();
    await page.getByTestId('sign-in').waitFor();
    await signInAs('Priya Castellane');
    await page.getByRole('link', { name: demoProject }).click();
    await page.waitForURL(`**/projects/${projectId}`);
    await expect.poll(() => page.getByText('Your role: viewer').isVisible()).toBe(true);
    expect(await page.getByRole('link', { name: 'Upload climate file' }).count()).toBe(0);
    expect(await page.getByRole('link', { name: 'New scenario' }).count()).toBe(0);
    await page
      .getByTestId('runs-table')
      .getByRole('link', { name: `#${ourRunId}` })
      .waitFor();
    await h.shot('demo-13-viewer-overview');

    await page
      .getByTestId('runs-table')
      .getByRole('link', { name: `#${ourRunId}` })
      .click();
    await page.waitForURL(`**/projects/${projectId}/runs/${ourRunId}`);
    await expect.poll(() => page.getByTestId('run-status').innerText()).toBe('done');
    expect((await modeHours(page)).total).toBe(26_280);
    await chartsDrawn(page, { atLeast: 3 });
    await h.shot('demo-14-viewer-run');

    await page.getByRole('link', { name: 'Open scenario' }).click();
    await page.waitForURL(/\/scenarios\/\d+$/);
    const scenarioId = Number(page.url().split('/').pop());
    await expect.poll(() => page.getByText('Read-only').isVisible()).toBe(true);
    expect(await page.getByLabel('Supply air setpoint').isDisabled()).toBe(true);
    expect(await page.getByRole('button', { name: /Save/ }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /Run/ }).count()).toBe(0);
    await h.shot('demo-15-viewer-scenario');

    // The server refuses a write from the viewer's own signed-in page, whatever the screen offers.
    const status = await page.evaluate(
      async ([pid, sid]) => {
        const res = await fetch(`/api/projects/${pid}/runs`, {
          method: 'POST',
          headers: { 'content-type': 'application/json', 'x-tramontane-request': '1' },
          body: JSON.stringify({ scenarioIds: [sid], climateFileIds: [1] }),
        });
        return res.status;
      },
      [projectId, scenarioId],
    );
    expect(status).toBe(403);

    await page.goto(`${h.baseUrl}/projects/${projectId}/compare?runs=${ourRunId},${demoRunId}`);
    await page.getByTestId('comparison-table').waitFor();
    await chartsDrawn(page);
    await h.shot('demo-16-viewer-compare');
  });
});
