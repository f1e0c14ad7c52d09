// @ts-nocheck
import { and, eq, inArray } from 'drizzle-orm';
import { z } from 'zod';
import type { ImportReport } from '../../shared/climate';
import { baselineFirst, shapeReportRun, type ComparisonReportData, type ReportRun, type RunClimateSnapshot, type RunReportData } from '../../shared/report';
import type { ScenarioResults } from '../../shared/scenario';
import type { SweepPointValues } from '../../shared/sweep';
import type { Db } from '../db/client';
import { climateFiles, projects, runs, sites } from '../db/schema';
import { HttpError } from '../http-error';

export const maxComparedRuns = 12;

/** `?runs=1,2,3&baseline=2`: the runs of a comparison, in order, and its baseline (the first when not given). */
export const comparisonQuery = z
  .object({
    runs: z
      .string({ error: 'runs must list run numbers, e.g. runs=3,4' })
      .transform((text) => text.split(',').map((part) => Number(part.trim())))
      .pipe(
        z
          .array(z.number().int('runs must be whole numbers').positive('runs must be positive'))
          .min(2, 'a comparison needs at least two runs')
          .max(maxComparedRuns, `a comparison shows at most ${maxComparedRuns} runs`),
      ),
    baseline: z.coerce.number().int().positive('baseline must be a run number').optional(),
  })
  .transform((q) => ({ runIds: [...new Set(q.runs)], baselineId: q.baseline ?? q.runs[0] }))
  .refine((q) => q.runIds.length >= 2, { message: 'a comparison needs at least two different runs', path: ['runs'] })
  .refine((q) => q.runIds.includes(q.baselineId), { message: 'baseline must be one of the compared runs', path: ['baseline'] });

function projectName(db: Db, projectId: number): string {
  return db.select({ name: projects.name }).from(projects).where(eq(projects.id, projectId)).get()?.name ?? '';
}

/** A finished run of the project as the report shows it; 404 when missing, 409 while it is not done. */
export function loadReportRuns(db: Db, projectId: number, runIds: number[]): ReportRun[] {
  const rows = db
    .select()
    .from(runs)
    .where(and(eq(runs.projectId, projectId), inArray(runs.id, runIds)))
    .all();
  return runIds.map((id) => {
    const row = rows.find((r) => r.id === id);
    if (!row) throw new HttpError(404, 'not_found', `Run ${id} was not found in this project; it may have been deleted.`);
    if (row.status !== 'done' || !row.resultsJson) {
      throw new HttpError(409, 'not_ready', `Run ${id} is ${row.status}; a report needs a finished run.`);
    }
    const file = row.climateFileId === null ? undefined : db.select().from(climateFiles).where(eq(climateFiles.id, row.climateFileId)).get();
    const site = file ? db.select({ latitude: sites.latitude, longitude: sites.longitude }).from(sites).where(eq(sites.id, file.siteId)).get() : undefined;
    return shapeReportRun({
      id: row.id,
      engineVersion: row.engineVersion,
      createdAt: row.createdAt,
      finishedAt: row.finishedAt,
      scenario: JSON.parse(row.scenarioJson),
      sweepPoint: row.sweepPointJson ? (JSON.parse(row.sweepPointJson) as SweepPointValues) : null,
      climate: JSON.parse(row.climateJson) as RunClimateSnapshot,
      results: JSON.parse(row.resultsJson) as ScenarioResults,
      file: file
        ? {
            originalFileName: file.originalFileName,
            hasPressure: file.hasPressure,
            humidityKind: file.humidityKind,
            report: JSON.parse(file.reportJson) as ImportReport,
            derivationJson: file.derivationJson,
          }
        : null,
      siteNow: site ?? null,
    });
  });
}

export function runReport(db: Db, projectId: number, runId: number, now: Date): RunReportData {
  const [run] = loadReportRuns(db, projectId, [runId]);
  return { kind: 'run', projectName: projectName(db, projectId), generatedAt: now.toISOString(), run };
}

export function comparisonReport(db: Db, projectId: number, runIds: number[], baselineId: number, now: Date): ComparisonReportData {
  const loaded = loadReportRuns(db, projectId, runIds);
  return { kind: 'comparison', projectName: projectName(db, projectId), generatedAt: now.toISOString(), baselineId, runs: baselineFirst(loaded, baselineId) };
}
