// @ts-nocheck
import express from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiRoutes, type AppDeps } from '../../server/app';
import { access, mountRoutes, type AccessRule, type RouteSpec } from '../../server/auth/access';
import { refuseCrossSite } from '../../server/auth/csrf';
import { loadSession } from '../../server/auth/session';
import { errorHandler } from '../../server/middleware/errors';
import { projectRoles } from '../../server/db/schema';
import { createTestApp, type TestApp } from '../support/test-app';
import { asPerson, personWithSession, projectWithMembers, type TestPerson } from '../support/people';

/**
 * The role matrix: every API route the app mounts × every kind of caller, with the expected answer
 * derived from the route's declared rule. A route whose rule is missing or unknown fails here, and so
 * does a route the access check lets the wrong person through.
 */
type Caller = 'signed out' | 'viewer' | 'engineer' | 'owner' | 'admin' | "another project's owner";
const callers: Caller[] = ['signed out', 'viewer', 'engineer', 'owner', 'admin', "another project's owner"];
type Outcome = 'reached' | 401 | 403 | 404;

const rank = { viewer: 1, engineer: 2, owner: 3 } as const;

function expectedOutcome(rule: AccessRule, caller: Caller): Outcome {
  if (rule.level === 'public') return 'reached';
  if (caller === 'signed out') return 401;
  if (rule.level === 'signed-in') return 'reached';
  if (rule.level === 'admin') return caller === 'admin' ? 'reached' : 403;
  if (caller === 'admin') return 'reached'; // admins pass every project rule as owners
  if (caller === "another project's owner") return 404; // a non-member learns nothing about the project
  return rank[caller] >= rank[rule.role] ? 'reached' : 403;
}

const knownRules: AccessRule[] = Object.values(access);

let t: TestApp;
let people: Record<Exclude<Caller, 'signed out'>, TestPerson>;
let projectId: number;
let routes: RouteSpec[];
let probe: express.Express;

beforeAll(() => {
  t = createTestApp();
  people = {
    viewer: personWithSession(t.db, 'viewer@example.test'),
    engineer: personWithSession(t.db, 'engineer@example.test'),
    owner: personWithSession(t.db, 'owner@example.test'),
    admin: personWithSession(t.db, 'admin@example.test', { isAdmin: true }),
    "another project's owner": personWithSession(t.db, 'elsewhere@example.test'),
  };
  projectId = projectWithMembers(t.db, 'Matrix study', [
    [people.viewer, 'viewer'],
    [people.engineer, 'engineer'],
    [people.owner, 'owner'],
  ]);
  projectWithMembers(t.db, 'Another study', [[people["another project's owner"], 'owner']]);

  const deps: AppDeps = { db: t.db, pool: t.pool, runQueue: t.runQueue } as AppDeps;
  routes = apiRoutes(deps);
  // The probe mounts the same list through the same mountRoutes, with every handler replaced by one that
  // says which route was reached: an allowed caller reaches exactly this route, with no side effect.
  probe = express();
  const api = express.Router();
  api.use(express.json());
  api.use(loadSession(t.db));
  api.use(refuseCrossSite);
  mountRoutes(
    api,
    t.db,
    routes.map((spec, index) => ({ ...spec, handlers: [(_req: express.Request, res: express.Response) => void res.json({ reached: index })] })),
  );
  probe.use('/api', api);
  probe.use(errorHandler(() => {}));
});
afterAll(() => t.close());

function concretePath(spec: RouteSpec): string {
  return `/api${spec.path.replace(/:projectId\b/g, String(projectId)).replace(/:(\w+)/g, '1')}`;
}

function send(app: express.Express, spec: RouteSpec, caller: Caller) {
  const req = request(app)[spec.method](concretePath(spec));
  return caller === 'signed out' ? req.set('x-tramontane-request', '1') : req.set(asPerson(people[caller]));
}

