import { z } from 'zod';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { HttpError } from '../http-error';
import { storageLimitOf } from '../storage/quota';
import { hourColumnsOf } from '../reports/hourly-results';
import { closedRequestSignal } from '../request-signal';
import { HOUR_COLUMN_NAMES, type HourColumnName } from '../../shared/report/hour-columns';
import { createRunReads, runJsonText } from '../runs/run-json';
import { cancelRun, deleteRun, runModeHours, startRuns } from '../runs/store';
import { createReadCache } from '../read-cache';
import type { runs } from '../db/schema';

const runParams = z.object({ runId: z.coerce.number().int().positive('runId must be a positive whole number') });
const maxRunsPerRequest = 200;

/**
 * `?columns=modes,dryBulbC` picks columns of the hour-columns message (all of them when absent); `&bins=2` adds the
 * dry-bulb bins of that width (K) to its header, on a grid with an edge at `&binOrigin` (°C, 0 when absent; IP pages
 * ask for 5 °F bins from 0 °F).
 */
const hourColumnsQuery = z.object({
  bins: z.coerce.number().min(0.5, 'bins must be at least 0.5 K').max(10, 'bins must be at most 10 K').optional(),
  binOrigin: z.coerce.number().min(-50, 'binOrigin must be at least -50 °C').max(50, 'binOrigin must be at most 50 °C').optional(),
  columns: z
    .string()
    .optional()
    .transform((list) => (list === undefined ? [...HOUR_COLUMN_NAMES] : list.split(',').map((name) => name.trim())))
    .pipe(
      z
        .array(
          z.enum(HOUR_COLUMN_NAMES as [HourColumnName, ...HourColumnName[]], {
            error: (issue) => `columns: unknown column "${String(issue.input)}"; known: ${HOUR_COLUMN_NAMES.join(', ')}`,
          }),
        )
        .min(1, 'columns must name at least one column'),
    ),
});

/** One scenario on several climate files, several scenarios on one file, or any grid of both (a sweep). */
const createRunsInput = z
  .object({
    scenarioIds: z.array(z.number().int().positive()).min(1, 'scenarioIds must name at least one scenario'),
    climateFileIds: z.array(z.number().int().positive()).min(1, 'climateFileIds must name at least one climate file'),
    /**
     * Reuse a run of the same scenario inputs on the same file, site snapshot and engine that is queued, running or done
     * (not a sweep point) instead of queueing it again ("Run on today and on the projection").
     */
    reuse: z.boolean({ error: 'reuse must be true or false' }).default(false),
  })
  .refine((r) => r.scenarioIds.length * r.climateFileIds.length <= maxRunsPerRequest, {
    message: `at most ${maxRunsPerRequest} runs per request`,
  });

export function runRoutes(deps: AppDeps): RouteSpec[] {
  const { db, runQueue, pool } = deps;

  const readCache = createReadCache(db);
  const reads = createRunReads(db);

  function runWithSweepOr404(projectId: number, params: unknown) {
    const { runId } = runParams.parse(params);
    const found = reads.one(projectId, runId);
    if (!found) throw new HttpError(404, 'not_found', `Run ${runId} was not found in this project.`);
    return found;
  }
  const runOr404 = (projectId: number, params: unknown) => runWithSweepOr404(projectId, params).run;
  const runText = ({ run, sweepName }: { run: typeof runs.$inferSelect; sweepName: string | null }) => runJsonText(run, sweepName, run.resultsJson);

  return [
    route('get', '/projects/:projectId/runs', access.viewer, (req, res) => {
      // The listing leaves out the per-month tables; the run page fetches the whole run. Sweep points carry their
      // sweep's name, so lists can fold a sweep's points into one named row.
      readCache.sendJson(req, res, `runs:${req.projectId}`, () => reads.listingText(req.projectId!));
    }),

    route('post', '/projects/:projectId/runs', access.engineer, (req, res) => {
      const input = createRunsInput.parse(req.body);
      const { created, reused } = startRuns(db, runQueue, { projectId: req.projectId!, ...input, storageLimitBytes: storageLimitOf(deps) }, req);
      // Each run as GET gives it, plus whether it is an earlier identical run reused rather than a new one.
      const createdText = created.map((run) => `${runText({ run, sweepName: null }).slice(0, -1)},"reused":${reused.has(run.id)}}`);
      res
        .status(202)
        .type('json')
        .send(`{"runs":[${createdText.join(',')}]}`);
    }),

    route('get', '/projects/:projectId/runs/:runId', access.viewer, (req, res) => {
      const { runId } = runParams.parse(req.params);
      readCache.sendJson(req, res, `run:${req.projectId}:${runId}`, () => `{"run":${runText(runWithSweepOr404(req.projectId!, req.params))}}`);
    }),

    route('get', '/projects/:projectId/runs/:runId/hours', access.viewer, (req, res) => {
      const run = runOr404(req.projectId!, req.params);
      res.json(runModeHours(db, run));
    }),

    // The run page's hourly views: typed columns in one binary message (shared/report/hour-columns.ts), made on the pool.
    route('get', '/projects/:projectId/runs/:runId/hour-columns', access.viewer, async (req, res) => {
      const run = runOr404(req.projectId!, req.params);
      const { columns, bins, binOrigin } = hourColumnsQuery.parse(req.query);
      const gzip = /\bgzip\b/.test(req.get('accept-encoding') ?? '');
      const bytes = await hourColumnsOf(db, pool, run, { columns, gzip, binWidthK: bins, binOriginC: binOrigin }, closedRequestSignal(res));
      res.type('application/octet-stream').vary('Accept-Encoding');
      if (gzip) res.set('Content-Encoding', 'gzip');
      res.send(bytes);
    }),

    route('post', '/projects/:projectId/runs/:runId/cancel', access.engineer, (req, res) => {
      const run = runOr404(req.projectId!, req.params);
      cancelRun(db, runQueue, run, req);
      const { runId } = runParams.parse(req.params);
      readCache.sendJson(req, res, `run:${req.projectId}:${runId}`, () => `{"run":${runText(runWithSweepOr404(req.projectId!, req.params))}}`);
    }),

    route('delete', '/projects/:projectId/runs/:runId', access.engineer, (req, res) => {
      const run = runOr404(req.projectId!, req.params);
      deleteRun(db, runQueue, run, req);
      res.status(204).end();
    }),
  ];
}
