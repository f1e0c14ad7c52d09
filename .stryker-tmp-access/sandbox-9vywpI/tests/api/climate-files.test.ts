// @ts-nocheck
import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents } from '../../server/db/schema';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { directAirSample, storedClimateRows } from '../support/study-setup';

const threeDays = readFileSync(new URL('../fixtures/api/three-days.csv', import.meta.url));

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let siteId: number;

beforeAll(async () => {
  t = createTestApp({ uploadLimits: { bytes: 200_000, rows: 5_000 } });
  engineer = personWithSession(t.db, 'ines.varga@example.test');
  viewer = personWithSession(t.db, 'client.reader@example.test');
  projectId = projectWithMembers(t.db, 'Upload study', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  const site = await request(t.app)
    .post(`/api/projects/${projectId}/sites`)
    .set(asPerson(engineer))
    .send({ name: 'Quarry Hill', elevationM: 120, timeZone: 'Europe/Dublin' })
    .expect(201);
  siteId = site.body.site.id;
});
afterAll(() => t.close());

const storedCounts = () => storedClimateRows(t.db);

const upload = (body: Buffer | string, query = '') =>
  request(t.app).post(`/api/projects/${projectId}/sites/${siteId}/climate-files${query}`).set(asPerson(engineer)).set('content-type', 'text/csv').send(body);

describe('an engineer uploading hourly weather', () => {
  it('previews the detected mapping and the first hours without storing anything', async () => {
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/sites/${siteId}/climate-files/preview`)
      .set(asPerson(engineer))
      .set('content-type', 'text/csv')
      .send(threeDays)
      .expect(200);
    expect(res.body.ok).toBe(true);
    expect(res.body.mapping.dryBulb.header).toBe('dry_bulb_c');
    expect(res.body.mapping.humidity.quantity).toBe('relative-humidity');
    expect(res.body.preview[0]).toMatchObject({ timestampMs: Date.UTC(2023, 6, 1, 0), dryBulbC: 8.3, humidity: 88, pressurePa: 101_300 });
    expect(storedCounts().files).toBe(0);
  });

  it('stores the file whole: listing, original bytes and the hourly series', async () => {
    const res = await upload(threeDays, '?fileName=three-days.csv&name=July%20check').expect(201);
    expect(res.body.climateFile).toMatchObject({ name: 'July check', hours: 72, measuredHours: 72, missingHours: 0, siteName: 'Quarry Hill' });
    expect(storedCounts()).toEqual({ files: 1, originals: 1, series: 1 });
    const imported = t.db
      .select()
      .from(auditEvents)
      .all()
      .filter((e) => e.action === 'climate.import');
    expect(imported).toHaveLength(1);
    expect(imported[0]).toMatchObject({ actorId: engineer.id, projectId, target: 'July check' });

    const id = res.body.climateFile.id;
    const original = await request(t.app)
      .get(`/api/projects/${projectId}/climate-files/${id}/original`)
      .set(asPerson(viewer))
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(Buffer.compare(original.body, threeDays)).toBe(0);

    const csv = await request(t.app).get(`/api/projects/${projectId}/climate-files/${id}/hourly.csv`).set(asPerson(viewer)).expect(200);
    const lines = csv.text.trim().split('\n');
    expect(lines[0]).toBe('timestamp,dry_bulb_c,relative_humidity_pct,pressure_kpa,flag');
    expect(lines[1]).toBe('2023-07-01T00:00:00Z,8.3,88,101.3,measured');
    expect(lines).toHaveLength(73);
  });

  it('shows what the file holds: coverage, monthly statistics and design values from this file', async () => {
    const list = await request(t.app).get(`/api/projects/${projectId}/climate-files`).set(asPerson(viewer)).expect(200);
    const id = list.body.climateFiles[0].id;
    const res = await request(t.app).get(`/api/projects/${projectId}/climate-files/${id}`).set(asPerson(viewer)).expect(200);
    const july = res.body.summary.monthly.dryBulbC[6];
    // The fixture's dry-bulb swings 14 ± 8 °C, written with one decimal: 6.0 … 22.0 °C.
    expect(july.hours).toBe(72);
    expect(july.min).toBeCloseTo(6, 0);
    expect(july.max).toBeCloseTo(22, 0);
    expect(res.body.summary.years).toEqual([{ year: 2023, hours: 72, measuredHours: 72, filledHours: 0, missingHours: 0 }]);
    expect(res.body.summary.design.computedFromFile).toBe(true);
    expect(res.body.summary.design.dryBulb[0].valueC).toBeGreaterThan(21);
  });

  it('reads local timestamps in the site civil time, its standard time or UTC, as the person chooses', async () => {
    // Europe/Dublin: UTC+1 in summer, UTC in winter, so its standard (least) offset is UTC (IANA time-zone database).
    const text = 'date,time,dry_bulb_c,relative_humidity_pct\n2023-07-01,12:00,20,50\n2023-07-01,13:00,21,50\n';
    const preview = async (basis: string) =>
      (
        await request(t.app)
          .post(`/api/projects/${projectId}/sites/${siteId}/climate-files/preview?timeBasis=${basis}`)
          .set(asPerson(engineer))
          .set('content-type', 'text/csv')
          .send(text)
          .expect(200)
      ).body.preview[0].timestampMs;
    expect(await preview('site-civil')).toBe(Date.UTC(2023, 6, 1, 11));
    expect(await preview('site-standard')).toBe(Date.UTC(2023, 6, 1, 12));
    expect(await preview('utc')).toBe(Date.UTC(2023, 6, 1, 12));
  });

  it('reads humidity below 0 °C over ice when asked, stores it over water, and a run records the choice', async () => {
    // Synthetic winter hours: RH 80 % at −10 °C.
    const text = 'timestamp,dry_bulb_c,relative_humidity_pct\n2023-01-10T00:00Z,-10,80\n2023-01-10T01:00Z,-10,80\n';
    const plain = await upload(text, '?fileName=winter.csv').expect(201);
    expect(plain.body.report.humidityOverIce).toBe(false);
    const res = await upload(text, '?fileName=winter-ice.csv&humidityOverIce=true').expect(201);
    expect(res.body.report.humidityOverIce).toBe(true);
    const fileId = res.body.climateFile.id;
    const stored = await request(t.app).get(`/api/projects/${projectId}/climate-files/${fileId}`).set(asPerson(viewer)).expect(200);
    expect(stored.body.report.humidityOverIce).toBe(true);
    // 80 % over ice is 80 × pws,ice/pws,water = 72.56 % over water at −10 °C (Hyland–Wexler eq. 5 and 6, ASHRAE 2017 ch. 1).
    const hours = await request(t.app).get(`/api/projects/${projectId}/climate-files/${fileId}/hours`).set(asPerson(viewer)).expect(200);
    expect(hours.body.humidity[0]).toBeCloseTo(72.56, 2);

    const scenario = await request(t.app).post(`/api/projects/${projectId}/scenarios`).set(asPerson(engineer)).send({ scenario: directAirSample }).expect(201);
    const created = await request(t.app)
      .post(`/api/projects/${projectId}/runs`)
      .set(asPerson(engineer))
      .send({ scenarioIds: [scenario.body.scenario.id], climateFileIds: [fileId, plain.body.climateFile.id] })
      .expect(202);
    const [iceRun, waterRun] = created.body.runs.map((r: { id: number }) => r.id);
    const runOf = async (id: number) => (await request(t.app).get(`/api/projects/${projectId}/runs/${id}`).set(asPerson(viewer)).expect(200)).body.run;
    expect((await runOf(iceRun)).climate.humidityOverIce).toBe(true);
    expect((await runOf(waterRun)).climate.humidityOverIce).toBe(false);
  });

  it('refuses a humidityOverIce that is not true or false, naming it', async () => {
    const res = await upload('timestamp,dry_bulb_c,relative_humidity_pct\n2023-01-10T00:00Z,-10,80\n', '?humidityOverIce=yes').expect(400);
    expect(JSON.stringify(res.body.error)).toMatch(/humidityOverIce must be true or false/);
  });

  it('refuses a file without humidity with a 422 report and stores nothing', async () => {
    const before = storedCounts();
    const res = await upload('timestamp,dry_bulb_c\n2023-01-01T00:00Z,3\n2023-01-01T01:00Z,4\n').expect(422);
    expect(res.body.error.code).toBe('import_rejected');
    expect(res.body.error.details.report.issues.some((i: { kind: string }) => i.kind === 'missing-humidity')).toBe(true);
    expect(storedCounts()).toEqual(before);
  });

  it('refuses an empty file and binary bytes with a clear message, never a 500', async () => {
    expect((await upload('').expect(422)).body.error.message).toMatch(/empty/i);
    const binary = Buffer.from(Array.from({ length: 600 }, (_, i) => (i * 37) % 256));
    const res = await upload(binary);
    expect(res.status).toBe(422);
    expect(res.body.error.message).toBeTypeOf('string');
  });

  it('answers 413 naming the limit for a file over the size or row limit', async () => {
    const big = Buffer.alloc(250_000, 'a');
    expect((await upload(big).expect(413)).body.error.message).toContain('limit');
    const manyRows = `timestamp,dry_bulb_c,relative_humidity_pct\n${'2023-01-01T00:00Z,1,50\n'.repeat(6_000)}`;
    expect((await upload(manyRows).expect(413)).body.error.message).toContain('5,000');
  });

  it('lets a viewer read but not upload', async () => {
    await request(t.app).post(`/api/projects/${projectId}/sites/${siteId}/climate-files`).set(asPerson(viewer)).send(threeDays).expect(403);
  });
});
