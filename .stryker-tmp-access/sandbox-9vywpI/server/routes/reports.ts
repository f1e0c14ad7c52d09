// @ts-nocheck
import type { Response } from 'express';
import { and, eq } from 'drizzle-orm';
import { z } from 'zod';
import {
  comparisonCsv,
  comparisonRows,
  runSummaryRows,
  summaryCsv,
  summaryRowsIn,
  type ReportData,
  type ReportRun,
  type SummaryUnits,
} from '../../shared/report';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordRequestAudit } from '../auth/audit';
import { systemClock } from '../auth/session';
import { runs, shareLinks } from '../db/schema';
import { HttpError } from '../http-error';
import { perAddressLimit } from '../middleware/rate-limit';
import { hourlyFileOf } from '../reports/hourly-results';
import { closedRequestSignal } from '../request-signal';
import { comparisonQuery, comparisonReport, runReport } from '../reports/load-report';
import { checkPublicUntil, createShareInput, listLinks, newShareToken, presentLink, resolveShareToken } from '../reports/share-links';

const runParams = z.object({ runId: z.coerce.number().int().positive('runId must be a positive whole number') });
const linkParams = z.object({ linkId: z.coerce.number().int().positive('linkId must be a positive whole number') });
const runFile = z.enum(['hourly.csv', 'hourly.json', 'summary.csv', 'summary.json'], {
  error: 'the download must be hourly.csv, hourly.json, summary.csv or summary.json',
});
const comparisonFile = z.enum(['summary.csv', 'summary.json'], { error: 'the download must be summary.csv or summary.json' });
const sharedRunQuery = z.object({ run: z.coerce.number().int().positive('run must be a run number').optional() });
/** `?units=ip` gives the summaries in IP (°F, ft, US gal); the hourly files stay SI, as the command line writes them. */
const unitsQuery = z.object({
  units: z
    .enum(['si', 'ip', 'SI', 'IP'], { error: "units must be 'si' or 'ip'" })
    .optional()
    .transform((u): SummaryUnits => (u?.toUpperCase() === 'IP' ? 'IP' : 'SI')),
});

/** Lower-case ASCII words joined by hyphens, for file names that survive every system. */
export function fileSlug(text: string): string {
  const slug = text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/ß/g, 'ss')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/, '');
  return slug || 'report';
}

const runFileName = (run: ReportRun, what: string, ext: string) => `run-${run.id}-${fileSlug(run.scenario.name)}-${what}.${ext}`;

/** Answers one download of a report: the hourly results of one of its runs (made on the pool), or its summary. */
async function sendDownload(
  { db, pool }: Pick<AppDeps, 'db' | 'pool'>,
  res: Response,
  projectId: number,
  report: ReportData,
  file: z.infer<typeof runFile>,
  query: unknown,
  runId?: number,
): Promise<void> {
  const { units } = unitsQuery.parse(query);
  const suffix = units === 'IP' ? '-ip' : '';
  const reportRuns = report.kind === 'run' ? [report.run] : report.runs;
  if (file === 'hourly.csv' || file === 'hourly.json') {
    const run = reportRuns.find((r) => r.id === (runId ?? reportRuns[0].id));
    if (!run) throw new HttpError(404, 'not_found', `Run ${runId} is not part of this report.`);
    const row = db
      .select()
      .from(runs)
      .where(and(eq(runs.id, run.id), eq(runs.projectId, projectId)))
      .get();
    if (!row) throw new HttpError(404, 'not_found', `Run ${run.id} was not found in this project.`);
    if (file === 'hourly.json') {
      const about = { id: run.id, scenario: run.scenario.name, site: run.site.name, climateFile: run.climate.name };
      const bytes = await hourlyFileOf(db, pool, row, 'json', about, closedRequestSignal(res));
      res
        .attachment(runFileName(run, 'hourly', 'json'))
        .type('application/json')
        .send(bytes);
      return;
    }
    const bytes = await hourlyFileOf(db, pool, row, 'csv', undefined, closedRequestSignal(res));
    res
      .attachment(runFileName(run, 'hourly', 'csv'))
      .type('text/csv; charset=utf-8')
      .send(bytes);
    return;
  }
  if (report.kind === 'run') {
    const run = report.run;
    const rows = summaryRowsIn(runSummaryRows(run), units);
    if (file === 'summary.csv') {
      res
        .attachment(runFileName(run, `summary${suffix}`, 'csv'))
        .type('text/csv; charset=utf-8')
        .send(summaryCsv(rows));
    } else {
      res.attachment(runFileName(run, `summary${suffix}`, 'json')).type('application/json');
      // The report data itself stays in SI, as the engine computed it; the rows are in the units asked for.
      res.send(JSON.stringify({ report, units, summary: rows }, null, 1));
    }
    return;
  }
  const name = `comparison-${report.runs.map((r) => r.id).join('-')}-summary${suffix}`;
  if (file === 'summary.csv') {
    res
      .attachment(`${name}.csv`)
      .type('text/csv; charset=utf-8')
      .send(comparisonCsv(report.runs, report.baselineId, units));
  } else {
    res.attachment(`${name}.json`).type('application/json');
    res.send(JSON.stringify({ report, units, table: comparisonRows(report.runs, report.baselineId, units) }, null, 1));
  }
}

