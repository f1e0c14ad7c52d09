// @ts-nocheck
import { and, eq } from 'drizzle-orm';
import { z } from 'zod';
import { siteInputSchema } from '../../shared/schemas/climate-file';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordRequestAudit } from '../auth/audit';
import { sites } from '../db/schema';
import { HttpError } from '../http-error';
import { parsePatch } from '../patch-body';

const siteParams = z.object({ siteId: z.coerce.number().int().positive('siteId must be a positive whole number') });

export function findSite(deps: Pick<AppDeps, 'db'>, projectId: number, siteId: number) {
  const site = deps.db
    .select()
    .from(sites)
    .where(and(eq(sites.id, siteId), eq(sites.projectId, projectId)))
    .get();
  if (!site) throw new HttpError(404, 'not_found', `Site ${siteId} was not found in this project.`);
  return site;
}

export function siteRoutes(deps: AppDeps): RouteSpec[] {
  const { db } = deps;
  return [
    route('get', '/projects/:projectId/sites', access.viewer, (req, res) => {
      res.json({ sites: db.select().from(sites).where(eq(sites.projectId, req.projectId!)).all() });
    }),
    route('post', '/projects/:projectId/sites', access.engineer, (req, res) => {
      const input = siteInputSchema.parse(req.body);
      const site = db.transaction((tx) => {
        const row = tx
          .insert(sites)
          .values({ ...input, projectId: req.projectId! })
          .returning()
          .get();
        recordRequestAudit(tx, req, 'site.create', row.name, { siteId: row.id });
        return row;
      });
      res.status(201).json({ site });
    }),
    route('patch', '/projects/:projectId/sites/:siteId', access.engineer, (req, res) => {
      const { siteId } = siteParams.parse(req.params);
      findSite(deps, req.projectId!, siteId);
      const input = parsePatch(siteInputSchema, req.body);
      const site = db.transaction((tx) => {
        const row = tx.update(sites).set(input).where(eq(sites.id, siteId)).returning().get();
        recordRequestAudit(tx, req, 'site.update', row.name, { siteId, changed: Object.keys(input) });
        return row;
      });
      res.json({ site });
    }),
    route('delete', '/projects/:projectId/sites/:siteId', access.engineer, (req, res) => {
      const { siteId } = siteParams.parse(req.params);
      const site = findSite(deps, req.projectId!, siteId);
      db.transaction((tx) => {
        tx.delete(sites).where(eq(sites.id, siteId)).run();
        recordRequestAudit(tx, req, 'site.delete', site.name, { siteId });
      });
      res.status(204).end();
    }),
  ];
}
