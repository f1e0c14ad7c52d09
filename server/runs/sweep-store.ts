import { and, asc, desc, eq, isNotNull } from 'drizzle-orm';
import type { ScenarioResults } from '../../shared/scenario';
import { pointResults, prepareSweep, sweepProgress, type SweepPoint, type SweepSpec } from '../../shared/sweep';
import { recordRequestAudit, type Actor } from '../auth/audit';
import { climateFileOr404 } from '../climate/store';
import type { Db } from '../db/client';
import { runs, sweeps } from '../db/schema';
import { HttpError } from '../http-error';
import { scenarioOr404, validScenario } from '../scenarios/store';
import { siteById } from '../sites/store';
import { requireStorage, runBytes } from '../storage/quota';
import { insertSweep, type StoredSweepSpec } from './new-sweep';
import type { RunQueue } from './queue';

type SweepRow = typeof sweeps.$inferSelect;
type PointRun = Pick<typeof runs.$inferSelect, 'id' | 'status' | 'progress' | 'error' | 'sweepPointJson' | 'resultsJson'>;

function presentPoint(run: PointRun): SweepPoint {
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

/** The sweep with this id in this project; 404 when there is none. */
export function sweepOr404(db: Db, projectId: number, sweepId: number): SweepRow {
  const row = db
    .select()
    .from(sweeps)
    .where(and(eq(sweeps.id, sweepId), eq(sweeps.projectId, projectId)))
    .get();
  if (!row) throw new HttpError(404, 'not_found', `Sweep ${sweepId} was not found in this project.`);
  return row;
}

const pointRuns = (db: Db, sweepId: number): PointRun[] =>
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

/** A project's sweeps, newest first, with their progress only; a sweep's page reads its points' results. */
export function listSweeps(db: Db, projectId: number) {
  const rows = db.select().from(sweeps).where(eq(sweeps.projectId, projectId)).orderBy(desc(sweeps.id)).all();
  const statuses = db
    .select({ sweepId: runs.sweepId, status: runs.status, progress: runs.progress })
    .from(runs)
    .where(and(eq(runs.projectId, projectId), isNotNull(runs.sweepId)))
    .all();
  return rows.map((row) => {
    const { points: _points, baseScenario: _base, ...listed } = presentSweep(row, []);
    return { ...listed, progress: sweepProgress(statuses.filter((s) => s.sweepId === row.id)) };
  });
}

/** A sweep as its page shows it: the spec and every point with its results once done. */
export function sweepWithPoints(db: Db, row: SweepRow) {
  return presentSweep(row, pointRuns(db, row.id).map(presentPoint));
}

/**
 * Checks a sweep (404 for a missing scenario or file, 422 for axes that do not fit the scenario) and stores it with
 * one queued run per point, all or none, within the project's storage limit (413 otherwise); the runs are enqueued
 * after the transaction commits.
 */
export function startSweep(db: Db, runQueue: RunQueue, input: { projectId: number; spec: SweepSpec; storageLimitBytes: number }, by: Actor) {
  const { projectId, spec } = input;
  const scenarioRow = scenarioOr404(db, projectId, spec.scenarioId);
  const file = climateFileOr404(db, projectId, spec.climateFileId);
  const site = siteById(db, file.siteId);
  const base = validScenario(JSON.parse(scenarioRow.scenarioJson));
  const prepared = prepareSweep(base, spec.axes);
  if (!prepared.ok) throw new HttpError(422, 'invalid_sweep', prepared.errors.join('; '), { errors: prepared.errors });

  // The sweep and all its runs, or nothing.
  const { sweep, created } = db.transaction((tx) => {
    const points = prepared.points.length;
    requireStorage(tx, projectId, input.storageLimitBytes, points * runBytes(file.hours), `the sweep's ${points} runs`);
    const { sweep, created } = insertSweep(tx, {
      projectId,
      name: spec.name,
      scenarioId: scenarioRow.id,
      base,
      axes: spec.axes,
      points: prepared.points,
      file,
      site,
      createdBy: by.user?.id ?? null,
    });
    recordRequestAudit(tx, by, 'sweep.start', `sweep ${sweep.id}: ${sweep.name}`, {
      sweepId: sweep.id,
      scenarioId: scenarioRow.id,
      climateFileId: file.id,
      inputs: spec.axes.map((a) => a.input),
      points: created.length,
    });
    return { sweep, created };
  });
  for (const run of created) runQueue.enqueue(run.id);
  return presentSweep(sweep, created.map(presentPoint));
}

/** Stops the points still waiting or running and keeps the finished ones (409 when none is left); the count stopped. */
export function cancelSweep(db: Db, runQueue: RunQueue, row: SweepRow, by: Actor): number {
  const pending = pointRuns(db, row.id).filter((run) => run.status === 'queued' || run.status === 'running');
  if (pending.length === 0) throw new HttpError(409, 'not_cancellable', `Sweep ${row.id} has no point waiting or running; nothing to stop.`);
  let cancelled = 0;
  for (const run of pending) if (runQueue.cancel(run.id)) cancelled++;
  recordRequestAudit(db, by, 'sweep.cancel', `sweep ${row.id}: ${row.name}`, { sweepId: row.id, cancelled });
  return cancelled;
}

/** Deletes a sweep and its runs; waiting and running points are stopped first, so no worker writes results for a deleted run. */
export function deleteSweep(db: Db, runQueue: RunQueue, row: SweepRow, by: Actor): void {
  const points = pointRuns(db, row.id);
  let cancelled = 0;
  for (const run of points) if ((run.status === 'queued' || run.status === 'running') && runQueue.cancel(run.id)) cancelled++;
  db.transaction((tx) => {
    tx.delete(runs).where(eq(runs.sweepId, row.id)).run();
    tx.delete(sweeps).where(eq(sweeps.id, row.id)).run();
    recordRequestAudit(tx, by, 'sweep.delete', `sweep ${row.id}: ${row.name}`, { sweepId: row.id, runs: points.length, cancelled });
  });
}
