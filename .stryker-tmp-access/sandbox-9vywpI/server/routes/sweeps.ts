// @ts-nocheck
import { and, asc, desc, eq, isNotNull } from 'drizzle-orm';
import { z } from 'zod';
import type { ScenarioResults } from '../../shared/scenario';
import { pointResults, prepareSweep, sweepProgress, sweepSpecSchema, type SweepPoint } from '../../shared/sweep';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { recordRequestAudit } from '../auth/audit';
import { findClimateFile } from '../climate/store';
import { runs, scenarios, sites, sweeps } from '../db/schema';
import { insertSweep, type StoredSweepSpec } from '../runs/new-sweep';
import { HttpError } from '../http-error';
import { requireStorage, runBytes, storageLimitOf } from '../storage/quota';
import { validScenario } from './scenarios';

const sweepParams = z.object({ sweepId: z.coerce.number().int().positive('sweepId must be a positive whole number') });

type SweepRow = typeof sweeps.$inferSelect;
type RunRow = Pick<typeof runs.$inferSelect, 'id' | 'status' | 'progress' | 'error' | 'sweepPointJson' | 'resultsJson'>;

function presentPoint(run: RunRow): SweepPoint {
  return {
    runId: run.id,
    values: run.sweepPointJson ? JSON.parse(run.sweepPointJson) : {},
    status: run.status,
    progress: run.progress,
    error: run.error,
    results: run.status === 'done' && run.resultsJson ? pointResults(JSON.parse(run.resultsJson) as ScenarioResults) : null,
  };
}

function presentSweep(row: SweepRow, points: SweepPoint[]) {
  const { specJson, ...rest } = row;
  const spec = JSON.parse(specJson) as StoredSweepSpec;
  return { ...rest, ...spec, progress: sweepProgress(points), points };
}

/** Sweeps: one or two scenario inputs varied over a range on one climate file, each point a run. */
export function sweepRoutes(deps: AppDeps): RouteSpec[] {
  const { db, runQueue } = deps;

  function sweepOr404(projectId: number, params: unknown): SweepRow {
    const { sweepId } = sweepParams.parse(params);
    const row = db
      .select()
      .from(sweeps)
      .where(and(eq(sweeps.id, sweepId), eq(sweeps.projectId, projectId)))
      .get();
    if (!row) throw new HttpError(404, 'not_found', `Sweep ${sweepId} was not found in this project.`);
    return row;
  }

  const pointRuns = (sweepId: number): RunRow[] =>
    db
      .select({
        id: runs.id,
        status: runs.status,
        progress: runs.progress,
        error: runs.error,
        sweepPointJson: runs.sweepPointJson,
        resultsJson: runs.resultsJson,
      })
      .from(runs)
      .where(eq(runs.sweepId, sweepId))
      .orderBy(asc(runs.id))
      .all();

  return [
    route('get', '/projects/:projectId/sweeps', access.viewer, (req, res) => {
      const rows = db.select().from(sweeps).where(eq(sweeps.projectId, req.projectId!)).orderBy(desc(sweeps.id)).all();
      // The listing carries progress only; a sweep's page reads its points' results.
      const statuses = db
        .select({ sweepId: runs.sweepId, status: runs.status, progress: runs.progress })
        .from(runs)
        .where(and(eq(runs.projectId, req.projectId!), isNotNull(runs.sweepId)))
        .all();
      res.json({
        sweeps: rows.map((row) => {
          const { points: _points, baseScenario: _base, ...listed } = presentSweep(row, []);
          return { ...listed, progress: sweepProgress(statuses.filter((s) => s.sweepId === row.id)) };
        }),
      });
    }),

    route('post', '/projects/:projectId/sweeps', access.engineer, (req, res) => {
      const spec = sweepSpecSchema.parse(req.body);
      const projectId = req.projectId!;
      const scenarioRow = db
        .select()
        .from(scenarios)
        .where(and(eq(scenarios.id, spec.scenarioId), eq(scenarios.projectId, projectId)))
        .get();
      if (!scenarioRow) throw new HttpError(404, 'not_found', `Scenario ${spec.scenarioId} was not found in this project.`);
      const file = findClimateFile(db, projectId, spec.climateFileId);
      if (!file) throw new HttpError(404, 'not_found', `Climate file ${spec.climateFileId} was not found in this project.`);
      const site = db.select().from(sites).where(eq(sites.id, file.siteId)).get()!;
      const base = validScenario(JSON.parse(scenarioRow.scenarioJson));
      const prepared = prepareSweep(base, spec.axes);
      if (!prepared.ok) throw new HttpError(422, 'invalid_sweep', prepared.errors.join('; '), { errors: prepared.errors });

      // The sweep and all its runs, or nothing.
      const { sweep, created } = db.transaction((tx) => {
        const points = prepared.points.length;
        requireStorage(tx, projectId, storageLimitOf(deps), points * runBytes(file.hours), `the sweep's ${points} runs`);
        const { sweep, created } = insertSweep(tx, {
          projectId,
          name: spec.name,
          scenarioId: scenarioRow.id,
          base,
          axes: spec.axes,
          points: prepared.points,
          file,
          site,
          createdBy: req.user!.id,
        });
        recordRequestAudit(tx, req, 'sweep.start', `sweep ${sweep.id}: ${sweep.name}`, {
          sweepId: sweep.id,
          scenarioId: scenarioRow.id,
          climateFileId: file.id,
          inputs: spec.axes.map((a) => a.input),
          points: created.length,
        });
        return { sweep, created };
      });
      for (const run of created) runQueue.enqueue(run.id);
      res.status(202).json({ sweep: presentSweep(sweep, created.map(presentPoint)) });
    }),

    route('get', '/projects/:projectId/sweeps/:sweepId', access.viewer, (req, res) => {
      const row = sweepOr404(req.projectId!, req.params);
      res.json({ sweep: presentSweep(row, pointRuns(row.id).map(presentPoint)) });
    }),

    // Stops the points still waiting or running and keeps the finished ones, so a sweep started too wide can be cut short.
    route('post', '/projects/:projectId/sweeps/:sweepId/cancel', access.engineer, (req, res) => {
      const row = sweepOr404(req.projectId!, req.params);
      const pending = pointRuns(row.id).filter((run) => run.status === 'queued' || run.status === 'running');
      if (pending.length === 0) throw new HttpError(409, 'not_cancellable', `Sweep ${row.id} has no point waiting or running; nothing to stop.`);
      let cancelled = 0;
      for (const run of pending) if (runQueue.cancel(run.id)) cancelled++;
      recordRequestAudit(db, req, 'sweep.cancel', `sweep ${row.id}: ${row.name}`, { sweepId: row.id, cancelled });
      res.json({ cancelled });
    }),

    route('delete', '/projects/:projectId/sweeps/:sweepId', access.engineer, (req, res) => {
      const row = sweepOr404(req.projectId!, req.params);
      const points = pointRuns(row.id);
      // Waiting and running points are stopped first, so no worker writes results for a deleted run.
      let cancelled = 0;
      for (const run of points) if ((run.status === 'queued' || run.status === 'running') && runQueue.cancel(run.id)) cancelled++;
      db.transaction((tx) => {
        tx.delete(runs).where(eq(runs.sweepId, row.id)).run();
        tx.delete(sweeps).where(eq(sweeps.id, row.id)).run();
        recordRequestAudit(tx, req, 'sweep.delete', `sweep ${row.id}: ${row.name}`, { sweepId: row.id, runs: points.length, cancelled });
      });
      res.status(204).end();
    }),
  ];
}
