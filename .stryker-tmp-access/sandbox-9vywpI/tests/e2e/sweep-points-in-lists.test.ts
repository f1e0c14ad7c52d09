// @ts-nocheck
import { readFileSync } from 'node:fs';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { collectPageErrors, expectNoPageErrors } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Synthetic test weather: 72 hours of July at an invented site (tests/fixtures/api/three-days.csv), so sweeps finish fast.
const threeDays = readFileSync(new URL('../fixtures/api/three-days.csv', import.meta.url));
const directAir = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));
const lineName = 'Setpoint 18–30 °C';
const gridName = 'Setpoint by IT load';

let h: BrowserHarness;
let analyst: TestPerson;
let projectId: number;
let scenarioId: number;
let plainRunIds: number[];
let lineSweep: { id: number; points: { runId: number; values: Record<string, number> }[] };
let pageErrors: string[] = [];

beforeAll(async () => {
  h = await startBrowserHarness();
  analyst = personWithSession(h.testApp.db, 'wren.okafor@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Fenmouth hall study', [[analyst, 'engineer']]);
  const { site } = await h.api<{ site: { id: number } }>(analyst, 'POST', `/projects/${projectId}/sites`, JSON.stringify({ name: 'Fenmouth', elevationM: 40 }));
  const { climateFile } = await h.api<{ climateFile: { id: number } }>(
    analyst,
    'POST',
    `/projects/${projectId}/sites/${site.id}/climate-files?fileName=three-days.csv`,
    threeDays,
    'text/csv',
  );
  scenarioId = (await h.api<{ scenario: { id: number } }>(analyst, 'POST', `/projects/${projectId}/scenarios`, JSON.stringify({ scenario: directAir })))
    .scenario.id;
  const body = (name: string, axes: unknown[]) => JSON.stringify({ name, scenarioId, climateFileId: climateFile.id, axes });
  const first = await h.api<{ runs: { id: number }[] }>(
    analyst,
    'POST',
    `/projects/${projectId}/runs`,
    JSON.stringify({ scenarioIds: [scenarioId], climateFileIds: [climateFile.id] }),
  );
  lineSweep = (
    await h.api<{ sweep: typeof lineSweep }>(
      analyst,
      'POST',
      `/projects/${projectId}/sweeps`,
      body(lineName, [{ input: 'system.supplyAirC', from: 18, to: 30, step: 1 }]),
    )
  ).sweep;
  const second = await h.api<{ runs: { id: number }[] }>(
    analyst,
    'POST',
    `/projects/${projectId}/runs`,
    JSON.stringify({ scenarioIds: [scenarioId], climateFileIds: [climateFile.id] }),
  );
  await h.api(
    analyst,
    'POST',
    `/projects/${projectId}/sweeps`,
    body(gridName, [
      { input: 'system.supplyAirC', from: 20, to: 22, step: 2 },
      { input: 'energy.itLoadKw', from: 500, to: 1000, step: 500 },
    ]),
  );
  plainRunIds = [second.runs[0].id, first.runs[0].id];
  // 2 plain runs and 13 + 4 points, all on 72 hours.
  await h.testApp.runQueue.idle();
  const listed = (await h.api<{ runs: { status: string }[] }>(analyst, 'GET', `/projects/${projectId}/runs`)).runs;
  expect(listed.filter((r) => r.status === 'done')).toHaveLength(19);
  pageErrors = collectPageErrors(h.page);
  await h.signInAs(analyst);
  await h.page.goto(h.baseUrl);
  await h.useUnits('SI');
});
afterAll(() => h?.close());
afterEach(() => expectNoPageErrors(pageErrors));

