// @ts-nocheck
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';

let t: TestApp;
let owner: TestPerson;
let projectId: number;

beforeAll(() => {
  t = createTestApp();
  owner = personWithSession(t.db, 'ines.harrow@example.test');
  projectId = projectWithMembers(t.db, 'Alpine annex', [[owner, 'owner']]);
});
afterAll(() => t.close());

describe('a PATCH changes only what it carries', () => {
  it('renaming a project keeps its description', async () => {
    await request(t.app).patch(`/api/projects/${projectId}`).set(asPerson(owner)).send({ description: 'Two halls above the lake' }).expect(200);
    const res = await request(t.app).patch(`/api/projects/${projectId}`).set(asPerson(owner)).send({ name: 'Alpine annex, phase 2' }).expect(200);
    expect(res.body.project).toMatchObject({ name: 'Alpine annex, phase 2', description: 'Two halls above the lake' });
  });

  it('renaming a site keeps its elevation, time zone and coordinates', async () => {
    const created = await request(t.app)
      .post(`/api/projects/${projectId}/sites`)
      .set(asPerson(owner))
      .send({ name: 'Col de Vasse', latitude: 46.5, longitude: 9.8, elevationM: 1800, timeZone: 'Europe/Zurich' })
      .expect(201);
    const res = await request(t.app)
      .patch(`/api/projects/${projectId}/sites/${created.body.site.id}`)
      .set(asPerson(owner))
      .send({ name: 'Col de Vasse north' })
      .expect(200);
    expect(res.body.site).toMatchObject({ name: 'Col de Vasse north', latitude: 46.5, longitude: 9.8, elevationM: 1800, timeZone: 'Europe/Zurich' });
  });

  it('a site field sent as null is cleared, since null was sent', async () => {
    const created = await request(t.app).post(`/api/projects/${projectId}/sites`).set(asPerson(owner)).send({ name: 'Plaine', latitude: 45 }).expect(201);
    const res = await request(t.app)
      .patch(`/api/projects/${projectId}/sites/${created.body.site.id}`)
      .set(asPerson(owner))
      .send({ latitude: null })
      .expect(200);
    expect(res.body.site.latitude).toBeNull();
  });

  it('an empty PATCH is refused, naming what could be sent', async () => {
    const res = await request(t.app).patch(`/api/projects/${projectId}`).set(asPerson(owner)).send({}).expect(400);
    expect(res.body.error.message).toBe('Nothing to change: send at least one of name, description.');
  });
});
