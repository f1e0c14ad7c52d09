import { createHash } from 'node:crypto';
import { and, desc, eq } from 'drizzle-orm';
import { decodeClimateSeries, encodeColumn, type ClimateSeries, type DecodeOptions, type EncodedClimateSeries, type ImportResult } from '../../shared/climate';
import type { HumidityKind } from '../../shared/psychrometrics';
import { recordRequestAudit, type Actor } from '../auth/audit';
import type { Db, DbOrTx } from '../db/client';
import { climateFiles, climateOriginals, climateSeries, sites } from '../db/schema';
import { HttpError } from '../http-error';
import { listing } from './listing';

/** An encoded column as a Buffer over the same bytes, as Drizzle's blob columns take it. */
export function blob(column: Float64Array | Uint8Array): Buffer {
  const bytes = encodeColumn(column);
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}

export interface NewClimateFile {
  projectId: number;
  siteId: number;
  name: string;
  originalFileName: string;
  bytes: Buffer;
  imported: ImportResult & { series: ClimateSeries };
  createdBy: number | null;
}

/** Stores a whole import — listing row, original bytes, series — in one transaction, or nothing. */
export function saveClimateFile(db: DbOrTx, file: NewClimateFile): typeof climateFiles.$inferSelect {
  const { series, report, mapping } = file.imported;
  return db.transaction((tx) => {
    const row = tx
      .insert(climateFiles)
      .values({
        projectId: file.projectId,
        siteId: file.siteId,
        name: file.name,
        originalFileName: file.originalFileName,
        byteSize: file.bytes.byteLength,
        sha256: createHash('sha256').update(file.bytes).digest('hex'),
        mappingJson: JSON.stringify(mapping),
        reportJson: JSON.stringify(report),
        humidityKind: series.humidity.kind,
        hasPressure: series.pressurePa !== null,
        hours: series.timestampsMs.length,
        measuredHours: report.counts.measuredHours,
        filledHours: report.counts.filledHours,
        missingHours: report.counts.missingHours,
        firstHourMs: series.timestampsMs[0],
        lastHourMs: series.timestampsMs[series.timestampsMs.length - 1],
        createdBy: file.createdBy,
      })
      .returning()
      .get();
    tx.insert(climateOriginals).values({ climateFileId: row.id, bytes: file.bytes }).run();
    tx.insert(climateSeries)
      .values({
        climateFileId: row.id,
        timestampsMs: blob(series.timestampsMs),
        dryBulbC: blob(series.dryBulbC),
        humidity: blob(series.humidity.values),
        pressurePa: series.pressurePa ? blob(series.pressurePa) : null,
        flags: blob(series.flags),
      })
      .run();
    return row;
  });
}

export function findClimateFile(db: Db, projectId: number, fileId: number) {
  return db
    .select()
    .from(climateFiles)
    .where(and(eq(climateFiles.id, fileId), eq(climateFiles.projectId, projectId)))
    .get();
}

/** The climate file with this id in this project; 404 when there is none. */
export function climateFileOr404(db: Db, projectId: number, fileId: number): typeof climateFiles.$inferSelect {
  const file = findClimateFile(db, projectId, fileId);
  if (!file) throw new HttpError(404, 'not_found', `Climate file ${fileId} was not found in this project.`);
  return file;
}

/** A stored file's decoded series; 404 when none is stored. */
export function seriesOr404(db: Db, fileId: number): ClimateSeries {
  const series = loadClimateSeries(db, fileId);
  if (!series) throw new HttpError(404, 'not_found', `Climate file ${fileId} has no stored series.`);
  return series;
}

/** A project's climate files as lists show them, newest first, each with its site's name and elevation. */
export function listClimateFiles(db: Db, projectId: number) {
  const rows = db
    .select({ file: climateFiles, siteName: sites.name, siteElevationM: sites.elevationM })
    .from(climateFiles)
    .innerJoin(sites, eq(sites.id, climateFiles.siteId))
    .where(eq(climateFiles.projectId, projectId))
    .orderBy(desc(climateFiles.createdAt))
    .all();
  // The site's elevation rides along: forms check a setpoint against the envelope derated for it.
  return rows.map(({ file, siteName, siteElevationM }) => ({ ...listing(file, siteName), siteElevationM }));
}

/** Deletes a file found with `climateFileOr404` (its series and original go with it) and writes the audit line. */
export function deleteClimateFile(db: Db, file: typeof climateFiles.$inferSelect, by: Actor): void {
  db.transaction((tx) => {
    tx.delete(climateFiles).where(eq(climateFiles.id, file.id)).run();
    recordRequestAudit(tx, by, 'climate.delete', file.name, { climateFileId: file.id });
  });
}

/** The column blobs of a stored file's series, undecoded (a worker decodes them); undefined when none is stored. */
export function loadEncodedSeries(db: Db, fileId: number): EncodedClimateSeries | undefined {
  const row = db
    .select({ kind: climateFiles.humidityKind, series: climateSeries })
    .from(climateSeries)
    .innerJoin(climateFiles, eq(climateFiles.id, climateSeries.climateFileId))
    .where(eq(climateSeries.climateFileId, fileId))
    .get();
  if (!row) return undefined;
  const { timestampsMs, dryBulbC, humidity, pressurePa, flags } = row.series;
  return { humidityKind: row.kind as HumidityKind, timestampsMs, dryBulbC, humidity, pressurePa, flags };
}

/** The hourly series of a stored file, as typed arrays ready for the engine or a worker (shared: see DecodeOptions). */
export function loadClimateSeries(db: Db, fileId: number, options?: DecodeOptions): ClimateSeries | undefined {
  const encoded = loadEncodedSeries(db, fileId);
  return encoded && decodeClimateSeries(encoded, options);
}

export function loadOriginal(db: Db, fileId: number): Buffer | undefined {
  return db.select().from(climateOriginals).where(eq(climateOriginals.climateFileId, fileId)).get()?.bytes;
}
