import { and, desc, eq, getTableColumns, sql, type SQL } from 'drizzle-orm';
import type { Db } from '../db/client';
import { runs, sweeps } from '../db/schema';
import { listedResultPaths } from '../../shared/metrics';

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

type PathTree = { [field: string]: PathTree | null };

/** Dotted paths as a tree of fields: "loops.liquid.hours" → { loops: { liquid: { hours: null } } } (null: the whole field). */
function pathTree(paths: readonly string[]): PathTree {
  const tree: PathTree = {};
  for (const path of paths) {
    let node = tree;
    const steps = path.split('.');
    steps.forEach((step, i) => {
      if (i === steps.length - 1) node[step] = null;
      else node = node[step] ??= {};
    });
  }
  return tree;
}

/**
 * The SQL that takes one listed field out of the stored results as JSON text (SQLite's `->` gives a field's JSON text,
 * or NULL where the results lack it); a field of which only parts are listed is rebuilt with json_object from them.
 */
function pickedJson(results: SQL | typeof runs.resultsJson, path: string, children: PathTree | null): SQL {
  if (children === null) return sql`${results} -> ${`$.${path}`}`;
  const parts = Object.entries(children).map(([field, sub]) => sql`${field}, json(${pickedJson(results, `${path}.${field}`, sub)})`);
  return sql`CASE WHEN ${results} -> ${`$.${path}`} IS NULL THEN NULL ELSE json_object(${sql.join(parts, sql`, `)}) END`;
}

/** The results a run list carries, per top-level field: the parts of the results the compared figures read (shared/metrics.ts). */
const listedTree = pathTree(listedResultPaths);
export const listedResultFields = Object.keys(listedTree);

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
  // SQLite takes the listed fields out, as comparableResults (shared/metrics.ts) picks them; NULL where a run lacks one.
  const listedResultsQuery = db
    .select(
      Object.fromEntries(listedResultFields.map((field) => [field, pickedJson(runs.resultsJson, field, listedTree[field]) as SQL<string | null>])) as Record<
        string,
        SQL<string | null>
      >,
    )
    .from(runs)
    .where(eq(runs.id, sql.placeholder('runId')))
    .prepare();

  const listedResults = new Map<string, string>();
  const listedResultsText = (runId: number, finishedAt: Date | null): string => {
    const key = `${runId}:${finishedAt?.getTime()}`;
    let text = listedResults.get(key);
    if (text === undefined) {
      const picked = listedResultsQuery.get({ runId }) ?? {};
      text = `{${listedResultFields
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
