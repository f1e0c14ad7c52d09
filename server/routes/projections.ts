import { z } from 'zod';
import { describeFactorIssues, projectionRequestSchema, type Derivation, type ProjectionRequest } from '../../shared/morphing';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { listing } from '../climate/listing';
import { climateFileOr404, findClimateFile, seriesOr404 } from '../climate/store';
import { HttpError } from '../http-error';
import { morphOnPool } from '../projections/morph';
import { createProjection } from '../projections/store';
import { closedRequestSignal } from '../request-signal';
import { findSite } from '../sites/store';
import { storageLimitOf } from '../storage/quota';

const fileParams = z.object({ fileId: z.coerce.number().int().positive('fileId must be a positive whole number') });

/** The change factors asked for; their problems come back as a 400 naming each month and field. */
function requestOf(body: unknown): ProjectionRequest {
  const parsed = projectionRequestSchema.safeParse(body);
  if (parsed.success) return parsed.data;
  const problems = describeFactorIssues(parsed.error.issues);
  throw new HttpError(400, 'invalid_factors', `The change factors were refused: ${problems.join('; ')}.`, { problems });
}

/** Future-climate files derived from an uploaded one by Belcher morphing. */
export function projectionRoutes(deps: AppDeps): RouteSpec[] {
  const { db, pool } = deps;

  function parentOf(projectId: number, fileIdParam: unknown) {
    const { fileId } = fileParams.parse({ fileId: fileIdParam });
    const file = climateFileOr404(db, projectId, fileId);
    return { file, series: seriesOr404(db, file.id), site: findSite(db, projectId, file.siteId) };
  }

  return [
    route('post', '/projects/:projectId/climate-files/:fileId/projections/preview', access.engineer, async (req, res) => {
      const { factors } = requestOf(req.body);
      const { series, site } = parentOf(req.projectId!, req.params.fileId);
      const out = await morphOnPool(pool, { series, site, factors, keepSeries: false }, closedRequestSignal(res));
      res.json({
        comparison: { parent: out.parentMonthly, projection: out.projectionMonthly },
        alphaByMonth: out.alphaByMonth,
        clampedHighHours: out.clampedHighHours,
        clampedLowHours: out.clampedLowHours,
        lostHours: out.lostHours,
      });
    }),

    route('post', '/projects/:projectId/climate-files/:fileId/projections', access.engineer, async (req, res) => {
      const request = requestOf(req.body);
      const { file: parent, series, site } = parentOf(req.projectId!, req.params.fileId);
      const morphed = await morphOnPool(pool, { series, site, factors: request.factors, keepSeries: true }, closedRequestSignal(res));
      const { row, derivation } = createProjection(
        db,
        { projectId: req.projectId!, storageLimitBytes: storageLimitOf(deps), parent, request, morphed, createdBy: req.user?.id ?? null },
        req,
      );
      res.status(201).json({ climateFile: listing(row, site.name), derivation });
    }),

    route('get', '/projects/:projectId/projections/:fileId', access.viewer, (req, res) => {
      const { fileId } = fileParams.parse({ fileId: req.params.fileId });
      const file = climateFileOr404(db, req.projectId!, fileId);
      if (!file.derivationJson) throw new HttpError(404, 'not_a_projection', `Climate file "${file.name}" is an upload, not a projection.`);
      const site = findSite(db, req.projectId!, file.siteId);
      const parent = file.parentId ? findClimateFile(db, req.projectId!, file.parentId) : undefined;
      res.json({
        climateFile: listing(file, site.name),
        parent: parent ? listing(parent, site.name) : null,
        derivation: JSON.parse(file.derivationJson) as Derivation,
      });
    }),
  ];
}