describe('an analyst with two sweeps beside plain runs', () => {
  it('sees each sweep as one row among the recent runs, linking to the sweep', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}`);
    const table = page.getByTestId('runs-table');
    await table.waitFor();
    // Newest first: the grid sweep, the second plain run, the line sweep, the first plain run — 4 rows, not 19.
    await expect.poll(() => table.locator('tbody tr').count()).toBe(4);
    const rows = await table.locator('tbody tr').allInnerTexts();
    expect(rows[0]).toMatch(new RegExp(`^sweep\\s+${gridName}: 4 points, 4 done`));
    expect(rows[1]).toContain(`#${plainRunIds[0]}`);
    expect(rows[2]).toMatch(new RegExp(`^sweep\\s+${lineName}: 13 points, 13 done`));
    expect(rows[3]).toContain(`#${plainRunIds[1]}`);
    expect(rows[2]).toMatch(/\d+(–\d+)? % free/);
    await h.shot('sweep-points-overview-si');
    await table.getByRole('link', { name: lineName }).click();
    await page.waitForURL(`**/projects/${projectId}/sweeps/${lineSweep.id}`);
  });

  it("sees the same folding in the scenario editor's run list", async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/scenarios/${scenarioId}`);
    const list = page.getByTestId('scenario-runs');
    await list.waitFor();
    await expect.poll(() => list.locator('li').count()).toBe(4);
    expect(await page.getByTestId('scenario-sweep-row').allInnerTexts()).toEqual([
      expect.stringContaining('4 points, 4 done'),
      expect.stringContaining('13 points, 13 done'),
    ]);
    // The compare link takes the plain runs only.
    expect(await page.getByRole('link', { name: 'Compare these runs' }).getAttribute('href')).toBe(
      `/projects/${projectId}/compare?runs=${plainRunIds.join(',')}`,
    );
    await h.shot('sweep-points-scenario-si');
  });

  it('picks sweep points on the compare page once asked, labelled with sweep and value, in SI and IP', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/compare`);
    const picker = page.getByTestId('run-picker');
    await picker.waitFor();
    // Sweep points are hidden at first: the two plain runs only.
    await expect.poll(() => picker.locator('tbody tr').count()).toBe(2);
    await page.getByLabel('Runs listed').selectOption({ label: `Points of sweep ${lineName} (13)` });
    await expect.poll(() => picker.locator('tbody tr').count()).toBe(13);
    const values = await picker.getByTestId('sweep-point-value').allInnerTexts();
    // Listed in sweep order, 18 … 30 °C by 1 K, each naming its sweep.
    expect(values).toEqual(Array.from({ length: 13 }, (_, i) => `supply air ${18 + i}.0 °C`));
    expect(new Set(await picker.getByTestId('sweep-point-sweep').allInnerTexts())).toEqual(new Set([`Point of sweep ${lineName}`]));
    const [p18, p24] = [lineSweep.points[0].runId, lineSweep.points[6].runId];
    await picker.getByRole('checkbox', { name: `Compare run ${p18}` }).click();
    await expect.poll(() => new URL(page.url()).searchParams.get('runs')).toBe(String(p18));
    await picker.getByRole('checkbox', { name: `Compare run ${p24}` }).click();
    await expect.poll(() => new URL(page.url()).searchParams.get('runs')).toBe(`${p18},${p24}`);
    await page.getByTestId('comparison-table').waitFor();
    await h.shot('sweep-points-compare-si');
    // Back to plain runs: the two ticked points stay listed so their ticks can be taken back.
    await page.getByLabel('Runs listed').selectOption('plain');
    await expect.poll(() => picker.locator('tbody tr').count()).toBe(4);

    await h.useUnits('IP');
    await picker.waitFor();
    await page.getByLabel('Runs listed').selectOption('all');
    await expect.poll(() => picker.locator('tbody tr').count()).toBe(19);
    // 24 °C × 9/5 + 32 = 75.2 °F (exact, by the definition of the Fahrenheit scale).
    expect(
      await picker
        .getByRole('row')
        .filter({ hasText: `#${p24} ` })
        .getByTestId('sweep-point-value')
        .innerText(),
    ).toBe('supply air 75.2 °F');
    const gridRow = picker.getByRole('row').filter({ hasText: `Point of sweep ${gridName}` });
    expect(await gridRow.getByTestId('sweep-point-value').allInnerTexts()).toEqual([
      // Newest first: 22 °C = 71.6 °F and 20 °C = 68.0 °F (°C × 9/5 + 32, exact), each at 1,000 kW then 500 kW.
      'supply air 71.6 °F · IT load 1,000 kW',
      'supply air 71.6 °F · IT load 500 kW',
      'supply air 68.0 °F · IT load 1,000 kW',
      'supply air 68.0 °F · IT load 500 kW',
    ]);
    await h.shot('sweep-points-compare-ip');
    await h.useUnits('SI');
  });

  it("reads on a point's run page which sweep it belongs to and its value, with a link to the sweep", async () => {
    const page = h.page;
    const point = lineSweep.points[6];
    expect(point.values['system.supplyAirC']).toBe(24);
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${point.runId}`);
    const line = page.getByTestId('run-sweep-point');
    await line.waitFor();
    expect(await line.innerText()).toBe(`Point of sweep ${lineName}: Supply air setpoint = 24.0 °C`);
    await h.shot('sweep-points-run-si');
    await h.useUnits('IP');
    await expect.poll(() => line.innerText()).toBe(`Point of sweep ${lineName}: Supply air setpoint = 75.2 °F`);
    await h.shot('sweep-points-run-ip');
    await page.getByTestId('run-sweep-point').getByRole('link', { name: lineName }).click();
    await page.waitForURL(`**/projects/${projectId}/sweeps/${lineSweep.id}`);
    await h.useUnits('SI');
    // A plain run says nothing of sweeps.
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${plainRunIds[0]}`);
    await page.getByTestId('run-status').waitFor();
    expect(await page.getByTestId('run-sweep-point').count()).toBe(0);
  });

  it('shows the overview in IP too', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}`);
    await h.useUnits('IP');
    await expect.poll(() => page.getByTestId('runs-table').locator('tbody tr').count()).toBe(4);
    await h.shot('sweep-points-overview-ip');
    await h.useUnits('SI');
  });
});
