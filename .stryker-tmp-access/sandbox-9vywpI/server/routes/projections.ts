// @ts-nocheck
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { cleanedSeriesCsv, importClimateText, standardOffsetMinutes, type ClimateSeries, type ImportReport } from '../../shared/climate';
import {
  describeFactorIssues,
  MORPHING_CITATION,
  projectionRequestSchema,
  type ChangeFactors,
  type Derivation,
  type ProjectionRequest,
} from '../../shared/morphing';
import type { MorphClimateTaskResult } from '../../workers/morph-climate';
import type { AppDeps } from '../app';
import type { DbOrTx } from '../db/client';
import { access, route, type RouteSpec } from '../auth/access';
import { recordRequestAudit } from '../auth/audit';
import { findClimateFile, loadClimateSeries, saveClimateFile } from '../climate/store';
import { climateFiles } from '../db/schema';
import { HttpError } from '../http-error';
import { closedRequestSignal } from '../request-signal';
import { climateFileBytes, requireStorage, storageLimitOf } from '../storage/quota';
import { listing } from './climate-files';
import { findSite } from './sites';

const fileParams = z.object({ fileId: z.coerce.number().int().positive('fileId must be a positive whole number') });

export const PROJECTION_METHOD = 'Belcher, Hacker and Powell (2005) morphing';
export const PROJECTION_NOTE =
  'A projection: the parent file re-shaped by the stated monthly change factors. It is a what-if for design comparison, not a forecast of any year.';

/** Future-climate files derived from an uploaded one by Belcher morphing. */
export function projectionRoutes(deps: AppDeps): RouteSpec[] {
  const { db, pool } = deps;

  function parentOf(projectId: number, fileIdParam: unknown) {
    const { fileId } = fileParams.parse({ fileId: fileIdParam });
    const file = findClimateFile(db, projectId, fileId);
    if (!file) throw new HttpError(404, 'not_found', `Climate file ${fileId} was not found in this project.`);
    const series = loadClimateSeries(db, file.id);
    if (!series) throw new HttpError(404, 'not_found', `Climate file ${fileId} has no stored series.`);
    return { file, series, site: findSite(deps, projectId, file.siteId) };
  }

  function requestOf(body: unknown): ProjectionRequest {
    const parsed = projectionRequestSchema.safeParse(body);
    if (parsed.success) return parsed.data;
    const problems = describeFactorIssues(parsed.error.issues);
    throw new HttpError(400, 'invalid_factors', `The change factors were refused: ${problems.join('; ')}.`, { problems });
  }

  /** Morphs on the pool (a preview in its interactive lane), stopped if the client leaves; refusals (a daily range turned upside down) come back as 422 naming the month. */
  async function morph(series: ClimateSeries, timeZone: string, elevationM: number, factors: ChangeFactors, keepSeries: boolean, signal: AbortSignal) {
    const utcOffsetMinutes = standardOffsetMinutes(timeZone);
    const result: MorphClimateTaskResult = await pool.run(
      'morphClimate',
      {
        series,
        factors,
        utcOffsetMinutes,
        elevationM,
        keepSeries,
      },
      { lane: keepSeries ? 'long' : 'interactive', signal },
    );
    if (!result.ok) {
      throw new HttpError(422, 'invalid_factors', `The change factors do not fit this file: ${result.problems.join('; ')}.`, { problems: result.problems });
    }
    return { ...result, utcOffsetMinutes };
  }

  return [
    route('post', '/projects/:projectId/climate-files/:fileId/projections/preview', access.engineer, async (req, res) => {
      const { factors } = requestOf(req.body);
      const { series, site } = parentOf(req.projectId!, req.params.fileId);
      const out = await morph(series, site.timeZone, site.elevationM, factors, false, closedRequestSignal(res));
      res.json({
        comparison: { parent: out.parentMonthly, projection: out.projectionMonthly },
        alphaByMonth: out.alphaByMonth,
        clampedHighHours: out.clampedHighHours,
        clampedLowHours: out.clampedLowHours,
        lostHours: out.lostHours,
      });
    }),

    route('post', '/projects/:projectId/climate-files/:fileId/projections', access.engineer, async (req, res) => {
      const body = requestOf(req.body);
      const { file: parent, series, site } = parentOf(req.projectId!, req.params.fileId);
      const out = await morph(series, site.timeZone, site.elevationM, body.factors, true, closedRequestSignal(res));
      const { row, derivation } = db.transaction((tx) => {
        // The projection stores its series and, as its original, the series as CSV (its few head lines left out here).
        const hours = out.series?.timestampsMs.length ?? 0;
        requireStorage(
          tx,
          req.projectId!,
          storageLimitOf(deps),
          climateFileBytes(out.seriesCsv?.byteLength ?? 0, hours, Boolean(out.series?.pressurePa)),
          'the projection',
        );
        const stored = storeProjection(tx, { projectId: req.projectId!, parent, request: body, morphed: out, createdBy: req.user?.id ?? null });
        recordRequestAudit(tx, req, 'climate.project', stored.row.name, {
          climateFileId: stored.row.id,
          parentId: parent.id,
          parentName: parent.name,
          method: PROJECTION_METHOD,
          dryBulbMethod: body.factors.dryBulbMethod,
          humidityMethod: body.factors.humidityMethod,
          clampedHighHours: out.clampedHighHours,
          clampedLowHours: out.clampedLowHours,
        });
        return stored;
      });
      res.status(201).json({ climateFile: listing(row, site.name), derivation });
    }),

    route('get', '/projects/:projectId/projections/:fileId', access.viewer, (req, res) => {
      const { fileId } = fileParams.parse({ fileId: req.params.fileId });
      const file = findClimateFile(db, req.projectId!, fileId);
      if (!file) throw new HttpError(404, 'not_found', `Climate file ${fileId} was not found in this project.`);
      if (!file.derivationJson) throw new HttpError(404, 'not_a_projection', `Climate file "${file.name}" is an upload, not a projection.`);
      const site = findSite(deps, req.projectId!, file.siteId);
      const parent = file.parentId ? findClimateFile(db, req.projectId!, file.parentId) : undefined;
      res.json({
        climateFile: listing(file, site.name),
        parent: parent ? listing(parent, site.name) : null,
        derivation: JSON.parse(file.derivationJson) as Derivation,
      });
    }),
  ];
}

