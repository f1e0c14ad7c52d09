// @ts-nocheck
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { memberships, projects, unitSystems, users } from '../db/schema';

const settingsPatch = z
  .object({
    unitSystem: z.enum(unitSystems),
    runNotices: z.boolean(),
  })
  .partial()
  .strict();

export function meRoutes({ db }: AppDeps): RouteSpec[] {
  const me = (userId: number) => {
    const row = db
      .select({
        id: users.id,
        email: users.email,
        name: users.name,
        isAdmin: users.isAdmin,
        unitSystem: users.unitSystem,
        runNotices: users.runNotices,
      })
      .from(users)
      .where(eq(users.id, userId))
      .get()!;
    const { unitSystem, runNotices, ...user } = row;
    const projectRows = db
      .select({ id: projects.id, name: projects.name, role: memberships.role })
      .from(memberships)
      .innerJoin(projects, eq(projects.id, memberships.projectId))
      .where(eq(memberships.userId, userId))
      .all();
    return { user, settings: { unitSystem, runNotices }, projects: projectRows };
  };

  return [
    route('get', '/me', access.signedIn, (req, res) => {
      res.json(me(req.user!.id));
    }),
    route('patch', '/me', access.signedIn, (req, res) => {
      const patch = settingsPatch.parse(req.body ?? {});
      if (Object.keys(patch).length > 0) db.update(users).set(patch).where(eq(users.id, req.user!.id)).run();
      res.json(me(req.user!.id));
    }),
  ];
}
