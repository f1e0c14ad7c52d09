// @ts-nocheck
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { auditEvents, runs } from '../../server/db/schema';
import { createRunQueue, type RunQueue } from '../../server/runs/queue';
import type { WorkerPool } from '../../workers/pool';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { siteFileAndScenario } from '../support/study-setup';
import { createTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
let app: ReturnType<typeof createApp>;
let queue: RunQueue;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let ids: { climateFileId: number; scenarioId: number };
let finishFirst: () => void;

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'odile.brannock@example.test');
  viewer = personWithSession(t.db, 'night.reader@example.test');
  projectId = projectWithMembers(t.db, 'Stopping study', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  ids = await siteFileAndScenario(t, projectId, engineer);
  // A pool whose first task finishes when the test says so and whose others never answer (as busy workers would),
  // so the sweep is caught with one point done, one running and the rest waiting.
  let first = true;
  const heldPool: WorkerPool = {
    ...t.pool,
    threads: 2,
    run: (task, input, options) => {
      if (first) {
        first = false;
        return new Promise((resolve, reject) => {
          finishFirst = () => t.pool.run(task, input).then(resolve, reject);
        }) as never;
      }
      return new Promise((_resolve, reject) => options?.signal?.addEventListener('abort', () => reject(options.signal!.reason))) as never;
    },
  };
  queue = createRunQueue({ db: t.db, pool: heldPool });
  app = createApp({ db: t.db, pool: t.pool, runQueue: queue });
});
afterAll(async () => {
  await queue.idle();
  await t.close();
});

describe('stopping the rest of a sweep', () => {
  it('cancels the points waiting or running, keeps the finished one, and is audited once', async () => {
    const created = await request(app)
      .post(`/api/projects/${projectId}/sweeps`)
      .set(asPerson(engineer))
      .send({ ...ids, axes: [{ input: 'system.supplyAirC', from: 18, to: 26, step: 1 }] })
      .expect(202);
    const sweepId = created.body.sweep.id as number;
    finishFirst();
    const points = () => t.db.select().from(runs).where(eq(runs.sweepId, sweepId)).all();
    await expect.poll(() => points().filter((r) => r.status === 'done').length, { timeout: 10_000 }).toBe(1);

    await request(app).post(`/api/projects/${projectId}/sweeps/${sweepId}/cancel`).set(asPerson(viewer)).expect(403);
    const res = await request(app).post(`/api/projects/${projectId}/sweeps/${sweepId}/cancel`).set(asPerson(engineer)).expect(200);
    // 9 points (18…26 °C by 1 K): one done, the other 8 waiting or running.
    expect(res.body).toEqual({ cancelled: 8 });
    await queue.idle();
    const statuses = points().map((r) => r.status);
    expect(statuses.filter((s) => s === 'done')).toHaveLength(1);
    expect(statuses.filter((s) => s === 'cancelled')).toHaveLength(8);
    expect(
      t.db
        .select()
        .from(auditEvents)
        .all()
        .filter((e) => e.action === 'sweep.cancel'),
    ).toHaveLength(1);

    const again = await request(app).post(`/api/projects/${projectId}/sweeps/${sweepId}/cancel`).set(asPerson(engineer)).expect(409);
    expect(again.body.error.message).toMatch(/nothing to stop/);
    // The sweep and its finished point are still there to read.
    const read = await request(app).get(`/api/projects/${projectId}/sweeps/${sweepId}`).set(asPerson(viewer)).expect(200);
    expect(read.body.sweep.progress).toMatchObject({ done: 1, cancelled: 8, finished: true });
  });
});
