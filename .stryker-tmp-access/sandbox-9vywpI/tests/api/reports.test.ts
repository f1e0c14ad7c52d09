// @ts-nocheck
import { readFileSync } from 'node:fs';
import { createHash } from 'node:crypto';
import request from 'supertest';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HOURLY_CSV_COLUMNS } from '../../shared/scenario';
import { auditEvents, shareLinks } from '../../server/db/schema';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { tightPsychrolib } from '../unit/psychrometrics/reference-psychrolib';

// Synthetic test weather: 72 hours of July (tests/fixtures/api/three-days.csv), first row 8.3 °C, 88 % RH, 101.3 kPa.
const threeDays = readFileSync(new URL('../fixtures/api/three-days.csv', import.meta.url));
const directAir = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

let t: TestApp;
let nowMs = Date.now();
const day = 86_400_000;
let owner: TestPerson;
let engineer: TestPerson;
let viewer: TestPerson;
let outsider: TestPerson;
let projectId: number;
let runId: number;
let secondRunId: number;

/** Text cells as a spreadsheet would get them, split on commas outside quotes. */
function cells(line: string): string[] {
  return line
    .match(/("([^"]|"")*"|[^,]*)(,|$)/g)!
    .slice(0, -1)
    .map((cell) => cell.replace(/,$/, ''));
}

beforeAll(async () => {
  // The app's clock, so a public period can be made to end.
  t = createTestApp({ clock: () => new Date(nowMs) });
  owner = personWithSession(t.db, 'ines.marlow@example.test');
  engineer = personWithSession(t.db, 'ravi.oduya@example.test');
  viewer = personWithSession(t.db, 'client.reader@example.test');
  outsider = personWithSession(t.db, 'someone.else@example.test');
  projectId = projectWithMembers(t.db, 'Quayside hall study', [
    [owner, 'owner'],
    [engineer, 'engineer'],
    [viewer, 'viewer'],
  ]);
  projectWithMembers(t.db, 'Unrelated study', [[outsider, 'owner']]);
  // Names typed by people may look like spreadsheet formulas; every download must defuse them.
  const site = await request(t.app)
    .post(`/api/projects/${projectId}/sites`)
    .set(asPerson(engineer))
    .send({ name: '+Harbour wall', elevationM: 120 })
    .expect(201);
  const file = await request(t.app)
    .post(`/api/projects/${projectId}/sites/${site.body.site.id}/climate-files?fileName=${encodeURIComponent('@SUM(A1).csv')}`)
    .set(asPerson(engineer))
    .set('content-type', 'text/csv')
    .send(threeDays)
    .expect(201);
  const scenarioA = await request(t.app)
    .post(`/api/projects/${projectId}/scenarios`)
    .set(asPerson(engineer))
    .send({ scenario: { ...directAir, name: '=HYPERLINK("http://bad.example","click")' } })
    .expect(201);
  const scenarioB = await request(t.app)
    .post(`/api/projects/${projectId}/scenarios`)
    .set(asPerson(engineer))
    .send({ scenario: { ...directAir, name: 'Direct air, 15 °C supply', system: { ...directAir.system, supplyAirC: 15 } } })
    .expect(201);
  const created = await request(t.app)
    .post(`/api/projects/${projectId}/runs`)
    .set(asPerson(engineer))
    .send({ scenarioIds: [scenarioA.body.scenario.id, scenarioB.body.scenario.id], climateFileIds: [file.body.climateFile.id] })
    .expect(202);
  [runId, secondRunId] = created.body.runs.map((r: { id: number }) => r.id);
  await t.runQueue.idle();
});
afterAll(() => t.close());

