// @ts-nocheck
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents, runs } from '../../server/db/schema';
import { createApp } from '../../server/app';
import { createRunQueue } from '../../server/runs/queue';
import type { WorkerPool } from '../../workers/pool';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { directAirSample, siteFileAndScenario } from '../support/study-setup';

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let climateFileId: number;
let scenarioId: number;

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'maren.holt@example.test');
  viewer = personWithSession(t.db, 'reviewer@example.test');
  projectId = projectWithMembers(t.db, 'Run study', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  ({ climateFileId, scenarioId } = await siteFileAndScenario(t, projectId, engineer));
});
afterAll(() => t.close());

describe('an engineer running a scenario', () => {
  it('refuses a scenario with a bad field, naming it', async () => {
    const bad = { ...directAirSample, system: { ...directAirSample.system, supplyAirC: 90 } };
    const res = await request(t.app).post(`/api/projects/${projectId}/scenarios`).set(asPerson(engineer)).send({ scenario: bad }).expect(400);
    expect(res.body.error.message).toContain('supplyAirC');
  });

  it('previews hours per mode while editing, without storing a run', async () => {
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/scenarios/preview`)
      .set(asPerson(engineer))
      .send({ scenario: directAirSample, climateFileId })
      .expect(200);
    const h = res.body.hours;
    expect(h.free + h.adiabatic + h.mechanical + h.noData).toBe(72);
    expect(t.db.select().from(runs).all()).toHaveLength(0);
  });

  it('queues a run that finishes on the pool with hours summing to the file', async () => {
    const created = await request(t.app)
      .post(`/api/projects/${projectId}/runs`)
      .set(asPerson(engineer))
      .send({ scenarioIds: [scenarioId], climateFileIds: [climateFileId] })
      .expect(202);
    const runId = created.body.runs[0].id;
    expect(created.body.runs[0].status).toBe('queued');
    await t.runQueue.idle();
    const res = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}`).set(asPerson(viewer)).expect(200);
    expect(res.body.run.status).toBe('done');
    expect(res.body.run.engineVersion).toBeTypeOf('string');
    expect(res.body.run.scenario.name).toBe(directAirSample.name);
    expect(res.body.run.climate.sha256).toMatch(/^[0-9a-f]{64}$/);
    const h = res.body.run.results.hours;
    expect(h.total).toBe(72);
    expect(h.free + h.adiabatic + h.mechanical + h.noData).toBe(72);
    // The fixture never exceeds 22 °C dry-bulb, so with a 25 °C supply and 1 K fan heat no hour needs compressors
    // for temperature; its moisture stays under the 17 °C dew-point limit, so none needs them for humidity either.
    expect(h.mechanical).toBe(0);

    const hours = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/hours`).set(asPerson(viewer)).expect(200);
    expect(hours.body.modes).toHaveLength(72);
    expect(hours.body.modeNames).toEqual(['free', 'adiabatic', 'mechanical', 'no_data']);
    // One humidified flag per hour (the moist-air chart counts humidified free cooling as its own region); as many as the results count.
    expect(hours.body.humidified).toHaveLength(72);
    expect(hours.body.humidified.filter((v: number) => v === 1).length).toBe(res.body.run.results.hours.humidified ?? 0);

    const trail = t.db.select().from(auditEvents).all();
    expect(trail.find((e) => e.action === 'run.start')).toMatchObject({ actorId: engineer.id, target: `run ${runId}` });
    expect(trail.find((e) => e.action === 'run.done')).toMatchObject({ actorId: null, projectId });
  });

  it('keeps the run as it was when the scenario changes later', async () => {
    const list = await request(t.app).get(`/api/projects/${projectId}/runs`).set(asPerson(viewer)).expect(200);
    const before = list.body.runs[0];
    await request(t.app)
      .put(`/api/projects/${projectId}/scenarios/${scenarioId}`)
      .set(asPerson(engineer))
      .send({ scenario: { ...directAirSample, name: 'Renamed later', system: { ...directAirSample.system, supplyAirC: 20 } } })
      .expect(200);
    const after = await request(t.app).get(`/api/projects/${projectId}/runs/${before.id}`).set(asPerson(viewer)).expect(200);
    expect(after.body.run.scenario.name).toBe(directAirSample.name);
    expect(after.body.run.scenario.system.supplyAirC).toBe(25);
  });

  it('runs a sweep of scenarios and lets a queued run be cancelled', async () => {
    const copy = await request(t.app).post(`/api/projects/${projectId}/scenarios/${scenarioId}/duplicate`).set(asPerson(engineer)).expect(201);
    expect(copy.body.scenario.name).toBe('Renamed later (copy)');
    // The pool holds every task until the test lets go, so the fourth run is surely still waiting when it is cancelled.
    const held: Array<() => void> = [];
    const heldPool: WorkerPool = {
      ...t.pool,
      run: (task, input, options) => new Promise<void>((release) => held.push(release)).then(() => t.pool.run(task, input, options)) as never,
    };
    const queue = createRunQueue({ db: t.db, pool: heldPool });
    const app = createApp({ db: t.db, pool: t.pool, runQueue: queue });
    const created = await request(app)
      .post(`/api/projects/${projectId}/runs`)
      .set(asPerson(engineer))
      .send({ scenarioIds: [scenarioId, copy.body.scenario.id, scenarioId, scenarioId], climateFileIds: [climateFileId] })
      .expect(202);
    expect(created.body.runs).toHaveLength(4);
    const ids: number[] = created.body.runs.map((r: { id: number }) => r.id);
    const last = ids[3];
    const cancel = await request(app).post(`/api/projects/${projectId}/runs/${last}/cancel`).set(asPerson(engineer)).expect(200);
    expect(cancel.body.run.status).toBe('cancelled');
    // Let every held task go, also any started after the first ones finish, until the queue is idle.
    const releaseAll = setInterval(() => held.splice(0).forEach((go) => go()), 5);
    await queue.idle();
    clearInterval(releaseAll);
    const statuses = t.db
      .select({ id: runs.id, status: runs.status })
      .from(runs)
      .all()
      .filter((r) => ids.includes(r.id));
    expect(statuses.find((r) => r.id === last)!.status).toBe('cancelled');
    expect(statuses.filter((r) => r.id !== last).map((r) => r.status)).toEqual(['done', 'done', 'done']);
  });

  it('picks up runs left pending when the server stopped', async () => {
    const created = await request(t.app)
      .post(`/api/projects/${projectId}/runs`)
      .set(asPerson(engineer))
      .send({ scenarioIds: [scenarioId], climateFileIds: [climateFileId] })
      .expect(202);
    await t.runQueue.idle();
    const runId = created.body.runs[0].id;
    // As if the process died mid-run: the row says running and nothing is computing it.
    t.db.update(runs).set({ status: 'running', resultsJson: null }).where(eq(runs.id, runId)).run();
    t.db.$client.prepare('delete from run_hours where run_id = ?').run(runId);
    const restarted = createRunQueue({ db: t.db, pool: t.pool });
    expect(restarted.resume()).toBe(1);
    await restarted.idle();
    expect(t.db.select({ status: runs.status }).from(runs).where(eq(runs.id, runId)).get()!.status).toBe('done');
  });

  it('marks a run failed, with the reason, when it times out or its climate file is gone', async () => {
    const queued = () =>
      t.db
        .insert(runs)
        .values({ ...t.db.select().from(runs).get()!, id: undefined, status: 'queued', resultsJson: null, error: null, startedAt: null, finishedAt: null })
        .returning()
        .get();
    const slow = queued();
    // A task that never answers, as a stuck worker would: only the queue's timeout can end it.
    const stuckPool: WorkerPool = {
      ...t.pool,
      run: (_task, _input, options) => new Promise((_resolve, reject) => options?.signal?.addEventListener('abort', () => reject(options.signal!.reason))),
    };
    const impatient = createRunQueue({ db: t.db, pool: stuckPool, timeoutMs: 50 });
    impatient.enqueue(slow.id);
    await impatient.idle();
    const timedOut = t.db.select().from(runs).where(eq(runs.id, slow.id)).get()!;
    expect(timedOut.status).toBe('failed');
    expect(timedOut.error).toMatch(/took longer than/);

    const orphan = queued();
    t.db.update(runs).set({ climateFileId: null }).where(eq(runs.id, orphan.id)).run();
    t.runQueue.enqueue(orphan.id);
    await t.runQueue.idle();
    const failed = t.db.select().from(runs).where(eq(runs.id, orphan.id)).get()!;
    expect(failed.status).toBe('failed');
    expect(failed.error).toBe('The climate file of this run was deleted before the run started.');
    expect(
      t.db
        .select()
        .from(auditEvents)
        .all()
        .filter((e) => e.action === 'run.failed'),
    ).toHaveLength(2);
  });

  it('refuses runs to a viewer', async () => {
    await request(t.app)
      .post(`/api/projects/${projectId}/runs`)
      .set(asPerson(viewer))
      .send({ scenarioIds: [scenarioId], climateFileIds: [climateFileId] })
      .expect(403);
  });
});
