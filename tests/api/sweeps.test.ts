import request from 'supertest';
import { eq, isNotNull } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents, runHours, runs, sweeps } from '../../server/db/schema';
import { createApp } from '../../server/app';
import { createRunQueue } from '../../server/runs/queue';
import { markRunStarted } from '../../server/runs/run-rows';
import type { WorkerPool } from '../../workers/pool';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { directAirSample, siteFileAndScenario, threeDaysCsv as threeDaysText } from '../support/study-setup';
import { psychrolib as psy } from '../unit/psychrometrics/reference-psychrolib';

// No evaporative stage, so every hour is free cooling or mechanical and the count below needs no wet-bulb line.
const directAir = { ...directAirSample, name: 'Direct air, dry', system: { ...directAirSample.system, evaporativeEffectiveness: 0 } };
const SITE_ELEVATION_M = 120;

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let projectId: number;
let climateFileId: number;
let scenarioId: number;

const counts = () => ({
  sweeps: t.db.select().from(sweeps).all().length,
  runs: t.db.select().from(runs).all().length,
  audit: t.db.select().from(auditEvents).all().length,
});

/**
 * Mechanical hours of a dry direct-air design computed outside the engine, with psychrolib as the reference:
 * an hour needs compressors when outdoor air plus fan heat is above the setpoint, or when its humidity ratio is
 * above the envelope's upper moisture limit (the smaller of W at the dew-point maximum and W at the setpoint and
 * RH maximum, at the site's standard pressure) — issue 5's direct-air rules 1–3 with ε = 0.
 */
function referenceMechanicalHours(supplyAirC: number): number {
  // Fan heat derived from the fan power: ΔT_fan = fanPowerFraction · ΔT_IT.
  const fanHeatK = directAir.energy.fanPowerFraction * directAir.system.itDeltaTK;
  const { dewPointMaxC, rhMaxPct } = directAir.envelope;
  const standardPa = psy.GetStandardAtmPressure(SITE_ELEVATION_M);
  const wHigh = Math.min(psy.GetHumRatioFromTDewPoint(dewPointMaxC, standardPa), psy.GetHumRatioFromRelHum(supplyAirC, rhMaxPct / 100, standardPa));
  return threeDaysText
    .split('\n')
    .filter((line) => /^\d{4}-/.test(line))
    .map((line) => line.split(',').map(Number))
    .filter(([, t, rh, kPa]) => t + fanHeatK > supplyAirC || psy.GetHumRatioFromRelHum(t, rh / 100, kPa * 1000) > wHigh).length;
}

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'lio.marchetti@example.test');
  viewer = personWithSession(t.db, 'client.reader@example.test');
  projectId = projectWithMembers(t.db, 'Setpoint study', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  ({ climateFileId, scenarioId } = await siteFileAndScenario(t, projectId, engineer, {
    siteName: 'Quillmoor',
    elevationM: SITE_ELEVATION_M,
    scenario: directAir,
  }));
});
afterAll(() => t.close());