/** Report data, hourly and summary downloads, and read-only share links. */
export function reportRoutes(deps: AppDeps): RouteSpec[] {
  const { db } = deps;
  const now = () => (deps.clock ?? systemClock)();
  // One limiter for both share-link routes, so a reader's report and downloads count together.
  const sharedLimit = perAddressLimit(
    deps.sharedLinkRateLimit ?? { limit: 120, windowMs: 60_000 },
    'Too many report-link requests from this address; wait a minute and try again.',
  );

  /** The report a share link shows, built afresh from the runs it names. */
  function linkedReport(link: typeof shareLinks.$inferSelect): ReportData {
    const runIds = JSON.parse(link.runIdsJson) as number[];
    return link.target === 'run' ? runReport(db, link.projectId, runIds[0], now()) : comparisonReport(db, link.projectId, runIds, runIds[0], now());
  }

  return [
    route('get', '/projects/:projectId/runs/:runId/report', access.viewer, (req, res) => {
      const { runId } = runParams.parse(req.params);
      res.json({ report: runReport(db, req.projectId!, runId, now()) });
    }),

    route('get', '/projects/:projectId/compare/report', access.viewer, (req, res) => {
      const { runIds, baselineId } = comparisonQuery.parse(req.query);
      res.json({ report: comparisonReport(db, req.projectId!, runIds, baselineId, now()) });
    }),

    route('get', '/projects/:projectId/runs/:runId/downloads/:file', access.viewer, async (req, res) => {
      const { runId } = runParams.parse(req.params);
      const file = runFile.parse(req.params.file);
      await sendDownload(deps, res, req.projectId!, runReport(db, req.projectId!, runId, now()), file, req.query);
    }),

    route('get', '/projects/:projectId/compare/downloads/:file', access.viewer, async (req, res) => {
      const file = comparisonFile.parse(req.params.file);
      const { runIds, baselineId } = comparisonQuery.parse(req.query);
      await sendDownload(deps, res, req.projectId!, comparisonReport(db, req.projectId!, runIds, baselineId, now()), file, req.query);
    }),

    route('get', '/projects/:projectId/share-links', access.owner, (req, res) => {
      res.json({ links: listLinks(db, req.projectId!, now()) });
    }),

    route('post', '/projects/:projectId/share-links', access.owner, (req, res) => {
      const input = createShareInput.parse(req.body);
      const at = now();
      const publicUntil = checkPublicUntil(input.publicUntil, at);
      // The runs must exist here and be finished; the report is checked now rather than when a reader opens it.
      if (input.target === 'run') runReport(db, req.projectId!, input.runIds[0], at);
      else comparisonReport(db, req.projectId!, input.runIds, input.runIds[0], at);
      const { token, tokenHash } = newShareToken();
      const link = db.transaction((tx) => {
        const row = tx
          .insert(shareLinks)
          .values({
            projectId: req.projectId!,
            tokenHash,
            target: input.target,
            runIdsJson: JSON.stringify(input.runIds),
            title: input.title,
            publicUntil,
            createdBy: req.user!.id,
            createdAt: at,
          })
          .returning()
          .get();
        recordRequestAudit(tx, req, 'share.create', input.title, {
          linkId: row.id,
          target: input.target,
          runIds: input.runIds,
          publicUntil: publicUntil?.toISOString() ?? null,
        });
        return row;
      });
      // The token is shown this once; only its SHA-256 is kept.
      res.status(201).json({ link: presentLink(link, req.user!.name, at), token, path: `/shared/${token}` });
    }),

    route('post', '/projects/:projectId/share-links/:linkId/revoke', access.owner, (req, res) => {
      const { linkId } = linkParams.parse(req.params);
      const link = db
        .select()
        .from(shareLinks)
        .where(and(eq(shareLinks.id, linkId), eq(shareLinks.projectId, req.projectId!)))
        .get();
      if (!link) throw new HttpError(404, 'not_found', `Share link ${linkId} was not found in this project.`);
      const at = now();
      const revoked = db.transaction((tx) => {
        const row = link.revokedAt ? link : tx.update(shareLinks).set({ revokedAt: at }).where(eq(shareLinks.id, linkId)).returning().get();
        if (!link.revokedAt) recordRequestAudit(tx, req, 'share.revoke', link.title, { linkId, target: link.target, runIds: JSON.parse(link.runIdsJson) });
        return row;
      });
      res.json({ link: presentLink(revoked, null, at) });
    }),

    // Anyone may ask; resolveShareToken decides: public until its date, otherwise the project's members only.
    route('get', '/shared/:token', access.public, sharedLimit, (req, res) => {
      const link = resolveShareToken(db, req, String(req.params.token), now());
      res.json({
        link: { title: link.title, target: link.target, publicUntil: link.publicUntil?.toISOString() ?? null },
        report: linkedReport(link),
      });
    }),

    route('get', '/shared/:token/downloads/:file', access.public, sharedLimit, async (req, res) => {
      const link = resolveShareToken(db, req, String(req.params.token), now());
      const file = runFile.parse(req.params.file);
      const { run } = sharedRunQuery.parse(req.query);
      await sendDownload(deps, res, link.projectId, linkedReport(link), file, req.query, run);
    }),
  ];
}