describe('the role matrix over every API route', () => {
  it('covers a sensible number of routes, each with a known rule', () => {
    expect(routes.length).toBeGreaterThan(20);
    for (const spec of routes) {
      expect(knownRules, `${spec.method.toUpperCase()} ${spec.path} has no known access rule`).toContainEqual(spec.access);
      if (spec.access.level === 'project') expect(spec.path, `${spec.path} has a project rule but no :projectId`).toContain(':projectId');
      expect(projectRoles).toContain(spec.access.level === 'project' ? spec.access.role : 'owner');
    }
  });

  it('is exactly what the real app mounts under /api: no route slips in beside the list', () => {
    type Layer = { route?: { path: string; methods: Record<string, boolean> }; handle?: { stack?: Layer[] } };
    const appLayers = (t.app as unknown as { router: { stack: Layer[] } }).router.stack;
    const mounted = appLayers
      .flatMap((layer) => layer.handle?.stack ?? [])
      .filter((layer) => layer.route)
      .flatMap((layer) => Object.keys(layer.route!.methods).map((method) => `${method.toUpperCase()} ${layer.route!.path}`));
    const declared = routes.map((spec) => `${spec.method.toUpperCase()} ${spec.path}`);
    expect(mounted.sort()).toEqual(declared.sort());
  });

  it('answers every caller as the rule says, on the probe and on the real app', async () => {
    const mismatches: string[] = [];
    for (const [index, spec] of routes.entries()) {
      const label = `${spec.method.toUpperCase()} ${spec.path}`;
      for (const caller of callers) {
        const expected = expectedOutcome(spec.access, caller);
        if (expected === 'reached') {
          const res = await send(probe, spec, caller);
          if (res.status !== 200 || res.body.reached !== index) {
            mismatches.push(`${label} as ${caller}: expected to reach route ${index}, got ${res.status} ${JSON.stringify(res.body)}`);
          }
          continue;
        }
        // Refusals happen before any handler, so the real app can be asked without side effects.
        const res = await send(t.app, spec, caller);
        const code = { 401: 'unauthenticated', 403: 'forbidden', 404: 'not_found' }[expected];
        if (res.status !== expected || res.body.error?.code !== code) {
          mismatches.push(`${label} as ${caller}: expected ${expected} ${code}, got ${res.status} ${JSON.stringify(res.body)}`);
        }
        if (expected === 404 && res.body.error?.message !== `Project ${projectId} was not found.`) {
          mismatches.push(`${label} as ${caller}: the 404 should not reveal the project, got ${res.body.error?.message}`);
        }
      }
    }
    expect(mismatches).toEqual([]);
  });

  it('derives the expected answers as the issue describes for one route of each rule', () => {
    expect(callers.map((c) => expectedOutcome(access.engineer, c))).toEqual([401, 403, 'reached', 'reached', 'reached', 404]);
    expect(callers.map((c) => expectedOutcome(access.owner, c))).toEqual([401, 403, 403, 'reached', 'reached', 404]);
    expect(callers.map((c) => expectedOutcome(access.viewer, c))).toEqual([401, 'reached', 'reached', 'reached', 'reached', 404]);
    expect(callers.map((c) => expectedOutcome(access.admin, c))).toEqual([401, 403, 403, 403, 'reached', 403]);
    expect(callers.map((c) => expectedOutcome(access.signedIn, c))).toEqual([401, 'reached', 'reached', 'reached', 'reached', 'reached']);
  });
});

