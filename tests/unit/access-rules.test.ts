/**
 * The access check every API route passes first (server/auth/access.ts), called directly: each level, each role
 * against each rule, and the answer a refused caller gets. The order viewer < engineer < owner, admins passing as
 * owners and non-members seeing 404 are the product's own rules (DEVELOPERS.md, tests/api/roles.test.ts walks the routes).
 */
import type { Request, Response } from 'express';
import { describe, expect, it } from 'vitest';
import { access, authorize, roleAtLeast, route, type AccessRule } from '../../server/auth/access';
import type { Db } from '../../server/db/client';
import type { ProjectRole } from '../../server/db/schema';
import { HttpError } from '../../server/http-error';

const ROLES: ProjectRole[] = ['viewer', 'engineer', 'owner'];
const person = { id: 5, email: 'ines@example.test', name: 'Ines', isAdmin: false };
const admin = { ...person, id: 1, isAdmin: true };

/** Runs the check for one request; `roleIn` answers the membership question without a database. */
function check(rule: AccessRule, req: { user?: typeof person; params?: Record<string, string> }, membership?: ProjectRole) {
  const asked: Array<[number, number]> = [];
  const request = { params: {}, ...req } as unknown as Request;
  let passed = false;
  let refusal: HttpError | undefined;
  try {
    authorize({} as Db, rule, (projectId, userId) => {
      asked.push([projectId, userId]);
      return membership;
    })(request, {} as Response, () => {
      passed = true;
    });
  } catch (error) {
    if (!(error instanceof HttpError)) throw error;
    refusal = error;
  }
  return { passed, refusal, asked, request };
}

describe('roleAtLeast', () => {
  it('orders viewer < engineer < owner and refuses no role', () => {
    const table = ROLES.map((held) => ROLES.map((needed) => roleAtLeast(held, needed)));
    expect(table).toEqual([
      [true, false, false],
      [true, true, false],
      [true, true, true],
    ]);
    for (const needed of ROLES) expect(roleAtLeast(undefined, needed)).toBe(false);
  });
});

describe('authorize', () => {
  it('lets anyone through a public route, signed in or not', () => {
    expect(check(access.public, {}).passed).toBe(true);
  });

  it('asks for a session on every other level: 401 unauthenticated', () => {
    for (const rule of [access.signedIn, access.admin, access.viewer, access.owner]) {
      const { passed, refusal } = check(rule, { params: { projectId: '3' } }, 'owner');
      expect(passed).toBe(false);
      expect(refusal).toMatchObject({ status: 401, code: 'unauthenticated', message: 'Sign in to use this.' });
    }
  });

  it('signed-in: any session passes, without asking about projects', () => {
    const { passed, asked } = check(access.signedIn, { user: person });
    expect(passed).toBe(true);
    expect(asked).toEqual([]);
  });

  it('admin: only organisation admins, 403 forbidden for anyone else', () => {
    expect(check(access.admin, { user: admin }).passed).toBe(true);
    const { passed, refusal } = check(access.admin, { user: person });
    expect(passed).toBe(false);
    expect(refusal).toMatchObject({ status: 403, code: 'forbidden', message: 'Only an organisation admin can do this.' });
  });

  it('project: each role against each rule, with the role and project kept on the request for the route', () => {
    for (const held of ROLES) {
      for (const needed of ROLES) {
        const { passed, refusal, asked, request } = check({ level: 'project', role: needed }, { user: person, params: { projectId: '12' } }, held);
        expect(asked).toEqual([[12, 5]]);
        const allowed = ROLES.indexOf(held) >= ROLES.indexOf(needed);
        expect(passed).toBe(allowed);
        if (allowed) {
          expect(request.projectRole).toBe(held);
          expect(request.projectId).toBe(12);
        } else {
          expect(refusal).toMatchObject({
            status: 403,
            code: 'forbidden',
            message: `This needs the ${needed} role or higher in this project; you are ${held}.`,
          });
          expect(request.projectRole).toBeUndefined();
        }
      }
    }
  });

  it('project: a non-member gets 404, as if the project did not exist', () => {
    const { passed, refusal, request } = check(access.viewer, { user: person, params: { projectId: '12' } }, undefined);
    expect(passed).toBe(false);
    expect(refusal).toMatchObject({ status: 404, code: 'not_found', message: 'Project 12 was not found.' });
    expect(request.projectId).toBeUndefined();
  });

  it('project: an organisation admin passes as owner without being a member', () => {
    const { passed, asked, request } = check(access.owner, { user: admin, params: { projectId: '12' } }, undefined);
    expect(passed).toBe(true);
    expect(asked).toEqual([]);
    expect(request.projectRole).toBe('owner');
  });

  it('project: a project id that is not a positive whole number is a 400 naming it', () => {
    for (const bad of ['0', '-3', '1.5', 'abc', '9007199254740993']) {
      const { passed, refusal, asked } = check(access.viewer, { user: person, params: { projectId: bad } }, 'owner');
      expect(passed).toBe(false);
      expect(asked).toEqual([]);
      expect(refusal).toMatchObject({ status: 400, code: 'invalid_request', message: `projectId must be a positive whole number, not "${bad}".` });
    }
  });
});

describe('route', () => {
  it('keeps the method, path, rule and handlers it is given', () => {
    const handler = () => undefined;
    expect(route('patch', '/projects/:projectId', access.engineer, handler)).toEqual({
      method: 'patch',
      path: '/projects/:projectId',
      access: { level: 'project', role: 'engineer' },
      handlers: [handler],
    });
  });
});
