import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadClimateSeries } from '../../server/climate/store';
import { climateFiles } from '../../server/db/schema';
import { createSeriesCache } from '../../server/runs/series-cache';
import { createTestApp, type TestApp } from '../support/test-app';
import { personWithSession, projectWithMembers } from '../support/people';
import { siteFileAndScenario } from '../support/study-setup';

let t: TestApp;
let climateFileId: number;

beforeAll(async () => {
  t = createTestApp();
  const engineer = personWithSession(t.db, 'ines.varga@example.test');
  const projectId = projectWithMembers(t.db, 'Cache study', [[engineer, 'engineer']]);
  ({ climateFileId } = await siteFileAndScenario(t, projectId, engineer));
});
afterAll(() => t.close());

describe('the series the queued runs of one file read', () => {
  it('is decoded once and handed to the threads as shared memory, with the stored values', () => {
    const cache = createSeriesCache(t.db);
    const { series: first, key } = cache.get(climateFileId)!;
    expect(cache.get(climateFileId)!.series).toBe(first);
    const sha256 = t.db.select({ sha256: climateFiles.sha256 }).from(climateFiles).where(eq(climateFiles.id, climateFileId)).get()!.sha256;
    expect(key).toBe(`${climateFileId}:${sha256}`);
    for (const column of [first.timestampsMs, first.dryBulbC, first.humidity.values, first.flags]) expect(column.buffer).toBeInstanceOf(SharedArrayBuffer);
    const stored = loadClimateSeries(t.db, climateFileId)!;
    expect(Array.from(first.dryBulbC)).toEqual(Array.from(stored.dryBulbC));
    expect(Array.from(first.humidity.values)).toEqual(Array.from(stored.humidity.values));
    expect(first.timestampsMs.length).toBe(72);
  });

  it('is read afresh when the content hash of the file changes, and is gone with the file', () => {
    const cache = createSeriesCache(t.db);
    const before = cache.get(climateFileId)!.series;
    const sha256 = t.db.select({ sha256: climateFiles.sha256 }).from(climateFiles).where(eq(climateFiles.id, climateFileId)).get()!.sha256;
    t.db
      .update(climateFiles)
      .set({ sha256: '0'.repeat(64) })
      .where(eq(climateFiles.id, climateFileId))
      .run();
    try {
      expect(cache.get(climateFileId)!.series).not.toBe(before);
    } finally {
      t.db.update(climateFiles).set({ sha256 }).where(eq(climateFiles.id, climateFileId)).run();
    }
    expect(cache.get(climateFileId + 1000)).toBeUndefined();
  });

  it('forgets what it holds when cleared', () => {
    const cache = createSeriesCache(t.db);
    const before = cache.get(climateFileId)!.series;
    cache.clear();
    expect(cache.get(climateFileId)!.series).not.toBe(before);
  });
});
