/**
 * A hybrid hall through the API: saved, previewed with both loops' hours, run, downloaded hour by hour with the loop
 * columns, and swept over the liquid share and the facility-water supply (the grid of the two).
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { siteFileAndScenario, threeDaysCsv } from '../support/study-setup';

const hybridSample = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/hybrid-w32-dry-cooler.json', import.meta.url), 'utf8'));
/** The fixture's dry-bulbs, read from the CSV itself (hours with a value). */
const dryBulbs = threeDaysCsv
  .split('\n')
  .filter((line) => /^\d{4}-/.test(line))
  .map((line) => Number(line.split(',')[1]));

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let climateFileId: number;
let scenarioId: number;

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'hybrid.engineer@example.test');
  viewer = personWithSession(t.db, 'hybrid.viewer@example.test');
  projectId = projectWithMembers(t.db, 'Hybrid study', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  ({ climateFileId, scenarioId } = await siteFileAndScenario(t, projectId, engineer, { scenario: hybridSample }));
});
afterAll(() => t.close());

/** Liquid-loop mechanical hours by the dry-cooler approach rule (common practice): T_db + approach > supply. */
const liquidMechanicalHours = (supplyC: number, approachK = 5) => dryBulbs.filter((t) => t + approachK > supplyC).length;

describe('a hybrid hall through the API', () => {
  it('refuses a hybrid whose share is out of range, naming the field', async () => {
    const bad = { ...hybridSample, system: { ...hybridSample.system, liquidShare: 1.5 } };
    const res = await request(t.app).post(`/api/projects/${projectId}/scenarios`).set(asPerson(engineer)).send({ scenario: bad }).expect(400);
    expect(res.body.error.message).toContain('system.liquidShare');
  });

  it('previews both loops’ hours while editing', async () => {
    const scenario = { ...hybridSample, system: { ...hybridSample.system, liquid: { ...hybridSample.system.liquid, chilledWaterSupplyC: 17 } } };
    const res = await request(t.app).post(`/api/projects/${projectId}/scenarios/preview`).set(asPerson(engineer)).send({ scenario, climateFileId }).expect(200);
    expect(res.body.loops.liquid.hours.total).toBe(72);
    expect(res.body.loops.liquid.hours.mechanical).toBe(liquidMechanicalHours(17));
    expect(res.body.loops.air.hours.total).toBe(72);
    expect(res.body.hours.mechanical).toBeGreaterThanOrEqual(res.body.loops.liquid.hours.mechanical);
  });

  it('runs, keeps the loops and heat reuse in the results, and writes the loop columns hour by hour', async () => {
    const created = await request(t.app)
      .post(`/api/projects/${projectId}/runs`)
      .set(asPerson(engineer))
      .send({ scenarioIds: [scenarioId], climateFileIds: [climateFileId] })
      .expect(202);
    const runId = created.body.runs[0].id;
    await t.runQueue.idle();
    const res = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}`).set(asPerson(viewer)).expect(200);
    const results = res.body.run.results;
    expect(results.systemKind).toBe('hybrid');
    expect(results.loops.liquid.hours.mechanical).toBe(liquidMechanicalHours(32)); // 0: the file tops out at 22 °C
    expect(results.loops.liquid.share).toBe(0.8);
    expect(results.heatReuse.availableHours).toBe(72);
    const csv = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/downloads/hourly.csv`).set(asPerson(viewer)).expect(200);
    const lines = csv.text.trimEnd().split('\n');
    expect(lines[0].endsWith(',local_standard_time,liquid_mode,air_mode,liquid_mechanical_fraction')).toBe(true);
    expect(lines).toHaveLength(73);
    expect(lines.slice(1).every((line) => line.split(',')[11] === 'free')).toBe(true);
  });

  it('sweeps a grid of liquid share and facility-water supply, each point an ordinary run', async () => {
    const created = await request(t.app)
      .post(`/api/projects/${projectId}/sweeps`)
      .set(asPerson(engineer))
      .send({
        scenarioId,
        climateFileId,
        axes: [
          { input: 'system.liquidShare', from: 0.6, to: 0.9, step: 0.3 },
          { input: 'system.liquid.chilledWaterSupplyC', from: 12, to: 17, step: 5 },
        ],
      })
      .expect(202);
    expect(created.body.sweep.points).toHaveLength(4);
    await t.runQueue.idle();
    const res = await request(t.app).get(`/api/projects/${projectId}/sweeps/${created.body.sweep.id}`).set(asPerson(viewer)).expect(200);
    const byPoint = res.body.sweep.points.map((p: { values: Record<string, number>; results: { liquidMechanicalHours: number } }) => [
      p.values['system.liquidShare'],
      p.values['system.liquid.chilledWaterSupplyC'],
      p.results.liquidMechanicalHours,
    ]);
    expect(byPoint).toEqual([
      [0.6, 12, liquidMechanicalHours(12)],
      [0.6, 17, liquidMechanicalHours(17)],
      [0.9, 12, liquidMechanicalHours(12)],
      [0.9, 17, liquidMechanicalHours(17)],
    ]);
    expect(liquidMechanicalHours(12)).toBeGreaterThan(liquidMechanicalHours(17));
  });

  it('refuses a single-system input on a hybrid sweep, saying what to sweep instead', async () => {
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/sweeps`)
      .set(asPerson(engineer))
      .send({ scenarioId, climateFileId, axes: [{ input: 'system.supplyAirC', from: 20, to: 24, step: 2 }] })
      .expect(422);
    expect(res.body.error.message).toContain('system.liquidShare');
  });
});
