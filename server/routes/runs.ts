import { and, desc, eq, inArray, isNull } from 'drizzle-orm';
import { z } from 'zod';
import { decodeFloat64Column, decodeUint8Column } from '../../shared/climate';
import { MODE_NAMES } from '../../shared/scenario';
import type { SweepPointValues } from '../../shared/sweep';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordRequestAudit } from '../auth/audit';
import { findClimateFile } from '../climate/store';
import { runHours, runs, scenarios, sites, sweeps } from '../db/schema';
import { HttpError } from '../http-error';
import { validScenario } from './scenarios';
import { newRunValues } from '../runs/new-run';

const runParams = z.object({ runId: z.coerce.number().int().positive('runId must be a positive whole number') });
const maxRunsPerRequest = 200;

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

/**
 * A run as the API gives it: the stored JSON parsed. A sweep's point also carries its sweep's name and the swept
 * inputs' values (sweepPoint, e.g. {"system.supplyAirC": 24}); a plain run has null for sweepId, sweepName and sweepPoint.
 */
function present(row: typeof runs.$inferSelect, sweepName: string | null = null) {
  const { scenarioJson, climateJson, resultsJson, sweepPointJson, ...rest } = row;
  return {
    ...rest,
    sweepName: row.sweepId === null ? null : sweepName,
    sweepPoint: sweepPointJson ? (JSON.parse(sweepPointJson) as SweepPointValues) : null,
    scenario: JSON.parse(scenarioJson),
    climate: JSON.parse(climateJson),
    results: resultsJson ? JSON.parse(resultsJson) : null,
  };
}

export function runRoutes(deps: AppDeps): RouteSpec[] {
  const { db, runQueue } = deps;

  function runOr404(projectId: number, params: unknown) {
    const { runId } = runParams.parse(params);
    const row = db
      .select()
      .from(runs)
      .where(and(eq(runs.id, runId), eq(runs.projectId, projectId)))
      .get();
    if (!row) throw new HttpError(404, 'not_found', `Run ${runId} was not found in this project.`);
    return row;
  }

  const sweepNameOf = (sweepId: number | null) =>
    sweepId === null ? null : (db.select({ name: sweeps.name }).from(sweeps).where(eq(sweeps.id, sweepId)).get()?.name ?? null);
  const presentOne = (row: typeof runs.$inferSelect) => present(row, sweepNameOf(row.sweepId));

  return [
    route('get', '/projects/:projectId/runs', access.viewer, (req, res) => {
      // The listing leaves out the per-month tables; the run page fetches the whole run.
      const rows = db.select().from(runs).where(eq(runs.projectId, req.projectId!)).orderBy(desc(runs.id)).all();
      // One read of the project's sweep names, so lists can fold a sweep's points into one named row.
      const sweepNames = new Map(
        db.select({ id: sweeps.id, name: sweeps.name }).from(sweeps).where(eq(sweeps.projectId, req.projectId!)).all().map((s) => [s.id, s.name]),
      );
      res.json({
        runs: rows.map((row) => {
          const run = present(row, row.sweepId === null ? null : (sweepNames.get(row.sweepId) ?? null));
          const r = run.results;
          return { ...run, results: r ? { hours: r.hours, energy: r.energy, water: r.water, peakMechanicalLoadKw: r.peakMechanicalLoadKw, excursions: r.excursions } : null };
        }),
      });
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
      res.status(202).json({ runs: created.map((row) => ({ ...present(row), reused: reused.has(row.id) })) });
    }),

    route('get', '/projects/:projectId/runs/:runId', access.viewer, (req, res) => {
      res.json({ run: presentOne(runOr404(req.projectId!, req.params)) });
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
      res.json({ run: presentOne(runOr404(req.projectId!, req.params)) });
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
