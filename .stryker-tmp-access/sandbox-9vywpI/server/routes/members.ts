// @ts-nocheck
import { and, asc, count, eq, ne } from 'drizzle-orm';
import { z } from 'zod';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordAudit } from '../auth/audit';
import { systemClock } from '../auth/session';
import { memberships, projectRoles, projects, users } from '../db/schema';
import { HttpError } from '../http-error';

const userIdParam = z.object({ userId: z.coerce.number().int().positive() });
const rolePatch = z.object({ role: z.enum(projectRoles) }).strict();
const adminPatch = z.object({ isAdmin: z.boolean() }).strict();

export function memberRoutes(deps: AppDeps): RouteSpec[] {
  const { db } = deps;
  const clock = deps.clock ?? systemClock;

  const membership = (projectId: number, userId: number) =>
    db
      .select({ role: memberships.role, name: users.name, email: users.email })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.projectId, projectId), eq(memberships.userId, userId)))
      .get();

  /** A project always keeps one owner, so someone can still manage it. */
  const otherOwners = (projectId: number, userId: number) =>
    db
      .select({ n: count() })
      .from(memberships)
      .where(and(eq(memberships.projectId, projectId), eq(memberships.role, 'owner'), ne(memberships.userId, userId)))
      .get()!.n;

  return [
    route('get', '/projects/:projectId/members', access.viewer, (req, res) => {
      const projectId = req.projectId!;
      const project = db.select({ id: projects.id, name: projects.name }).from(projects).where(eq(projects.id, projectId)).get();
      if (!project) throw new HttpError(404, 'not_found', `Project ${projectId} was not found.`);
      const members = db
        .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(eq(memberships.projectId, projectId))
        .orderBy(asc(users.name))
        .all();
      res.json({ project, yourRole: req.projectRole, canManage: req.projectRole === 'owner', members });
    }),

    route('patch', '/projects/:projectId/members/:userId', access.owner, (req, res) => {
      const projectId = req.projectId!;
      const { userId } = userIdParam.parse(req.params);
      const { role } = rolePatch.parse(req.body ?? {});
      const current = membership(projectId, userId);
      if (!current) throw new HttpError(404, 'not_found', `Person ${userId} is not a member of this project.`);
      if (current.role === 'owner' && role !== 'owner' && otherOwners(projectId, userId) === 0) {
        throw new HttpError(409, 'last_owner', 'A project keeps at least one owner; make someone else owner first.');
      }
      db.transaction((tx) => {
        tx.update(memberships)
          .set({ role })
          .where(and(eq(memberships.projectId, projectId), eq(memberships.userId, userId)))
          .run();
        recordAudit(
          tx,
          { actorId: req.user!.id, projectId, action: 'member.role-changed', target: current.email, detail: { from: current.role, to: role } },
          clock(),
        );
      });
      res.json({ userId, role });
    }),

    route('delete', '/projects/:projectId/members/:userId', access.owner, (req, res) => {
      const projectId = req.projectId!;
      const { userId } = userIdParam.parse(req.params);
      const current = membership(projectId, userId);
      if (!current) throw new HttpError(404, 'not_found', `Person ${userId} is not a member of this project.`);
      if (current.role === 'owner' && otherOwners(projectId, userId) === 0) {
        throw new HttpError(409, 'last_owner', 'A project keeps at least one owner; make someone else owner first.');
      }
      db.transaction((tx) => {
        tx.delete(memberships)
          .where(and(eq(memberships.projectId, projectId), eq(memberships.userId, userId)))
          .run();
        recordAudit(tx, { actorId: req.user!.id, projectId, action: 'member.removed', target: current.email, detail: { role: current.role } }, clock());
      });
      res.status(204).end();
    }),

    route('get', '/admin/people', access.admin, (_req, res) => {
      const people = db
        .select({ id: users.id, name: users.name, email: users.email, isAdmin: users.isAdmin, lastSignInAt: users.lastSignInAt })
        .from(users)
        .orderBy(asc(users.name))
        .all();
      res.json({ people });
    }),

    route('patch', '/admin/people/:userId', access.admin, (req, res) => {
      const { userId } = userIdParam.parse(req.params);
      const { isAdmin } = adminPatch.parse(req.body ?? {});
      const person = db.select({ email: users.email, isAdmin: users.isAdmin }).from(users).where(eq(users.id, userId)).get();
      if (!person) throw new HttpError(404, 'not_found', `Person ${userId} was not found.`);
      if (person.isAdmin && !isAdmin) {
        const others = db
          .select({ n: count() })
          .from(users)
          .where(and(eq(users.isAdmin, true), ne(users.id, userId)))
          .get()!.n;
        if (others === 0) throw new HttpError(409, 'last_admin', 'The installation keeps at least one admin.');
      }
      db.transaction((tx) => {
        tx.update(users).set({ isAdmin }).where(eq(users.id, userId)).run();
        recordAudit(tx, { actorId: req.user!.id, action: isAdmin ? 'admin.granted' : 'admin.revoked', target: person.email }, clock());
      });
      res.json({ id: userId, isAdmin });
    }),
  ];
}
