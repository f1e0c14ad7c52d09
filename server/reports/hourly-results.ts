import { eq } from 'drizzle-orm';
import { decodeFloat64Column, decodeUint8Column } from '../../shared/climate';
import type { RunClimateSnapshot } from '../../shared/report';
import type { WorkerPool } from '../../workers/pool';
import { loadClimateSeries } from '../climate/store';
import type { Db } from '../db/client';
import { runHours, type runs } from '../db/schema';
import { HttpError } from '../http-error';

/**
 * The hourly file of a finished run (the command line's --hourly columns, as CSV or column-wise JSON),
 * made on the worker pool: the outdoor states are recomputed there from the stored climate series with
 * the pressure at the run's elevation (the engine's own first step), and the stored modes and compressor shares are used
 * as they were. A download is interactive work (its own lane of the pool); pass the request's closedRequestSignal so
 * a cancelled download stops.
 */
export async function hourlyFileOf(
  db: Db,
  pool: WorkerPool,
  run: typeof runs.$inferSelect,
  format: 'csv' | 'json',
  about?: Record<string, unknown>,
  signal?: AbortSignal,
): Promise<Buffer> {
  const stored = db.select().from(runHours).where(eq(runHours.runId, run.id)).get();
  if (!stored || run.status !== 'done') throw new HttpError(409, 'not_ready', `Run ${run.id} is ${run.status}; its hours exist once it is done.`);
  const series = run.climateFileId === null ? undefined : loadClimateSeries(db, run.climateFileId);
  if (!series) {
    throw new HttpError(410, 'climate_file_deleted', `The climate file of run ${run.id} was deleted, so its hourly weather is gone; the summary can still be downloaded.`);
  }
  const modes = decodeUint8Column(stored.modes);
  const mechanicalFraction = decodeFloat64Column(stored.mechanicalFraction);
  const humidified = stored.humidified ? decodeUint8Column(stored.humidified) : null;
  if (modes.length !== series.timestampsMs.length) {
    throw new HttpError(409, 'series_changed', `Run ${run.id} has ${modes.length} hours but its climate file now has ${series.timestampsMs.length}.`);
  }
  const climate = JSON.parse(run.climateJson) as RunClimateSnapshot;
  const bytes = await pool.run('formatHourly', {
    scenario: JSON.parse(run.scenarioJson),
    series,
    elevationM: climate.elevationM,
    utcOffsetMinutes: climate.utcOffsetMinutes ?? 0,
    modes,
    mechanicalFraction,
    humidified,
    format,
    about,
  }, { lane: 'interactive', signal });
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}
