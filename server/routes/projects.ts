import { z } from 'zod';
import { withoutControlCharacters } from '../../shared/schemas/plain-text';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { parsePatch } from '../patch-body';
import { createProject, deleteProject, projectsOf, updateProject } from '../projects/store';
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
      res.json({ projects: projectsOf(db, user) });
    }),
    route('post', '/projects', access.signedIn, (req, res) => {
      const input = projectInput.parse(req.body);
      const project = createProject(db, input, { user: req.user! });
      res.status(201).json({ project: { ...project, role: 'owner' } });
    }),
    // What the project stores against its limit, shown on the project page.
    route('get', '/projects/:projectId/storage', access.viewer, (req, res) => {
      res.json({ storage: storageUse(db, req.projectId!, storageLimitOf(deps)) });
    }),
    route('patch', '/projects/:projectId', access.owner, (req, res) => {
      const input = parsePatch(projectInput, req.body);
      res.json({ project: updateProject(db, req.projectId!, input, req) });
    }),
    route('delete', '/projects/:projectId', access.owner, (req, res) => {
      deleteProject(db, req.projectId!, req);
      res.status(204).end();
    }),
  ];
}
