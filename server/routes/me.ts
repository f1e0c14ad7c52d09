import { z } from 'zod';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { unitSystems } from '../db/schema';
import { personWithProjects, updateSettings } from '../members/store';

const settingsPatch = z
  .object({
    unitSystem: z.enum(unitSystems),
    runNotices: z.boolean(),
  })
  .partial()
  .strict();

export function meRoutes({ db }: AppDeps): RouteSpec[] {
  return [
    route('get', '/me', access.signedIn, (req, res) => {
      res.json(personWithProjects(db, req.user!.id));
    }),
    route('patch', '/me', access.signedIn, (req, res) => {
      updateSettings(db, req.user!.id, settingsPatch.parse(req.body ?? {}));
      res.json(personWithProjects(db, req.user!.id));
    }),
  ];
}
