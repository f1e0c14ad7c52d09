// @ts-nocheck
import express from 'express';
import { desc, eq } from 'drizzle-orm';
import { z } from 'zod';
import { createHash } from 'node:crypto';
import { decodeClimateBytes, firstLinesEchoed, joinClimateFiles, type ClimateSeries, type ImportReport, type ImportResult } from '../../shared/climate';
import { climateUploadQuerySchema, uploadedFilesSchema } from '../../shared/schemas/climate-file';
import { fixedOffsetZone, standardOffsetMinutes } from '../../shared/time-zone';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordRequestAudit } from '../auth/audit';
import { multipartBoundary, readMultipartFiles } from '../climate/multipart';
import { findClimateFile, loadClimateSeries, loadEncodedSeries, loadOriginal, saveClimateFile } from '../climate/store';
import { linkIssueList, loadIssueListCsv, packIssueList, saveIssueList, UNLINKED_LISTS_KEPT } from '../climate/issue-lists';
import { tarArchive } from '../climate/tar-archive';
import { climateFileBytes, requireStorage, storageLimitOf } from '../storage/quota';
import { climateFiles, sites } from '../db/schema';
import { HttpError } from '../http-error';
import { closedRequestSignal } from '../request-signal';
import { findSite } from './sites';

/** Upload limits: 64 MB and 1.2 million lines (over 100 years of hours) unless the app is given others. */
export const defaultUploadLimits = { bytes: 64 * 1024 * 1024, rows: 1_200_000 };
const previewHours = 48;

const siteParams = z.object({ siteId: z.coerce.number().int().positive('siteId must be a positive whole number') });
const fileParams = z.object({ fileId: z.coerce.number().int().positive('fileId must be a positive whole number') });
const listParams = z.object({ listId: z.coerce.number().int().positive('listId must be a positive whole number') });
const hoursQuery = z.object({ year: z.coerce.number().int().min(1800).max(2200).optional() });

function countRows(text: string): number {
  let n = 0;
  for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) n++;
  return n + 1;
}

