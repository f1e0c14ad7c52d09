// @ts-nocheck
import { z } from 'zod';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { listAudit } from '../auth/audit';

const optionalId = z.coerce.number().int().positive().optional();
const auditQuery = z.object({
  projectId: optionalId,
  actorId: optionalId,
  action: z
    .string()
    .regex(/^[a-z][a-z0-9-]*(\.[a-z0-9-]*)*$/, 'action must look like "invite.sent" or a prefix such as "invite."')
    .optional(),
  from: z.coerce.date().optional(),
  to: z.coerce.date().optional(),
  beforeId: optionalId,
  limit: z.coerce.number().int().min(1).max(500).default(100),
});

export function auditRoutes({ db }: AppDeps): RouteSpec[] {
  return [
    // Admins see the whole installation's trail.
    route('get', '/audit', access.admin, (req, res) => {
      const query = auditQuery.parse(req.query);
      res.json({ events: listAudit(db, query) });
    }),
    // Owners see their project's trail.
    route('get', '/projects/:projectId/audit', access.owner, (req, res) => {
      const { projectId: _ignored, ...query } = auditQuery.parse(req.query);
      res.json({ events: listAudit(db, { ...query, projectId: req.projectId! }) });
    }),
  ];
}
