// @ts-nocheck
import { readFileSync } from 'node:fs';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { zeroFactors, type ChangeFactors } from '../../shared/morphing';
import { seedDemoProjection } from '../../server/demo/projections';
import { auditEvents, climateFiles } from '../../server/db/schema';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';

// Synthetic: three July days (2023-07-01..03 UTC), dry-bulb 6.3–22 °C, with RH and pressure.
const threeDays = readFileSync(new URL('../fixtures/api/three-days.csv', import.meta.url));
const directAir = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let stranger: TestPerson;
let projectId: number;
let parentId: number;

/** July warmer: mean +8 K, daily maxima +9 K, minima +7 K; specific humidity +10 %. */
function julyWarmer(): ChangeFactors {
  const months = zeroFactors();
  months[6] = { ...months[6], deltaMeanK: 8, deltaMaxK: 9, deltaMinK: 7, humidityChangePct: 10 };
  return { dryBulbMethod: 'shift-and-stretch', humidityMethod: 'stretch', months };
}

const fileCount = () => t.db.select().from(climateFiles).all().length;
const projectionAudits = () =>
  t.db
    .select()
    .from(auditEvents)
    .all()
    .filter((e) => e.action === 'climate.project');

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'ines.varga@example.test');
  viewer = personWithSession(t.db, 'reviewer@example.test');
  stranger = personWithSession(t.db, 'elsewhere@example.test');
  projectId = projectWithMembers(t.db, 'Projection study', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  projectWithMembers(t.db, 'Another study', [[stranger, 'owner']]);
  // Site on Central European Time: its standard offset is UTC+01:00, so its days start at 23:00 UTC.
  const site = await request(t.app)
    .post(`/api/projects/${projectId}/sites`)
    .set(asPerson(engineer))
    .send({ name: 'Veldhaven', elevationM: 120, timeZone: 'Europe/Amsterdam' })
    .expect(201);
  const file = await request(t.app)
    // Read as a file whose sub-zero humidity is over ice: the stored series is over water either way.
    .post(`/api/projects/${projectId}/sites/${site.body.site.id}/climate-files?fileName=three-days.csv&humidityOverIce=true`)
    .set(asPerson(engineer))
    .set('content-type', 'text/csv')
    .send(threeDays)
    .expect(201);
  parentId = file.body.climateFile.id;
});
afterAll(() => t.close());

describe('making a future-climate projection', () => {
  it('previews the monthly means without storing anything', async () => {
    const before = fileCount();
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/climate-files/${parentId}/projections/preview`)
      .set(asPerson(engineer))
      .send({ factors: julyWarmer() })
      .expect(200);
    const { parent, projection } = res.body.comparison;
    // Shift-and-stretch moves the monthly mean by ΔTmean and the mean daily max/min by ΔTmax/ΔTmin exactly
    // (Belcher, Hacker and Powell 2005: T = T0 + ΔTmean + α(T0 − <T0>), α = (ΔTmax − ΔTmin)/(<Tmax0> − <Tmin0>)).
    expect(projection.dryBulbC[6].mean - parent.dryBulbC[6].mean).toBeCloseTo(8, 9);
    expect(projection.meanDailyMaxC[6] - parent.meanDailyMaxC[6]).toBeCloseTo(9, 9);
    expect(projection.meanDailyMinC[6] - parent.meanDailyMinC[6]).toBeCloseTo(7, 9);
    // Specific humidity stretched by 1.1, hour by hour, so its monthly mean too.
    expect(projection.specificHumidityGPerKg[6].mean / parent.specificHumidityGPerKg[6].mean).toBeCloseTo(1.1, 9);
    expect(parent.dryBulbC[0].mean).toBeNull(); // no January in the file
    expect(fileCount()).toBe(before);
  });

  it('refuses a viewer and a member of another project', async () => {
    const url = `/api/projects/${projectId}/climate-files/${parentId}/projections`;
    await request(t.app).post(url).set(asPerson(viewer)).send({ factors: julyWarmer() }).expect(403);
    await request(t.app).post(url).set(asPerson(stranger)).send({ factors: julyWarmer() }).expect(404);
    expect(projectionAudits()).toHaveLength(0);
  });

  it('names the month and field of a bad factor and saves nothing', async () => {
    const before = fileCount();
    const bad = julyWarmer();
    bad.months[2] = { ...bad.months[2], deltaMaxK: 40 };
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/climate-files/${parentId}/projections`)
      .set(asPerson(engineer))
      .send({ factors: bad })
      .expect(400);
    expect(res.body.error.message).toContain('March, ΔTmax (deltaMaxK): ΔTmax must be at most 15 K');
    const short = { ...julyWarmer(), months: julyWarmer().months.slice(0, 11) };
    const res2 = await request(t.app)
      .post(`/api/projects/${projectId}/climate-files/${parentId}/projections`)
      .set(asPerson(engineer))
      .send({ factors: short })
      .expect(400);
    expect(res2.body.error.message).toContain('all 12 months');
    // July's parent mean daily range is 22 − 6 = 16 K on the site's days; ΔTmax − ΔTmin = −16 K would flatten it (1 + α = 0).
    const inverted = julyWarmer();
    inverted.months[6] = { ...inverted.months[6], deltaMaxK: -8, deltaMinK: 8 };
    const res3 = await request(t.app)
      .post(`/api/projects/${projectId}/climate-files/${parentId}/projections`)
      .set(asPerson(engineer))
      .send({ factors: inverted })
      .expect(422);
    expect(res3.body.error.message).toMatch(/July: ΔTmax − ΔTmin = -16\.00 K/);
    expect(fileCount()).toBe(before);
    expect(projectionAudits()).toHaveLength(0);
  });
});

