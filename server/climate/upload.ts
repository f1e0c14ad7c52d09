import { createHash } from 'node:crypto';
import { decodeClimateBytes, joinClimateFiles, type ClimateSeries, type ImportReport, type ImportResult } from '../../shared/climate';
import { uploadedFilesSchema, type climateUploadQuerySchema } from '../../shared/schemas/climate-file';
import { fixedOffsetZone, standardOffsetMinutes } from '../../shared/time-zone';
import type { z } from 'zod';
import type { WorkerPool } from '../../workers/pool';
import { recordRequestAudit, type Actor } from '../auth/audit';
import type { Db } from '../db/client';
import { HttpError } from '../http-error';
import { climateFileBytes, requireStorage } from '../storage/quota';
import { linkIssueList, packIssueList, saveIssueList } from './issue-lists';
import { multipartBoundary, readMultipartFiles } from './multipart';
import { saveClimateFile } from './store';
import { tarArchive } from './tar-archive';

/** Upload limits: 64 MB and 1.2 million lines (over 100 years of hours) unless the app is given others. */
export const defaultUploadLimits = { bytes: 64 * 1024 * 1024, rows: 1_200_000 };
const previewHourCount = 48;

type UploadQuery = z.infer<typeof climateUploadQuerySchema>;

export interface Upload {
  query: UploadQuery;
  /** The request body: one raw file, or several as multipart/form-data. */
  body: Buffer;
  contentType: string | undefined;
  site: { elevationM: number; timeZone: string };
}

function countRows(text: string): number {
  let n = 0;
  for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) n++;
  return n + 1;
}

/**
 * Reads an upload — one raw file, or several files as multipart/form-data — and imports it on the pool:
 * a set's files are read in parallel with the same options and mapping, then joined in time order
 * (shared/climate/join-files.ts). Nothing is stored here. A preview goes in the pool's interactive lane, an import
 * in the long one; either stops when `signal` aborts (the client left).
 */
export async function importUpload(
  pool: WorkerPool,
  upload: Upload,
  limits: { rows: number },
  { forPreview, signal }: { forPreview: boolean; signal: AbortSignal },
) {
  const { query, body, site } = upload;
  const { timeZone } = site;
  const boundary = multipartBoundary(upload.contentType);
  const parts = boundary ? readMultipartFiles(body, boundary) : [{ fileName: query.fileName, bytes: body }];
  if (!boundary && body.byteLength === 0) {
    throw new HttpError(422, 'empty_file', 'The file is empty. Choose an hourly weather file (CSV or other delimited text).');
  }
  uploadedFilesSchema.parse(parts.map((p) => ({ fileName: p.fileName, byteLength: p.bytes.byteLength })));
  const texts = parts.map((p) => decodeClimateBytes(p.bytes));
  const rows = texts.reduce((sum, text) => sum + countRows(text), 0);
  if (rows > limits.rows) {
    throw new HttpError(
      413,
      'too_many_rows',
      `The ${parts.length > 1 ? `${parts.length} files have` : 'file has'} ${rows.toLocaleString('en')} lines; the limit is ${limits.rows.toLocaleString('en')}. Split ${parts.length > 1 ? 'the set' : 'it'} by period.`,
    );
  }
  const options = {
    mapping: query.mapping,
    maxGapHours: query.maxGapHours,
    timeZone: importTimeZone(query.timeBasis, timeZone),
    humidityOverIce: query.humidityOverIce,
    site: { elevationM: site.elevationM, timeZone },
  };
  const lane = forPreview ? 'interactive' : 'long';
  const results: ImportResult[] = await Promise.all(texts.map((text) => pool.run('importClimate', { text, options }, { signal, lane })));
  if (parts.length === 1) return { parts, text: texts[0], result: results[0], original: parts[0] };
  const files = parts.map((p, i) => ({ fileName: p.fileName, bytes: p.bytes.byteLength, sha256: sha256(p.bytes), result: results[i] }));
  const result = joinClimateFiles(files, query.maxGapHours, timeZone);
  const setName = query.name ?? defaultSetName(result.report.files.map((f) => f.fileName));
  // The originals of a set are kept as one POSIX tar archive, each file byte for byte, in time order; entries carry
  // no upload time (mtime 0), so the same set always gives the same archive and the same SHA-256.
  const inTimeOrder = result.report.files.map((f) => parts.find((p) => p.fileName === f.fileName)!);
  const original = { fileName: `${setName}.tar`, bytes: tarArchive(inTimeOrder, 0) };
  return { parts, text: texts[parts.indexOf(inTimeOrder[0])], result, original };
}

