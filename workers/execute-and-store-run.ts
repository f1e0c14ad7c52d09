import { connectDatabase, type Db } from '../server/db/client';
import { markRunStarted, packRunOutput, storeRunOutput } from '../server/runs/run-rows';
import { withWriteTurn } from '../server/runs/write-turn';
import { executeRun, type ExecuteRunInput } from './execute-run';

export interface ExecuteAndStoreRunInput extends ExecuteRunInput {
  /**
   * The server's database file and the run's row, `queued` until this task starts it; `writeTurn`, the queue's
   * turns at the write lock among its threads (server/runs/write-turn.ts).
   */
  store: { dbFile: string; runId: number; writeTurn?: Int32Array };
}

/** This thread's own connection to each database file it stores into, opened at its first run and kept. */
const connections = new Map<string, Db>();

function connectionTo(file: string): Db {
  let db = connections.get(file);
  if (!db) {
    db = connectDatabase(file);
    connections.set(file, db);
  }
  return db;
}

/**
 * Piscina task: one run of the queue, marked running, computed and stored from this thread (server/runs/run-rows.ts)
 * over the thread's own connection, so the main thread writes nothing for it, never receives its hours and only
 * learns whether it was stored (false: cancelled before or while it computed). A thread ended mid-transaction (a
 * cancelled or timed-out task) has its connection closed by better-sqlite3 and the transaction rolled back.
 */
export function executeAndStoreRun({ store, ...input }: ExecuteAndStoreRunInput): { stored: boolean } {
  const db = connectionTo(store.dbFile);
  if (!withWriteTurn(store.writeTurn, () => markRunStarted(db, store.runId))) return { stored: false };
  // packed (deflated, its results as JSON) before its turn at the write lock, so the lock is held only to write
  const packed = packRunOutput(executeRun(input));
  return { stored: withWriteTurn(store.writeTurn, () => storeRunOutput(db, store.runId, packed)) };
}