export function climateFileRoutes(deps: AppDeps): RouteSpec[] {
  const { db, pool } = deps;
  const limits = deps.uploadLimits ?? defaultUploadLimits;
  const rawUpload = express.raw({ type: () => true, limit: limits.bytes });

  /**
   * Reads the body — one raw file, or several files as multipart/form-data — and imports it on the pool:
   * a set's files are read in parallel with the same options and mapping, then joined in time order
   * (shared/climate/join-files.ts). Nothing is stored here. The body limit (413) covers the whole set. A preview goes
   * in the pool's interactive lane, an import in the long one; either stops if the client leaves.
   */
  async function importUpload(req: express.Request, res: express.Response, site: { elevationM: number; timeZone: string }, forPreview: boolean) {
    const { timeZone } = site;
    const query = climateUploadQuerySchema.parse(req.query);
    const body = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
    const boundary = multipartBoundary(req.headers['content-type']);
    const parts = boundary ? readMultipartFiles(body, boundary) : [{ fileName: query.fileName, bytes: body }];
    if (!boundary && body.byteLength === 0) {
      throw new HttpError(422, 'empty_file', 'The file is empty. Choose an hourly weather file (CSV or other delimited text).');
    }
    uploadedFilesSchema.parse(parts.map((p) => ({ fileName: p.fileName, byteLength: p.bytes.byteLength })));
    const texts = parts.map((p) => decodeClimateBytes(p.bytes));
    const rows = texts.reduce((sum, text) => sum + countRows(text), 0);
    if (rows > limits.rows) {
      throw new HttpError(
        413,
        'too_many_rows',
        `The ${parts.length > 1 ? `${parts.length} files have` : 'file has'} ${rows.toLocaleString('en')} lines; the limit is ${limits.rows.toLocaleString('en')}. Split ${parts.length > 1 ? 'the set' : 'it'} by period.`,
      );
    }
    const options = {
      mapping: query.mapping,
      maxGapHours: query.maxGapHours,
      timeZone: importTimeZone(query.timeBasis, timeZone),
      humidityOverIce: query.humidityOverIce,
      site: { elevationM: site.elevationM, timeZone },
    };
    const signal = closedRequestSignal(res);
    const lane = forPreview ? 'interactive' : 'long';
    const results: ImportResult[] = await Promise.all(texts.map((text) => pool.run('importClimate', { text, options }, { signal, lane })));
    if (parts.length === 1) return { query, parts, text: texts[0], result: results[0], original: parts[0] };
    const files = parts.map((p, i) => ({ fileName: p.fileName, bytes: p.bytes.byteLength, sha256: sha256(p.bytes), result: results[i] }));
    const result = joinClimateFiles(files, query.maxGapHours, timeZone);
    const setName = query.name ?? defaultSetName(result.report.files.map((f) => f.fileName));
    // The originals of a set are kept as one POSIX tar archive, each file byte for byte, in time order; entries carry
    // no upload time (mtime 0), so the same set always gives the same archive and the same SHA-256.
    const inTimeOrder = result.report.files.map((f) => parts.find((p) => p.fileName === f.fileName)!);
    const original = { fileName: `${setName}.tar`, bytes: tarArchive(inTimeOrder, 0) };
    return { query, parts, text: texts[parts.indexOf(inTimeOrder[0])], result, original };
  }

  /**
   * The report of a preview or a refused upload as answered: when it lists only the first issues, the full list is
   * stored (among the project's newest unlinked lists) and the report says where.
   */
  async function withFullIssueList(req: express.Request, result: ImportResult): Promise<ImportReport> {
    const packed = await packIssueList(result);
    if (!packed) return result.report;
    const list = saveIssueList(db, { projectId: req.projectId!, climateFileId: null, createdBy: req.user?.id ?? null, list: packed });
    return { ...result.report, fullIssueList: { path: list.path, issues: list.issues } };
  }

  function fileOr404(projectId: number, fileIdParam: unknown) {
    const { fileId } = fileParams.parse({ fileId: fileIdParam });
    const file = findClimateFile(db, projectId, fileId);
    if (!file) throw new HttpError(404, 'not_found', `Climate file ${fileId} was not found in this project.`);
    return file;
  }

  function seriesOf(fileId: number): ClimateSeries {
    const series = loadClimateSeries(db, fileId);
    if (!series) throw new HttpError(404, 'not_found', `Climate file ${fileId} has no stored series.`);
    return series;
  }

  /**
   * A stored file's hourly CSV or hours JSON, built on the pool's interactive lane from the undecoded columns (a
   * century of hours takes seconds, which on the main thread would stall every other request), stopped if the
   * client leaves.
   */
  async function formatOnPool(
    res: express.Response,
    fileId: number,
    format: 'csv' | 'hours-json',
    year?: { year: number; offsetMinutes: number },
  ): Promise<Buffer> {
    const encoded = loadEncodedSeries(db, fileId);
    if (!encoded) throw new HttpError(404, 'not_found', `Climate file ${fileId} has no stored series.`);
    const bytes = await pool.run('formatClimateSeries', { encoded, format, year }, { lane: 'interactive', signal: closedRequestSignal(res) });
    return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  }

  return [
    route('get', '/projects/:projectId/climate-files', access.viewer, (req, res) => {
      const rows = db
        .select({ file: climateFiles, siteName: sites.name, siteElevationM: sites.elevationM })
        .from(climateFiles)
        .innerJoin(sites, eq(sites.id, climateFiles.siteId))
        .where(eq(climateFiles.projectId, req.projectId!))
        .orderBy(desc(climateFiles.createdAt))
        .all();
      // The site's elevation rides along: forms check a setpoint against the envelope derated for it.
      res.json({ climateFiles: rows.map(({ file, siteName, siteElevationM }) => ({ ...listing(file, siteName), siteElevationM })) });
    }),

    route('post', '/projects/:projectId/sites/:siteId/climate-files/preview', access.engineer, rawUpload, async (req, res) => {
      const { siteId } = siteParams.parse(req.params);
      const site = findSite(deps, req.projectId!, siteId);
      const { result, text } = await importUpload(req, res, site, true);
      const report = await withFullIssueList(req, result);
      const s = result.series;
      const hours = s
        ? Array.from({ length: Math.min(previewHours, s.timestampsMs.length) }, (_, i) => ({
            timestampMs: s.timestampsMs[i],
            dryBulbC: nullIfNaN(s.dryBulbC[i]),
            humidity: nullIfNaN(s.humidity.values[i]),
            pressurePa: s.pressurePa ? nullIfNaN(s.pressurePa[i]) : null,
            flag: s.flags[i],
          }))
        : [];
      res.json({
        ok: result.ok,
        mapping: result.mapping,
        report,
        humidityKind: s?.humidity.kind ?? null,
        firstLines: firstLinesEchoed(text),
        preview: hours,
      });
    }),

    route('post', '/projects/:projectId/sites/:siteId/climate-files', access.engineer, rawUpload, async (req, res) => {
      const { siteId } = siteParams.parse(req.params);
      const site = findSite(deps, req.projectId!, siteId);
      // The upload itself is a floor of what it would store: refused before the import's work when even that does not fit.
      requireStorage(db, req.projectId!, storageLimitOf(deps), Buffer.isBuffer(req.body) ? req.body.byteLength : 0, 'this upload');
      const { query, parts, result, original } = await importUpload(req, res, site, false);
      const bytes = original.bytes;
      if (!result.ok || !result.series) {
        const report = await withFullIssueList(req, result);
        recordRequestAudit(db, req, 'climate.rejected', original.fileName, { siteId, files: parts.length, summary: result.report.summary });
        throw new HttpError(422, 'import_rejected', result.report.summary, { report, mapping: result.mapping });
      }
      const series = result.series;
      const issueList = await packIssueList(result);
      const row = db.transaction((tx) => {
        const hours = series.timestampsMs.length;
        requireStorage(tx, req.projectId!, storageLimitOf(deps), climateFileBytes(bytes.byteLength, hours, series.pressurePa !== null), 'this climate file');
        const list = issueList && saveIssueList(tx, { projectId: req.projectId!, climateFileId: null, createdBy: req.user?.id ?? null, list: issueList });
        const report = { ...result.report, fullIssueList: list && { path: list.path, issues: list.issues } };
        const saved = saveClimateFile(tx, {
          projectId: req.projectId!,
          siteId,
          name: query.name ?? original.fileName.replace(/\.[^.]+$/, ''),
          originalFileName: original.fileName,
          bytes,
          imported: { ...result, report, series },
          createdBy: req.user?.id ?? null,
        });
        if (list) linkIssueList(tx, list.id, saved.id);
        recordRequestAudit(tx, req, 'climate.import', saved.name, {
          climateFileId: saved.id,
          fileName: original.fileName,
          files: parts.length,
          bytes: bytes.byteLength,
          hours: saved.hours,
          filledHours: saved.filledHours,
          missingHours: saved.missingHours,
        });
        return saved;
      });
      res.status(201).json({ climateFile: listing(row, site.name), report: JSON.parse(row.reportJson) as ImportReport });
    }),

    route('get', '/projects/:projectId/climate-files/:fileId', access.viewer, async (req, res) => {
      const file = fileOr404(req.projectId!, req.params.fileId);
      const site = findSite(deps, req.projectId!, file.siteId);
      const series = seriesOf(file.id);
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
      const { year } = hoursQuery.parse(req.query);
      // a calendar year on the site's standard time, as the file page and run pages count years
      const window = year === undefined ? undefined : { year, offsetMinutes: standardOffsetMinutes(findSite(deps, req.projectId!, file.siteId).timeZone) };
      const bytes = await formatOnPool(res, file.id, 'hours-json', window);
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
      const bytes = await formatOnPool(res, file.id, 'csv');
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
      db.transaction((tx) => {
        tx.delete(climateFiles).where(eq(climateFiles.id, file.id)).run();
        recordRequestAudit(tx, req, 'climate.delete', file.name, { climateFileId: file.id });
      });
      res.status(204).end();
    }),
  ];
}

