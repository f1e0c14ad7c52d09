// @ts-nocheck
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents } from '../../server/db/schema';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';

let t: TestApp;
let engineer: TestPerson;
let admin: TestPerson;
let outsider: TestPerson;

beforeAll(() => {
  t = createTestApp();
  engineer = personWithSession(t.db, 'oskar.brandt@example.test');
  admin = personWithSession(t.db, 'admin@example.test', { isAdmin: true });
  outsider = personWithSession(t.db, 'outsider@example.test');
  projectWithMembers(t.db, 'Existing study', [[outsider, 'viewer']]);
});
afterAll(() => t.close());

describe('projects', () => {
  it('lets anyone signed in start a project and become its owner, recorded in the audit trail', async () => {
    const res = await request(t.app).post('/api/projects').set(asPerson(engineer)).send({ name: '  Harbourside retrofit  ' }).expect(201);
    expect(res.body.project).toMatchObject({ name: 'Harbourside retrofit', description: '', role: 'owner' });
    const list = await request(t.app).get('/api/projects').set(asPerson(engineer)).expect(200);
    expect(list.body.projects.map((p: { name: string }) => p.name)).toEqual(['Harbourside retrofit']);
    const events = t.db
      .select()
      .from(auditEvents)
      .all()
      .filter((e) => e.action === 'project.create');
    expect(events).toHaveLength(1);
    expect(events[0].target).toBe('Harbourside retrofit');
  });

  it('shows an organisation admin every project', async () => {
    const list = await request(t.app).get('/api/projects').set(asPerson(admin)).expect(200);
    expect(list.body.projects.map((p: { name: string }) => p.name)).toEqual(['Existing study', 'Harbourside retrofit']);
  });

  it('refuses an empty name, naming the field', async () => {
    const res = await request(t.app).post('/api/projects').set(asPerson(engineer)).send({ name: ' ' }).expect(400);
    expect(res.body.error.message).toContain('name must not be empty');
  });

  it('lets the owner rename and delete, and nobody else', async () => {
    const created = await request(t.app).post('/api/projects').set(asPerson(engineer)).send({ name: 'Short-lived' }).expect(201);
    const id = created.body.project.id;
    await request(t.app).delete(`/api/projects/${id}`).set(asPerson(outsider)).expect(404);
    await request(t.app).patch(`/api/projects/${id}`).set(asPerson(engineer)).send({ name: 'Renamed' }).expect(200);
    await request(t.app).delete(`/api/projects/${id}`).set(asPerson(engineer)).expect(204);
    const list = await request(t.app).get('/api/projects').set(asPerson(engineer)).expect(200);
    expect(list.body.projects.map((p: { name: string }) => p.name)).not.toContain('Renamed');
    expect(
      t.db
        .select()
        .from(auditEvents)
        .all()
        .some((e) => e.action === 'project.delete' && e.target === 'Renamed'),
    ).toBe(true);
  });
});
