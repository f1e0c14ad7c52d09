// @ts-nocheck
import Database from 'better-sqlite3';
import path from 'node:path';
import { asc, eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runs, sweeps } from '../../server/db/schema';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { siteFileAndScenario } from '../support/study-setup';
import { createTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let plainRunId: number;
let sweepId: number;

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'orla.quennell@example.test');
  viewer = personWithSession(t.db, 'bram.ottery@example.test');
  projectId = projectWithMembers(t.db, 'Read path study', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  const { climateFileId, scenarioId } = await siteFileAndScenario(t, projectId, engineer, { siteName: 'Cressing Moor', elevationM: 60 });
  const plain = await request(t.app)
    .post(`/api/projects/${projectId}/runs`)
    .set(asPerson(engineer))
    .send({ scenarioIds: [scenarioId], climateFileIds: [climateFileId] })
    .expect(202);
  plainRunId = plain.body.runs[0].id;
  const sweep = await request(t.app)
    .post(`/api/projects/${projectId}/sweeps`)
    .set(asPerson(engineer))
    .send({ name: 'Supply air steps', scenarioId, climateFileId, axes: [{ input: 'system.supplyAirC', from: 20, to: 22, step: 2 }] })
    .expect(202);
  sweepId = sweep.body.sweep.id;
  await t.runQueue.idle();
});
afterAll(() => t.close());

/** What the run reads gave when they parsed every stored JSON column and wrote it again (before they spliced the stored text in). */
function parsedRun(row: typeof runs.$inferSelect, sweepName: string | null) {
  const { scenarioJson, climateJson, resultsJson, sweepPointJson, ...rest } = row;
  return {
    ...rest,
    sweepName: row.sweepId === null ? null : sweepName,
    sweepPoint: sweepPointJson ? JSON.parse(sweepPointJson) : null,
    scenario: JSON.parse(scenarioJson),
    climate: JSON.parse(climateJson),
    results: resultsJson ? JSON.parse(resultsJson) : null,
  };
}
function parsedListing() {
  const names = new Map(
    t.db
      .select()
      .from(sweeps)
      .all()
      .map((s) => [s.id, s.name]),
  );
  const rows = t.db
    .select()
    .from(runs)
    .where(eq(runs.projectId, projectId))
    .all()
    .sort((a, b) => b.id - a.id);
  return {
    runs: rows.map((row) => {
      const run = parsedRun(row, row.sweepId === null ? null : (names.get(row.sweepId) ?? null));
      const r = run.results;
      return {
        ...run,
        results: r ? { hours: r.hours, energy: r.energy, water: r.water, peakMechanicalLoadKw: r.peakMechanicalLoadKw, excursions: r.excursions } : null,
      };
    }),
  };
}
const runRow = (id: number) => t.db.select().from(runs).where(eq(runs.id, id)).get()!;
const listing = () => request(t.app).get(`/api/projects/${projectId}/runs`).set(asPerson(viewer)).expect(200);
const oneRun = (id: number) => request(t.app).get(`/api/projects/${projectId}/runs/${id}`).set(asPerson(viewer));

describe('the run list and a run, read from the stored JSON text', () => {
  it('give the same JSON, byte for byte, as parsing the stored columns and writing them again', async () => {
    const list = await listing();
    expect(list.text).toBe(JSON.stringify(parsedListing()));
    expect(list.body.runs).toHaveLength(3);
    const point = t.db.select().from(runs).where(eq(runs.sweepId, sweepId)).orderBy(asc(runs.id)).get()!;
    for (const id of [plainRunId, point.id]) {
      const res = await oneRun(id).expect(200);
      expect(res.text).toBe(JSON.stringify({ run: parsedRun(runRow(id), id === point.id ? 'Supply air steps' : null) }));
    }
    // The sweep point and the plain run as the list gives them, and a full run carries its per-month table.
    const listedPoint = list.body.runs.find((r: { id: number }) => r.id === point.id);
    expect(listedPoint).toMatchObject({ sweepId, sweepName: 'Supply air steps', sweepPoint: { 'system.supplyAirC': 20 }, status: 'done' });
    expect(Object.keys(listedPoint.results)).toEqual(['hours', 'energy', 'water', 'peakMechanicalLoadKw', 'excursions']);
    expect((await oneRun(plainRunId)).body.run.results.hoursByMonth).toHaveLength(12);
  });

  it('leave out listed results fields the stored results lack, keep a stored null, and give null results for a run not done', async () => {
    const stored = JSON.parse(runRow(plainRunId).resultsJson!);
    const { excursions: _excursions, ...withoutExcursions } = stored;
    t.db
      .update(runs)
      .set({ resultsJson: JSON.stringify({ ...withoutExcursions, peakMechanicalLoadKw: null }) })
      .where(eq(runs.id, plainRunId))
      .run();
    t.db.update(runs).set({ resultsJson: null, status: 'failed', error: 'stopped by a test' }).where(eq(runs.sweepId, sweepId)).run();
    // A run's results never change once written; remembering them is keyed by finish time, so the edit above is read as new.
    t.db
      .update(runs)
      .set({ finishedAt: new Date(Date.UTC(2026, 0, 2)) })
      .where(eq(runs.id, plainRunId))
      .run();
    const list = await listing();
    expect(list.text).toBe(JSON.stringify(parsedListing()));
    const plain = list.body.runs.find((r: { id: number }) => r.id === plainRunId);
    expect(plain.results).not.toHaveProperty('excursions');
    expect(plain.results.peakMechanicalLoadKw).toBeNull();
    expect(list.body.runs.filter((r: { results: unknown }) => r.results === null)).toHaveLength(2);
  });
});