/**
 * The report of a preview or a refused upload as answered: when it lists only the first issues, the full list is
 * stored (among the project's newest unlinked lists) and the report says where.
 */
export async function withFullIssueList(db: Db, projectId: number, createdBy: number | null, result: ImportResult): Promise<ImportReport> {
  const packed = await packIssueList(result);
  if (!packed) return result.report;
  const list = saveIssueList(db, { projectId, climateFileId: null, createdBy, list: packed });
  return { ...result.report, fullIssueList: { path: list.path, issues: list.issues } };
}

/** The first hours of an import as the upload preview shows them; a missing value is null. */
export function previewHours(series: ClimateSeries | undefined | null) {
  if (!series) return [];
  const s = series;
  return Array.from({ length: Math.min(previewHourCount, s.timestampsMs.length) }, (_, i) => ({
    timestampMs: s.timestampsMs[i],
    dryBulbC: nullIfNaN(s.dryBulbC[i]),
    humidity: nullIfNaN(s.humidity.values[i]),
    pressurePa: s.pressurePa ? nullIfNaN(s.pressurePa[i]) : null,
    flag: s.flags[i],
  }));
}

/**
 * Stores an accepted import with its full issue list in one transaction, within the project's storage limit
 * (413 otherwise), and writes the audit line. A refused import (no series) is audited and answered 422 with its report.
 */
export async function storeUpload(
  db: Db,
  input: {
    projectId: number;
    siteId: number;
    storageLimitBytes: number;
    name: string | undefined;
    imported: Awaited<ReturnType<typeof importUpload>>;
    createdBy: number | null;
  },
  by: Actor,
) {
  const { projectId, siteId } = input;
  const { parts, result, original } = input.imported;
  const bytes = original.bytes;
  if (!result.ok || !result.series) {
    const report = await withFullIssueList(db, projectId, input.createdBy, result);
    recordRequestAudit(db, by, 'climate.rejected', original.fileName, { siteId, files: parts.length, summary: result.report.summary });
    throw new HttpError(422, 'import_rejected', result.report.summary, { report, mapping: result.mapping });
  }
  const series = result.series;
  const issueList = await packIssueList(result);
  return db.transaction((tx) => {
    const hours = series.timestampsMs.length;
    requireStorage(tx, projectId, input.storageLimitBytes, climateFileBytes(bytes.byteLength, hours, series.pressurePa !== null), 'this climate file');
    const list = issueList && saveIssueList(tx, { projectId, climateFileId: null, createdBy: input.createdBy, list: issueList });
    const report = { ...result.report, fullIssueList: list && { path: list.path, issues: list.issues } };
    const saved = saveClimateFile(tx, {
      projectId,
      siteId,
      name: input.name ?? original.fileName.replace(/\.[^.]+$/, ''),
      originalFileName: original.fileName,
      bytes,
      imported: { ...result, report, series },
      createdBy: input.createdBy,
    });
    if (list) linkIssueList(tx, list.id, saved.id);
    recordRequestAudit(tx, by, 'climate.import', saved.name, {
      climateFileId: saved.id,
      fileName: original.fileName,
      files: parts.length,
      bytes: bytes.byteLength,
      hours: saved.hours,
      filledHours: saved.filledHours,
      missingHours: saved.missingHours,
    });
    return saved;
  });
}

/** The zone the importer reads local timestamps in, for the chosen time basis. */
function importTimeZone(basis: 'site-civil' | 'site-standard' | 'utc', siteTimeZone: string): string {
  if (basis === 'utc') return 'UTC';
  if (basis === 'site-civil') return siteTimeZone;
  return fixedOffsetZone(standardOffsetMinutes(siteTimeZone));
}

function sha256(bytes: Buffer): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/** "2019–2021 (3 files)": the first and last names of a set without their extensions, in time order. */
function defaultSetName(fileNames: string[]): string {
  const bare = fileNames.map((n) => n.replace(/\.[^.]+$/, ''));
  return `${bare[0]}–${bare[bare.length - 1]} (${bare.length} files)`;
}

function nullIfNaN(v: number): number | null {
  return v === v ? v : null;
}
