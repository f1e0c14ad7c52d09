import { eq } from 'drizzle-orm';
import { decodeRunHours } from '../runs/run-rows';
import type { RunClimateSnapshot } from '../../shared/report';
import type { ClimateSeries } from '../../shared/climate';
import type { WorkerPool } from '../../workers/pool';
import { loadClimateSeries } from '../climate/store';
import type { Db } from '../db/client';
import { runHours, type runs } from '../db/schema';
import { HttpError } from '../http-error';
import type { HourColumnName } from '../../shared/report/hour-columns';

/** What a finished run's hourly views need: its climate series, its stored per-hour outcome and its snapshot. */
export interface StoredRunHours {
  series: ClimateSeries;
  modes: Uint8Array;
  mechanicalFraction: Float64Array;
  humidified: Uint8Array | null;
  climate: RunClimateSnapshot;
}

/**
 * A finished run's stored hours beside its climate series. 409 before the run is done or when the file's hours no
 * longer match the run's; 410 when the climate file was deleted.
 */
export function storedRunHours(db: Db, run: typeof runs.$inferSelect): StoredRunHours {
  const stored = db.select().from(runHours).where(eq(runHours.runId, run.id)).get();
  if (!stored || run.status !== 'done') throw new HttpError(409, 'not_ready', `Run ${run.id} is ${run.status}; its hours exist once it is done.`);
  const series = run.climateFileId === null ? undefined : loadClimateSeries(db, run.climateFileId);
  if (!series) {
    throw new HttpError(
      410,
      'climate_file_deleted',
      `The climate file of run ${run.id} was deleted, so its hourly weather is gone; the summary can still be downloaded.`,
    );
  }
  const { modes, mechanicalFraction, humidified } = decodeRunHours(stored);
  if (modes.length !== series.timestampsMs.length) {
    throw new HttpError(409, 'series_changed', `Run ${run.id} has ${modes.length} hours but its climate file now has ${series.timestampsMs.length}.`);
  }
  return {
    series,
    modes,
    mechanicalFraction,
    humidified,
    climate: JSON.parse(run.climateJson) as RunClimateSnapshot,
  };
}

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
  const { series, modes, mechanicalFraction, humidified, climate } = storedRunHours(db, run);
  const bytes = await pool.run(
    'formatHourly',
    {
      scenario: JSON.parse(run.scenarioJson),
      series,
      elevationM: climate.elevationM,
      utcOffsetMinutes: climate.utcOffsetMinutes ?? 0,
      modes,
      mechanicalFraction,
      humidified,
      format,
      about,
    },
    { lane: 'interactive', signal },
  );
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}

/**
 * The run page's hourly views: the chosen typed columns of a finished run in one binary message
 * (shared/report/hour-columns.ts), gzipped when asked, with the dry-bulb bins of `binWidthK` from `binOriginC` when
 * given, made on the pool's interactive lane and stopped when `signal` aborts.
 */
export async function hourColumnsOf(
  db: Db,
  pool: WorkerPool,
  run: typeof runs.$inferSelect,
  options: { columns: HourColumnName[]; gzip: boolean; binWidthK?: number; binOriginC?: number },
  signal: AbortSignal,
): Promise<Buffer> {
  const { series, modes, mechanicalFraction, humidified, climate } = storedRunHours(db, run);
  const bytes = await pool.run(
    'hourColumns',
    { series, elevationM: climate.elevationM, modes, mechanicalFraction, humidified, ...options },
    {
      lane: 'interactive',
      signal,
      // freshly decoded copies, each on its own buffer: moved to the thread, not copied
      transferList: [series.timestampsMs, series.dryBulbC, series.humidity.values, series.pressurePa, series.flags, modes, mechanicalFraction, humidified]
        .filter((a) => a !== null)
        .map((a) => a.buffer as ArrayBuffer),
    },
  );
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}
