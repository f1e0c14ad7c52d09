import { and, eq, inArray } from 'drizzle-orm';
import type { Db } from '../db/client';
import { runs, sweeps } from '../db/schema';
import { createSeriesCache } from './series-cache';
import { markRunStarted, packRunOutput, storeRunOutput } from './run-rows';
import { createWriteTurn } from './write-turn';
import type { WorkerPool } from '../../workers/pool';
import { recordAudit } from '../auth/audit';
import type { Mailer } from '../mail/mailer';
import { sendRunFinishedNotices } from '../mail/notices';

export interface RunQueueOptions {
  db: Db;
  pool: WorkerPool;
  /** A run still going after this long is stopped and marked failed. */
  timeoutMs?: number;
  /** Where run-finished notices go for the members who opted in; none are sent without it. */
  mailer?: Mailer;
  publicUrl?: string;
  logError?: (error: unknown) => void;
}

export interface RunQueue {
  enqueue(runId: number): void;
  cancel(runId: number): boolean;
  /** Puts back runs left queued or running by a previous process. */
  resume(): number;
  /** Resolves when nothing is waiting or running (tests, shutdown). */
  idle(): Promise<void>;
}

interface RunSnapshotClimate {
  elevationM: number;
  utcOffsetMinutes: number;
}

/**
 * Runs execute on the worker pool, at most one per pool thread at a time so a run's status says
 * truthfully whether it is waiting or computing. State lives in the runs table, so a restart loses
 * nothing: `resume()` re-queues what was pending.
 */
