import request from 'supertest';
import { count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runs } from '../../server/db/schema';
import { loadEnv } from '../../server/env';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { siteFileAndScenario, storedClimateRows, storedRunHourBytes, threeDaysCsv, type StudySetup } from '../support/study-setup';

// Stored bytes, worked out here from the storage layout rather than read back from the code: every column blob is
// a 16-byte header and its elements (8 bytes a float64, 1 a uint8); a climate file keeps its original bytes, its
// time, dry-bulb, humidity (and pressure) columns and its flags; a finished run keeps modes (uint8), the
// compressors' share (float64) and the humidified flag (uint8) — at most: each of its columns is stored deflated
// where that is smaller, so a finished run counts at its blobs' lengths, read back from SQLite below.
const HEADER = 16;
const threeDaysBytes = Buffer.byteLength(threeDaysCsv) + 72 * (4 * 8 + 1) + 5 * HEADER; // has a pressure column
const runOnThreeDays = 72 * (1 + 8 + 1) + 3 * HEADER; // 768 bytes at most
const storedRunBytes = () => storedRunHourBytes(t.db, projectId);
const ROOM = 100_000;

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let study: StudySetup;

beforeAll(async () => {
  // The limit leaves ROOM bytes once the three-day file is stored.
  t = createTestApp({ storageLimitBytes: threeDaysBytes + ROOM });
  engineer = personWithSession(t.db, 'quota.engineer@example.test');
  viewer = personWithSession(t.db, 'quota.viewer@example.test');
  projectId = projectWithMembers(t.db, 'Quota study', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  study = await siteFileAndScenario(t, projectId, engineer);
});
afterAll(() => t.close());

const storage = async () => (await request(t.app).get(`/api/projects/${projectId}/storage`).set(asPerson(viewer)).expect(200)).body.storage;
const runCount = () => t.db.select({ n: count() }).from(runs).where(eq(runs.projectId, projectId)).get()!.n;

/** `hours` hours of canonical CSV without pressure (synthetic values). */
function hoursCsv(hours: number): string {
  const start = Date.UTC(2022, 0, 1);
  const lines = ['timestamp,dry_bulb_c,relative_humidity_pct'];
  for (let i = 0; i < hours; i++)
    lines.push(`${new Date(start + i * 3_600_000).toISOString().slice(0, 16)}Z,${(8 + (i % 13) / 2).toFixed(1)},${50 + (i % 30)}`);
  return `${lines.join('\n')}\n`;
}

describe('a per-project limit on stored bytes', () => {
  it('shows what the project stores against its limit', async () => {
    expect(await storage()).toEqual({
      climateFileBytes: threeDaysBytes,
      runBytes: 0,
      pendingRunBytes: 0,
      issueListBytes: 0,
      usedBytes: threeDaysBytes,
      limitBytes: threeDaysBytes + ROOM,
    });
  });

  it('refuses 200 runs queued in one request with 413 and the figures, storing none of them; 10 fit', async () => {
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/runs`)
      .set(asPerson(engineer))
      .send({ scenarioIds: Array(200).fill(study.scenarioId), climateFileIds: [study.climateFileId] })
      .expect(413);
    expect(res.body.error.code).toBe('storage_full');
    expect(res.body.error.details).toEqual({ usedBytes: threeDaysBytes, limitBytes: threeDaysBytes + ROOM, neededBytes: 200 * runOnThreeDays });
    expect(res.body.error.message).toContain('these 200 runs would need about 0.2 MB more; nothing was stored');
    expect(runCount()).toBe(0);

    await request(t.app)
      .post(`/api/projects/${projectId}/runs`)
      .set(asPerson(engineer))
      .send({ scenarioIds: Array(10).fill(study.scenarioId), climateFileIds: [study.climateFileId] })
      .expect(202);
    await t.runQueue.idle();
    // Stored, they count at what they hold: deflated, less than the estimate.
    const stored = storedRunBytes();
    expect(stored).toBeGreaterThan(0);
    expect(stored).toBeLessThan(10 * runOnThreeDays);
    expect(await storage()).toMatchObject({ runBytes: stored, pendingRunBytes: 0, usedBytes: threeDaysBytes + stored });

    // A queued run counts at the most it can store, so a second bulk request cannot slip past runs not yet done: a
    // run row put back to queued here, without the queue, stays queued while it is read.
    const done = t.db.select().from(runs).where(eq(runs.projectId, projectId)).get()!;
    const { id: _id, ...copy } = done;
    const queuedId = t.db
      .insert(runs)
      .values({ ...copy, status: 'queued', resultsJson: null, finishedAt: null })
      .returning()
      .get().id;
    try {
      expect(await storage()).toMatchObject({ runBytes: stored, pendingRunBytes: runOnThreeDays, usedBytes: threeDaysBytes + stored + runOnThreeDays });
    } finally {
      t.db.delete(runs).where(eq(runs.id, queuedId)).run();
    }
  });

  it('refuses a sweep whose points do not fit', async () => {
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/sweeps`)
      .set(asPerson(engineer))
      .send({ scenarioId: study.scenarioId, climateFileId: study.climateFileId, axes: [{ input: 'system.supplyAirC', from: 14, to: 23.95, step: 0.05 }] })
      .expect(413);
    // 14.00, 14.05 … 23.95 °C: 200 points, each counted at most while queued
    expect(res.body.error.details.neededBytes).toBe(200 * runOnThreeDays);
    expect(runCount()).toBe(10);
  });

  it('refuses an upload that would not fit, before or after reading it, and stores nothing', async () => {
    const before = storedClimateRows(t.db);
    const used = threeDaysBytes + storedRunBytes();
    const room = threeDaysBytes + ROOM - used;
    const url = `/api/projects/${projectId}/sites/${study.siteId}/climate-files`;
    // Larger than the room left: refused on its size alone.
    const big = hoursCsv(4_000);
    expect(Buffer.byteLength(big)).toBeGreaterThan(room);
    const early = await request(t.app).post(url).set(asPerson(engineer)).set('content-type', 'text/csv').send(big).expect(413);
    expect(early.body.error.details).toEqual({ usedBytes: used, limitBytes: threeDaysBytes + ROOM, neededBytes: Buffer.byteLength(big) });
    // Smaller than the room, but not with its series (25 bytes an hour without pressure).
    const hours = 2_000;
    const fitsAlone = hoursCsv(hours);
    const needed = Buffer.byteLength(fitsAlone) + hours * (3 * 8 + 1) + 4 * HEADER;
    expect(Buffer.byteLength(fitsAlone)).toBeLessThan(room);
    expect(needed).toBeGreaterThan(room);
    const late = await request(t.app).post(url).set(asPerson(engineer)).set('content-type', 'text/csv').send(fitsAlone).expect(413);
    expect(late.body.error.details).toEqual({ usedBytes: used, limitBytes: threeDaysBytes + ROOM, neededBytes: needed });
    expect(storedClimateRows(t.db)).toEqual(before);
  });

  it('takes the limit from TRAMONTANE_PROJECT_STORAGE_MB, 1,000 MB when unset', () => {
    expect(loadEnv({ TRAMONTANE_DEMO: '1' }).TRAMONTANE_PROJECT_STORAGE_MB).toBe(1_000);
    expect(loadEnv({ TRAMONTANE_DEMO: '1', TRAMONTANE_PROJECT_STORAGE_MB: '250' }).TRAMONTANE_PROJECT_STORAGE_MB).toBe(250);
    expect(() => loadEnv({ TRAMONTANE_DEMO: '1', TRAMONTANE_PROJECT_STORAGE_MB: 'lots' })).toThrow(/TRAMONTANE_PROJECT_STORAGE_MB/);
  });
});
