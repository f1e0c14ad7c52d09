/**
 * One metric list (shared/metrics.ts): the compare page builds its CSV from the run list the API gives it, the
 * comparison report's CSV is built on the server from the runs' full results; for the same runs both give the same
 * figures in the same units. The run list's results are the fields the compared figures read, a hybrid's loops and
 * heat reuse included.
 */
import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { comparableResults, listedResultPaths, METRICS } from '../../shared/metrics';
import { comparisonCsv, withResults } from '../../shared/report/comparison';
import type { RunListing } from '../../src/lib/api/runs';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { siteFileAndScenario } from '../support/study-setup';

const hybridSample = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/hybrid-w32-dry-cooler.json', import.meta.url), 'utf8'));

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let directRunId: number;
let hybridRunId: number;

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'metrics.engineer@example.test');
  viewer = personWithSession(t.db, 'metrics.viewer@example.test');
  projectId = projectWithMembers(t.db, 'One metric list', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  const { climateFileId, scenarioId } = await siteFileAndScenario(t, projectId, engineer);
  const hybrid = await request(t.app).post(`/api/projects/${projectId}/scenarios`).set(asPerson(engineer)).send({ scenario: hybridSample }).expect(201);
  const created = await request(t.app)
    .post(`/api/projects/${projectId}/runs`)
    .set(asPerson(engineer))
    .send({ scenarioIds: [scenarioId, hybrid.body.scenario.id], climateFileIds: [climateFileId] })
    .expect(202);
  [directRunId, hybridRunId] = created.body.runs.map((r: { id: number }) => r.id);
  await t.runQueue.idle();
});
afterAll(() => t.close());

const listing = async (): Promise<RunListing[]> => (await request(t.app).get(`/api/projects/${projectId}/runs`).set(asPerson(viewer)).expect(200)).body.runs;
const fullResults = async (runId: number) =>
  (await request(t.app).get(`/api/projects/${projectId}/runs/${runId}`).set(asPerson(viewer)).expect(200)).body.run.results;

describe('the run list', () => {
  it("lists a hybrid run's results as comparableResults picks them from the full results: loops' hours and heat reuse included", async () => {
    const hybrid = (await listing()).find((r) => r.id === hybridRunId)!;
    const full = await fullResults(hybridRunId);
    expect(full.loops).toBeDefined();
    expect(full.heatReuse).toBeDefined();
    expect(hybrid.results).toEqual(comparableResults(full));
    expect(Object.keys(hybrid.results!).sort()).toEqual(['energy', 'excursions', 'heatReuse', 'hours', 'loops', 'peakMechanicalLoadKw', 'water']);
    expect(hybrid.results!.loops).toEqual({ liquid: { hours: full.loops.liquid.hours }, air: { hours: full.loops.air.hours } });
    expect(hybrid.results!.heatReuse).toEqual({ availableKwh: full.heatReuse.availableKwh, erf: full.heatReuse.erf });
    // The paths come from the compared figures, none inside another.
    expect(listedResultPaths).toEqual([
      'hours',
      'excursions',
      'energy',
      'peakMechanicalLoadKw',
      'water',
      'loops.liquid.hours',
      'loops.air.hours',
      'heatReuse.availableKwh',
      'heatReuse.erf',
    ]);
  });

  it('lists a single system without loops or heat reuse', async () => {
    const direct = (await listing()).find((r) => r.id === directRunId)!;
    expect(direct.results).not.toHaveProperty('loops');
    expect(direct.results).not.toHaveProperty('heatReuse');
    expect(direct.results).toEqual(comparableResults(await fullResults(directRunId)));
  });
});

describe("the compare page's CSV and the comparison report's CSV", () => {
  for (const units of ['SI', 'IP'] as const) {
    it(`give the same figures in the same units for the same runs (${units})`, async () => {
      // As the compare page does: the listed runs in the order ticked (the baseline first), those with results.
      const listed = await listing();
      const ticked = [directRunId, hybridRunId].map((id) => listed.find((r) => r.id === id)!);
      const pageCsv = comparisonCsv(withResults(ticked), directRunId, units);
      const report = await request(t.app)
        .get(`/api/projects/${projectId}/compare/downloads/summary.csv?runs=${directRunId},${hybridRunId}&baseline=${directRunId}&units=${units.toLowerCase()}`)
        .set(asPerson(viewer))
        .expect(200);
      expect(pageCsv).toBe(report.text);

      const lines = report.text.trimEnd().split('\n');
      const line = (figure: string) => lines.find((l) => l.startsWith(`${figure},`) || l.startsWith(`"${figure}",`))!.split(/,(?=(?:[^"]*"[^"]*")*[^"]*$)/);
      // 72 hours of July, 6.3…22.0 °C (tests/fixtures/api/three-days.csv): every hour has data.
      const hours = ['Free cooling', 'Adiabatic assist', 'Mechanical', 'No data'].map((f) => Number(line(f)[2]));
      expect(hours.reduce((a, b) => a + b, 0)).toBe(72);
      // Energy in kWh, water in L or US gal (1 US gal = 3.785 411 784 L exactly, NIST SP 811 App. B), WUE in L/kWh (ISO/IEC 30134-9).
      expect(line(METRICS.coolingPerYear.label)[1]).toBe('kWh');
      expect(line(METRICS.waterPerYear.label)[1]).toBe(units === 'SI' ? 'L' : 'US gal');
      expect(line(METRICS.wue.label)[1]).toBe('L/kWh');
      // The hybrid's figures are there, with – for the single system beside it.
      expect(line(METRICS.liquidMechanical.label).slice(2)).toEqual(['', '', '0', '']);
      expect(line(METRICS.erf.label)[2]).toBe('');
    });
  }
});
