import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents } from '../../server/db/schema';
import type { Mailer, OutgoingMail } from '../../server/mail/mailer';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { createTestApp, type TestApp } from '../support/test-app';

// Synthetic test weather: 72 hours of July at an invented site (tests/fixtures/api/three-days.csv).
const threeDaysText = readFileSync(new URL('../fixtures/api/three-days.csv', import.meta.url), 'utf8');
const scenario = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));

const sent: OutgoingMail[] = [];
const mailer: Mailer = { send: async (mail) => void sent.push(mail), close: () => {} };
let t: TestApp;
let engineer: TestPerson;
let projectId: number;

beforeAll(async () => {
  t = createTestApp({ mailer, publicUrl: 'https://tramontane.test' });
  engineer = personWithSession(t.db, 'noor.valdes@example.test');
  projectId = projectWithMembers(t.db, 'Notice study', [[engineer, 'engineer']]);
  await request(t.app).patch('/api/me').set(asPerson(engineer)).send({ runNotices: true }).expect(200);
});
afterAll(() => t.close());

describe('notices for a sweep', () => {
  it('come once, when its last point settles, linking to the sweep; the points are not audited one by one', async () => {
    const site = await request(t.app).post(`/api/projects/${projectId}/sites`).set(asPerson(engineer)).send({ name: 'Pellow Yard', elevationM: 40 }).expect(201);
    const file = await request(t.app)
      .post(`/api/projects/${projectId}/sites/${site.body.site.id}/climate-files?fileName=three-days.csv`)
      .set(asPerson(engineer))
      .set('content-type', 'text/csv')
      .send(threeDaysText)
      .expect(201);
    const saved = await request(t.app).post(`/api/projects/${projectId}/scenarios`).set(asPerson(engineer)).send({ scenario }).expect(201);
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/sweeps`)
      .set(asPerson(engineer))
      .send({ scenarioId: saved.body.scenario.id, climateFileId: file.body.climateFile.id, axes: [{ input: 'system.supplyAirC', from: 18, to: 24, step: 2 }] })
      .expect(202);
    const sweepId = res.body.sweep.id as number;
    await t.runQueue.idle();
    await new Promise((resolve) => setTimeout(resolve, 50));

    expect(sent).toHaveLength(1);
    expect(sent[0].to).toBe('noor.valdes@example.test');
    expect(sent[0].subject).toMatch(/^Sweep finished: .*\(4 of 4 points done\) \(Notice study\)$/);
    expect(sent[0].text).toContain(`https://tramontane.test/projects/${projectId}/sweeps/${sweepId}`);
    const actions = t.db.select().from(auditEvents).all().map((e) => e.action);
    expect(actions.filter((a) => a === 'sweep.done')).toHaveLength(1);
    expect(actions.filter((a) => a === 'run.done')).toHaveLength(0);
  });
});
