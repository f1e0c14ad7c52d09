import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents } from '../../server/db/schema';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';

let t: TestApp;
let engineer: TestPerson;
let projectId: number;
let otherProjectId: number;

// A project's own envelope (invented for this test): limits the owner chose, not a published class.
const limits = { dryBulbMinC: 16, dryBulbMaxC: 30, dewPointMinC: -8, dewPointMaxC: 17, rhMinPct: 10, rhMaxPct: 70 };

beforeAll(() => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'ilse.marwood@example.test');
  projectId = projectWithMembers(t.db, 'Quarry hall', [[engineer, 'engineer']]);
  otherProjectId = projectWithMembers(t.db, 'Elsewhere', [[engineer, 'engineer']]);
});
afterAll(() => t.close());

describe("a project's own envelopes", () => {
  it('are saved, listed with their limits, deleted once, each change in the audit trail', async () => {
    const created = await request(t.app)
      .post(`/api/projects/${projectId}/envelopes`)
      .set(asPerson(engineer))
      .send({ name: 'Hall B, tenant limits', limits })
      .expect(201);
    expect(created.body.envelope).toMatchObject({ name: 'Hall B, tenant limits', note: '', limits });
    const id = created.body.envelope.id;

    const list = await request(t.app).get(`/api/projects/${projectId}/envelopes`).set(asPerson(engineer)).expect(200);
    expect(list.body.envelopes).toEqual([expect.objectContaining({ id, limits })]);
    const elsewhere = await request(t.app).get(`/api/projects/${otherProjectId}/envelopes`).set(asPerson(engineer)).expect(200);
    expect(elsewhere.body.envelopes).toEqual([]);

    // Another project's address does not reach it.
    await request(t.app).delete(`/api/projects/${otherProjectId}/envelopes/${id}`).set(asPerson(engineer)).expect(404);
    await request(t.app).delete(`/api/projects/${projectId}/envelopes/${id}`).set(asPerson(engineer)).expect(204);
    const again = await request(t.app).delete(`/api/projects/${projectId}/envelopes/${id}`).set(asPerson(engineer)).expect(404);
    expect(again.body.error.message).toBe(`Envelope ${id} was not found in this project.`);

    const actions = t.db
      .select()
      .from(auditEvents)
      .all()
      .filter((e) => e.action.startsWith('envelope.'))
      .map((e) => [e.action, e.target]);
    expect(actions).toEqual([
      ['envelope.create', 'Hall B, tenant limits'],
      ['envelope.delete', 'Hall B, tenant limits'],
    ]);
  });

  it('refuses limits the wrong way round, naming the field, and saves nothing', async () => {
    const res = await request(t.app)
      .post(`/api/projects/${projectId}/envelopes`)
      .set(asPerson(engineer))
      .send({ name: 'Upside down', limits: { ...limits, rhMinPct: 80 } })
      .expect(400);
    expect(JSON.stringify(res.body.error)).toContain('rhMinPct must be below rhMaxPct');
    const list = await request(t.app).get(`/api/projects/${projectId}/envelopes`).set(asPerson(engineer)).expect(200);
    expect(list.body.envelopes).toEqual([]);
  });
});