describe('a stored projection', () => {
  let projectionId: number;

  beforeAll(async () => {
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/climate-files/${parentId}/projections`)
      .set(asPerson(engineer))
      .send({ name: 'Veldhaven warmer July', source: 'synthetic factors for a test', factors: julyWarmer() })
      .expect(201);
    projectionId = res.body.climateFile.id;
  });

  it('is a climate file on the same site that records its parent, factors, method and source', async () => {
    const list = await request(t.app).get(`/api/projects/${projectId}/climate-files`).set(asPerson(viewer)).expect(200);
    const file = list.body.climateFiles.find((f: { id: number }) => f.id === projectionId);
    // The name is made to say it is a projection, so pickers that show only names say so too.
    expect(file).toMatchObject({
      parentId,
      hours: 72,
      name: 'Veldhaven warmer July (projection)',
      projection: { parentName: 'three-days', method: 'Belcher, Hacker and Powell (2005) morphing' },
    });
    expect(list.body.climateFiles.find((f: { id: number }) => f.id === parentId).projection).toBeNull();
    const res = await request(t.app).get(`/api/projects/${projectId}/projections/${projectionId}`).set(asPerson(viewer)).expect(200);
    const d = res.body.derivation;
    expect(d.citation).toContain('Building Services Engineering Research and Technology 26(1)');
    expect(d.note).toContain('not a forecast');
    expect(d.factors.months[6].deltaMaxK).toBe(9);
    expect(d.source).toBe('synthetic factors for a test');
    expect(d.clampedHighHours + d.clampedLowHours).toBeTypeOf('number');
    expect(d.comparison.projection.dryBulbC[6].mean - d.comparison.parent.dryBulbC[6].mean).toBeCloseTo(8, 9);
    expect(res.body.parent.id).toBe(parentId);
    // The parent was read over ice; the projection's humidity is computed over liquid water, and its report says so.
    const reportOf = (id: number) => JSON.parse(t.db.select().from(climateFiles).where(eq(climateFiles.id, id)).get()!.reportJson);
    expect(reportOf(parentId).humidityOverIce).toBe(true);
    expect(reportOf(projectionId).humidityOverIce).toBe(false);
    const audits = projectionAudits();
    expect(audits).toHaveLength(1);
    expect(audits[0]).toMatchObject({ actorId: engineer.id, projectId, target: 'Veldhaven warmer July (projection)' });
  });

  it('can be downloaded as a CSV that says it is a projection and imports again as it stands', async () => {
    const res = await request(t.app).get(`/api/projects/${projectId}/climate-files/${projectionId}/original`).set(asPerson(viewer)).expect(200);
    const text = Buffer.from(res.body).toString('utf8');
    expect(text.split('\n')[0]).toContain('future-climate projection, not measured weather');
    const again = await request(t.app)
      .post(`/api/projects/${projectId}/sites/${await siteIdOf(projectionId)}/climate-files/preview?fileName=again.csv`)
      .set(asPerson(engineer))
      .set('content-type', 'text/csv')
      .send(text)
      .expect(200);
    expect(again.body.ok).toBe(true);
    expect(again.body.report.counts.hours).toBe(72);
  });

  it('runs like any other file, and a July 8 K warmer needs more help than today', async () => {
    const scenario = await request(t.app).post(`/api/projects/${projectId}/scenarios`).set(asPerson(engineer)).send({ scenario: directAir }).expect(201);
    const created = await request(t.app)
      .post(`/api/projects/${projectId}/runs`)
      .set(asPerson(engineer))
      .send({ scenarioIds: [scenario.body.scenario.id], climateFileIds: [parentId, projectionId] })
      .expect(202);
    await t.runQueue.idle();
    const hoursOf = async (fileId: number) => {
      const run = created.body.runs.find((r: { climateFileId: number }) => r.climateFileId === fileId);
      const res = await request(t.app).get(`/api/projects/${projectId}/runs/${run.id}`).set(asPerson(viewer)).expect(200);
      expect(res.body.run.status).toBe('done');
      return res.body.run.results.hours;
    };
    const today = await hoursOf(parentId);
    const warmer = await hoursOf(projectionId);
    expect(warmer.total).toBe(72);
    // Direct outdoor air at a 25 °C supply with 1 K fan heat: today's file never passes 22 °C, so every hour is free;
    // 8 K warmer (daily maxima 9 K warmer) pushes the afternoons past 24 °C, which need evaporative or mechanical help.
    expect(warmer.free).toBeLessThan(today.free);
    expect(warmer.adiabatic + warmer.mechanical).toBeGreaterThan(today.adiabatic + today.mechanical);
  });

  it('outlives its parent: parentId becomes null and the derivation keeps the parent’s name', async () => {
    await request(t.app).delete(`/api/projects/${projectId}/climate-files/${parentId}`).set(asPerson(engineer)).expect(204);
    const res = await request(t.app).get(`/api/projects/${projectId}/projections/${projectionId}`).set(asPerson(viewer)).expect(200);
    expect(res.body.climateFile.parentId).toBeNull();
    expect(res.body.parent).toBeNull();
    expect(res.body.derivation.parent.name).toBe('three-days');
    expect(res.body.climateFile.projection.parentName).toBe('three-days');
  });
});

describe('the demo projection', () => {
  it('is stored like one made in the app, from the first uploaded file', async () => {
    // The parent of the tests above is deleted by now: upload the file again.
    const siteId = t.db.select().from(climateFiles).all()[0].siteId;
    await request(t.app)
      .post(`/api/projects/${projectId}/sites/${siteId}/climate-files?fileName=three-days.csv`)
      .set(asPerson(engineer))
      .set('content-type', 'text/csv')
      .send(threeDays)
      .expect(201);
    const fileId = seedDemoProjection(t.db, projectId, engineer.id);
    expect(fileId).not.toBeNull();
    const res = await request(t.app).get(`/api/projects/${projectId}/projections/${fileId}`).set(asPerson(viewer)).expect(200);
    expect(res.body.climateFile.name).toMatch(/— projection, warmer decade \(synthetic factors\)$/);
    expect(res.body.derivation.source).toContain('Synthetic');
    // July's synthetic ΔTmean is 2.4 K; shift-and-stretch moves the monthly mean by exactly that.
    const c = res.body.derivation.comparison;
    expect(c.projection.dryBulbC[6].mean - c.parent.dryBulbC[6].mean).toBeCloseTo(2.4, 9);
  });
});

async function siteIdOf(fileId: number): Promise<number> {
  return t.db
    .select()
    .from(climateFiles)
    .all()
    .find((f) => f.id === fileId)!.siteId;
}
