import { eq } from 'drizzle-orm';
import type { ClimateSeries } from '../../shared/climate';
import type { Db } from '../db/client';
import { climateFiles } from '../db/schema';
import { loadClimateSeries } from '../climate/store';

/** A file's series as the threads receive it, and the key that names its content (`<file id>:<SHA-256>`). */
export interface CachedSeries {
  series: ClimateSeries;
  key: string;
}

export interface SeriesCache {
  /** The stored series of a file, decoded once and held in SharedArrayBuffers; undefined when the file is gone. */
  get(fileId: number): CachedSeries | undefined;
  /** Forgets every series (the queue calls it when it has nothing left to run). */
  clear(): void;
}

/**
 * The climate series the queued runs read, decoded once per batch of runs (a sweep's 50 points read one file) rather
 * than once per run, and posted to the threads as shared memory rather than a copy per run. An entry is keyed by the
 * file's id and the SHA-256 of its content, so a file replaced under a reused id is read afresh; the threads get the
 * key too, and keep the outdoor states of the key they last ran (workers/execute-run.ts). The engine only
 * reads its series, so the threads may share one.
 */
export function createSeriesCache(db: Db, { maxFiles = 4 }: { maxFiles?: number } = {}): SeriesCache {
  const entries = new Map<string, CachedSeries>();
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
      // decoded straight into SharedArrayBuffers: posted to a pool thread, their memory is shared instead of copied
      const series = loadClimateSeries(db, fileId, { shared: true });
      if (!series) return undefined;
      const entry = { series, key };
      entries.set(key, entry);
      while (entries.size > maxFiles) entries.delete(entries.keys().next().value!);
      return entry;
    },
    clear() {
      entries.clear();
    },
  };
}
