import type { Request, Response } from 'express';
import { z } from 'zod';
import type { ReportData, SummaryUnits } from '../../shared/report';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { systemClock } from '../auth/session';
import { perAddressLimit } from '../middleware/rate-limit';
import { reportDownload, type ReportFile } from '../reports/downloads';
import { comparisonQuery, comparisonReport, runReport } from '../reports/load-report';
import { createShareInput, createShareLink, linkedReport, listLinks, resolveShareToken, revokeShareLink } from '../reports/share-links';
import { closedRequestSignal } from '../request-signal';

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

/** Report data, hourly and summary downloads, and read-only share links. */
export function reportRoutes(deps: AppDeps): RouteSpec[] {
  const { db } = deps;
  const now = () => (deps.clock ?? systemClock)();
  // One limiter for both share-link routes, so a reader's report and downloads count together.
  const sharedLimit = perAddressLimit(
    deps.sharedLinkRateLimit ?? { limit: 120, windowMs: 60_000 },
    'Too many report-link requests from this address; wait a minute and try again.',
  );

  /** Answers one download of a report in the units the query asks for. */
  async function sendDownload(req: Request, res: Response, projectId: number, report: ReportData, file: ReportFile, runId?: number) {
    const { units } = unitsQuery.parse(req.query);
    const download = await reportDownload(deps, projectId, report, file, units, closedRequestSignal(res), runId);
    res.attachment(download.fileName).type(download.type).send(download.body);
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
      await sendDownload(req, res, req.projectId!, runReport(db, req.projectId!, runId, now()), file);
    }),

    route('get', '/projects/:projectId/compare/downloads/:file', access.viewer, async (req, res) => {
      const file = comparisonFile.parse(req.params.file);
      const { runIds, baselineId } = comparisonQuery.parse(req.query);
      await sendDownload(req, res, req.projectId!, comparisonReport(db, req.projectId!, runIds, baselineId, now()), file);
    }),

    route('get', '/projects/:projectId/share-links', access.owner, (req, res) => {
      res.json({ links: listLinks(db, req.projectId!, now()) });
    }),

    route('post', '/projects/:projectId/share-links', access.owner, (req, res) => {
      const input = createShareInput.parse(req.body);
      const { link, token } = createShareLink(db, req.projectId!, input, { user: req.user!, projectId: req.projectId }, now());
      // The token is shown this once; only its SHA-256 is kept.
      res.status(201).json({ link, token, path: `/shared/${token}` });
    }),

    route('post', '/projects/:projectId/share-links/:linkId/revoke', access.owner, (req, res) => {
      const { linkId } = linkParams.parse(req.params);
      res.json({ link: revokeShareLink(db, req.projectId!, linkId, req, now()) });
    }),

    // Anyone may ask; resolveShareToken decides: public until its date, otherwise the project's members only.
    route('get', '/shared/:token', access.public, sharedLimit, (req, res) => {
      const link = resolveShareToken(db, req, String(req.params.token), now());
      res.json({
        link: { title: link.title, target: link.target, publicUntil: link.publicUntil?.toISOString() ?? null },
        report: linkedReport(db, link, now()),
      });
    }),

    route('get', '/shared/:token/downloads/:file', access.public, sharedLimit, async (req, res) => {
      const link = resolveShareToken(db, req, String(req.params.token), now());
      const file = runFile.parse(req.params.file);
      const { run } = sharedRunQuery.parse(req.query);
      await sendDownload(req, res, link.projectId, linkedReport(db, link, now()), file, run);
    }),
  ];
}
