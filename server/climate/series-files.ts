import type { WorkerPool } from '../../workers/pool';
import type { Db } from '../db/client';
import { HttpError } from '../http-error';
import { loadEncodedSeries } from './store';

/**
 * A stored file's hourly CSV or hours JSON, built on the pool's interactive lane from the undecoded columns (a
 * century of hours takes seconds, which on the main thread would stall every other request), stopped when
 * `signal` aborts.
 */
export async function formatStoredSeries(db: Db, pool: WorkerPool, fileId: number, format: 'csv' | 'hours-json', signal: AbortSignal): Promise<Buffer> {
  const encoded = loadEncodedSeries(db, fileId);
  if (!encoded) throw new HttpError(404, 'not_found', `Climate file ${fileId} has no stored series.`);
  const bytes = await pool.run('formatClimateSeries', { encoded, format }, { lane: 'interactive', signal });
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}