describe('downloads of a run', () => {
  it('gives the hourly CSV in the command line columns, named for the run, with outdoor states checked against psychrolib', async () => {
    const res = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/downloads/hourly.csv`).set(asPerson(viewer)).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toBe(`attachment; filename=run-${runId}-hyperlink-http-bad-example-click-hourly.csv`);
    const lines = res.text.trimEnd().split('\n');
    expect(lines[0]).toBe(HOURLY_CSV_COLUMNS.join(','));
    expect(lines).toHaveLength(73);
    const first = Object.fromEntries(HOURLY_CSV_COLUMNS.map((c, i) => [c, lines[1].split(',')[i]]));
    expect(first.timestamp).toBe('2023-07-01T00:00Z');
    expect(first.mode).toBe('free');
    expect(first.dry_bulb_c).toBe('8.30');
    // Reference library: psychrolib (SI) at 8.3 °C, 88 % RH and the file's 101.3 kPa station pressure.
    const w = tightPsychrolib.GetHumRatioFromRelHum(8.3, 0.88, 101_300);
    expect(Number(first.wet_bulb_c)).toBeCloseTo(tightPsychrolib.GetTWetBulbFromHumRatio(8.3, w, 101_300), 2);
    expect(Number(first.dew_point_c)).toBeCloseTo(tightPsychrolib.GetTDewPointFromHumRatio(8.3, w, 101_300), 2);
    expect(Number(first.humidity_ratio_gkg)).toBeCloseTo(w * 1000, 3);
    expect(Number(first.enthalpy_kjkg)).toBeCloseTo(tightPsychrolib.GetMoistAirEnthalpy(8.3, w) / 1000, 2);
    // Nothing a spreadsheet could run: every cell is a number, a fixed mode word or a timestamp.
    for (const line of lines.slice(1))
      expect(line).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\dZ,(free|adiabatic|mechanical|no_data)(,-?\d+(\.\d+)?|,)+,\d{4}-\d\d-\d\dT\d\d:\d\d$/);
    // the site's standard time beside the UTC stamp (this site keeps UTC)
    expect(first.local_standard_time).toBe('2023-07-01T00:00');
  });

  it('gives the same hours as JSON, column by column', async () => {
    const csv = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/downloads/hourly.csv`).set(asPerson(viewer)).expect(200);
    const res = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/downloads/hourly.json`).set(asPerson(viewer)).expect(200);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(res.headers['content-disposition']).toBe(`attachment; filename=run-${runId}-hyperlink-http-bad-example-click-hourly.json`);
    const body = JSON.parse(res.text);
    expect(body.columns).toEqual([...HOURLY_CSV_COLUMNS]);
    expect(body.hours.timestamp).toHaveLength(72);
    const row = csv.text.split('\n')[5].split(',');
    HOURLY_CSV_COLUMNS.forEach((column, i) => {
      const value = body.hours[column][4];
      expect(String(typeof value === 'number' ? value : value), column).toBe(typeof value === 'number' ? String(Number(row[i])) : row[i]);
    });
  });

  it('gives the run summary with typed names neutralised and numbers left as numbers', async () => {
    const res = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/downloads/summary.csv`).set(asPerson(viewer)).expect(200);
    expect(res.headers['content-disposition']).toBe(`attachment; filename=run-${runId}-hyperlink-http-bad-example-click-summary.csv`);
    const lines = res.text.trimEnd().split('\n');
    expect(lines[0]).toBe('section,figure,unit,value');
    const byFigure = new Map(lines.slice(1).map((line) => [cells(line)[1], cells(line)]));
    // OWASP CSV injection guidance: a leading = + - @ is prefixed with an apostrophe, so it is read as text.
    expect(byFigure.get('Scenario')![3]).toBe(`"'=HYPERLINK(""http://bad.example"",""click"")"`);
    expect(byFigure.get('Site')![3]).toBe("'+Harbour wall");
    expect(byFigure.get('Climate file')![3]).toBe("'@SUM(A1)");
    const run = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}`).set(asPerson(viewer)).expect(200);
    const hours = run.body.run.results.hours;
    expect(byFigure.get('Free cooling')).toEqual(['hours', 'Free cooling', 'h', String(hours.free)]);
    expect(byFigure.get('All hours')![3]).toBe('72');
    expect(Number(byFigure.get('Partial PUE (cooling)')![3])).toBeCloseTo(run.body.run.results.energy.partialPue, 4);
    expect(byFigure.get('system.supplyAirC')).toEqual(['inputs', 'system.supplyAirC', '°C', '25']);
    // Every text cell that starts like a formula was neutralised.
    for (const line of lines) for (const cell of cells(line)) expect(cell.replace(/^"/, '')).not.toMatch(/^[=+@\t\r]/);
  });

  it('gives the summary in IP units when asked, named so', async () => {
    const res = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/downloads/summary.csv?units=ip`).set(asPerson(viewer)).expect(200);
    expect(res.headers['content-disposition']).toBe(`attachment; filename=run-${runId}-hyperlink-http-bad-example-click-summary-ip.csv`);
    // 25 °C = 77 °F (°F = 1.8·°C + 32, NIST SP 811 App. B).
    expect(res.text).toContain('inputs,system.supplyAirC,°F,77\n');
    expect(res.text).toMatch(/\nwater,Water total,US gal,[\d.]+\n/);
    await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/downloads/summary.csv?units=furlongs`).set(asPerson(viewer)).expect(400);
  });

  it('gives the summary as JSON with the report it came from, and no internal ids beyond the run number', async () => {
    const res = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/downloads/summary.json`).set(asPerson(viewer)).expect(200);
    const body = JSON.parse(res.text);
    expect(body.report.run.id).toBe(runId);
    expect(body.report.run.climate.validation).toMatchObject({ measuredHours: 72, filledHours: 0, missingHours: 0, completenessPct: 100 });
    expect(res.text).not.toMatch(/"(projectId|climateFileId|scenarioId|siteId|createdBy)"/);
  });

  it('gives the comparison table, baseline first, with differences', async () => {
    const res = await request(t.app)
      .get(`/api/projects/${projectId}/compare/downloads/summary.csv?runs=${runId},${secondRunId}&baseline=${secondRunId}`)
      .set(asPerson(viewer))
      .expect(200);
    expect(res.headers['content-disposition']).toBe(`attachment; filename=comparison-${secondRunId}-${runId}-summary.csv`);
    const lines = res.text.trimEnd().split('\n');
    const header = cells(lines[0]);
    // Names inside a longer cell do not start it, so they need no apostrophe there.
    expect(header[2]).toBe(`"run ${secondRunId} (baseline): Direct air, 15 °C supply / @SUM(A1)"`);
    expect(header[4]).toBe(`"run ${runId}: =HYPERLINK(""http://bad.example"",""click"") / @SUM(A1)"`);
    const free = cells(lines.find((l) => l.startsWith('Free cooling,'))!);
    expect(free[3]).toBe('');
    expect(Number(free[5])).toBe(Number(free[4]) - Number(free[2]));
  });

  it('refuses a comparison of one run, or with a baseline outside it', async () => {
    const same = await request(t.app).get(`/api/projects/${projectId}/compare/report?runs=${runId},${runId}`).set(asPerson(viewer)).expect(400);
    expect(same.body.error.message).toContain('at least two different runs');
    const outside = await request(t.app)
      .get(`/api/projects/${projectId}/compare/report?runs=${runId},${secondRunId}&baseline=999`)
      .set(asPerson(viewer))
      .expect(400);
    expect(outside.body.error.message).toContain('baseline must be one of the compared runs');
  });

  it('refuses a download it does not have, saying which exist', async () => {
    const res = await request(t.app).get(`/api/projects/${projectId}/runs/${runId}/downloads/hourly.xlsx`).set(asPerson(viewer)).expect(400);
    expect(res.body.error.message).toContain('hourly.csv, hourly.json, summary.csv or summary.json');
  });
});

