import express from 'express';
import { z } from 'zod';
import { firstLinesEchoed, type ImportReport } from '../../shared/climate';
import { climateUploadQuerySchema } from '../../shared/schemas/climate-file';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { loadIssueListCsv, UNLINKED_LISTS_KEPT } from '../climate/issue-lists';
import { listing } from '../climate/listing';
import { climateFileOr404, deleteClimateFile, listClimateFiles, loadOriginal, seriesOr404 } from '../climate/store';
import { formatStoredSeries } from '../climate/series-files';
import { defaultUploadLimits, importUpload, previewHours, storeUpload, withFullIssueList } from '../climate/upload';
import { HttpError } from '../http-error';
import { closedRequestSignal } from '../request-signal';
import { findSite } from '../sites/store';
import { requireStorage, storageLimitOf } from '../storage/quota';

const siteParams = z.object({ siteId: z.coerce.number().int().positive('siteId must be a positive whole number') });
const fileParams = z.object({ fileId: z.coerce.number().int().positive('fileId must be a positive whole number') });
const listParams = z.object({ listId: z.coerce.number().int().positive('listId must be a positive whole number') });

export function climateFileRoutes(deps: AppDeps): RouteSpec[] {
  const { db, pool } = deps;
  const limits = deps.uploadLimits ?? defaultUploadLimits;
  // The body limit (413) covers the whole set of an upload.
  const rawUpload = express.raw({ type: () => true, limit: limits.bytes });

  const uploadOf = (req: express.Request, site: { elevationM: number; timeZone: string }) => ({
    query: climateUploadQuerySchema.parse(req.query),
    body: Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0),
    contentType: req.headers['content-type'],
    site,
  });

  const fileOr404 = (projectId: number, fileIdParam: unknown) => climateFileOr404(db, projectId, fileParams.parse({ fileId: fileIdParam }).fileId);

  return [
    route('get', '/projects/:projectId/climate-files', access.viewer, (req, res) => {
      res.json({ climateFiles: listClimateFiles(db, req.projectId!) });
    }),

    route('post', '/projects/:projectId/sites/:siteId/climate-files/preview', access.engineer, rawUpload, async (req, res) => {
      const { siteId } = siteParams.parse(req.params);
      const site = findSite(db, req.projectId!, siteId);
      const { result, text } = await importUpload(pool, uploadOf(req, site), limits, { forPreview: true, signal: closedRequestSignal(res) });
      const report = await withFullIssueList(db, req.projectId!, req.user?.id ?? null, result);
      res.json({
        ok: result.ok,
        mapping: result.mapping,
        report,
        humidityKind: result.series?.humidity.kind ?? null,
        firstLines: firstLinesEchoed(text),
        preview: previewHours(result.series),
      });
    }),

    route('post', '/projects/:projectId/sites/:siteId/climate-files', access.engineer, rawUpload, async (req, res) => {
      const { siteId } = siteParams.parse(req.params);
      const site = findSite(db, req.projectId!, siteId);
      // The upload itself is a floor of what it would store: refused before the import's work when even that does not fit.
      requireStorage(db, req.projectId!, storageLimitOf(deps), Buffer.isBuffer(req.body) ? req.body.byteLength : 0, 'this upload');
      const upload = uploadOf(req, site);
      const imported = await importUpload(pool, upload, limits, { forPreview: false, signal: closedRequestSignal(res) });
      const row = await storeUpload(
        db,
        { projectId: req.projectId!, siteId, storageLimitBytes: storageLimitOf(deps), name: upload.query.name, imported, createdBy: req.user?.id ?? null },
        req,
      );
      res.status(201).json({ climateFile: listing(row, site.name), report: JSON.parse(row.reportJson) as ImportReport });
    }),

    route('get', '/projects/:projectId/climate-files/:fileId', access.viewer, async (req, res) => {
      const file = fileOr404(req.projectId!, req.params.fileId);
      const site = findSite(db, req.projectId!, file.siteId);
      const series = seriesOr404(db, file.id);
      const summary = await pool.run('summariseClimate', { series, elevationM: site.elevationM }, { lane: 'interactive', signal: closedRequestSignal(res) });
      res.json({
        climateFile: listing(file, site.name),
        site,
        mapping: JSON.parse(file.mappingJson),
        report: JSON.parse(file.reportJson),
        summary,
      });
    }),

    route('get', '/projects/:projectId/climate-files/:fileId/hours', access.viewer, async (req, res) => {
      const file = fileOr404(req.projectId!, req.params.fileId);
      const bytes = await formatStoredSeries(db, pool, file.id, 'hours-json', closedRequestSignal(res));
      res.type('application/json').send(bytes);
    }),

    route('get', '/projects/:projectId/climate-files/:fileId/original', access.viewer, (req, res) => {
      const file = fileOr404(req.projectId!, req.params.fileId);
      const bytes = loadOriginal(db, file.id);
      if (!bytes) throw new HttpError(404, 'not_found', 'The original file is not stored.');
      res.attachment(file.originalFileName).type('application/octet-stream').send(bytes);
    }),

    route('get', '/projects/:projectId/climate-files/:fileId/hourly.csv', access.viewer, async (req, res) => {
      const file = fileOr404(req.projectId!, req.params.fileId);
      const bytes = await formatStoredSeries(db, pool, file.id, 'csv', closedRequestSignal(res));
      res.attachment(`${file.name}-hourly.csv`).type('text/csv').send(bytes);
    }),

    route('get', '/projects/:projectId/climate-issue-lists/:listId', access.viewer, async (req, res) => {
      const { listId } = listParams.parse(req.params);
      const csv = await loadIssueListCsv(db, req.projectId!, listId);
      if (!csv)
        throw new HttpError(
          404,
          'not_found',
          `Issue list ${listId} was not found in this project; lists of previews and refused uploads are kept for the newest ${UNLINKED_LISTS_KEPT} only.`,
        );
      res.attachment(`climate-file-issues-${listId}.csv`).type('text/csv').send(csv);
    }),

    route('delete', '/projects/:projectId/climate-files/:fileId', access.engineer, (req, res) => {
      const file = fileOr404(req.projectId!, req.params.fileId);
      deleteClimateFile(db, file, req);
      res.status(204).end();
    }),
  ];
}
