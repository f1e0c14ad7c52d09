// @ts-nocheck
import { eq } from 'drizzle-orm';
import type { ClimateSeries } from '../../shared/climate';
import type { Db } from '../db/client';
import { climateFiles } from '../db/schema';
import { loadClimateSeries } from '../climate/store';

export interface SeriesCache {
  /** The stored series of a file, decoded once and held in SharedArrayBuffers; undefined when the file is gone. */
  get(fileId: number): ClimateSeries | undefined;
  /** Forgets every series (the queue calls it when it has nothing left to run). */
  clear(): void;
}

/** A typed array's copy over a SharedArrayBuffer: posted to a pool thread, its memory is shared instead of copied. */
function shared<T extends Float64Array | Uint8Array>(values: T): T {
  const copy = (
    values instanceof Float64Array ? new Float64Array(new SharedArrayBuffer(values.byteLength)) : new Uint8Array(new SharedArrayBuffer(values.byteLength))
  ) as T;
  copy.set(values);
  return copy;
}

/**
 * The climate series the queued runs read, decoded once per batch of runs (a sweep's 50 points read one file) rather
 * than once per run, and posted to the threads as shared memory rather than a copy per run. An entry is keyed by the
 * file's id and the SHA-256 of its content, so a file replaced under a reused id is read afresh. The engine only
 * reads its series, so the threads may share one.
 */
export function createSeriesCache(db: Db, { maxFiles = 4 }: { maxFiles?: number } = {}): SeriesCache {
  const entries = new Map<string, ClimateSeries>();
  return {
    get(fileId) {
      const file = db.select({ sha256: climateFiles.sha256 }).from(climateFiles).where(eq(climateFiles.id, fileId)).get();
      if (!file) return undefined;
      const key = `${fileId}:${file.sha256}`;
      const held = entries.get(key);
      if (held) {
        // most recently used last, so the oldest goes first below
        entries.delete(key);
        entries.set(key, held);
        return held;
      }
      const series = loadClimateSeries(db, fileId);
      if (!series) return undefined;
      const sharedSeries: ClimateSeries = {
        timestampsMs: shared(series.timestampsMs),
        dryBulbC: shared(series.dryBulbC),
        humidity: { kind: series.humidity.kind, values: shared(series.humidity.values) },
        pressurePa: series.pressurePa ? shared(series.pressurePa) : null,
        flags: shared(series.flags),
      };
      entries.set(key, sharedSeries);
      while (entries.size > maxFiles) entries.delete(entries.keys().next().value!);
      return sharedSeries;
    },
    clear() {
      entries.clear();
    },
  };
}
