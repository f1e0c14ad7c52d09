import { sql } from 'drizzle-orm';
import type { DbOrTx } from '../db/client';
import { HttpError } from '../http-error';
import { BYTES_PER_MB, type ProjectStorage } from '../../shared/schemas/project-storage';

/** Default per-project limit on stored bytes, MB of 1,000,000 bytes: 1 GB (a 200-point sweep on a 30-year file stores about 0.5 GB). */
export const DEFAULT_PROJECT_STORAGE_MB = 1_000;
export { BYTES_PER_MB };

/** Header bytes of one stored column blob (shared/climate/column-codec.ts). */
const COLUMN_HEADER_BYTES = 16;

/**
 * Bytes a finished run stores per hour at most: its mode (1 byte), the compressors' share (8) and the humidified flag
 * (1), column-wise (run_hours). Each column is stored deflated where that is smaller (server/runs/run-rows.ts), so a
 * run stores less, usually a fifth of it. A queued run is counted at this upper figure for its climate file's hours
 * until it is done, and at what it stored after.
 */
export const RUN_BYTES_PER_HOUR = 1 + 8 + 1;

/** Bytes a run on a file of `hours` hours will store at most. */
export function runBytes(hours: number): number {
  return hours * RUN_BYTES_PER_HOUR + 3 * COLUMN_HEADER_BYTES;
}

/** Bytes a climate file stores: its original bytes and its series (time, dry-bulb, humidity, pressure if any, each 8 bytes an hour; flags 1). */
export function climateFileBytes(originalBytes: number, hours: number, hasPressure: boolean): number {
  const columns = hasPressure ? 4 : 3;
  return originalBytes + hours * (columns * 8 + 1) + (columns + 1) * COLUMN_HEADER_BYTES;
}

/** The project's stored bytes, summed from the blobs' lengths (SQLite reads a blob's length without reading the blob). */
export function storageUse(db: DbOrTx, projectId: number, limitBytes: number): ProjectStorage {
  const one = (query: ReturnType<typeof sql>) => Number(db.get<{ bytes: number | null }>(query)?.bytes ?? 0);
  const climate = one(sql`
    select sum(length(o.bytes) + length(s.timestamps_ms) + length(s.dry_bulb_c) + length(s.humidity) + coalesce(length(s.pressure_pa), 0) + length(s.flags)) as bytes
    from climate_files f
    left join climate_originals o on o.climate_file_id = f.id
    left join climate_series s on s.climate_file_id = f.id
    where f.project_id = ${projectId}`);
  const runs = one(sql`
    select sum(length(h.modes) + length(h.mechanical_fraction) + coalesce(length(h.humidified), 0)) as bytes
    from run_hours h join runs r on r.id = h.run_id
    where r.project_id = ${projectId}`);
  const pending = one(sql`
    select sum(coalesce(json_extract(r.climate_json, '$.hours'), 0) * ${RUN_BYTES_PER_HOUR} + ${3 * COLUMN_HEADER_BYTES}) as bytes
    from runs r
    where r.project_id = ${projectId} and r.status in ('queued', 'running')`);
  const lists = one(sql`select sum(length(csv_gzip)) as bytes from climate_issue_lists where project_id = ${projectId}`);
  return {
    climateFileBytes: climate,
    runBytes: runs,
    pendingRunBytes: pending,
    issueListBytes: lists,
    usedBytes: climate + runs + pending + lists,
    limitBytes,
  };
}

/** The limit a set of deps gives, bytes. */
export function storageLimitOf(deps: { storageLimitBytes?: number }): number {
  return deps.storageLimitBytes ?? DEFAULT_PROJECT_STORAGE_MB * BYTES_PER_MB;
}

const mb = (bytes: number) => `${(bytes / BYTES_PER_MB).toLocaleString('en', { maximumFractionDigits: 1 })} MB`;

/**
 * Refuses with 413 `storage_full` (the figures in details) when storing `neededBytes` more would take the project past
 * its limit. Call it inside the transaction that stores, or with no await between the check and the store.
 */
export function requireStorage(db: DbOrTx, projectId: number, limitBytes: number, neededBytes: number, what: string): void {
  const use = storageUse(db, projectId, limitBytes);
  if (use.usedBytes + neededBytes <= limitBytes) return;
  throw new HttpError(
    413,
    'storage_full',
    `This project stores ${mb(use.usedBytes)} of its ${mb(limitBytes)} limit, and ${what} would need about ${mb(neededBytes)} more; nothing was stored. Delete runs or climate files the project no longer needs, or ask the administrator to raise the limit.`,
    { usedBytes: use.usedBytes, limitBytes, neededBytes },
  );
}
