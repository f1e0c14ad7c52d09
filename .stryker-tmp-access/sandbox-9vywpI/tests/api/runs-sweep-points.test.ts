// @ts-nocheck
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { siteFileAndScenario } from '../support/study-setup';

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let plainRunId: number;
let sweepId: number;
let pointRunIds: number[];

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'ines.valbrand@example.test');
  viewer = personWithSession(t.db, 'panel.reader@example.test');
  projectId = projectWithMembers(t.db, 'Point listing study', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  const { climateFileId, scenarioId } = await siteFileAndScenario(t, projectId, engineer, { siteName: 'Harrowgate Fen', elevationM: 40 });
  const plain = await request(t.app)
    .post(`/api/projects/${projectId}/runs`)
    .set(asPerson(engineer))
    .send({ scenarioIds: [scenarioId], climateFileIds: [climateFileId] })
    .expect(202);
  plainRunId = plain.body.runs[0].id;
  // A 2 × 2 grid: supply air outer, IT load inner, so each point names two inputs in that order.
  const sweep = await request(t.app)
    .post(`/api/projects/${projectId}/sweeps`)
    .set(asPerson(engineer))
    .send({
      name: 'Setpoint by load',
      scenarioId,
      climateFileId,
      axes: [
        { input: 'system.supplyAirC', from: 20, to: 22, step: 2 },
        { input: 'energy.itLoadKw', from: 500, to: 1000, step: 500 },
      ],
    })
    .expect(202);
  sweepId = sweep.body.sweep.id;
  pointRunIds = sweep.body.sweep.points.map((p: { runId: number }) => p.runId);
  await t.runQueue.idle();
});
afterAll(() => t.close());

describe('runs that are points of a sweep', () => {
  it('carry their sweep id, the sweep name and the point in the project run list; plain runs carry nulls', async () => {
    const res = await request(t.app).get(`/api/projects/${projectId}/runs`).set(asPerson(viewer)).expect(200);
    const listed = res.body.runs as { id: number; sweepId: number | null; sweepName: string | null; sweepPoint: Record<string, number> | null }[];
    expect(listed).toHaveLength(5);
    const points = listed.filter((r) => r.sweepId !== null).sort((a, b) => a.id - b.id);
    expect(points.map((r) => r.id)).toEqual(pointRunIds);
    expect(points.every((r) => r.sweepId === sweepId && r.sweepName === 'Setpoint by load')).toBe(true);
    // The grid's points in sweep order (first axis outer), each naming both inputs, outer first.
    expect(points.map((r) => r.sweepPoint)).toEqual([
      { 'system.supplyAirC': 20, 'energy.itLoadKw': 500 },
      { 'system.supplyAirC': 20, 'energy.itLoadKw': 1000 },
      { 'system.supplyAirC': 22, 'energy.itLoadKw': 500 },
      { 'system.supplyAirC': 22, 'energy.itLoadKw': 1000 },
    ]);
    expect(points.map((r) => Object.keys(r.sweepPoint!))).toEqual(points.map(() => ['system.supplyAirC', 'energy.itLoadKw']));
    const plain = listed.find((r) => r.id === plainRunId)!;
    expect(plain).toMatchObject({ sweepId: null, sweepName: null, sweepPoint: null });
    // The stored JSON text is not sent beside its parsed form, as for the scenario and the results.
    for (const r of listed) expect(r).not.toHaveProperty('sweepPointJson');
  });

  it('carry the same on the single run, and the point agrees with the scenario as run', async () => {
    const res = await request(t.app).get(`/api/projects/${projectId}/runs/${pointRunIds[2]}`).set(asPerson(viewer)).expect(200);
    const run = res.body.run;
    expect(run).toMatchObject({ sweepId, sweepName: 'Setpoint by load', sweepPoint: { 'system.supplyAirC': 22, 'energy.itLoadKw': 500 } });
    expect(run.scenario.system.supplyAirC).toBe(22);
    expect(run.scenario.energy.itLoadKw).toBe(500);
    expect(run).not.toHaveProperty('sweepPointJson');
    const plain = (await request(t.app).get(`/api/projects/${projectId}/runs/${plainRunId}`).set(asPerson(viewer)).expect(200)).body.run;
    expect(plain).toMatchObject({ sweepId: null, sweepName: null, sweepPoint: null });
  });

  it('are gone from the list once their sweep is deleted, leaving the plain run', async () => {
    await request(t.app).delete(`/api/projects/${projectId}/sweeps/${sweepId}`).set(asPerson(engineer)).expect(204);
    const res = await request(t.app).get(`/api/projects/${projectId}/runs`).set(asPerson(viewer)).expect(200);
    expect(res.body.runs.map((r: { id: number }) => r.id)).toEqual([plainRunId]);
  });
});
