/**
 * Cancelling a run on the queue (server/runs/queue.ts): a waiting run never starts, a running one has its task
 * stopped and stays cancelled (not failed), a finished one cannot be cancelled, and a run that fails or runs out of
 * time says why. The pool is held by the test, so each run is surely waiting or running when it is cancelled.
 * Written for the mutants that survived `npm run mutation` (docs/benchmarks.md).
 */
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents, runs } from '../../server/db/schema';
import { createApp } from '../../server/app';
import { createRunQueue } from '../../server/runs/queue';
import type { WorkerPool } from '../../workers/pool';
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
  engineer = personWithSession(t.db, 'ines.aldana@example.test');
  projectId = projectWithMembers(t.db, 'Cancel study', [[engineer, 'engineer']]);
  ({ climateFileId, scenarioId } = await siteFileAndScenario(t, projectId, engineer));
});
afterAll(() => t.close());

interface HeldTask {
  signal: AbortSignal | undefined;
  /** Runs the task on the real pool. */
  go: () => void;
  /** Fails the task as a crashed worker would. */
  fail: (message: string) => void;
}

/** A pool whose tasks wait for the test; a task whose signal fires rejects as piscina does, unless `deaf`. */
function heldPool({ deaf = false } = {}) {
  const tasks: HeldTask[] = [];
  const pool: WorkerPool = {
    ...t.pool,
    run: ((task: string, input: unknown, options: { signal?: AbortSignal } = {}) =>
      new Promise((resolve, reject) => {
        if (!deaf) options.signal?.addEventListener('abort', () => reject(new Error('The task has been aborted')));
        tasks.push({
          signal: options.signal,
          go: () => void (t.pool.run as (...a: unknown[]) => Promise<unknown>)(task, input, deaf ? {} : options).then(resolve, reject),
          fail: (message) => reject(new Error(message)),
        });
      })) as never,
  };
  return { pool, tasks };
}

function appWith(pool: WorkerPool, timeoutMs?: number) {
  const queue = createRunQueue({ db: t.db, pool, timeoutMs });
  return { queue, app: createApp({ db: t.db, pool: t.pool, runQueue: queue }) };
}

async function startRuns(app: ReturnType<typeof createApp>, count: number): Promise<number[]> {
  const created = await request(app)
    .post(`/api/projects/${projectId}/runs`)
    .set(asPerson(engineer))
    .send({ scenarioIds: Array.from({ length: count }, () => scenarioId), climateFileIds: [climateFileId] })
    .expect(202);
  return created.body.runs.map((r: { id: number }) => r.id);
}

const rowOf = (id: number) => t.db.select({ status: runs.status, error: runs.error }).from(runs).where(eq(runs.id, id)).get()!;
/** The audit actions recorded against one run after it was asked for (its run.start is left out), oldest first. */
const auditFor = (id: number) =>
  t.db
    .select({ action: auditEvents.action, target: auditEvents.target })
    .from(auditEvents)
    .orderBy(auditEvents.id)
    .all()
    .filter((e) => e.action !== 'run.start' && (e.target === `run ${id}` || e.target.startsWith(`run ${id}:`)))
    .map((e) => e.action);

async function settle(queue: ReturnType<typeof createRunQueue>, tasks: HeldTask[]) {
  // Let every held task go, also any started after the first ones finish, until the queue is idle.
  let released = 0;
  const releaseAll = setInterval(() => {
    while (released < tasks.length) tasks[released++].go();
  }, 5);
  await queue.idle();
  clearInterval(releaseAll);
}

describe('cancelling a run', () => {
  it('stops a running run’s task; the run stays cancelled, not failed, and the runs waiting behind it still run', async () => {
    const { pool, tasks } = heldPool();
    const { queue, app } = appWith(pool);
    // The test pool has two threads: two runs' tasks are handed to it, the third waits. A run reads 'running' only once
    // its thread starts it (the thread marks it), and these tasks are held before that.
    const ids = await startRuns(app, 3);
    expect(tasks).toHaveLength(2);
    expect(ids.map((id) => rowOf(id).status)).toEqual(['queued', 'queued', 'queued']);
    const res = await request(app).post(`/api/projects/${projectId}/runs/${ids[0]}/cancel`).set(asPerson(engineer)).expect(200);
    expect(res.body.run.status).toBe('cancelled');
    expect(tasks[0].signal?.aborted).toBe(true);
    expect(tasks[0].signal?.reason).toBe('cancelled');
    await settle(queue, tasks.slice(1));
    expect(ids.map((id) => rowOf(id))).toEqual([
      { status: 'cancelled', error: null },
      { status: 'done', error: null },
      { status: 'done', error: null },
    ]);
    // The cancel is audited as the person's act; the run neither failed nor finished on its own.
    expect(auditFor(ids[0])).toEqual(['run.cancel']);
    expect(auditFor(ids[1])).toEqual(['run.done']);
  });

  it('a task that finishes after its run was cancelled stores nothing and announces nothing', async () => {
    const { pool, tasks } = heldPool({ deaf: true });
    const { queue, app } = appWith(pool);
    const [id] = await startRuns(app, 1);
    await request(app).post(`/api/projects/${projectId}/runs/${id}/cancel`).set(asPerson(engineer)).expect(200);
    await settle(queue, tasks);
    expect(rowOf(id)).toEqual({ status: 'cancelled', error: null });
    expect(auditFor(id)).toEqual(['run.cancel']);
  });

  it('refuses to cancel a finished run: 409 naming its status, and the run stays done', async () => {
    const { pool, tasks } = heldPool();
    const { queue, app } = appWith(pool);
    const [id] = await startRuns(app, 1);
    await settle(queue, tasks);
    const res = await request(app).post(`/api/projects/${projectId}/runs/${id}/cancel`).set(asPerson(engineer)).expect(409);
    expect(res.body.error).toMatchObject({ code: 'not_cancellable', message: `Run ${id} is done and cannot be cancelled.` });
    expect(queue.cancel(id)).toBe(false);
    expect(rowOf(id).status).toBe('done');
  });
});

describe('a run that does not finish', () => {
  it('fails with the worker’s message, audited as failed', async () => {
    const { pool, tasks } = heldPool();
    const { queue, app } = appWith(pool);
    const [id] = await startRuns(app, 1);
    tasks[0].fail('The worker thread stopped unexpectedly.');
    await queue.idle();
    expect(rowOf(id)).toEqual({ status: 'failed', error: 'The worker thread stopped unexpectedly.' });
    expect(auditFor(id)).toEqual(['run.failed']);
  });

  it('is stopped when it runs out of time, and says after how long', async () => {
    const { pool } = heldPool();
    const { queue, app } = appWith(pool, 1500);
    const [id] = await startRuns(app, 1);
    await queue.idle();
    expect(rowOf(id)).toEqual({ status: 'failed', error: 'The run took longer than 2 s and was stopped.' });
  });
});
