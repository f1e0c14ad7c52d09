// @ts-nocheck
import { createHash } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { decodeClimateSeries, encodeColumn, type ClimateSeries, type EncodedClimateSeries, type ImportResult } from '../../shared/climate';
import type { HumidityKind } from '../../shared/psychrometrics';
import type { Db, DbOrTx } from '../db/client';
import { climateFiles, climateOriginals, climateSeries } from '../db/schema';

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

/** The hourly series of a stored file, as typed arrays ready for the engine or a worker. */
export function loadClimateSeries(db: Db, fileId: number): ClimateSeries | undefined {
  const encoded = loadEncodedSeries(db, fileId);
  return encoded && decodeClimateSeries(encoded);
}

export function loadOriginal(db: Db, fileId: number): Buffer | undefined {
  return db.select().from(climateOriginals).where(eq(climateOriginals.climateFileId, fileId)).get()?.bytes;
}
