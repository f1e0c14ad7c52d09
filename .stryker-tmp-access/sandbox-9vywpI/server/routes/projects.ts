// @ts-nocheck
import { and, asc, eq } from 'drizzle-orm';
import { z } from 'zod';
import { withoutControlCharacters } from '../../shared/schemas/plain-text';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordRequestAudit } from '../auth/audit';
import { memberships, projects } from '../db/schema';
import { parsePatch } from '../patch-body';
import { storageLimitOf, storageUse } from '../storage/quota';

const projectInput = z.object({
  name: z
    .string()
    .trim()
    .min(1, 'name must not be empty')
    .max(120, 'name must be at most 120 characters')
    .refine(...withoutControlCharacters('name')),
  description: z
    .string()
    .trim()
    .max(2000, 'description must be at most 2000 characters')
    .refine(...withoutControlCharacters('description', { multiLine: true }))
    .default(''),
});

export function projectRoutes(deps: AppDeps): RouteSpec[] {
  const { db } = deps;
  return [
    // Members see their projects with their role; an organisation admin sees every project, as owner where not a member.
    // A signed-out visitor gets an empty list, not a 401: every page asks for it, and a 401 would be logged on each.
    route('get', '/projects', access.public, (req, res) => {
      const user = req.user;
      if (!user) {
        res.json({ projects: [], signedIn: false });
        return;
      }
      const rows = db
        .select({ id: projects.id, name: projects.name, description: projects.description, role: memberships.role })
        .from(projects)
        .leftJoin(memberships, and(eq(memberships.projectId, projects.id), eq(memberships.userId, user.id)))
        .orderBy(asc(projects.name))
        .all()
        .filter((row) => row.role !== null || user.isAdmin)
        .map((row) => ({ ...row, role: row.role ?? ('owner' as const) }));
      res.json({ projects: rows });
    }),
    route('post', '/projects', access.signedIn, (req, res) => {
      const input = projectInput.parse(req.body);
      const project = db.transaction((tx) => {
        const row = tx.insert(projects).values(input).returning().get();
        tx.insert(memberships).values({ projectId: row.id, userId: req.user!.id, role: 'owner' }).run();
        recordRequestAudit(tx, { user: req.user, projectId: row.id }, 'project.create', row.name, { projectId: row.id });
        return row;
      });
      res.status(201).json({ project: { ...project, role: 'owner' } });
    }),
    // What the project stores against its limit, shown on the project page.
    route('get', '/projects/:projectId/storage', access.viewer, (req, res) => {
      res.json({ storage: storageUse(db, req.projectId!, storageLimitOf(deps)) });
    }),
    route('patch', '/projects/:projectId', access.owner, (req, res) => {
      const input = parsePatch(projectInput, req.body);
      const project = db.transaction((tx) => {
        const row = tx.update(projects).set(input).where(eq(projects.id, req.projectId!)).returning().get();
        recordRequestAudit(tx, req, 'project.update', row.name, { changed: Object.keys(input) });
        return row;
      });
      res.json({ project });
    }),
    route('delete', '/projects/:projectId', access.owner, (req, res) => {
      db.transaction((tx) => {
        const row = tx.delete(projects).where(eq(projects.id, req.projectId!)).returning({ name: projects.name }).get();
        // The line outlives the project: it names it, and carries no project id that would dangle.
        recordRequestAudit(tx, { user: req.user }, 'project.delete', row?.name ?? `project ${req.projectId}`, { projectId: req.projectId });
      });
      res.status(204).end();
    }),
  ];
}
