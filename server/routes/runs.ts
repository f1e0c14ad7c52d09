import { and, eq, inArray } from 'drizzle-orm';
import { z } from 'zod';
import { decodeFloat64Column, decodeUint8Column } from '../../shared/climate';
import { MODE_NAMES } from '../../shared/scenario';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordRequestAudit } from '../auth/audit';
import { findClimateFile } from '../climate/store';
import { runHours, runs, scenarios, sites } from '../db/schema';
import { HttpError } from '../http-error';
import { validScenario } from './scenarios';
import { newRunValues } from '../runs/new-run';
import { createRunReads, runJsonText } from '../runs/run-json';
import { createReadCache } from '../read-cache';

const runParams = z.object({ runId: z.coerce.number().int().positive('runId must be a positive whole number') });
const maxRunsPerRequest = 200;

/** One scenario on several climate files, several scenarios on one file, or any grid of both (a sweep). */
const createRunsInput = z
  .object({
    scenarioIds: z.array(z.number().int().positive()).min(1, 'scenarioIds must name at least one scenario'),
    climateFileIds: z.array(z.number().int().positive()).min(1, 'climateFileIds must name at least one climate file'),
  })
  .refine((r) => r.scenarioIds.length * r.climateFileIds.length <= maxRunsPerRequest, {
    message: `at most ${maxRunsPerRequest} runs per request`,
  });

export function runRoutes(deps: AppDeps): RouteSpec[] {
  const { db, runQueue } = deps;

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
      const created = db.transaction((tx) => {
        const rows = chosen.flatMap((scenarioRow) => {
          const scenario = validScenario(JSON.parse(scenarioRow.scenarioJson));
          return files.map(({ file, site }) =>
            tx
              .insert(runs)
              .values(
                newRunValues({
                  projectId,
                  scenarioId: scenarioRow.id,
                  scenarioJson: JSON.stringify(scenario),
                  file,
                  site,
                  createdBy: req.user!.id,
                }),
              )
              .returning()
              .get(),
          );
        });
        recordRequestAudit(tx, req, 'run.start', rows.length === 1 ? `run ${rows[0].id}` : `${rows.length} runs`, {
          runIds: rows.map((r) => r.id),
          scenarioIds: input.scenarioIds,
          climateFileIds: input.climateFileIds,
        });
        return rows;
      });
      for (const run of created) runQueue.enqueue(run.id);
      res.status(202).type('json').send(`{"runs":[${created.map((run) => runText({ run, sweepName: null })).join(',')}]}`);
    }),

    route('get', '/projects/:projectId/runs/:runId', access.viewer, (req, res) => {
      const { runId } = runParams.parse(req.params);
      readCache.sendJson(req, res, `run:${req.projectId}:${runId}`, () => `{"run":${runText(runWithSweepOr404(req.projectId!, req.params))}}`);
    }),

    route('get', '/projects/:projectId/runs/:runId/hours', access.viewer, (req, res) => {
      const run = runOr404(req.projectId!, req.params);
      const hours = db.select().from(runHours).where(eq(runHours.runId, run.id)).get();
      if (!hours) throw new HttpError(409, 'not_ready', `Run ${run.id} is ${run.status}; its hours exist once it is done.`);
      const fraction = decodeFloat64Column(hours.mechanicalFraction);
      res.json({
        modeNames: MODE_NAMES,
        modes: Array.from(decodeUint8Column(hours.modes)),
        mechanicalFraction: Array.from(fraction, (v) => Math.round(v * 1000) / 1000),
      });
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