describe('an engineer sweeping the supply setpoint', () => {
  let sweepId: number;

  it('queues one run per point, with one audit entry', async () => {
    const before = counts();
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/sweeps`)
      .set(asPerson(engineer))
      .send({ scenarioId, climateFileId, axes: [{ input: 'system.supplyAirC', from: 14, to: 26, step: 2 }] })
      .expect(202);
    sweepId = res.body.sweep.id;
    expect(res.body.sweep.name).toBe('Direct air, dry · supply air');
    expect(res.body.sweep.axes).toEqual([{ input: 'system.supplyAirC', from: 14, to: 26, step: 2, values: [14, 16, 18, 20, 22, 24, 26] }]);
    expect(res.body.sweep.points.map((p: { values: unknown }) => p.values)).toEqual([14, 16, 18, 20, 22, 24, 26].map((v) => ({ 'system.supplyAirC': v })));
    expect(res.body.sweep.progress).toMatchObject({ total: 7, queued: 7 });
    const after = counts();
    expect(after.runs - before.runs).toBe(7);
    // The points' own run.done entries, and the sweep's sweep.done once the last one settles, may already follow as
    // they finish (seven small points can all be done before this read); the start is one entry, not one per run.
    const trail = t.db
      .select()
      .from(auditEvents)
      .all()
      .slice(before.audit)
      .filter((e) => e.action !== 'run.done' && e.action !== 'sweep.done');
    expect(trail.map((e) => e.action)).toEqual(['sweep.start']);
    expect(trail[0]).toMatchObject({ actorId: engineer.id, projectId, target: `sweep ${sweepId}: Direct air, dry · supply air` });
  });

  it('shows every point done to a viewer, with mechanical hours as the reference count gives them', async () => {
    await t.runQueue.idle();
    const res = await request(t.app).get(`/api/projects/${projectId}/sweeps/${sweepId}`).set(asPerson(viewer)).expect(200);
    const { sweep } = res.body;
    expect(sweep.progress).toMatchObject({ total: 7, done: 7, fraction: 1, finished: true });
    const mechanical = sweep.points.map((p: { results: { hours: { mechanical: number } } }) => p.results.hours.mechanical);
    // Each point checked against the count made with psychrolib from the CSV itself (see referenceMechanicalHours).
    expect(mechanical).toEqual([14, 16, 18, 20, 22, 24, 26].map(referenceMechanicalHours));
    // The file tops out at 22.0 °C: with 1 K fan heat no hour needs compressors once the setpoint reaches 23 °C,
    // so the first swept point with zero mechanical hours is 24 °C, and 22 °C still has the hours at 22.0 °C.
    expect(mechanical.slice(5)).toEqual([0, 0]);
    expect(mechanical[4]).toBeGreaterThan(0);
    for (const p of sweep.points) expect(p.results.hours.total).toBe(72);
    // With no compressor hour and no evaporative stage only the hall fans run, at 4 % of IT power every hour, so the
    // partial PUE as ISO/IEC 30134-2 defines it, (IT + cooling energy) / IT energy, is 1.04; no water, no mechanical load.
    for (const p of sweep.points.slice(5)) {
      expect(p.results.partialPue).toBeCloseTo(1 + directAir.energy.fanPowerFraction, 12);
      expect(p.results.waterL).toBe(0);
      expect(p.results.peakMechanicalLoadKw).toBe(0);
    }
    expect(sweep.points[0].results.peakMechanicalLoadKw).toBeGreaterThan(0);
    // Each point's run is an ordinary run, named after its value.
    const run = await request(t.app).get(`/api/projects/${projectId}/runs/${sweep.points[3].runId}`).set(asPerson(viewer)).expect(200);
    expect(run.body.run.scenario.name).toBe('Direct air, dry · supply air 20 °C');
    expect(run.body.run.scenario.system.supplyAirC).toBe(20);
    expect(run.body.run.sweepId).toBe(sweepId);

    const list = await request(t.app).get(`/api/projects/${projectId}/sweeps`).set(asPerson(viewer)).expect(200);
    expect(list.body.sweeps[0]).toMatchObject({ id: sweepId, progress: { total: 7, done: 7 }, climate: { name: 'three-days', siteName: 'Quillmoor' } });
    expect(list.body.sweeps[0].points).toBeUndefined();
  });

  it('gives a point the same results as a plain run of the same scenario on the same file', async () => {
    const sweep = (await request(t.app).get(`/api/projects/${projectId}/sweeps/${sweepId}`).set(asPerson(viewer)).expect(200)).body.sweep;
    const pointRun = (await request(t.app).get(`/api/projects/${projectId}/runs/${sweep.points[3].runId}`).set(asPerson(viewer)).expect(200)).body.run;
    const saved = await request(t.app).post(`/api/projects/${projectId}/scenarios`).set(asPerson(engineer)).send({ scenario: pointRun.scenario }).expect(201);
    const plain = await request(t.app)
      .post(`/api/projects/${projectId}/runs`)
      .set(asPerson(engineer))
      .send({ scenarioIds: [saved.body.scenario.id], climateFileIds: [climateFileId] })
      .expect(202);
    await t.runQueue.idle();
    const plainRun = (await request(t.app).get(`/api/projects/${projectId}/runs/${plain.body.runs[0].id}`).set(asPerson(viewer)).expect(200)).body.run;
    expect(plainRun.status).toBe('done');
    expect(plainRun.sweepId).toBeNull();
    expect(plainRun.results).toEqual(pointRun.results);
    const hoursOf = async (runId: number) =>
      (await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/hours`).set(asPerson(viewer)).expect(200)).body;
    expect(await hoursOf(plainRun.id)).toEqual(await hoursOf(pointRun.id));
  });

  it('sweeps a grid of two inputs', async () => {
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/sweeps`)
      .set(asPerson(engineer))
      .send({
        scenarioId,
        climateFileId,
        name: 'Setpoint × envelope',
        axes: [
          { input: 'system.supplyAirC', from: 20, to: 24, step: 4 },
          { input: 'envelope.presetId', presetIds: ['ashrae-2021-recommended', 'ashrae-2021-a2'] },
        ],
      })
      .expect(202);
    expect(res.body.sweep.points.map((p: { values: unknown }) => p.values)).toEqual([
      { 'system.supplyAirC': 20, 'envelope.presetId': 'ashrae-2021-recommended' },
      { 'system.supplyAirC': 20, 'envelope.presetId': 'ashrae-2021-a2' },
      { 'system.supplyAirC': 24, 'envelope.presetId': 'ashrae-2021-recommended' },
      { 'system.supplyAirC': 24, 'envelope.presetId': 'ashrae-2021-a2' },
    ]);
    await t.runQueue.idle();
    const run = await request(t.app).get(`/api/projects/${projectId}/runs/${res.body.sweep.points[1].runId}`).set(asPerson(viewer)).expect(200);
    // Allowable A2 as in shared/scenario/envelopes.ts (ASHRAE TC 9.9 2021, recalled from memory): 10–35 °C, 21 °C dew point, 80 % RH.
    expect(run.body.run.scenario.envelope).toMatchObject({ presetId: 'ashrae-2021-a2', dryBulbMinC: 10, dryBulbMaxC: 35, dewPointMaxC: 21, rhMaxPct: 80 });
  });
});

describe('a sweep that cannot be run', () => {
  const post = (person: TestPerson, body: unknown) =>
    request(t.app)
      .post(`/api/projects/${projectId}/sweeps`)
      .set(asPerson(person))
      .send(body as object);

  it('names the input and the value of a point the scenario schema refuses, and stores nothing', async () => {
    const before = counts();
    const res = await post(engineer, { scenarioId, climateFileId, axes: [{ input: 'system.supplyAirC', from: 35, to: 50, step: 5 }] }).expect(422);
    expect(res.body.error.code).toBe('invalid_sweep');
    expect(res.body.error.message).toBe('system.supplyAirC = 50 is refused: system.supplyAirC must be a number from 5 to 45 °C (got 50)');
    expect(counts()).toEqual(before);
  });

  it('refuses an input that does not apply to the scenario’s system', async () => {
    const before = counts();
    const res = await post(engineer, { scenarioId, climateFileId, axes: [{ input: 'system.approachK', from: 2, to: 6, step: 1 }] }).expect(422);
    expect(res.body.error.message).toBe('system.approachK applies to water-side systems only; this scenario is direct-air.');
    expect(counts()).toEqual(before);
  });

  it('refuses a bad range or too many points, naming the field', async () => {
    const zeroStep = await post(engineer, { scenarioId, climateFileId, axes: [{ input: 'system.supplyAirC', from: 18, to: 24, step: 0 }] }).expect(400);
    expect(zeroStep.body.error.message).toBe('axes.0.step: step must be above 0, got 0');
    const tooMany = await post(engineer, {
      scenarioId,
      climateFileId,
      axes: [
        { input: 'system.supplyAirC', from: 15, to: 35, step: 1 },
        { input: 'energy.itLoadKw', from: 100, to: 1000, step: 100 },
      ],
    }).expect(400);
    expect(tooMany.body.error.message).toBe('axes: the sweep has 210 points; at most 200');
    await post(engineer, { scenarioId: 9999, climateFileId, axes: [{ input: 'system.supplyAirC', from: 18, to: 24, step: 1 }] }).expect(404);
  });

  it('is refused to a viewer, who may still read sweeps', async () => {
    await post(viewer, { scenarioId, climateFileId, axes: [{ input: 'system.supplyAirC', from: 18, to: 24, step: 1 }] }).expect(403);
    await request(t.app).get(`/api/projects/${projectId}/sweeps`).set(asPerson(viewer)).expect(200);
    await request(t.app).delete(`/api/projects/${projectId}/sweeps/1`).set(asPerson(viewer)).expect(403);
  });
});

describe('deleting a sweep', () => {
  it('cancels its waiting and running points and removes it with every run, in one audit entry', async () => {
    // Workers that start each run they are given (marking it running, as the real task does first) and never answer,
    // as a long run would: every point is still waiting or running when the sweep is deleted.
    const stuckPool: WorkerPool = {
      ...t.pool,
      run: (task, input, options) => {
        if (task === 'executeAndStoreRun') markRunStarted(t.db, (input as { store: { runId: number } }).store.runId);
        return new Promise((_resolve, reject) => options?.signal?.addEventListener('abort', () => reject(options.signal!.reason)));
      },
    };
    const stuckQueue = createRunQueue({ db: t.db, pool: stuckPool });
    const app = createApp({ db: t.db, pool: stuckPool, runQueue: stuckQueue });
    const created = await request(app)
      .post(`/api/projects/${projectId}/sweeps`)
      .set(asPerson(engineer))
      .send({ scenarioId, climateFileId, axes: [{ input: 'energy.itLoadKw', from: 100, to: 3000, step: 100 }] })
      .expect(202);
    const sweepId = created.body.sweep.id;
    const runIds: number[] = created.body.sweep.points.map((p: { runId: number }) => p.runId);
    expect(runIds).toHaveLength(30);
    const reading = await request(app).get(`/api/projects/${projectId}/sweeps/${sweepId}`).set(asPerson(viewer)).expect(200);
    expect(reading.body.sweep.progress).toMatchObject({ total: 30, running: stuckPool.threads, queued: 30 - stuckPool.threads, finished: false });
    const auditBefore = counts().audit;
    await request(app).delete(`/api/projects/${projectId}/sweeps/${sweepId}`).set(asPerson(engineer)).expect(204);
    await stuckQueue.idle();
    expect(t.db.select().from(sweeps).where(eq(sweeps.id, sweepId)).all()).toEqual([]);
    expect(t.db.select().from(runs).where(eq(runs.sweepId, sweepId)).all()).toEqual([]);
    expect(
      t.db
        .select({ runId: runHours.runId })
        .from(runHours)
        .all()
        .filter((h) => runIds.includes(h.runId)),
    ).toEqual([]);
    const trail = t.db.select().from(auditEvents).all().slice(auditBefore);
    expect(trail.map((e) => e.action)).toEqual(['sweep.delete']);
    expect(JSON.parse(trail[0].detailJson)).toMatchObject({ sweepId, runs: 30, cancelled: 30 });
    await request(app).get(`/api/projects/${projectId}/sweeps/${sweepId}`).set(asPerson(viewer)).expect(404);
    // Other sweeps' runs are untouched.
    expect(t.db.select().from(runs).where(isNotNull(runs.sweepId)).all()).toHaveLength(11);
  });

  it('removes a finished sweep with its runs and their hours', async () => {
    const list = await request(t.app).get(`/api/projects/${projectId}/sweeps`).set(asPerson(viewer)).expect(200);
    const grid = list.body.sweeps.find((s: { name: string }) => s.name === 'Setpoint × envelope');
    const runIds = t.db
      .select({ id: runs.id })
      .from(runs)
      .where(eq(runs.sweepId, grid.id))
      .all()
      .map((r) => r.id);
    expect(runIds).toHaveLength(4);
    await request(t.app).delete(`/api/projects/${projectId}/sweeps/${grid.id}`).set(asPerson(engineer)).expect(204);
    expect(t.db.select().from(runs).where(isNotNull(runs.sweepId)).all()).toHaveLength(7);
    expect(
      t.db
        .select({ runId: runHours.runId })
        .from(runHours)
        .all()
        .filter((h) => runIds.includes(h.runId)),
    ).toEqual([]);
  });
});
