// @ts-nocheck
import { promisify } from 'node:util';
import { gunzip as gunzipCb, gzip as gzipCb } from 'node:zlib';
import { and, desc, eq, isNull, notInArray } from 'drizzle-orm';
import { issueListCsv, type ImportResult } from '../../shared/climate';
import type { Db, DbOrTx } from '../db/client';
import { climateIssueLists } from '../db/schema';

const gzip = promisify(gzipCb);
const gunzip = promisify(gunzipCb);

/** Lists of previews and refused uploads kept per project (the newest); a stored file's list lives as long as the file. */
export const UNLINKED_LISTS_KEPT = 20;

export interface PackedIssueList {
  issues: number;
  csvGzip: Buffer;
}

/**
 * The full issue list of an import whose report lists only part of it, gzipped (on libuv's threads, off the main
 * thread); null when the report already lists every issue.
 */
export async function packIssueList(result: ImportResult): Promise<PackedIssueList | null> {
  const { counts, issues } = result.report;
  if (counts.issuesNotListed === 0 || !result.issueList) return null;
  const { rows, notWritten, ofSet } = result.issueList;
  return { issues: issues.length + counts.issuesNotListed, csvGzip: await gzip(issueListCsv(rows, notWritten, ofSet)) };
}

/** Stores a packed list (linked to a stored file, or not), pushes out the project's oldest unlinked lists, and gives its download path. */
export function saveIssueList(
  tx: DbOrTx,
  input: { projectId: number; climateFileId: number | null; createdBy: number | null; list: PackedIssueList },
): { id: number; path: string; issues: number } {
  const { projectId, list } = input;
  const row = tx
    .insert(climateIssueLists)
    .values({ projectId, climateFileId: input.climateFileId, createdBy: input.createdBy, issues: list.issues, csvGzip: list.csvGzip })
    .returning({ id: climateIssueLists.id })
    .get();
  const unlinked = and(eq(climateIssueLists.projectId, projectId), isNull(climateIssueLists.climateFileId));
  const kept = tx
    .select({ id: climateIssueLists.id })
    .from(climateIssueLists)
    .where(unlinked)
    .orderBy(desc(climateIssueLists.id))
    .limit(UNLINKED_LISTS_KEPT)
    .all();
  tx.delete(climateIssueLists)
    .where(
      and(
        unlinked,
        notInArray(
          climateIssueLists.id,
          kept.map((k) => k.id),
        ),
      ),
    )
    .run();
  return { id: row.id, path: issueListPath(projectId, row.id), issues: list.issues };
}

export function linkIssueList(tx: DbOrTx, listId: number, climateFileId: number): void {
  tx.update(climateIssueLists).set({ climateFileId }).where(eq(climateIssueLists.id, listId)).run();
}

export function issueListPath(projectId: number, listId: number): string {
  return `/api/projects/${projectId}/climate-issue-lists/${listId}`;
}

/** A stored list's CSV text as bytes, or undefined when it is not in the project (or was pushed out). */
export async function loadIssueListCsv(db: Db, projectId: number, listId: number): Promise<Buffer | undefined> {
  const row = db
    .select({ csvGzip: climateIssueLists.csvGzip })
    .from(climateIssueLists)
    .where(and(eq(climateIssueLists.id, listId), eq(climateIssueLists.projectId, projectId)))
    .get();
  return row && gunzip(row.csvGzip);
}
