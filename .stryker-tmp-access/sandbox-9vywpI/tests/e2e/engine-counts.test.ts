// @ts-nocheck
import { readFileSync } from 'node:fs';
import { eq } from 'drizzle-orm';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { runHours, runs, scenarios } from '../../server/db/schema';
import { prepareStoredData } from '../../server/start-up';
import type { ScenarioResults } from '../../shared/scenario';
import { startBrowserHarness, type BrowserHarness } from '../support/browser';
import { chartsDrawn, collectPageErrors, expectNoPageErrors, failedResourceLoad } from '../support/e2e-helpers';
import { personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Three synthetic years of an invented cold continental site (sample-weather/generate.ts): cold dry winters give
// humidified free-cooling hours, hot spells partly economised mechanical hours.
const coldSite = readFileSync(new URL('../../sample-weather/zimna-dolina.csv', import.meta.url));
const directAir = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));
/** The same design as engine 1.0.0 saved it: fan heat in kelvin, a COP slope and a blowdown ratio (synthetic demo). */
const OLD_SCENARIO = {
  ...directAir,
  name: 'Direct air saved by engine 1.0.0 (synthetic demo)',
  system: { kind: 'direct-air', supplyAirC: 25, itDeltaTK: 12, fanHeatK: 1, evaporativeEffectiveness: 0.85 },
  energy: { itLoadKw: 1000, mechanicalCop: 4.5, copSlopePerK: -0.08, copReferenceC: 35, fanPowerFraction: 0.04, pumpPowerFraction: 0.005, blowdownRatio: 0.33 },
};

let h: BrowserHarness;
let owner: TestPerson;
let projectId: number;
let newRun: number;
let oldRun: number;
let oldScenarioId: number;
let results: ScenarioResults;
let pageErrors: string[] = [];

const fmt = (n: number) => n.toLocaleString('en');

beforeAll(async () => {
  h = await startBrowserHarness();
  owner = personWithSession(h.testApp.db, 'ilse.marrow@example.test');
  projectId = projectWithMembers(h.testApp.db, 'Zimna Dolina hall study', [[owner, 'owner']]);
  const { site } = await h.api<{ site: { id: number } }>(
    owner,
    'POST',
    `/projects/${projectId}/sites`,
    JSON.stringify({ name: 'Zimna Dolina', elevationM: 158, timeZone: 'Europe/Warsaw' }),
  );
  const { climateFile } = await h.api<{ climateFile: { id: number } }>(
    owner,
    'POST',
    `/projects/${projectId}/sites/${site.id}/climate-files?fileName=zimna-dolina.csv`,
    coldSite,
    'text/csv',
  );
  const { scenario } = await h.api<{ scenario: { id: number } }>(owner, 'POST', `/projects/${projectId}/scenarios`, JSON.stringify({ scenario: directAir }));
  const created = await h.api<{ runs: { id: number }[] }>(
    owner,
    'POST',
    `/projects/${projectId}/runs`,
    JSON.stringify({ scenarioIds: [scenario.id], climateFileIds: [climateFile.id] }),
  );
  newRun = created.runs[0].id;
  await h.testApp.runQueue.idle();
  const db = h.testApp.db;
  const row = db.select().from(runs).where(eq(runs.id, newRun)).get()!;
  results = JSON.parse(row.resultsJson!) as ScenarioResults;

  // A run as engine 1.0.0 stored it: the same hours without the counts it did not make.
  const strip = ({ humidified: _h, partialMechanical: _p, ...rest }: Record<string, unknown>) => rest;
  const { humidificationL: _a, evaporativeCoolingL: _b, driftL: _c, ...water } = results.water;
  const oldResults = {
    ...results,
    engineVersion: 'scenario-engine 1.0.0',
    hours: strip({ ...results.hours }),
    hoursByMonth: results.hoursByMonth.map((m) => strip({ ...m })),
    hoursByYear: results.hoursByYear.map((y) => strip({ ...y })),
    water,
  };
  const { id: _id, ...copy } = row;
  oldRun = db
    .insert(runs)
    .values({ ...copy, engineVersion: 'scenario-engine 1.0.0', resultsJson: JSON.stringify(oldResults) })
    .returning()
    .get().id;
  const hours = db.select().from(runHours).where(eq(runHours.runId, newRun)).get()!;
  db.insert(runHours)
    .values({ ...hours, runId: oldRun })
    .run();
  // A scenario saved by engine 1.0.0, migrated as the server does at start-up.
  oldScenarioId = db
    .insert(scenarios)
    .values({ projectId, name: OLD_SCENARIO.name, scenarioJson: JSON.stringify(OLD_SCENARIO) })
    .returning()
    .get().id;
  expect(prepareStoredData(db, { demo: true })).toMatchObject({ migratedScenarios: 1 });

  pageErrors = collectPageErrors(h.page, { ignoreConsole: failedResourceLoad });
  await h.signInAs(owner);
  await h.page.goto(h.baseUrl);
  await h.useUnits('SI');
});
afterAll(() => h?.close());
afterEach(() => expectNoPageErrors(pageErrors));