/** The zone the importer reads local timestamps in, for the chosen time basis. */
function importTimeZone(basis: 'site-civil' | 'site-standard' | 'utc', siteTimeZone: string): string {
  if (basis === 'utc') return 'UTC';
  if (basis === 'site-civil') return siteTimeZone;
  return fixedOffsetZone(standardOffsetMinutes(siteTimeZone));
}

function sha256(bytes: Buffer): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** "2019–2021 (3 files)": the first and last names of a set without their extensions, in time order. */
function defaultSetName(fileNames: string[]): string {
  const bare = fileNames.map((n) => n.replace(/\.[^.]+$/, ''));
  return `${bare[0]}–${bare[bare.length - 1]} (${bare.length} files)`;
}

function nullIfNaN(v: number): number | null {
  return v === v ? v : null;
}

/**
 * A file as lists show it: no mapping or report, but the calendar years it covers on its own clock, and for a
 * future-climate projection (parentId, derivationJson) a short note of what it was made from.
 */
export function listing(file: typeof climateFiles.$inferSelect, siteName: string) {
  const { mappingJson: _m, reportJson, derivationJson, ...rest } = file;
  const { years } = JSON.parse(reportJson) as ImportReport;
  return { ...rest, siteName, years, projection: derivationJson ? projectionNote(derivationJson) : null };
}

/** What a list says of a projection: its method and the parent's name (kept after the parent is deleted). */
function projectionNote(derivationJson: string): { method: string; parentName: string } {
  const d = JSON.parse(derivationJson) as { method?: string; parent?: { name?: string } };
  return { method: d.method ?? 'projection', parentName: d.parent?.name ?? 'an earlier file' };
}
