/**
 * The moist-air chart as a designer reads it: the design's operating regions with the site's hours over them on
 * the run page (hover names a region's rule and a cell's hours; the table beside it counts every hour), and the
 * same chart in the scenario editor, whose boundaries follow a setpoint as it is typed.
 */
// @ts-nocheck

import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { screenshotFolder, startBrowserHarness, type BrowserHarness } from '../support/browser';
import { chartsDrawn, collectPageErrors, expectNoPageErrors } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Three synthetic years for an invented mild maritime site (sample-weather/generate.ts).
const threeYears = readFileSync(new URL('../../sample-weather/kelderwick-point.csv', import.meta.url));
const directAir = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

let h: BrowserHarness;
let engineer: TestPerson;
let projectId: number;
let scenarioId: number;
let runId: number;
let hoursInFile: number;
let pageErrors: string[] = [];

beforeAll(async () => {
  h = await startBrowserHarness();
  engineer = personWithSession(h.testApp.db, 'marit.oyelaran@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Kelderwick chart study', [[engineer, 'engineer']]);
  const { site } = await h.api<{ site: { id: number } }>(
    engineer,
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Kelderwick Point', elevationM: 40 }),
  );
  const upload = await h.api<{ climateFile: { id: number; hours: number } }>(
    engineer,
    'POST',
    `/projects/${projectId}/sites/${site.id}/climate-files?fileName=kelderwick-point.csv`,
    threeYears,
    'text/csv',
  );
  hoursInFile = upload.climateFile.hours;
  const { scenario } = await h.api<{ scenario: { id: number } }>(engineer, 'POST', `/projects/${projectId}/scenarios`, JSON.stringify({ scenario: directAir }));
  scenarioId = scenario.id;
  const { runs } = await h.api<{ runs: { id: number }[] }>(
    engineer,
    'POST',
    `/projects/${projectId}/runs`,
    JSON.stringify({ scenarioIds: [scenarioId], climateFileIds: [upload.climateFile.id] }),
  );
  runId = runs[0].id;
  pageErrors = collectPageErrors(h.page);
  await h.signInAs(engineer);
  await h.page.goto(h.baseUrl);
  await h.useUnits('SI');
}, 120_000);
afterAll(() => h?.close());
afterEach(() => expectNoPageErrors(pageErrors));

/** Hours per region as the table beside the chart lists them. */
async function regionHours(scope: ReturnType<BrowserHarness['page']['getByTestId']>): Promise<Record<string, number>> {
  const rows = scope.getByTestId('region-table').locator('tbody tr');
  const out: Record<string, number> = {};
  for (const row of await rows.all()) {
    const key = (await row.getAttribute('data-region'))!;
    const text = await row.locator('td').first().innerText();
    out[key] = Number(text.replace(/[^0-9]/g, ''));
  }
  return out;
}

