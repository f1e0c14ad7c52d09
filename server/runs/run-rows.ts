import { and, eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { runHours, runs } from '../db/schema';
import { blob } from '../climate/store';
import type { ExecuteRunOutput } from '../../workers/execute-run';

/**
 * Marks a queued run `running` as a thread starts computing it; false when it is no longer queued (cancelled
 * meanwhile), and then it must not be computed. The pool thread calls it (workers/execute-and-store-run.ts), so the
 * main thread writes nothing per run and a run says `running` only while a thread is on it.
 */
export function markRunStarted(db: Db, runId: number): boolean {
  return (
    db
      .update(runs)
      .set({ status: 'running', startedAt: new Date(), progress: 0 })
      .where(and(eq(runs.id, runId), eq(runs.status, 'queued')))
      .run().changes === 1
  );
}

/**
 * Stores a finished run — its hours and its results, marked done — in one transaction, only while the run is still
 * `running` (a run cancelled or timed out meanwhile keeps that status and nothing is stored). Returns whether it stored.
 * Called on a pool thread over the thread's own connection (workers/execute-and-store-run.ts), so the run queue's
 * main thread does not spend a sweep point's time writing its hours; the transaction's check under SQLite's write
 * lock makes a cancel on the main thread and a store on a thread settle one way or the other, never both.
 */
export function storeRunOutput(db: Db, runId: number, out: ExecuteRunOutput): boolean {
  return db.transaction(
    (tx) => {
      const current = tx.select({ status: runs.status }).from(runs).where(eq(runs.id, runId)).get();
      if (current?.status !== 'running') return false;
      tx.insert(runHours)
        .values({ runId, modes: blob(out.modes), mechanicalFraction: blob(out.mechanicalFraction), humidified: blob(out.humidified) })
        .run();
      tx.update(runs)
        .set({ status: 'done', progress: 1, resultsJson: JSON.stringify(out.results), finishedAt: new Date() })
        .where(eq(runs.id, runId))
        .run();
      return true;
    },
    // IMMEDIATE takes the write lock before the status check, so no other connection can change the status between.
    { behavior: 'immediate' },
  );
}