describe('remembered answers', () => {
  it('show every write at the next read: a run changed, a sweep renamed, a run deleted, a run added', async () => {
    const before = await listing();
    t.db.update(runs).set({ error: 'changed after the read' }).where(eq(runs.id, plainRunId)).run();
    const afterChange = await listing();
    expect(afterChange.body.runs.find((r: { id: number }) => r.id === plainRunId).error).toBe('changed after the read');
    expect((await oneRun(plainRunId).expect(200)).body.run.error).toBe('changed after the read');
    expect(afterChange.text).not.toBe(before.text);

    t.db.update(sweeps).set({ name: 'Supply air, renamed' }).where(eq(sweeps.id, sweepId)).run();
    expect((await listing()).body.runs.filter((r: { sweepName: string | null }) => r.sweepName === 'Supply air, renamed')).toHaveLength(2);

    const point = t.db.select().from(runs).where(eq(runs.sweepId, sweepId)).orderBy(asc(runs.id)).get()!;
    await oneRun(point.id).expect(200);
    await request(t.app).delete(`/api/projects/${projectId}/runs/${point.id}`).set(asPerson(engineer)).expect(204);
    await oneRun(point.id).expect(404);
    expect((await listing()).body.runs.map((r: { id: number }) => r.id)).not.toContain(point.id);

    // A missing run is not remembered as missing: the id answers as soon as the run exists.
    const { id: _id, ...copy } = runRow(plainRunId);
    const unusedId = 900_000;
    await oneRun(unusedId).expect(404);
    t.db
      .insert(runs)
      .values({ ...copy, id: unusedId })
      .run();
    expect((await oneRun(unusedId).expect(200)).body.run.id).toBe(unusedId);
  });

  it('show a write by another connection to the same database file', async () => {
    await listing();
    const other = new Database(path.join(t.dataDir, 'tramontane.db'));
    try {
      other.prepare('UPDATE runs SET error = ? WHERE id = ?').run('written by another process', plainRunId);
    } finally {
      other.close();
    }
    expect((await listing()).body.runs.find((r: { id: number }) => r.id === plainRunId).error).toBe('written by another process');
  });

  it('answer 304 to a browser that has the same answer (its ETag), and 200 with the new one after a write', async () => {
    const first = await oneRun(plainRunId).expect(200);
    const etag = first.headers.etag;
    expect(etag).toMatch(/^W\/"/);
    await oneRun(plainRunId).set('if-none-match', etag).expect(304);
    t.db.update(runs).set({ error: 'another change' }).where(eq(runs.id, plainRunId)).run();
    const changed = await oneRun(plainRunId).set('if-none-match', etag).expect(200);
    expect(changed.headers.etag).not.toBe(etag);
  });

  it('are only given to someone who may read the project', async () => {
    await listing();
    const outsider = personWithSession(t.db, 'not.a.member@example.test');
    await request(t.app).get(`/api/projects/${projectId}/runs`).set(asPerson(outsider)).expect(404);
    await request(t.app).get(`/api/projects/${projectId}/runs/${plainRunId}`).set(asPerson(outsider)).expect(404);
    await request(t.app).get(`/api/projects/${projectId}/runs`).expect(401);
  });
});
