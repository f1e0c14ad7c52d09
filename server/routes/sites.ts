import { z } from 'zod';
import { siteInputSchema } from '../../shared/schemas/climate-file';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { parsePatch } from '../patch-body';
import { createSite, deleteSite, findSite, listSites, updateSite } from '../sites/store';

const siteParams = z.object({ siteId: z.coerce.number().int().positive('siteId must be a positive whole number') });

export function siteRoutes({ db }: AppDeps): RouteSpec[] {
  return [
    route('get', '/projects/:projectId/sites', access.viewer, (req, res) => {
      res.json({ sites: listSites(db, req.projectId!) });
    }),
    route('post', '/projects/:projectId/sites', access.engineer, (req, res) => {
      const input = siteInputSchema.parse(req.body);
      res.status(201).json({ site: createSite(db, req.projectId!, input, req) });
    }),
    route('patch', '/projects/:projectId/sites/:siteId', access.engineer, (req, res) => {
      const { siteId } = siteParams.parse(req.params);
      const site = findSite(db, req.projectId!, siteId);
      const input = parsePatch(siteInputSchema, req.body);
      res.json({ site: updateSite(db, site, input, req) });
    }),
    route('delete', '/projects/:projectId/sites/:siteId', access.engineer, (req, res) => {
      const { siteId } = siteParams.parse(req.params);
      deleteSite(db, req.projectId!, siteId, req);
      res.status(204).end();
    }),
  ];
}
