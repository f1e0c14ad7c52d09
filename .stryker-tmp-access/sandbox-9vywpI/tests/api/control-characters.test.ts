// @ts-nocheck
import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';

let t: TestApp;
let owner: TestPerson;
let projectId: number;

beforeAll(() => {
  t = createTestApp();
  owner = personWithSession(t.db, 'rafa.oyelaran@example.test');
  projectId = projectWithMembers(t.db, 'Quayside', [[owner, 'owner']]);
});
afterAll(() => t.close());

describe('names never carry control characters', () => {
  it('a project name with NUL is refused, naming the field and the character', async () => {
    const res = await request(t.app).post('/api/projects').set(asPerson(owner)).send({ name: 'Hall\u0000B' }).expect(400);
    expect(res.body.error.message).toBe('name: name must not contain control characters (U+0000)');
  });

  it('a site name with an escape code is refused', async () => {
    const res = await request(t.app).post(`/api/projects/${projectId}/sites`).set(asPerson(owner)).send({ name: 'North\u001b[31m' }).expect(400);
    expect(res.body.error.message).toContain('name must not contain control characters (U+001B)');
  });

  it('a description keeps its line breaks but not a bell', async () => {
    await request(t.app).patch(`/api/projects/${projectId}`).set(asPerson(owner)).send({ description: 'Phase 1\nPhase 2\tlater' }).expect(200);
    const res = await request(t.app).patch(`/api/projects/${projectId}`).set(asPerson(owner)).send({ description: 'ding\u0007' }).expect(400);
    expect(res.body.error.message).toContain('description must not contain control characters (U+0007)');
  });

  it('nothing was stored by the refused requests', async () => {
    const list = await request(t.app).get('/api/projects').set(asPerson(owner)).expect(200);
    expect(list.body.projects.map((p: { name: string; description: string }) => [p.name, p.description])).toEqual([['Quayside', 'Phase 1\nPhase 2\tlater']]);
  });
});

describe('a scenario name', () => {
  it('refuses control characters in the scenario schema, shared by the API and the command line', async () => {
    const { parseScenario } = await import('../../shared/scenario/schema');
    const scenario = JSON.parse(readFileSync(new URL('../../sample-weather/scenarios/direct-air-a1.json', import.meta.url), 'utf8'));
    const parsed = parseScenario({ ...scenario, name: 'Hall\u0000A' });
    expect(parsed).toEqual({ ok: false, errors: ['name: must not contain control characters (U+0000) (got "Hall\\u0000A")'] });
  });
});
