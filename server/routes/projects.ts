import { eq } from 'drizzle-orm';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { memberships, projects } from '../db/schema';

export function projectRoutes({ db }: AppDeps): RouteSpec[] {
  return [
    route('get', '/projects', access.signedIn, (req, res) => {
      const rows = db
        .select({ id: projects.id, name: projects.name, description: projects.description, role: memberships.role })
        .from(memberships)
        .innerJoin(projects, eq(projects.id, memberships.projectId))
        .where(eq(memberships.userId, req.user!.id))
        .all();
      res.json({ projects: rows });
    }),
  ];
}
