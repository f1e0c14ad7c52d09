import { deflateSync, inflateSync } from 'node:zlib';
import { and, eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { runHours, runs } from '../db/schema';
import { decodeFloat64Column, decodeUint8Column, encodeColumn } from '../../shared/climate';
import type { ExecuteRunOutput } from '../../workers/execute-run';

/**
 * One hourly column of a run as stored: the column codec's blob (shared/climate/column-codec.ts), deflated (zlib,
 * level 1). A run's columns repeat long stretches (a mode holds for hours; the compressors' share is 0 in every hour
 * that is not mechanical), so a 10-year run's 875 kB of columns store in about 120–190 kB, for a few milliseconds of
 * its own thread's time: a sweep's points then hold SQLite's write lock, and fill the WAL that its checkpoints copy
 * and sync, for a fifth of the bytes. Runs stored before hold the plain blob, as does a column that deflating would not
 * shrink; `unpackRunColumn` tells the two apart.
 */
function packRunColumn(column: Float64Array | Uint8Array): Buffer {
  const plain = encodeColumn(column);
  const packed = deflateSync(plain, { level: 1 });
  // never more than the plain blob, so the storage quota's estimate of a queued run (server/storage/quota.ts) holds
  return packed.byteLength < plain.byteLength ? packed : Buffer.from(plain.buffer, plain.byteOffset, plain.byteLength);
}

/** The codec blob of a stored column: inflated when it starts with a zlib header (0x78), as it is when plain ("TMC1"). */
function unpackRunColumn(stored: Uint8Array): Uint8Array {
  return stored[0] === 0x78 ? inflateSync(stored) : stored;
}

/** A finished run's hourly columns, decoded from its run_hours row (either storage form). */
export function decodeRunHours(stored: typeof runHours.$inferSelect): { modes: Uint8Array; mechanicalFraction: Float64Array; humidified: Uint8Array | null } {
  return {
    modes: decodeUint8Column(unpackRunColumn(stored.modes)),
    mechanicalFraction: decodeFloat64Column(unpackRunColumn(stored.mechanicalFraction)),
    // null for runs made before engine 2.0.0
    humidified: stored.humidified ? decodeUint8Column(unpackRunColumn(stored.humidified)) : null,
  };
}

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

/** A finished run as it is stored: its columns packed and its results as JSON, made before the write lock is taken. */
export interface PackedRunOutput {
  modes: Buffer;
  mechanicalFraction: Buffer;
  humidified: Buffer;
  resultsJson: string;
}

/** Packs a run's output for storeRunOutput: the deflating and the JSON, which need no lock, done outside it. */
export function packRunOutput(out: ExecuteRunOutput): PackedRunOutput {
  return {
    modes: packRunColumn(out.modes),
    mechanicalFraction: packRunColumn(out.mechanicalFraction),
    humidified: packRunColumn(out.humidified),
    resultsJson: JSON.stringify(out.results),
  };
}

/**
 * Stores a finished run — its hours and its results, marked done — in one transaction, only while the run is still
 * `running` (a run cancelled or timed out meanwhile keeps that status and nothing is stored). Returns whether it stored.
 * Called on a pool thread over the thread's own connection (workers/execute-and-store-run.ts), so the run queue's
 * main thread does not spend a sweep point's time writing its hours; the transaction's check under SQLite's write
 * lock makes a cancel on the main thread and a store on a thread settle one way or the other, never both. The output
 * comes packed (packRunOutput), so the lock is held only for the writes.
 */
export function storeRunOutput(db: Db, runId: number, { resultsJson, ...columns }: PackedRunOutput): boolean {
  return db.transaction(
    (tx) => {
      const current = tx.select({ status: runs.status }).from(runs).where(eq(runs.id, runId)).get();
      if (current?.status !== 'running') return false;
      tx.insert(runHours)
        .values({ runId, ...columns })
        .run();
      tx.update(runs).set({ status: 'done', progress: 1, resultsJson, finishedAt: new Date() }).where(eq(runs.id, runId)).run();
      return true;
    },
    // IMMEDIATE takes the write lock before the status check, so no other connection can change the status between.
    { behavior: 'immediate' },
  );
}