describe('share links', () => {
  let membersToken: string;
  let publicToken: string;
  let publicLinkId: number;

  it('only an owner creates them', async () => {
    const body = { target: 'run', runIds: [runId], title: 'Quayside run for the client' };
    await request(t.app).post(`/api/projects/${projectId}/share-links`).set(asPerson(engineer)).send(body).expect(403);
    await request(t.app).get(`/api/projects/${projectId}/share-links`).set(asPerson(viewer)).expect(403);
    const res = await request(t.app).post(`/api/projects/${projectId}/share-links`).set(asPerson(owner)).send(body).expect(201);
    membersToken = res.body.token;
    expect(membersToken).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(res.body.path).toBe(`/shared/${membersToken}`);
    expect(res.body.link).toMatchObject({ target: 'run', runIds: [runId], publicUntil: null, state: 'members' });
    // Only the SHA-256 of the token is kept, and the list never shows the token again.
    const row = t.db.select().from(shareLinks).where(eq(shareLinks.id, res.body.link.id)).get()!;
    expect(row.tokenHash).toBe(createHash('sha256').update(membersToken).digest('hex'));
    const list = await request(t.app).get(`/api/projects/${projectId}/share-links`).set(asPerson(owner)).expect(200);
    expect(JSON.stringify(list.body)).not.toContain(membersToken);
  });

  it('a members-only link opens for a signed-in member, not for anyone else', async () => {
    const signedOut = await request(t.app).get(`/api/shared/${membersToken}`).expect(401);
    expect(signedOut.body.error.message).toContain('Only signed-in members of the project');
    await request(t.app).get(`/api/shared/${membersToken}`).set(asPerson(outsider)).expect(403);
    const res = await request(t.app).get(`/api/shared/${membersToken}`).set(asPerson(viewer)).expect(200);
    expect(res.body.link).toEqual({ title: 'Quayside run for the client', target: 'run', publicUntil: null });
    expect(res.body.report.kind).toBe('run');
    expect(res.body.report.run.results.hours.total).toBe(72);
    expect(JSON.stringify(res.body)).not.toMatch(/"(projectId|climateFileId|scenarioId|siteId|createdBy|tokenHash)"/);
    await request(t.app).get('/api/shared/not-a-token').expect(404);
  });

  it('refuses a public date in the past or more than 90 days ahead', async () => {
    const base = { target: 'comparison', runIds: [runId, secondRunId], title: 'Two supply setpoints' };
    const past = await request(t.app)
      .post(`/api/projects/${projectId}/share-links`)
      .set(asPerson(owner))
      .send({ ...base, publicUntil: new Date(nowMs - day).toISOString() })
      .expect(400);
    expect(past.body.error.message).toContain('in the past');
    const far = await request(t.app)
      .post(`/api/projects/${projectId}/share-links`)
      .set(asPerson(owner))
      .send({ ...base, publicUntil: new Date(nowMs + 91 * day).toISOString() })
      .expect(400);
    expect(far.body.error.message).toContain('at most 90 days');
    const oneRun = await request(t.app)
      .post(`/api/projects/${projectId}/share-links`)
      .set(asPerson(owner))
      .send({ ...base, runIds: [runId] })
      .expect(400);
    expect(oneRun.body.error.message).toContain('a comparison two or more');
  });

  it('a public link opens signed out until its date, then only for members', async () => {
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/share-links`)
      .set(asPerson(owner))
      .send({ target: 'comparison', runIds: [secondRunId, runId], title: 'Two supply setpoints', publicUntil: new Date(nowMs + 2 * day).toISOString() })
      .expect(201);
    publicToken = res.body.token;
    publicLinkId = res.body.link.id;
    expect(res.body.link.state).toBe('public');
    const open = await request(t.app).get(`/api/shared/${publicToken}`).expect(200);
    expect(open.body.report.kind).toBe('comparison');
    expect(open.body.report.baselineId).toBe(secondRunId);
    expect(open.body.report.runs.map((r: { id: number }) => r.id)).toEqual([secondRunId, runId]);
    const csv = await request(t.app).get(`/api/shared/${publicToken}/downloads/summary.csv`).expect(200);
    expect(csv.text.split('\n')[0]).toMatch(/^figure,unit,"run \d+ \(baseline\)/);
    const hourly = await request(t.app).get(`/api/shared/${publicToken}/downloads/hourly.csv?run=${runId}`).expect(200);
    expect(hourly.text.split('\n')).toHaveLength(74);
    await request(t.app).get(`/api/shared/${publicToken}/downloads/hourly.csv?run=999`).expect(404);

    nowMs += 3 * day;
    const ended = await request(t.app).get(`/api/shared/${publicToken}`).expect(401);
    expect(ended.body.error.message).toContain('public period ended');
    const list = await request(t.app).get(`/api/projects/${projectId}/share-links`).set(asPerson(owner)).expect(401);
    expect(list.body.error.code).toBe('unauthenticated'); // the owner's test session has also run out by the moved clock
    nowMs -= 3 * day;
  });

  it('a revoked link refuses everyone with 410, and creating and revoking are in the audit trail', async () => {
    await request(t.app).post(`/api/projects/${projectId}/share-links/${publicLinkId}/revoke`).set(asPerson(engineer)).expect(403);
    const res = await request(t.app).post(`/api/projects/${projectId}/share-links/${publicLinkId}/revoke`).set(asPerson(owner)).expect(200);
    expect(res.body.link.state).toBe('revoked');
    for (const caller of [undefined, viewer, owner]) {
      const req = request(t.app).get(`/api/shared/${publicToken}`);
      const refused = await (caller ? req.set(asPerson(caller)) : req).expect(410);
      expect(refused.body.error).toMatchObject({ code: 'link_revoked' });
      expect(refused.body.error.message).toContain('revoked by the project owner');
    }
    await request(t.app).get(`/api/shared/${publicToken}/downloads/summary.json`).expect(410);
    const trail = t.db.select().from(auditEvents).where(eq(auditEvents.projectId, projectId)).all();
    const share = trail.filter((e) => e.action.startsWith('share.'));
    expect(share.map((e) => e.action)).toEqual(['share.create', 'share.create', 'share.revoke']);
    expect(share[2]).toMatchObject({ actorName: 'ines.marlow', target: 'Two supply setpoints' });
  });
});
