/**
 * A finished run's hourly columns are stored deflated (server/runs/run-rows.ts), and a run stored before that, with
 * plain column blobs, reads the same: its /hours, its hourly download and its run page's columns do not change.
 */
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { encodeColumn } from '../../shared/climate';
import { runHours } from '../../server/db/schema';
import { decodeRunHours } from '../../server/runs/run-rows';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { siteFileAndScenario } from '../support/study-setup';

let t: TestApp;
let engineer: TestPerson;
let projectId: number;
let runId: number;

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'hours.storage@example.test');
  projectId = projectWithMembers(t.db, 'Stored hours', [[engineer, 'engineer']]);
  const { scenarioId, climateFileId } = await siteFileAndScenario(t, projectId, engineer);
  const res = await request(t.app)
    .post(`/api/projects/${projectId}/runs`)
    .set(asPerson(engineer))
    .send({ scenarioIds: [scenarioId], climateFileIds: [climateFileId] })
    .expect(202);
  runId = res.body.runs[0].id;
  await t.runQueue.idle();
});
afterAll(() => t.close());

const storedRow = () => t.db.select().from(runHours).where(eq(runHours.runId, runId)).get()!;
const read = async (path: string) => {
  const res = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}${path}`).set(asPerson(engineer)).buffer(true).expect(200);
  return Buffer.isBuffer(res.body) ? res.body.toString('base64') : res.text;
};

describe("a run's stored hours", () => {
  it('are deflated (a zlib stream, not the plain "TMC1" blob) and decode to the 72 hours of the three-day file', () => {
    const row = storedRow();
    for (const column of [row.modes, row.mechanicalFraction, row.humidified!]) expect(column[0]).toBe(0x78);
    const hours = decodeRunHours(row);
    expect(hours.modes.length).toBe(72);
    expect(hours.mechanicalFraction.length).toBe(72);
    expect(hours.humidified!.length).toBe(72);
  });

  it('read the same when stored plain, as runs made before were', async () => {
    const packed = { hours: await read('/hours'), hourly: await read('/downloads/hourly.csv'), columns: await read('/hour-columns') };
    const decoded = decodeRunHours(storedRow());
    const plain = (column: Float64Array | Uint8Array) => Buffer.from(encodeColumn(column));
    t.db
      .update(runHours)
      .set({ modes: plain(decoded.modes), mechanicalFraction: plain(decoded.mechanicalFraction), humidified: plain(decoded.humidified!) })
      .where(eq(runHours.runId, runId))
      .run();
    expect(storedRow().modes.subarray(0, 4).toString('latin1')).toBe('TMC1');
    expect(await read('/hours')).toBe(packed.hours);
    expect(await read('/downloads/hourly.csv')).toBe(packed.hourly);
    expect(await read('/hour-columns')).toBe(packed.columns);
    expect(packed.hourly.split('\n').length).toBeGreaterThan(72);
  });
});
