import type { RequestHandler, Router } from 'express';
import { and, eq, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import { memberships, projectRoles, type ProjectRole } from '../db/schema';
import { HttpError } from '../http-error';

/**
 * Who may call a route. Every API route declares one; `mountRoutes` puts the check in front of it, so a
 * route cannot exist without a rule, and the role-matrix test walks the same list.
 * - public: anyone; signed-in: any session; admin: organisation admins;
 * - project: a member of the route's `:projectId` holding at least `role` (admins pass as owners).
 */
export type AccessRule = { level: 'public' } | { level: 'signed-in' } | { level: 'admin' } | { level: 'project'; role: ProjectRole };

export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface RouteSpec {
  method: HttpMethod;
  /** Path under /api, in Express syntax. Project routes carry `:projectId`. */
  path: string;
  access: AccessRule;
  handlers: RequestHandler[];
}

declare module 'express-serve-static-core' {
  interface Request {
    /** The caller's role in the route's project, set by the access check. */
    projectRole?: ProjectRole;
    projectId?: number;
  }
}

export const access = {
  public: { level: 'public' },
  signedIn: { level: 'signed-in' },
  admin: { level: 'admin' },
  viewer: { level: 'project', role: 'viewer' },
  engineer: { level: 'project', role: 'engineer' },
  owner: { level: 'project', role: 'owner' },
} as const satisfies Record<string, AccessRule>;

const rank: Record<ProjectRole, number> = { viewer: 1, engineer: 2, owner: 3 };

export function roleAtLeast(role: ProjectRole | undefined, needed: ProjectRole): boolean {
  return role !== undefined && rank[role] >= rank[needed];
}

export function route(method: HttpMethod, path: string, rule: AccessRule, ...handlers: RequestHandler[]): RouteSpec {
  return { method, path, access: rule, handlers };
}

/** The caller's role in a project, prepared once per database: every project route asks it. */
function membershipLookup(db: Db) {
  const query = db
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.projectId, sql.placeholder('projectId')), eq(memberships.userId, sql.placeholder('userId'))))
    .prepare();
  return (projectId: number, userId: number): ProjectRole | undefined => query.get({ projectId, userId })?.role;
}

export function authorize(db: Db, rule: AccessRule, roleIn = membershipLookup(db)): RequestHandler {
  return (req, _res, next) => {
    if (rule.level === 'public') return next();
    const user = req.user;
    if (!user) throw new HttpError(401, 'unauthenticated', 'Sign in to use this.');
    if (rule.level === 'signed-in') return next();
    if (rule.level === 'admin') {
      if (!user.isAdmin) throw new HttpError(403, 'forbidden', 'Only an organisation admin can do this.');
      return next();
    }
    const projectId = Number(req.params.projectId);
    if (!Number.isSafeInteger(projectId) || projectId <= 0) {
      throw new HttpError(400, 'invalid_request', `projectId must be a positive whole number, not "${req.params.projectId}".`);
    }
    const role: ProjectRole | undefined = user.isAdmin ? 'owner' : roleIn(projectId, user.id);
    // A non-member learns nothing about the project, not even that it exists.
    if (!role) throw new HttpError(404, 'not_found', `Project ${projectId} was not found.`);
    if (!roleAtLeast(role, rule.role)) {
      throw new HttpError(403, 'forbidden', `This needs the ${rule.role} role or higher in this project; you are ${role}.`);
    }
    req.projectRole = role;
    req.projectId = projectId;
    next();
  };
}

export function mountRoutes(router: Router, db: Db, specs: RouteSpec[]): void {
  const roleIn = membershipLookup(db);
  for (const spec of specs) router[spec.method](spec.path, authorize(db, spec.access, roleIn), ...spec.handlers);
}

export { projectRoles };
