// @ts-nocheck
import fc from 'fast-check';
import request from 'supertest';
import { count } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { climateFiles } from '../../server/db/schema';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';

let t: TestApp;
let engineer: TestPerson;
let projectId: number;
let siteId: number;

beforeAll(async () => {
  t = createTestApp({ uploadLimits: { bytes: 256 * 1024, rows: 20_000 } });
  engineer = personWithSession(t.db, 'fuzz.engineer@example.test');
  projectId = projectWithMembers(t.db, 'Fuzz study', [[engineer, 'engineer']]);
  const site = await request(t.app).post(`/api/projects/${projectId}/sites`).set(asPerson(engineer)).send({ name: 'Anywhere' }).expect(201);
  siteId = site.body.site.id;
});
afterAll(() => t.close());

const storedFiles = () => t.db.select({ n: count() }).from(climateFiles).get()!.n;

/** Posts a body to the upload route and checks the one promise: a stored file, or a 4xx that says why. */
async function uploadAnswersSensibly(body: Buffer): Promise<void> {
  const before = storedFiles();
  const res = await request(t.app)
    .post(`/api/projects/${projectId}/sites/${siteId}/climate-files?fileName=fuzz.csv`)
    .set(asPerson(engineer))
    .set('content-type', 'application/octet-stream')
    .send(body);
  if (res.status === 201) {
    expect(storedFiles()).toBe(before + 1);
    expect(res.body.climateFile.hours).toBeGreaterThan(0);
    return;
  }
  expect(res.status).toBeGreaterThanOrEqual(400);
  expect(res.status).toBeLessThan(500);
  expect(res.body.error.message).toBeTypeOf('string');
  expect(res.body.error.message.length).toBeGreaterThan(0);
  expect(storedFiles()).toBe(before);
}

const cell = fc.oneof(
  fc.constantFrom('', 'NaN', '-', '999', '1e400', '"', '""', '12,5', '-40', '101.3', '2023-13-45T25:61Z', '°C', '=1+1'),
  fc.double({ noNaN: false }).map(String),
  fc.integer({ min: -100, max: 2100 }).map(String),
  fc.date({ min: new Date(1990, 0, 1), max: new Date(2030, 0, 1), noInvalidDate: true }).map((d) => d.toISOString()),
  fc.string({ maxLength: 12 }),
);
const header = fc.constantFrom(
  'timestamp,dry_bulb_c,relative_humidity_pct',
  'Date;Time;Temp (F);RH %',
  'Year,Month,Day,Hour,Temp (F),Dew Point (F)',
  'time\ttemperature\thumidity ratio (g/kg)',
  '',
);
const csvLike = fc
  .record({
    header,
    rows: fc.array(fc.array(cell, { minLength: 1, maxLength: 7 }), { maxLength: 60 }),
    delimiter: fc.constantFrom(',', ';', '\t'),
    newline: fc.constantFrom('\n', '\r\n'),
  })
  .map(({ header: h, rows, delimiter, newline }) => Buffer.from([h, ...rows.map((r) => r.join(delimiter))].join(newline)));

/** A plausible hourly file with random values and, now and then, a damaged cell. */
const damagedHourly = fc
  .array(
    fc.record({
      dryBulbC: fc.double({ min: -30, max: 45, noNaN: true }),
      rhPct: fc.double({ min: 5, max: 100, noNaN: true }),
      junk: fc.oneof({ arbitrary: fc.constant(null), weight: 19 }, { arbitrary: fc.constantFrom('', 'n/a', '-999', 'abc', '101,5'), weight: 1 }),
    }),
    { minLength: 1, maxLength: 200 },
  )
  .map((rows) => {
    const start = Date.UTC(2022, 5, 1);
    const lines = rows.map((r, i) => `${new Date(start + i * 3_600_000).toISOString()},${r.junk ?? r.dryBulbC.toFixed(1)},${r.rhPct.toFixed(0)}`);
    return Buffer.from(['timestamp,dry_bulb_c,relative_humidity_pct', ...lines].join('\n'));
  });

describe('the upload API under arbitrary input', () => {
  it('answers random bytes with a stored file or a 4xx that says why, never a 500', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.uint8Array({ maxLength: 4096 }).map((b) => Buffer.from(b)),
        uploadAnswersSensibly,
      ),
      { numRuns: 60 },
    );
  });

  it('answers random CSV-like text the same way, storing nothing on refusal', async () => {
    await fc.assert(fc.asyncProperty(csvLike, uploadAnswersSensibly), { numRuns: 120 });
  });

  it('stores plausible hourly files whole, damaged cells and all, or refuses them whole', async () => {
    const before = storedFiles();
    await fc.assert(fc.asyncProperty(damagedHourly, uploadAnswersSensibly), { numRuns: 60 });
    // Most of these files are good enough to keep: the stored branch is exercised, not only refusals.
    expect(storedFiles() - before).toBeGreaterThan(20);
  });
});