describe('the moist-air chart of a design', () => {
  it('shows the run’s regions and hours, names a region’s rule and a cell’s hours on hover, in SI and IP', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runId}`);
    await expect.poll(() => page.getByTestId('run-status').innerText(), { timeout: 60_000 }).toBe('done');
    await chartsDrawn(page, { timeoutMs: 30_000 });
    const chart = page.getByTestId('moist-air-chart');
    await expect.poll(() => chart.getByTestId('region-table').locator('tbody tr').count(), { timeout: 30_000 }).toBeGreaterThanOrEqual(3);

    // Every hour with data is in one region, as the run classified it: the rows add up to the file's hours.
    const byRegion = await regionHours(chart);
    expect(Object.values(byRegion).reduce((a, b) => a + b, 0)).toBe(hoursInFile);
    // The run page's own mode table gives the same free-cooling hours (free + humidified = the free-cooling mode).
    const modeTable = await page.getByTestId('mode-hours').innerText();
    const freeMode = Number(/Free cooling\s+([\d,]+)/.exec(modeTable)![1].replace(/,/g, ''));
    expect(byRegion.free + (byRegion.humidified ?? 0)).toBe(freeMode);

    // A mild state, 12 °C and 6 g/kg: free cooling for a 25 °C supply. Its rule names the off-coil temperature:
    // 25 °C less 0.0833 × 12 K ≈ 1.0 K of fan heat = 24.0 °C (designFanHeatK; fan heat from the fan power share).
    const figure = chart.getByTestId('moist-air-figure');
    const svg = figure.locator('svg').first();
    await svg.scrollIntoViewIfNeeded();
    const box = (await svg.boundingBox())!;
    const position = await pointFor(page, 12, 0.006);
    await page.mouse.move(box.x + position.px, box.y + position.py);
    const hover = page.getByTestId('chart-hover');
    await expect.poll(() => hover.isVisible(), { timeout: 10_000 }).toBe(true);
    const hoverText = await hover.innerText();
    expect(hoverText).toContain('Free cooling');
    expect(hoverText).toContain('at most 24.0 °C');
    expect(hoverText).toMatch(/\d[\d,]* h/);
    await chart.screenshot({ path: path.join(screenshotFolder, 'moist-air-run-hover-si.png') });
    await page.mouse.move(0, 0);
    await chart.screenshot({ path: path.join(screenshotFolder, 'moist-air-run-si.png') });

    await h.useUnits('IP');
    await chartsDrawn(page, { timeoutMs: 30_000 });
    const chartIp = page.getByTestId('moist-air-chart');
    await expect.poll(() => chartIp.getByTestId('region-table').innerText(), { timeout: 30_000 }).toContain('°F');
    expect(await regionHours(chartIp)).toEqual(byRegion);
    const svgIp = chartIp.getByTestId('moist-air-figure').locator('svg').first();
    await svgIp.scrollIntoViewIfNeeded();
    const boxIp = (await svgIp.boundingBox())!;
    const positionIp = await pointFor(page, 12, 0.006);
    await page.mouse.move(boxIp.x + positionIp.px, boxIp.y + positionIp.py);
    // 24.0 °C = 75.2 °F.
    await expect.poll(() => page.getByTestId('chart-hover').innerText(), { timeout: 10_000 }).toContain('75.2 °F');
    await chartIp.scrollIntoViewIfNeeded();
    await chartIp.screenshot({ path: path.join(screenshotFolder, 'moist-air-run-ip.png') });
    await page.getByRole('button', { name: 'h–x diagram' }).click();
    await chartsDrawn(page, { timeoutMs: 30_000 });
    await chartIp.screenshot({ path: path.join(screenshotFolder, 'moist-air-run-hx-ip.png') });
    await h.useUnits('SI');
  }, 180_000);

  it('moves the boundaries in the scenario editor as the supply setpoint is typed', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/scenarios/${scenarioId}`);
    const preview = page.getByTestId('design-chart-preview');
    await expect.poll(() => preview.getByTestId('region-table').locator('tbody tr').count(), { timeout: 30_000 }).toBeGreaterThanOrEqual(3);
    const before = await regionHours(preview);
    await h.shot('moist-air-editor-si');
    // A colder supply (18 °C) shrinks free cooling: fewer hours fall below 17 °C than below 24 °C.
    await page.getByLabel('Supply air setpoint').fill('18');
    await expect.poll(async () => (await regionHours(preview)).free, { timeout: 15_000 }).toBeLessThan(before.free);
    const after = await regionHours(preview);
    expect(after.adiabatic + after.partialMechanical + (after.mechanical ?? 0)).toBeGreaterThan(
      before.adiabatic + before.partialMechanical + (before.mechanical ?? 0),
    );
    expect(await preview.getByTestId('region-table').innerText()).toContain('at most 17.0 °C');
    await h.shot('moist-air-editor-moved-si');
  }, 120_000);

  it('carries the moist-air chart and the carpet plot in the run report, printed on A4 and US Letter', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${runId}/report`);
    const charts = page.getByTestId('report-hour-charts');
    await expect.poll(() => charts.isVisible(), { timeout: 60_000 }).toBe(true);
    // The monthly chart, the moist-air chart and the carpet plot.
    await chartsDrawn(page, { atLeast: 3, timeoutMs: 30_000 });
    const byRegion = await regionHours(charts);
    expect(Object.values(byRegion).reduce((a, b) => a + b, 0)).toBe(hoursInFile);
    await page.emulateMedia({ media: 'print' });
    for (const format of ['A4', 'Letter'] as const) {
      const pdf = await page.pdf({ format, printBackground: true });
      writeFileSync(path.join(screenshotFolder, `moist-air-report-${format.toLowerCase()}.pdf`), pdf);
      expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
      // Both charts are drawn as SVG, so their lettering stays text in the PDF.
      expect(pdf.length).toBeGreaterThan(50_000);
    }
    await page.emulateMedia({ media: 'screen' });
    await charts.scrollIntoViewIfNeeded();
    await charts.screenshot({ path: path.join(screenshotFolder, 'moist-air-report-si.png') });
  }, 120_000);
});

/**
 * Where a state (°C, kg/kg) sits in the first moist-air chart's svg (dry-bulb/humidity-ratio projection), in CSS
 * pixels from its top-left corner: read from the axes' domains and the plotting area the chart writes on its svg.
 */
async function pointFor(page: BrowserHarness['page'], dryBulbC: number, humidityRatio: number): Promise<{ px: number; py: number }> {
  return page.evaluate(
    ([t, w]) => {
      const svg = document.querySelector('[data-testid="moist-air-figure"] svg') as SVGSVGElement;
      const [x0, x1, y0, y1] = svg.dataset.domains!.split(' ').map(Number);
      const [left, right, bottom, top] = svg.dataset.area!.split(' ').map(Number);
      const ip = localStorage.getItem('tramontane.unitSystem') === 'IP';
      // °F = 1.8·°C + 32; gr/lb = 7000 · kg/kg (grains per pound).
      const shownT = ip ? t * 1.8 + 32 : t;
      const shownW = ip ? w * 7000 : w * 1000;
      const scale = svg.getBoundingClientRect().width / svg.width.baseVal.value;
      return { px: (left + ((shownT - x0) / (x1 - x0)) * (right - left)) * scale, py: (bottom - ((shownW - y0) / (y1 - y0)) * (bottom - top)) * scale };
    },
    [dryBulbC, humidityRatio] as const,
  );
}