describe('members and roles inside a project', () => {
  it('every member sees who is in the project; only owners may manage', async () => {
    const asViewer = await request(t.app).get(`/api/projects/${projectId}/members`).set(asPerson(people.viewer)).expect(200);
    expect(asViewer.body).toMatchObject({ yourRole: 'viewer', canManage: false });
    expect(asViewer.body.members.map((m: { email: string }) => m.email).sort()).toEqual(['engineer@example.test', 'owner@example.test', 'viewer@example.test']);
    const asAdmin = await request(t.app).get(`/api/projects/${projectId}/members`).set(asPerson(people.admin)).expect(200);
    expect(asAdmin.body).toMatchObject({ yourRole: 'owner', canManage: true });
  });

  it('an owner changes a role, and the change is in the audit trail', async () => {
    await request(t.app).patch(`/api/projects/${projectId}/members/${people.viewer.id}`).set(asPerson(people.owner)).send({ role: 'engineer' }).expect(200);
    await request(t.app).post(`/api/projects/${projectId}/sites`).set(asPerson(people.viewer)).send({ name: 'Now allowed' }).expect(201);
    await request(t.app).patch(`/api/projects/${projectId}/members/${people.viewer.id}`).set(asPerson(people.owner)).send({ role: 'viewer' }).expect(200);
    const trail = await request(t.app).get(`/api/projects/${projectId}/audit?action=member.`).set(asPerson(people.owner)).expect(200);
    expect(trail.body.events.map((e: { detail: unknown }) => e.detail)).toEqual([
      { from: 'engineer', to: 'viewer' },
      { from: 'viewer', to: 'engineer' },
    ]);
    expect(trail.body.events[0]).toMatchObject({
      action: 'member.role-changed',
      actorName: 'owner',
      target: 'viewer@example.test',
      projectName: 'Matrix study',
    });
  });

  it('a project keeps its last owner', async () => {
    const res = await request(t.app)
      .patch(`/api/projects/${projectId}/members/${people.owner.id}`)
      .set(asPerson(people.owner))
      .send({ role: 'viewer' })
      .expect(409);
    expect(res.body.error.code).toBe('last_owner');
    await request(t.app).delete(`/api/projects/${projectId}/members/${people.owner.id}`).set(asPerson(people.owner)).expect(409);
  });

  it('an engineer cannot change roles, and is told which role it takes', async () => {
    const res = await request(t.app)
      .patch(`/api/projects/${projectId}/members/${people.viewer.id}`)
      .set(asPerson(people.engineer))
      .send({ role: 'owner' })
      .expect(403);
    expect(res.body.error.message).toBe('This needs the owner role or higher in this project; you are engineer.');
  });
});

describe('the organisation admin', () => {
  it('sees everyone and the whole audit trail with filters; owners see only their project', async () => {
    const everyone = await request(t.app).get('/api/admin/people').set(asPerson(people.admin)).expect(200);
    expect(everyone.body.people).toHaveLength(5);
    const all = await request(t.app).get(`/api/audit?projectId=${projectId}&actorId=${people.owner.id}`).set(asPerson(people.admin)).expect(200);
    expect(all.body.events.length).toBe(2);
    const none = await request(t.app).get('/api/audit?action=invite.').set(asPerson(people.admin)).expect(200);
    expect(none.body.events).toEqual([]);
    await request(t.app).get('/api/audit').set(asPerson(people.owner)).expect(403);
    const bad = await request(t.app).get('/api/audit?action=DROP TABLE').set(asPerson(people.admin)).expect(400);
    expect(bad.body.error.message).toContain('action');
  });

  it('grants and withdraws admin, but never the last one', async () => {
    await request(t.app).patch(`/api/admin/people/${people.engineer.id}`).set(asPerson(people.admin)).send({ isAdmin: true }).expect(200);
    await request(t.app).get('/api/audit').set(asPerson(people.engineer)).expect(200);
    await request(t.app).patch(`/api/admin/people/${people.engineer.id}`).set(asPerson(people.admin)).send({ isAdmin: false }).expect(200);
    await request(t.app).get('/api/audit').set(asPerson(people.engineer)).expect(403);
    const last = await request(t.app).patch(`/api/admin/people/${people.admin.id}`).set(asPerson(people.admin)).send({ isAdmin: false }).expect(409);
    expect(last.body.error.code).toBe('last_admin');
  });
});
