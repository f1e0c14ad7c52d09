// @ts-nocheck
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { decodeHourColumns, HOUR_COLUMN_NAMES, hourTimestampsMs } from '../../shared/report/hour-columns';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { siteFileAndScenario } from '../support/study-setup';
import { tightPsychrolib } from '../unit/psychrometrics/reference-psychrolib';

let t: TestApp;
let viewer: TestPerson;
let projectId: number;
let runId: number;

beforeAll(async () => {
  t = createTestApp();
  const engineer = personWithSession(t.db, 'ilse.varga@example.test');
  viewer = personWithSession(t.db, 'client.reader@example.test');
  projectId = projectWithMembers(t.db, 'Hour columns', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  const { climateFileId, scenarioId } = await siteFileAndScenario(t, projectId, engineer);
  const created = await request(t.app)
    .post(`/api/projects/${projectId}/runs`)
    .set(asPerson(engineer))
    .send({ scenarioIds: [scenarioId], climateFileIds: [climateFileId] })
    .expect(202);
  runId = created.body.runs[0].id;
  await t.runQueue.idle();
});
afterAll(() => t.close());

/** The response body as bytes, whatever its type (superagent leaves octet-stream unparsed only when told). */
const binary = (req: request.Test) =>
  req.buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on('data', (c: Buffer) => chunks.push(c));
    res.on('end', () => done(null, Buffer.concat(chunks)));
  });
const arrayBufferOf = (body: Buffer) => body.buffer.slice(body.byteOffset, body.byteOffset + body.byteLength) as ArrayBuffer;

describe("a run's hour columns", () => {
  it('carry the outdoor states the run computed, checked against psychrolib, beside the stored modes', async () => {
    const res = await binary(
      request(t.app).get(`/api/projects/${projectId}/runs/${runId}/hour-columns`).set(asPerson(viewer)).set('accept-encoding', 'identity'),
    ).expect(200);
    expect(res.headers['content-type']).toBe('application/octet-stream');
    expect(res.headers['content-encoding']).toBeUndefined();
    const message = decodeHourColumns(arrayBufferOf(res.body));
    // three-days.csv: 72 hours from 2023-07-01T00:00Z, one an hour, station pressure 101.3 kPa throughout
    expect(message.hours).toBe(72);
    expect(message.startMs).toBe(Date.UTC(2023, 6, 1));
    expect(message.stepMs).toBe(3_600_000);
    expect(hourTimestampsMs(message)[71]).toBe(Date.UTC(2023, 6, 3, 23));
    expect(message.sitePressurePa).toBe(101_300);
    expect(message.modeNames).toEqual(['free', 'adiabatic', 'mechanical', 'no_data']);
    expect(Object.keys(message.columns)).toEqual(HOUR_COLUMN_NAMES);
    const c = message.columns;
    // Reference library: psychrolib (SI) at the first hour, 8.3 °C and 88 % RH at 101.3 kPa; the columns keep the
    // hourly download's decimals (0.01 K, 0.001 g/kg, 0.01 kJ/kg).
    const w = tightPsychrolib.GetHumRatioFromRelHum(8.3, 0.88, 101_300);
    expect(c.dryBulbC![0]).toBeCloseTo(8.3, 5);
    expect(c.humidityRatio![0]).toBeCloseTo(Math.round(w * 1e6) / 1e6, 8);
    expect(c.wetBulbC![0]).toBeCloseTo(tightPsychrolib.GetTWetBulbFromHumRatio(8.3, w, 101_300), 2);
    expect(c.dewPointC![0]).toBeCloseTo(tightPsychrolib.GetTDewPointFromHumRatio(8.3, w, 101_300), 2);
    expect(c.rhPct![0]).toBeCloseTo(88, 3);
    expect(c.enthalpyKJPerKg![0]).toBeCloseTo(tightPsychrolib.GetMoistAirEnthalpy(8.3, w) / 1000, 2);
    expect(c.pressurePa![0]).toBe(101_300);
    const hours = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/hours`).set(asPerson(viewer)).expect(200);
    expect(Array.from(c.modes!)).toEqual(hours.body.modes);
    expect(Array.from(c.mechanicalFraction!, (v) => Math.round(v * 1000) / 1000)).toEqual(hours.body.mechanicalFraction);
  });

  it('send only the columns asked for, gzipped for a caller that accepts it', async () => {
    const res = await binary(
      request(t.app).get(`/api/projects/${projectId}/runs/${runId}/hour-columns?columns=modes,dryBulbC`).set(asPerson(viewer)).set('accept-encoding', 'gzip'),
    ).expect(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    // superagent has undone the gzip
    const message = decodeHourColumns(arrayBufferOf(res.body));
    expect(Object.keys(message.columns)).toEqual(['modes', 'dryBulbC']);
    expect(message.columns.dryBulbC).toBeInstanceOf(Float32Array);
  });

  it('carry the dry-bulb bins in their header when asked, from the same states', async () => {
    const res = await binary(request(t.app).get(`/api/projects/${projectId}/runs/${runId}/hour-columns?bins=2`).set(asPerson(viewer))).expect(200);
    const message = decodeHourColumns(arrayBufferOf(res.body));
    const table = message.dryBulbBins!;
    expect(table.widthK).toBe(2);
    expect(table.hoursWithoutDryBulb).toBe(0);
    // three-days.csv runs from 6.3 to 22.0 °C: bins [22, 24) down to [6, 8), warmest first
    expect(table.bins.map((b) => b.fromC)).toEqual([22, 20, 18, 16, 14, 12, 10, 8, 6]);
    const { dryBulbC, wetBulbC, modes } = message.columns;
    for (const bin of table.bins) {
      const inBin = Array.from(dryBulbC!.keys()).filter((i) => dryBulbC![i] >= bin.fromC && dryBulbC![i] < bin.toC);
      expect(bin.total).toBe(inBin.length);
      expect(bin.hours).toEqual([0, 1, 2, 3].map((m) => inBin.filter((i) => modes![i] === m).length));
      // the mean of the wet-bulb column (checked against psychrolib above), which keeps 0.01 K
      if (inBin.length) expect(bin.meanWetBulbC).toBeCloseTo(inBin.reduce((s, i) => s + wetBulbC![i], 0) / inBin.length, 2);
    }
  });

  it('give the bins on another grid when asked: IP pages ask for 5 °F bins from 0 °F', async () => {
    // 5 °F = 5/1.8 K and 0 °F = −32/1.8 °C (°F = 1.8 °C + 32, exact), sent as the JS numbers themselves.
    const url = `/api/projects/${projectId}/runs/${runId}/hour-columns?columns=modes&bins=${5 / 1.8}&binOrigin=${-32 / 1.8}`;
    const res = await binary(request(t.app).get(url).set(asPerson(viewer))).expect(200);
    const table = decodeHourColumns(arrayBufferOf(res.body)).dryBulbBins!;
    // three-days.csv runs from 6.3 to 22.0 °C (43.3 to 71.6 °F): bins [70, 75) °F down to [40, 45) °F, warmest first
    expect(table.bins.map((b) => Math.round((b.fromC * 1.8 + 32) * 1e9) / 1e9)).toEqual([70, 65, 60, 55, 50, 45, 40]);
    expect(table.bins.reduce((sum, b) => sum + b.total, 0)).toBe(72);
  });

  it('refuse an unknown column, naming it', async () => {
    const res = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/hour-columns?columns=modes,dryBulbF`).set(asPerson(viewer)).expect(400);
    expect(res.body.error.message).toContain('"dryBulbF"');
  });
});
