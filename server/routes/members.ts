import { z } from 'zod';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { systemClock } from '../auth/session';
import { projectRoles } from '../db/schema';
import { changeRole, listPeople, projectMembers, removeMember, setAdmin } from '../members/store';

const userIdParam = z.object({ userId: z.coerce.number().int().positive() });
const rolePatch = z.object({ role: z.enum(projectRoles) }).strict();
const adminPatch = z.object({ isAdmin: z.boolean() }).strict();

export function memberRoutes(deps: AppDeps): RouteSpec[] {
  const { db } = deps;
  const clock = deps.clock ?? systemClock;
  const by = (req: { user?: { id: number } }) => ({ actorId: req.user!.id, now: clock() });

  return [
    route('get', '/projects/:projectId/members', access.viewer, (req, res) => {
      const { project, members } = projectMembers(db, req.projectId!);
      res.json({ project, yourRole: req.projectRole, canManage: req.projectRole === 'owner', members });
    }),

    route('patch', '/projects/:projectId/members/:userId', access.owner, (req, res) => {
      const { userId } = userIdParam.parse(req.params);
      const { role } = rolePatch.parse(req.body ?? {});
      changeRole(db, req.projectId!, userId, role, by(req));
      res.json({ userId, role });
    }),

    route('delete', '/projects/:projectId/members/:userId', access.owner, (req, res) => {
      const { userId } = userIdParam.parse(req.params);
      removeMember(db, req.projectId!, userId, by(req));
      res.status(204).end();
    }),

    route('get', '/admin/people', access.admin, (_req, res) => {
      res.json({ people: listPeople(db) });
    }),

    route('patch', '/admin/people/:userId', access.admin, (req, res) => {
      const { userId } = userIdParam.parse(req.params);
      const { isAdmin } = adminPatch.parse(req.body ?? {});
      setAdmin(db, userId, isAdmin, by(req));
      res.json({ id: userId, isAdmin });
    }),
  ];
}
