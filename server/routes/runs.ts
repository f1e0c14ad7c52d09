import { and, desc, eq, inArray, isNull } from 'drizzle-orm';
import { z } from 'zod';
import { decodeRunHours } from '../runs/run-rows';
import { MODE_NAMES } from '../../shared/scenario';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordRequestAudit } from '../auth/audit';
import { findClimateFile } from '../climate/store';
import { runHours, runs, scenarios, sites } from '../db/schema';
import { HttpError } from '../http-error';
import { requireStorage, runBytes, storageLimitOf } from '../storage/quota';
import { validScenario } from './scenarios';
import { newRunValues } from '../runs/new-run';
import { storedRunHours } from '../reports/hourly-results';
import { closedRequestSignal } from '../request-signal';
import { HOUR_COLUMN_NAMES, type HourColumnName } from '../../shared/report/hour-columns';
import { createRunReads, runJsonText } from '../runs/run-json';
import { createReadCache } from '../read-cache';

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

/**
 * A run of exactly these inputs (scenario JSON, climate and site snapshot, engine version) that is queued, running or
 * done, and not a sweep point; the newest. Reusing it gives the same results without computing them again.
 */
function identicalRun(tx: Pick<AppDeps['db'], 'select'>, values: typeof runs.$inferInsert): typeof runs.$inferSelect | undefined {
  return tx
    .select()
    .from(runs)
    .where(
      and(
        eq(runs.projectId, values.projectId),
        eq(runs.climateFileId, values.climateFileId!),
        eq(runs.scenarioJson, values.scenarioJson),
        eq(runs.climateJson, values.climateJson),
        eq(runs.engineVersion, values.engineVersion!),
        inArray(runs.status, ['queued', 'running', 'done']),
        isNull(runs.sweepId),
      ),
    )
    .orderBy(desc(runs.id))
    .get();
}

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
      const projectId = req.projectId!;
      const scenarioRows = db
        .select()
        .from(scenarios)
        .where(and(eq(scenarios.projectId, projectId), inArray(scenarios.id, input.scenarioIds)))
        .all();
      const chosen = input.scenarioIds.map((id) => {
        const row = scenarioRows.find((s) => s.id === id);
        if (!row) throw new HttpError(404, 'not_found', `Scenario ${id} was not found in this project.`);
        return row;
      });
      const files = input.climateFileIds.map((id) => {
        const file = findClimateFile(db, projectId, id);
        if (!file) throw new HttpError(404, 'not_found', `Climate file ${id} was not found in this project.`);
        const site = db.select().from(sites).where(eq(sites.id, file.siteId)).get()!;
        return { file, site };
      });
      const reused = new Set<number>();
      const created = db.transaction((tx) => {
        // Each run is counted at what it will store when done (its file's hours × RUN_BYTES_PER_HOUR), before any is queued.
        const neededBytes = chosen.length * files.reduce((sum, { file }) => sum + runBytes(file.hours), 0);
        const count = chosen.length * files.length;
        requireStorage(tx, projectId, storageLimitOf(deps), neededBytes, count === 1 ? 'the run' : `these ${count} runs`);
        const rows = chosen.flatMap((scenarioRow) => {
          const scenario = validScenario(JSON.parse(scenarioRow.scenarioJson));
          return files.map(({ file, site }) => {
            const values = newRunValues({ projectId, scenarioId: scenarioRow.id, scenarioJson: JSON.stringify(scenario), file, site, createdBy: req.user!.id });
            const same = input.reuse ? identicalRun(tx, values) : undefined;
            if (same) {
              reused.add(same.id);
              return same;
            }
            return tx.insert(runs).values(values).returning().get();
          });
        });
        recordRequestAudit(tx, req, 'run.start', rows.length === 1 ? `run ${rows[0].id}` : `${rows.length} runs`, {
          runIds: rows.map((r) => r.id),
          scenarioIds: input.scenarioIds,
          climateFileIds: input.climateFileIds,
        });
        return rows;
      });
      for (const run of created) if (!reused.has(run.id)) runQueue.enqueue(run.id);
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
      const hours = db.select().from(runHours).where(eq(runHours.runId, run.id)).get();
      if (!hours) throw new HttpError(409, 'not_ready', `Run ${run.id} is ${run.status}; its hours exist once it is done.`);
      const { modes, mechanicalFraction: fraction, humidified } = decodeRunHours(hours);
      res.json({
        modeNames: MODE_NAMES,
        modes: Array.from(modes),
        // Rounded to 0.001, but a share under 1 stays under 1: it tells a partial mechanical hour from a full one.
        mechanicalFraction: Array.from(fraction, (v) => (v < 1 ? Math.min(0.999, Math.round(v * 1000) / 1000) : 1)),
        /** 1 for a free-cooling hour whose evaporative stage only added moisture; null for runs made before engine 2.0.0. */
        humidified: humidified ? Array.from(humidified) : null,
      });
    }),

    // The run page's hourly views: typed columns in one binary message (shared/report/hour-columns.ts), made on the pool.
    route('get', '/projects/:projectId/runs/:runId/hour-columns', access.viewer, async (req, res) => {
      const run = runOr404(req.projectId!, req.params);
      const { columns, bins, binOrigin } = hourColumnsQuery.parse(req.query);
      const { series, modes, mechanicalFraction, humidified, climate } = storedRunHours(db, run);
      const gzip = /\bgzip\b/.test(req.get('accept-encoding') ?? '');
      const bytes = await pool.run(
        'hourColumns',
        { series, elevationM: climate.elevationM, modes, mechanicalFraction, humidified, columns, gzip, binWidthK: bins, binOriginC: binOrigin },
        {
          lane: 'interactive',
          signal: closedRequestSignal(res),
          // freshly decoded copies, each on its own buffer: moved to the thread, not copied
          transferList: [series.timestampsMs, series.dryBulbC, series.humidity.values, series.pressurePa, series.flags, modes, mechanicalFraction, humidified]
            .filter((a) => a !== null)
            .map((a) => a.buffer as ArrayBuffer),
        },
      );
      res.type('application/octet-stream').vary('Accept-Encoding');
      if (gzip) res.set('Content-Encoding', 'gzip');
      res.send(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength));
    }),

    route('post', '/projects/:projectId/runs/:runId/cancel', access.engineer, (req, res) => {
      const run = runOr404(req.projectId!, req.params);
      if (!runQueue.cancel(run.id)) throw new HttpError(409, 'not_cancellable', `Run ${run.id} is ${run.status} and cannot be cancelled.`);
      recordRequestAudit(db, req, 'run.cancel', `run ${run.id}`, { runId: run.id });
      const { runId } = runParams.parse(req.params);
      readCache.sendJson(req, res, `run:${req.projectId}:${runId}`, () => `{"run":${runText(runWithSweepOr404(req.projectId!, req.params))}}`);
    }),

    route('delete', '/projects/:projectId/runs/:runId', access.engineer, (req, res) => {
      const run = runOr404(req.projectId!, req.params);
      runQueue.cancel(run.id);
      db.transaction((tx) => {
        tx.delete(runs).where(eq(runs.id, run.id)).run();
        recordRequestAudit(tx, req, 'run.delete', `run ${run.id}`, { runId: run.id, status: run.status });
      });
      res.status(204).end();
    }),
  ];
}
