import { Router } from 'express';
import { eq } from 'drizzle-orm';
import type { AppDeps } from '../app';
import { requireUser } from '../auth/session';
import { memberships, projects } from '../db/schema';

export function projectRoutes({ db }: AppDeps): Router {
  const router = Router();
  router.get('/projects', requireUser, (req, res) => {
    const rows = db
      .select({ id: projects.id, name: projects.name, description: projects.description, role: memberships.role })
      .from(memberships)
      .innerJoin(projects, eq(projects.id, memberships.projectId))
      .where(eq(memberships.userId, req.user!.id))
      .all();
    res.json({ projects: rows });
  });
  return router;
}
