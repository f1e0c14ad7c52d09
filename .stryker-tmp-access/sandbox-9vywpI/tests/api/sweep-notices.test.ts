// @ts-nocheck
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents } from '../../server/db/schema';
import type { Mailer, OutgoingMail } from '../../server/mail/mailer';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';
import { siteFileAndScenario } from '../support/study-setup';
import { createTestApp, type TestApp } from '../support/test-app';

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
    const { scenarioId, climateFileId } = await siteFileAndScenario(t, projectId, engineer, { siteName: 'Pellow Yard', elevationM: 40 });
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/sweeps`)
      .set(asPerson(engineer))
      .send({ scenarioId, climateFileId, axes: [{ input: 'system.supplyAirC', from: 18, to: 24, step: 2 }] })
      .expect(202);
    const sweepId = res.body.sweep.id as number;
    await t.runQueue.idle();
    await new Promise((resolve) => setTimeout(resolve, 50));

    expect(sent).toHaveLength(1);
    expect(sent[0].to).toBe('noor.valdes@example.test');
    expect(sent[0].subject).toMatch(/^Sweep finished: .*\(4 of 4 points done\) \(Notice study\)$/);
    expect(sent[0].text).toContain(`https://tramontane.test/projects/${projectId}/sweeps/${sweepId}`);
    const actions = t.db
      .select()
      .from(auditEvents)
      .all()
      .map((e) => e.action);
    expect(actions.filter((a) => a === 'sweep.done')).toHaveLength(1);
    expect(actions.filter((a) => a === 'run.done')).toHaveLength(0);
  });
});
