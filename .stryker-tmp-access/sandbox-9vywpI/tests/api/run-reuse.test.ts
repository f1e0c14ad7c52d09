/** "Run on today and on the projection" reuses an identical existing run instead of running it again (issue 17). */
// @ts-nocheck

import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runs } from '../../server/db/schema';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { siteFileAndScenario } from '../support/study-setup';

let t: TestApp;
let engineer: TestPerson;
let projectId: number;
let climateFileId: number;
let scenarioId: number;

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'tove.lindqvist@example.test');
  projectId = projectWithMembers(t.db, 'Reuse study', [[engineer, 'engineer']]);
  ({ climateFileId, scenarioId } = await siteFileAndScenario(t, projectId, engineer));
});
afterAll(() => t.close());

const start = (body: object) => request(t.app).post(`/api/projects/${projectId}/runs`).set(asPerson(engineer)).send(body).expect(202);

describe('starting runs with reuse', () => {
  it('gives back the existing run of identical inputs, queues nothing, and runs again once the scenario changes', async () => {
    const first = await start({ scenarioIds: [scenarioId], climateFileIds: [climateFileId] });
    await t.runQueue.idle();
    const again = await start({ scenarioIds: [scenarioId], climateFileIds: [climateFileId], reuse: true });
    expect(again.body.runs[0]).toMatchObject({ id: first.body.runs[0].id, reused: true, status: 'done' });
    expect(t.db.select().from(runs).all()).toHaveLength(1);
    // Without reuse (the run panel's "Run"), a new run is made as before.
    const fresh = await start({ scenarioIds: [scenarioId], climateFileIds: [climateFileId] });
    expect(fresh.body.runs[0].reused).toBe(false);
    await t.runQueue.idle();
    // A changed input is not identical.
    const { body } = await request(t.app).get(`/api/projects/${projectId}/scenarios/${scenarioId}`).set(asPerson(engineer)).expect(200);
    const changed = { ...body.scenario.scenario, system: { ...body.scenario.scenario.system, supplyAirC: body.scenario.scenario.system.supplyAirC + 1 } };
    await request(t.app).put(`/api/projects/${projectId}/scenarios/${scenarioId}`).set(asPerson(engineer)).send({ scenario: changed }).expect(200);
    const after = await start({ scenarioIds: [scenarioId], climateFileIds: [climateFileId], reuse: true });
    expect(after.body.runs[0].reused).toBe(false);
    await t.runQueue.idle();
  });
});
