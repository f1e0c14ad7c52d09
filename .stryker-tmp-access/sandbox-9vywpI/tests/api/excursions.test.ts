// @ts-nocheck
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { directAirSample, siteFileAndScenario } from '../support/study-setup';

let t: TestApp;
let engineer: TestPerson;
let viewer: TestPerson;
let outsider: TestPerson;
let projectId: number;
let runId: number;
const url = (query = '') => `/api/projects/${projectId}/runs/${runId}/excursions${query}`;

beforeAll(async () => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'ilse.varga@example.test');
  viewer = personWithSession(t.db, 'night.shift@example.test');
  outsider = personWithSession(t.db, 'elsewhere@example.test');
  projectId = projectWithMembers(t.db, 'Hall 3 setpoint review', [
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  projectWithMembers(t.db, 'Another study', [[outsider, 'owner']]);
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

describe('an operator checking a proposal against a run', () => {
  it("a viewer gets the run's own setpoint by default, with the run's hours per mode", async () => {
    const res = await request(t.app).get(url()).set(asPerson(viewer)).expect(200);
    const { run, proposal, analysis, reference } = res.body;
    expect(proposal.supplyAirC).toBe(directAirSample.system.supplyAirC);
    expect(proposal.floatUpToC).toBeNull();
    expect(proposal.recommended.id).toBe('ashrae-2021-recommended');
    expect(proposal.allowable.id).toBe('ashrae-2021-a1');
    expect(proposal.control.id).toBe('run');
    // Same setpoint, same envelope, same classifier: the same hours per mode as the run.
    const { free, adiabatic, mechanical, noData } = run.hours;
    expect(analysis.modes).toEqual({ free, adiabatic, mechanical, noData });
    expect(analysis.dataHours + analysis.noDataHours).toBe(72);
    expect(analysis.insideRecommendedHours + analysis.outsideRecommendedHours + analysis.outsideAllowableHours).toBe(analysis.dataHours);
    expect(reference.hourlyRateLimitK).toBe(20);
    expect(reference.xFactorTable.find((p: { dryBulbC: number }) => p.dryBulbC === 20).xFactor).toBe(1);
  });

  it('a setpoint held at 26 °C keeps every inlet hour at 26 °C or above, inside the recommended 18–27 °C', async () => {
    // The fixture never passes 22 °C outdoors, so 22 + 1 K fan heat stays under 26 °C: mixing holds 26 °C all along.
    const res = await request(t.app).get(url('?supplyAirC=26&allowable=ashrae-2021-a2')).set(asPerson(viewer)).expect(200);
    const a = res.body.analysis;
    expect(res.body.proposal.allowable.id).toBe('ashrae-2021-a2');
    expect(a.inletC.min).toBe(26);
    expect(a.inletC.max).toBe(26);
    expect(a.causes.recommended.warm).toBe(0);
    expect(a.causes.recommended.cold).toBe(0);
    // 26 °C throughout: X-factor 1.24 + 0.4·(1.34 − 1.24) = 1.28 (ASHRAE TC 9.9 2011 table, recalled from memory).
    expect(a.timeWeightedXFactor).toBeCloseTo(1.28, 12);
    expect(a.rateOfChange.maxKPerHour).toBe(0);
  });

  it('a setpoint above the recommended maximum shows every hour as an excursion in one long event', async () => {
    const res = await request(t.app).get(url('?supplyAirC=29')).set(asPerson(viewer)).expect(200);
    const a = res.body.analysis;
    expect(a.causes.recommended.warm).toBe(a.dataHours);
    expect(a.outsideAllowableHours).toBe(0); // A1 allows up to 32 °C
    expect(a.events.longestHours).toBeGreaterThan(1);
  });

  it('refuses bad input, naming the field and the value', async () => {
    const cases: [string, RegExp][] = [
      ['?supplyAirC=90', /supplyAirC: must be a number from 5 to 45 °C \(got 90\)/],
      ['?supplyAirC=warm', /supplyAirC: must be a number from 5 to 45 °C \(got "warm"\)/],
      ['?supplyAirC=24&floatUpToC=20', /floatUpToC: must be at or above supplyAirC 24 °C \(got 20\)/],
      ['?floatUpToC=10', /floatUpToC: must be at or above supplyAirC 25 °C \(got 10\)/],
      ['?allowable=ashrae-2021-recommended', /allowable: must be 'run' or one of .* \(got "ashrae-2021-recommended"\)/],
      ['?recommended=class-z', /recommended: must be 'run' or one of .* \(got "class-z"\)/],
      ['?setpoint=24', /Unrecognized key.*setpoint/],
    ];
    for (const [query, message] of cases) {
      const res = await request(t.app).get(url(query)).set(asPerson(viewer)).expect(400);
      expect(res.body.error.code).toBe('invalid_request');
      expect(res.body.error.message, query).toMatch(message);
    }
  });

  it('refuses the signed-out and people outside the project, and unknown runs', async () => {
    await request(t.app).get(url()).set('x-tramontane-request', '1').expect(401);
    const outside = await request(t.app).get(url()).set(asPerson(outsider)).expect(404);
    expect(outside.body.error.message).toBe(`Project ${projectId} was not found.`);
    const unknown = await request(t.app).get(`/api/projects/${projectId}/runs/99999/excursions`).set(asPerson(viewer)).expect(404);
    expect(unknown.body.error.message).toContain('Run 99999');
  });
});
