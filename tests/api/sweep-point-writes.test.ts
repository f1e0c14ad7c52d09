import request from 'supertest';
import { eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { connectDatabase, openDatabase, type Db } from '../../server/db/client';
import { recordAudit } from '../../server/auth/audit';
import { auditEvents, runHours, runs } from '../../server/db/schema';
import { decodeRunHours } from '../../server/runs/run-rows';
import { createRunQueue } from '../../server/runs/queue';
import type { WorkerPool } from '../../workers/pool';
import { asPerson, personWithSession, projectWithMembers } from '../support/people';
import { siteFileAndScenario } from '../support/study-setup';
import { createTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
let sweeps = 0;

beforeAll(() => {
  t = createTestApp();
});
afterAll(() => t.close());

/**
 * A 5-point sweep on an app over `db` whose pool holds every task until the sweep is stored and counted: the rows its
 * points left, and the changes the app's own connection made while they ran.
 */
async function sweepOn(db: Db) {
  let open: () => void = () => {};
  const gate = new Promise<void>((resolve) => (open = resolve));
  const heldPool: WorkerPool = { ...t.pool, run: (task, input, options) => gate.then(() => t.pool.run(task, input, options)) as never };
  const runQueue = createRunQueue({ db, pool: heldPool });
  const app = createApp({ db, pool: t.pool, runQueue });
  const engineer = personWithSession(db, `gus.tallow.${++sweeps}@example.test`);
  const projectId = projectWithMembers(db, 'Where the points are written', [[engineer, 'engineer']]);
  const ids = await siteFileAndScenario({ app } as TestApp, projectId, engineer);
  const changes = () => (db.$client.prepare('select total_changes() as n').get() as { n: number }).n;
  const created = await request(app)
    .post(`/api/projects/${projectId}/sweeps`)
    .set(asPerson(engineer))
    .send({ ...ids, axes: [{ input: 'system.supplyAirC', from: 18, to: 26, step: 2 }] })
    .expect(202);
  const before = changes();
  open();
  await runQueue.idle();
  const mainConnectionChanges = changes() - before;
  const points = db.select().from(runs).where(eq(runs.sweepId, created.body.sweep.id)).orderBy(runs.id).all();
  const hours = points.map((p) => db.select().from(runHours).where(eq(runHours.runId, p.id)).get()!);
  return { points, hours, mainConnectionChanges };
}

describe("a sweep's points", () => {
  it('are marked, computed and stored by the pool threads: the server connection writes only the sweep-done audit entry', async () => {
    const { points, hours, mainConnectionChanges } = await sweepOn(t.db);
    expect(points.map((p) => p.status)).toEqual(['done', 'done', 'done', 'done', 'done']);
    expect(points.every((p) => p.startedAt !== null && p.finishedAt !== null && p.progress === 1)).toBe(true);
    // 72 hours each (the three-day sample file)
    expect(hours.map((h) => decodeRunHours(h).modes.length)).toEqual([72, 72, 72, 72, 72]);
    // the audit trail's one sweep.done row; the queue used to make 3 writes per point here (running, hours, done)
    expect(mainConnectionChanges).toBe(1);
  });

  it('are stored the same, byte for byte, from the main thread when the database is in memory (threads cannot open it)', async () => {
    const memory = openDatabase(':memory:');
    try {
      const onThreads = await sweepOn(t.db);
      const inMemory = await sweepOn(memory);
      expect(inMemory.points.map((p) => p.status)).toEqual(['done', 'done', 'done', 'done', 'done']);
      // the main thread marks the 3 points started after the count (one per thread was marked as the sweep was queued),
      // stores each point (2 writes) and audits the sweep once
      expect(inMemory.mainConnectionChanges).toBe(3 + 5 * 2 + 1);
      expect(inMemory.points.map((p) => p.resultsJson)).toEqual(onThreads.points.map((p) => p.resultsJson));
      expect(inMemory.hours.map((h) => [h.modes, h.mechanicalFraction, h.humidified])).toEqual(
        onThreads.hours.map((h) => [h.modes, h.mechanicalFraction, h.humidified]),
      );
    } finally {
      memory.$client.close();
    }
  });

  it("leave the server's own transactions whole while a thread commits: each takes the write lock as it begins", () => {
    const thread = connectDatabase(t.db.$client.name);
    thread.$client.pragma('busy_timeout = 0');
    let threadRefused = false;
    try {
      // Read, let the "thread" try to commit, then write: begun deferred, the write would fail with SQLITE_BUSY_SNAPSHOT.
      t.db.transaction((tx) => {
        tx.select().from(auditEvents).all();
        try {
          recordAudit(thread, { actorId: null, projectId: null, action: 'run.done', target: 'a thread' });
        } catch (error) {
          threadRefused = (error as { code?: string }).code === 'SQLITE_BUSY';
        }
        recordAudit(tx, { actorId: null, projectId: null, action: 'run.done', target: 'the server' });
      });
    } finally {
      thread.$client.close();
    }
    expect(threadRefused).toBe(true);
    expect(
      t.db
        .select()
        .from(auditEvents)
        .all()
        .filter((e) => e.target === 'the server'),
    ).toHaveLength(1);
  });

  it('tell the sweep done once even when every point is stored before the server hears of the first', async () => {
    const engineer = personWithSession(t.db, 'ada.quill@example.test');
    const projectId = projectWithMembers(t.db, 'Late news', [[engineer, 'engineer']]);
    const ids = await siteFileAndScenario(t, projectId, engineer);
    const unfinished = () =>
      t.db
        .select({ id: runs.id })
        .from(runs)
        .where(inArray(runs.status, ['queued', 'running']))
        .all().length;
    // Each answer reaches the queue only once no point is left to compute: both threads' points already read done.
    const latePool: WorkerPool = {
      ...t.pool,
      run: async (task, input, options) => {
        const out = await t.pool.run(task, input, options);
        while (unfinished() > 0) await new Promise((resolve) => setTimeout(resolve, 5));
        return out as never;
      },
    };
    const runQueue = createRunQueue({ db: t.db, pool: latePool });
    const app = createApp({ db: t.db, pool: t.pool, runQueue });
    const created = await request(app)
      .post(`/api/projects/${projectId}/sweeps`)
      .set(asPerson(engineer))
      .send({ ...ids, axes: [{ input: 'system.supplyAirC', from: 18, to: 20, step: 2 }] })
      .expect(202);
    await runQueue.idle();
    const told = t.db
      .select()
      .from(auditEvents)
      .all()
      .filter((e) => e.action === 'sweep.done' && e.target.startsWith(`sweep ${created.body.sweep.id}:`));
    expect(told).toHaveLength(1);
  });
});
