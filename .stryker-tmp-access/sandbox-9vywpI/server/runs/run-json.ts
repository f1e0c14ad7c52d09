// @ts-nocheck
import { and, desc, eq, getTableColumns, sql, type SQL } from 'drizzle-orm';
import type { Db } from '../db/client';
import { runs, sweeps } from '../db/schema';

type RunRow = typeof runs.$inferSelect;
/** A run's own columns without its stored JSON texts, which runJsonText splices in. */
type RunFields = Omit<RunRow, 'scenarioJson' | 'climateJson' | 'resultsJson' | 'sweepPointJson'>;

/**
 * A run as the API gives it, as JSON text: its columns, its sweep's name and the swept inputs' values at this point
 * (sweepPoint, e.g. {"system.supplyAirC": 24}; null, like sweepName, for a run that is not a sweep point), the
 * scenario and climate file as run, and its results (null until done). The stored JSON columns were written by
 * JSON.stringify, so they go in as stored: the same text that parsing and writing them again on every read gave
 * (that was most of a read's time).
 */
export function runJsonText(
  row: RunFields & Pick<RunRow, 'scenarioJson' | 'climateJson' | 'sweepPointJson'> & { resultsJson?: string | null },
  sweepName: string | null,
  resultsText: string | null,
): string {
  const { scenarioJson, climateJson, sweepPointJson, resultsJson: _stored, ...fields } = row;
  const head = JSON.stringify({ ...fields, sweepName: fields.sweepId === null ? null : sweepName });
  return `${head.slice(0, -1)},"sweepPoint":${sweepPointJson || 'null'},"scenario":${scenarioJson},"climate":${climateJson},"results":${resultsText || 'null'}}`;
}

/** The results a run list carries: the totals a comparison reads, not the per-month, per-hour-of-day or per-year tables. */
export const listedResultFields = ['hours', 'energy', 'water', 'peakMechanicalLoadKw', 'excursions'] as const;

/** Listed results remembered at most for this many runs; past it the memory starts again empty. */
const maxRememberedListings = 50_000;

/**
 * The two reads of runs that every project and run page makes, prepared once for a database:
 * - `one`: a run of a project with its sweep's name, or undefined;
 * - `listingText`: a project's runs, newest first, as the JSON text of `{ runs: [...] }`, each with its listed
 *   results only. A run's results are written once, when it is done, and never change (ids are never reused), so
 *   each run's listed results are taken out of its stored results once and remembered by run id and finish time:
 *   a list reads only the small columns, not the whole results of every run.
 */
export function createRunReads(db: Db) {
  const oneQuery = db
    .select({ run: runs, sweepName: sweeps.name })
    .from(runs)
    .leftJoin(sweeps, eq(sweeps.id, runs.sweepId))
    .where(and(eq(runs.id, sql.placeholder('runId')), eq(runs.projectId, sql.placeholder('projectId'))))
    .prepare();

  const { resultsJson: _resultsJson, ...smallColumns } = getTableColumns(runs);
  const listQuery = db
    .select({ ...smallColumns, sweepName: sweeps.name, hasResults: sql<number>`${runs.resultsJson} IS NOT NULL AND ${runs.resultsJson} <> ''` })
    .from(runs)
    .leftJoin(sweeps, eq(sweeps.id, runs.sweepId))
    .where(eq(runs.projectId, sql.placeholder('projectId')))
    .orderBy(desc(runs.id))
    .prepare();
  // SQLite takes the fields out (`->` gives a field's JSON text, or NULL where the results lack it).
  const r = runs.resultsJson;
  const listedResultsQuery = db
    .select({
      ...(Object.fromEntries(listedResultFields.map((field) => [field, sql<string | null>`${r} -> ${`$.${field}`}`])) as Record<string, SQL<string | null>>),
      // A hybrid hall's loops (their hours only) and its heat reuse, as comparableResults gives them; NULL otherwise.
      loops: sql<
        string | null
      >`CASE WHEN ${r} -> '$.loops' IS NULL THEN NULL ELSE json_object('liquid', json_object('hours', json(${r} -> '$.loops.liquid.hours')), 'air', json_object('hours', json(${r} -> '$.loops.air.hours'))) END`,
      heatReuse: sql<
        string | null
      >`CASE WHEN ${r} -> '$.heatReuse' IS NULL THEN NULL ELSE json_object('availableKwh', json(${r} -> '$.heatReuse.availableKwh'), 'erf', json(${r} -> '$.heatReuse.erf')) END`,
    })
    .from(runs)
    .where(eq(runs.id, sql.placeholder('runId')))
    .prepare();

  const listedResults = new Map<string, string>();
  const listedResultsText = (runId: number, finishedAt: Date | null): string => {
    const key = `${runId}:${finishedAt?.getTime()}`;
    let text = listedResults.get(key);
    if (text === undefined) {
      const picked = listedResultsQuery.get({ runId }) ?? {};
      text = `{${[...listedResultFields, 'loops', 'heatReuse']
        .filter((field) => picked[field as keyof typeof picked] !== null && picked[field as keyof typeof picked] !== undefined)
        .map((field) => `"${field}":${picked[field as keyof typeof picked]}`)
        .join(',')}}`;
      if (listedResults.size >= maxRememberedListings) listedResults.clear();
      listedResults.set(key, text);
    }
    return text;
  };

  return {
    one: (projectId: number, runId: number) => oneQuery.get({ projectId, runId }),
    listingText(projectId: number): string {
      const listed = listQuery
        .all({ projectId })
        .map(({ sweepName, hasResults, ...run }) => runJsonText(run, sweepName, hasResults ? listedResultsText(run.id, run.finishedAt) : null));
      return `{"runs":[${listed.join(',')}]}`;
    },
  };
}
