import { and, desc, eq, inArray, isNull } from 'drizzle-orm';
import { decodeRunHours } from './run-rows';
import { MODE_NAMES } from '../../shared/scenario';
import { recordRequestAudit, type Actor } from '../auth/audit';
import { climateFileOr404 } from '../climate/store';
import type { Db, DbOrTx } from '../db/client';
import { runHours, runs } from '../db/schema';
import { HttpError } from '../http-error';
import { scenariosOr404, validScenario } from '../scenarios/store';
import { siteById } from '../sites/store';
import { requireStorage, runBytes } from '../storage/quota';
import { newRunValues } from './new-run';
import type { RunQueue } from './queue';

type RunRow = typeof runs.$inferSelect;

/**
 * A run of exactly these inputs (scenario JSON, climate and site snapshot, engine version) that is queued, running or
 * done, and not a sweep point; the newest. Reusing it gives the same results without computing them again.
 */
function identicalRun(tx: Pick<DbOrTx, 'select'>, values: typeof runs.$inferInsert): RunRow | undefined {
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
 * Queues a run of every scenario on every climate file (404 naming the first missing one), all or none: within the
 * project's storage limit (413 otherwise), each counted at what it will store when done (its file's hours ×
 * RUN_BYTES_PER_HOUR). With `reuse`, an identical run already queued, running or done stands in for a new one.
 * Writes one audit line; the new runs are enqueued after the transaction commits.
 */
export function startRuns(
  db: Db,
  runQueue: RunQueue,
  input: { projectId: number; scenarioIds: number[]; climateFileIds: number[]; reuse: boolean; storageLimitBytes: number },
  by: Actor,
): { created: RunRow[]; reused: Set<number> } {
  const { projectId } = input;
  const chosen = scenariosOr404(db, projectId, input.scenarioIds);
  const files = input.climateFileIds.map((id) => {
    const file = climateFileOr404(db, projectId, id);
    return { file, site: siteById(db, file.siteId) };
  });
  const reused = new Set<number>();
  const created = db.transaction((tx) => {
    const neededBytes = chosen.length * files.reduce((sum, { file }) => sum + runBytes(file.hours), 0);
    const count = chosen.length * files.length;
    requireStorage(tx, projectId, input.storageLimitBytes, neededBytes, count === 1 ? 'the run' : `these ${count} runs`);
    const rows = chosen.flatMap((scenarioRow) => {
      const scenario = validScenario(JSON.parse(scenarioRow.scenarioJson));
      return files.map(({ file, site }) => {
        const values = newRunValues({
          projectId,
          scenarioId: scenarioRow.id,
          scenarioJson: JSON.stringify(scenario),
          file,
          site,
          createdBy: by.user?.id ?? null,
        });
        const same = input.reuse ? identicalRun(tx, values) : undefined;
        if (same) {
          reused.add(same.id);
          return same;
        }
        return tx.insert(runs).values(values).returning().get();
      });
    });
    recordRequestAudit(tx, by, 'run.start', rows.length === 1 ? `run ${rows[0].id}` : `${rows.length} runs`, {
      runIds: rows.map((r) => r.id),
      scenarioIds: input.scenarioIds,
      climateFileIds: input.climateFileIds,
    });
    return rows;
  });
  for (const run of created) if (!reused.has(run.id)) runQueue.enqueue(run.id);
  return { created, reused };
}

/** A done run's mode per hour and mechanical share per hour; 409 until it is done. */
export function runModeHours(db: Db, run: RunRow) {
  const hours = db.select().from(runHours).where(eq(runHours.runId, run.id)).get();
  if (!hours) throw new HttpError(409, 'not_ready', `Run ${run.id} is ${run.status}; its hours exist once it is done.`);
  const { modes, mechanicalFraction: fraction, humidified } = decodeRunHours(hours);
  return {
    modeNames: MODE_NAMES,
    modes: Array.from(modes),
    // Rounded to 0.001, but a share under 1 stays under 1: it tells a partial mechanical hour from a full one.
    mechanicalFraction: Array.from(fraction, (v) => (v < 1 ? Math.min(0.999, Math.round(v * 1000) / 1000) : 1)),
    /** 1 for a free-cooling hour whose evaporative stage only added moisture; null for runs made before engine 2.0.0. */
    humidified: humidified ? Array.from(humidified) : null,
  };
}

/** Stops a queued or running run (409 for any other) and writes the audit line. */
export function cancelRun(db: Db, runQueue: RunQueue, run: RunRow, by: Actor): void {
  if (!runQueue.cancel(run.id)) throw new HttpError(409, 'not_cancellable', `Run ${run.id} is ${run.status} and cannot be cancelled.`);
  recordRequestAudit(db, by, 'run.cancel', `run ${run.id}`, { runId: run.id });
}

/** Stops the run if it is waiting or running, so no worker writes results for it, then deletes it. */
export function deleteRun(db: Db, runQueue: RunQueue, run: RunRow, by: Actor): void {
  runQueue.cancel(run.id);
  db.transaction((tx) => {
    tx.delete(runs).where(eq(runs.id, run.id)).run();
    recordRequestAudit(tx, by, 'run.delete', `run ${run.id}`, { runId: run.id, status: run.status });
  });
}
