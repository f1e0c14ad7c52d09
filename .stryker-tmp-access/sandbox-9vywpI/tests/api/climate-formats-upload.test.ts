/**
 * The published formats through the preview and upload routes, with no mapping or flag: each
 * synthetic fixture is recognised, its header comes back with the result and is checked against the
 * site; damaged versions give 201 or a 4xx that says why, never a 500, and nothing half-stored.
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { storedClimateRows } from '../support/study-setup';
import { createTestApp, type TestApp } from '../support/test-app';
import { damage, damaged } from '../support/weather-damage';

const fixture = (name: string) => readFileSync(path.resolve(import.meta.dirname, '../fixtures/weather', name));
const FILES = [
  { name: 'synthetic-typical-year.epw', format: 'epw' },
  { name: 'synthetic-header-block.csv', format: 'header-block-csv' },
  { name: 'synthetic-station-records.txt', format: 'fixed-width-station' },
] as const;

let t: TestApp;
let engineer: TestPerson;
let projectId: number;
let siteId: number;
let farSiteId: number;

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'formats.engineer@example.test');
  projectId = projectWithMembers(t.db, 'Formats study', [[engineer, 'engineer']]);
  const site = (body: object) => request(t.app).post(`/api/projects/${projectId}/sites`).set(asPerson(engineer)).send(body).expect(201);
  siteId = (await site({ name: 'Quellmoor (synthetic)', elevationM: 260, timeZone: 'UTC+01:00', latitude: 51.25, longitude: 7.125 })).body.site.id;
  farSiteId = (await site({ name: 'Somewhere else', elevationM: 900, timeZone: 'America/Denver' })).body.site.id;
});
afterAll(() => t.close());

const stored = () => storedClimateRows(t.db);

const post = (site: number, fileName: string, body: Buffer, preview = false) =>
  request(t.app)
    .post(`/api/projects/${projectId}/sites/${site}/climate-files${preview ? '/preview' : ''}?fileName=${encodeURIComponent(fileName)}`)
    .set(asPerson(engineer))
    .set('content-type', 'application/octet-stream')
    .send(body);

describe('published formats through the API, without flags', () => {
  for (const { name, format } of FILES) {
    it(`previews and stores ${name} as ${format}`, async () => {
      const preview = await post(siteId, name, fixture(name), true).expect(200);
      expect(preview.body.ok).toBe(true);
      expect(preview.body.mapping.format.id).toBe(format);
      expect(preview.body.preview.length).toBeGreaterThan(0);
      const res = await post(siteId, name, fixture(name)).expect(201);
      expect(res.body.climateFile.hours).toBe(72);
      const file = await request(t.app).get(`/api/projects/${projectId}/climate-files/${res.body.climateFile.id}`).set(asPerson(engineer)).expect(200);
      expect(file.body.mapping.format.id).toBe(format);
    });
  }

  it('returns the EPW header and typical year with the result, and no mismatch for a site that agrees', async () => {
    const res = await post(siteId, 'typical.epw', fixture('synthetic-typical-year.epw'), true).expect(200);
    expect(res.body.report.fileHeader).toMatchObject({
      name: 'Quellmoor Synthetic Station',
      latitude: 51.25,
      longitude: 7.125,
      elevationM: 250,
      utcOffsetHours: 1,
    });
    expect(res.body.report.typicalYear).toEqual({ year: 2001, sourceYearByMonth: [2004, 1999, null, null, null, null, null, null, null, null, null, null] });
    expect(res.body.report.issues.filter((i: { kind: string }) => i.kind === 'header-site-mismatch')).toEqual([]);
  });

  it('warns, and still stores, when the header disagrees with the chosen site', async () => {
    const res = await post(farSiteId, 'typical.epw', fixture('synthetic-typical-year.epw')).expect(201);
    const kinds = res.body.report.issues.filter((i: { kind: string }) => i.kind === 'header-site-mismatch').map((i: { message: string }) => i.message);
    expect(kinds).toHaveLength(2);
    expect(kinds[0]).toContain('250 m');
    expect(kinds[1]).toContain('America/Denver');
  });
});

/** Posts a body and checks the one promise: 201 with the file, series and original all stored, or a 4xx that says why with nothing stored. */
async function answersSensibly(name: string, body: Buffer): Promise<boolean> {
  const before = stored();
  const res = await post(siteId, name, body);
  const after = stored();
  if (res.status === 201) {
    expect(after).toEqual({ files: before.files + 1, series: before.series + 1, originals: before.originals + 1 });
    return true;
  }
  expect(res.status).toBeGreaterThanOrEqual(400);
  expect(res.status).toBeLessThan(500);
  expect(res.body.error.message.length).toBeGreaterThan(0);
  expect(after).toEqual(before);
  return false;
}

describe('damaged published-format files through the upload route', () => {
  it('answers 201 or a 4xx with a message, never a 500, and stores all of a file or none of it', async () => {
    let storedCount = 0;
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...FILES), fc.array(damage, { minLength: 1, maxLength: 6 }), async ({ name }, damages) => {
        if (await answersSensibly(name, Buffer.from(damaged(fixture(name).toString('utf8'), damages)))) storedCount++;
      }),
      { numRuns: 60 },
    );
    // both branches run: most lightly damaged files are still good enough to keep
    expect(storedCount).toBeGreaterThan(10);
  }, 120_000);

  it('answers random bytes behind each format’s opening lines the same way', async () => {
    const openings = FILES.map(({ name }) => fixture(name).subarray(0, 900));
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...openings), fc.uint8Array({ maxLength: 3000 }), async (opening, bytes) => {
        await answersSensibly('random.epw', Buffer.concat([opening, Buffer.from(bytes)]));
      }),
      { numRuns: 40 },
    );
  }, 120_000);
});