export function createRunQueue({ db, pool, timeoutMs = 10 * 60_000, mailer, publicUrl, logError }: RunQueueOptions): RunQueue {
  const waiting: number[] = [];
  const running = new Map<number, AbortController>();
  let idleWaiters: Array<() => void> = [];
  // A sweep's points read one file: decoded once while the queue has work, shared with the threads.
  const seriesCache = createSeriesCache(db);
  // The pool's threads store runs into the same file; an in-memory database can only be written from here.
  const dbFile = db.$client.memory ? null : db.$client.name;
  const writeTurn = createWriteTurn();

  /**
   * A run that finished or failed on its own goes into the audit trail and, when done, out as notices. A sweep's
   * points are told as one: a failed point is audited, and when its last point settles the sweep is audited and noticed.
   */
  function settle(runId: number, status: 'done' | 'failed'): void {
    const run = db
      .select({
        id: runs.id,
        projectId: runs.projectId,
        sweepId: runs.sweepId,
        error: runs.error,
        scenarioJson: runs.scenarioJson,
        climateJson: runs.climateJson,
      })
      .from(runs)
      .where(eq(runs.id, runId))
      .get();
    if (!run) return;
    if (run.sweepId !== null) return settleSweepPoint({ ...run, sweepId: run.sweepId }, status);
    const name = `${(JSON.parse(run.scenarioJson) as { name: string }).name} on ${(JSON.parse(run.climateJson) as { name: string }).name}`;
    recordAudit(db, { actorId: null, projectId: run.projectId, action: `run.${status}`, target: `run ${runId}: ${name}`, detail: { runId, error: run.error } });
    if (status === 'done') {
      sendRunFinishedNotices(
        { db, mailer, publicUrl, logError },
        { projectId: run.projectId, runName: name, path: `/projects/${run.projectId}/runs/${runId}` },
      ).catch((error: unknown) => logError?.(error));
    }
  }

  function settleSweepPoint(run: { id: number; projectId: number; sweepId: number; error: string | null }, status: 'done' | 'failed'): void {
    const sweepId = run.sweepId;
    if (status === 'failed') {
      recordAudit(db, {
        actorId: null,
        projectId: run.projectId,
        action: 'run.failed',
        target: `run ${run.id} (sweep ${sweepId})`,
        detail: { runId: run.id, sweepId, error: run.error },
      });
    }
    const points = db.select({ id: runs.id, status: runs.status }).from(runs).where(eq(runs.sweepId, sweepId)).all();
    // A thread stores its point itself, so another point may already read done before this queue has settled it:
    // then that point's own settle, which comes later, tells the sweep (once).
    if (points.some((p) => p.status === 'queued' || p.status === 'running' || (p.id !== run.id && running.has(p.id)))) return;
    const sweep = db.select({ name: sweeps.name }).from(sweeps).where(eq(sweeps.id, sweepId)).get();
    if (!sweep) return;
    const tally = (s: string) => points.filter((p) => p.status === s).length;
    const counts = { done: tally('done'), failed: tally('failed'), cancelled: tally('cancelled') };
    recordAudit(db, {
      actorId: null,
      projectId: run.projectId,
      action: 'sweep.done',
      target: `sweep ${sweepId}: ${sweep.name}`,
      detail: { sweepId, points: points.length, ...counts },
    });
    if (counts.done === 0) return;
    const outcome = `${counts.done} of ${points.length} points done${counts.failed ? `, ${counts.failed} failed` : ''}`;
    sendRunFinishedNotices(
      { db, mailer, publicUrl, logError },
      { projectId: run.projectId, runName: `${sweep.name} (${outcome})`, path: `/projects/${run.projectId}/sweeps/${sweepId}`, kind: 'sweep' },
    ).catch((error: unknown) => logError?.(error));
  }

  function pump(): void {
    while (running.size < pool.threads && waiting.length > 0) {
      const runId = waiting.shift()!;
      void execute(runId);
    }
    if (running.size === 0 && waiting.length === 0) {
      seriesCache.clear();
      const waiters = idleWaiters;
      idleWaiters = [];
      for (const w of waiters) w();
    }
  }

  async function execute(runId: number): Promise<void> {
    const run = db.select().from(runs).where(eq(runs.id, runId)).get();
    if (!run || run.status !== 'queued') return pump();
    const controller = new AbortController();
    running.set(runId, controller);
    const timer = setTimeout(() => controller.abort(new Error(`The run took longer than ${Math.round(timeoutMs / 1000)} s and was stopped.`)), timeoutMs);
    try {
      const cached = run.climateFileId === null ? undefined : seriesCache.get(run.climateFileId);
      if (!cached) throw new Error('The climate file of this run was deleted before the run started.');
      const climate = JSON.parse(run.climateJson) as RunSnapshotClimate;
      const input = {
        scenario: JSON.parse(run.scenarioJson),
        series: cached.series,
        seriesKey: cached.key,
        options: { elevationM: climate.elevationM, utcOffsetMinutes: climate.utcOffsetMinutes },
      };
      // A run is one pool task: it is marked running as a thread starts it, and its progress stays 0 until done. The
      // thread marks and stores it over its own connection to the file, so the main thread writes nothing per run (a
      // sweep's points would otherwise wait behind its writes and for SQLite's write lock) and never sees the hours.
      const stored = dbFile
        ? (await pool.run('executeAndStoreRun', { ...input, store: { dbFile, runId, writeTurn } }, { signal: controller.signal })).stored
        : markRunStarted(db, runId) && storeRunOutput(db, runId, packRunOutput(await pool.run('executeRun', input, { signal: controller.signal })));
      if (stored) settle(runId, 'done');
    } catch (error) {
      const cancelled = controller.signal.aborted && controller.signal.reason === 'cancelled';
      if (!cancelled) {
        const message = controller.signal.aborted
          ? String((controller.signal.reason as Error)?.message ?? controller.signal.reason)
          : error instanceof Error
            ? error.message
            : String(error);
        db.update(runs)
          .set({ status: 'failed', error: message, finishedAt: new Date() })
          .where(and(eq(runs.id, runId), inArray(runs.status, ['queued', 'running'])))
          .run();
        settle(runId, 'failed');
      }
    } finally {
      clearTimeout(timer);
      running.delete(runId);
      pump();
    }
  }

  return {
    enqueue(runId) {
      waiting.push(runId);
      pump();
    },
    cancel(runId) {
      const changed = db
        .update(runs)
        .set({ status: 'cancelled', finishedAt: new Date() })
        .where(and(eq(runs.id, runId), inArray(runs.status, ['queued', 'running'])))
        .run().changes;
      if (changed === 0) return false;
      const index = waiting.indexOf(runId);
      if (index >= 0) waiting.splice(index, 1);
      running.get(runId)?.abort('cancelled');
      pump();
      return true;
    },
    resume() {
      const pending = db
        .select({ id: runs.id })
        .from(runs)
        .where(inArray(runs.status, ['queued', 'running']))
        .orderBy(runs.id)
        .all();
      db.update(runs).set({ status: 'queued', progress: 0 }).where(eq(runs.status, 'running')).run();
      for (const { id } of pending) waiting.push(id);
      pump();
      return pending.length;
    },
    idle() {
      if (running.size === 0 && waiting.length === 0) return Promise.resolve();
      return new Promise((resolve) => idleWaiters.push(resolve));
    },
  };
}