describe('the new counts on screen', () => {
  it('the run page shows humidified and partly economised hours and the water split, in SI and IP', { timeout: 180_000 }, async () => {
    expect(results.hours.humidified).toBeGreaterThan(0);
    expect(results.hours.partialMechanical).toBeGreaterThan(0);
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${newRun}`);
    await page.getByTestId('mode-hours').waitFor();
    await chartsDrawn(page, { timeoutMs: 60_000 });
    expect(await page.getByTestId('run-engine').innerText()).toContain('scenario-engine 2.0.0');
    expect(await page.getByTestId('subset-humidified').innerText()).toContain(fmt(results.hours.humidified));
    expect(await page.getByTestId('subset-partialMechanical').innerText()).toContain(fmt(results.hours.partialMechanical));
    // The by-year table carries the same counts per year, which add up to the run's.
    const yearText = await page.getByTestId('year-table').innerText();
    for (const y of results.hoursByYear) expect(yearText).toContain(fmt(y.humidified));
    expect(results.hoursByYear.reduce((sum, y) => sum + y.humidified, 0)).toBe(results.hours.humidified);
    expect(await page.getByTestId('water-humidificationL').innerText()).toContain(
      `${(results.water.humidificationL / 1000).toLocaleString('en', { minimumFractionDigits: 2, maximumFractionDigits: 2 })} m³`,
    );
    await h.shot('engine-counts-run-si');
    await h.useUnits('IP');
    await page.getByTestId('mode-hours').waitFor();
    await chartsDrawn(page, { timeoutMs: 60_000 });
    // 1 US gallon = 3.785 411 784 L (NIST SP 811, 2008, App. B).
    expect(await page.getByTestId('water-humidificationL').innerText()).toContain(`${fmt(Math.round(results.water.humidificationL / 3.785411784))} US gal`);
    await h.shot('engine-counts-run-ip');
    await h.useUnits('SI');
  });

  it('the report shows the same counts and names its engine', { timeout: 120_000 }, async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${newRun}/report`);
    await page.getByTestId('report-mode-hours').waitFor();
    await chartsDrawn(page, { timeoutMs: 60_000 });
    expect(await page.getByTestId('report-engine').innerText()).toContain('scenario-engine 2.0.0');
    expect(await page.getByTestId('report-mode-hours').innerText()).toContain(fmt(results.hours.humidified));
    expect(await page.getByTestId('report-headline').innerText()).toContain(`${fmt(results.hours.humidified)} h with humidification`);
    expect(await page.getByTestId('report-monthly').innerText()).toContain('with humidification (h)');
    await h.shot('engine-counts-report');
  });

  it('an old run shows — and says its engine did not count them; a comparison with it says the engines differ', { timeout: 120_000 }, async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/runs/${oldRun}`);
    await page.getByTestId('mode-hours').waitFor();
    expect(await page.getByTestId('run-engine').innerText()).toContain('scenario-engine 1.0.0');
    expect(await page.getByTestId('subset-humidified').innerText()).toContain('—');
    expect(await page.getByTestId('not-counted-note').innerText()).toContain('(scenario-engine 1.0.0) did not count');
    await h.shot('engine-counts-old-run');

    await page.goto(`${h.baseUrl}/projects/${projectId}/compare?runs=${oldRun},${newRun}`);
    await page.getByTestId('comparison-table').waitFor();
    expect(await page.getByTestId('mixed-engines').innerText()).toContain(`scenario-engine 1.0.0: run ${oldRun}`);
    expect(await page.getByTestId('compare-row-humidified').innerText()).toContain(fmt(results.hours.humidified));
    expect(await page.getByTestId('compare-row-humidified').innerText()).toContain('—');
    // The run picker marks the run made by the older engine, and only that one.
    expect(await page.getByTestId('older-engine').allInnerTexts()).toEqual([' · by scenario-engine 1.0.0']);
    await h.shot('engine-counts-compare');

    await page.goto(`${h.baseUrl}/projects/${projectId}/compare/report?runs=${oldRun},${newRun}&baseline=${oldRun}`);
    await page.getByTestId('report-mixed-engines').waitFor();
    expect(await page.getByTestId('report-comparison').innerText()).toContain('of which with humidification');
    // The monthly table gives each run's 'of which' counts too: — for the old run's months.
    const monthly = await page.getByTestId('report-monthly-comparison').innerText();
    expect(monthly).toContain('free cooling / with humidification / adiabatic assist / mechanical / partly economised');
    expect(monthly).toMatch(/\d+ \/ — \/ \d+ \/ \d+ \/ —/);
    await h.shot('engine-counts-compare-report');
  });
});

describe('the scenario editor', () => {
  it('shows what the start-up migration changed once, until the owner dismisses it', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/scenarios/${oldScenarioId}`);
    const notice = page.getByTestId('migration-notice');
    await notice.waitFor();
    const text = await notice.innerText();
    expect(text).toContain('system.fanHeatK');
    expect(text).toContain('energy.cyclesOfConcentration');
    await h.shot('engine-counts-migration-notice');
    await notice.getByRole('button', { name: /dismiss/ }).click();
    await notice.waitFor({ state: 'detached' });
    await page.reload();
    await page.getByRole('heading', { name: OLD_SCENARIO.name }).waitFor();
    expect(await page.getByTestId('migration-notice').count()).toBe(0);
  });

  it('offers the IT load through the year and summarises the example profile', async () => {
    const page = h.page;
    await page.goto(`${h.baseUrl}/projects/${projectId}/scenarios/${oldScenarioId}`);
    await page.getByTestId('load-profile').waitFor();
    await page.getByTestId('load-profile').getByText('Hourly profile').click();
    const summary = page.getByTestId('load-profile-summary');
    await summary.waitFor();
    expect(await summary.innerText()).toContain('Typical daily and weekly shape');
    await page.getByTestId('load-profile').scrollIntoViewIfNeeded();
    await h.screenshot('engine-counts-load-profile');
    // A ramp by year: a bad entry is named and not taken; a good ramp is drawn year by year.
    await page.getByTestId('load-profile').getByText('Ramp by year').click();
    await page.getByLabel('Fraction of design load for each year').fill('0.5, abc, 1');
    expect(await page.getByTestId('load-profile-errors').innerText()).toContain('year 2: "abc" is not a number');
    await page.getByLabel('Fraction of design load for each year').fill('0.5, 75 %, 1');
    await page.getByTestId('load-profile-errors').waitFor({ state: 'detached' });
    expect(await page.getByRole('img', { name: 'Load by year' }).innerText()).toContain('75 %');
    await page.getByTestId('load-profile').scrollIntoViewIfNeeded();
    await h.screenshot('engine-counts-load-ramp');
  });
});