/**
 * Stores a morphed series as a projection: a climate file on the parent's site with its parentId and derivation,
 * and as its downloadable original the canonical CSV headed by what it is. Call inside a transaction.
 */
export function storeProjection(
  tx: DbOrTx,
  input: {
    projectId: number;
    parent: typeof climateFiles.$inferSelect;
    request: ProjectionRequest;
    morphed: Extract<MorphClimateTaskResult, { ok: true }> & { utcOffsetMinutes: number };
    createdBy: number | null;
  },
): { row: typeof climateFiles.$inferSelect; derivation: Derivation } {
  const { parent, request, morphed: out } = input;
  if (!out.series) throw new Error('storeProjection needs the morphed series (keepSeries: true)');
  // The name says it is a projection, so every list and picker that shows only names says so too.
  const name = projectionName(request.name ?? `${parent.name} — projection`);
  const derivation: Derivation = {
    kind: 'projection',
    method: PROJECTION_METHOD,
    citation: MORPHING_CITATION,
    note: PROJECTION_NOTE,
    humidityQuantity: 'specific humidity',
    parent: { id: parent.id, name: parent.name, sha256: parent.sha256, hours: parent.hours },
    source: request.source ?? null,
    factors: request.factors,
    utcOffsetMinutes: out.utcOffsetMinutes,
    alphaByMonth: out.alphaByMonth,
    clampedHighHours: out.clampedHighHours,
    clampedLowHours: out.clampedLowHours,
    lostHours: out.lostHours,
    comparison: { parent: out.parentMonthly, projection: out.projectionMonthly },
  };
  const csv = projectionCsv(out.seriesCsv ?? Buffer.from(cleanedSeriesCsv(out.series)), name, derivation);
  const report = projectionReport(JSON.parse(parent.reportJson) as ImportReport, out.series, derivation);
  // The mapping the importer reads from the CSV's head: what an upload of the download would be mapped as.
  const mapping = importClimateText(csv.subarray(0, 16_384).toString('utf8').split('\n', 60).join('\n'), { timeZone: 'UTC' }).mapping;
  const saved = saveClimateFile(tx, {
    projectId: input.projectId,
    siteId: parent.siteId,
    name,
    originalFileName: `${fileNameOf(name)}.csv`,
    bytes: csv,
    imported: { ok: true, series: out.series, report, mapping },
    createdBy: input.createdBy,
  });
  const link = { parentId: parent.id, derivationJson: JSON.stringify(derivation) };
  tx.update(climateFiles).set(link).where(eq(climateFiles.id, saved.id)).run();
  return { row: { ...saved, ...link }, derivation };
}

/** The name as given, with " (projection)" added unless it already says so. */
export function projectionName(name: string): string {
  return /projection/i.test(name) ? name : `${name} (projection)`;
}

/** A file name from a display name: letters, digits and dashes. */
function fileNameOf(name: string): string {
  return (
    name
      .normalize('NFKD')
      .replace(/[^\w.-]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 80) || 'projection'
  );
}

/**
 * The projection's downloadable "original": the series in the canonical columns (the same writer as the
 * hourly download), headed by comment lines saying what it is, so it can be uploaded again as it stands.
 */
function projectionCsv(seriesCsv: Uint8Array, name: string, d: Derivation): Buffer {
  const oneLine = (s: string) => s.replace(/[\r\n]+/g, ' ');
  const head = [
    `# ${oneLine(name)}: future-climate projection, not measured weather`,
    `# Made from "${oneLine(d.parent.name)}" by ${d.method}; dry-bulb by ${d.factors.dryBulbMethod}, specific humidity by ${d.factors.humidityMethod}`,
    `# ${d.citation}`,
    `# ${d.note}`,
  ];
  return Buffer.concat([Buffer.from(`${head.join('\n')}\n`), seriesCsv]);
}

/** The parent's validation report, restated for the projection (its line-level issues belong to the parent's file). */
function projectionReport(parent: ImportReport, series: ClimateSeries, d: Derivation): ImportReport {
  let measured = 0;
  let filled = 0;
  for (const f of series.flags) {
    if (f === 0) measured++;
    else if (f === 1) filled++;
  }
  const hours = series.flags.length;
  const bounded = d.clampedHighHours + d.clampedLowHours;
  return {
    ...parent,
    summary:
      `Projection of "${d.parent.name}" by ${d.method}: ${hours.toLocaleString('en')} hours, ` +
      `${(hours - measured - filled).toLocaleString('en')} without data; relative humidity bounded to 0–100 % in ${bounded.toLocaleString('en')} hours.`,
    counts: { ...parent.counts, hours, measuredHours: measured, filledHours: filled, missingHours: hours - measured - filled },
    issues: [],
    // The parent's series was stored over liquid water whatever its file said; the projection's RH is computed over water.
    humidityOverIce: false,
  };
}
