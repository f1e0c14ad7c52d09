import { eq } from 'drizzle-orm';
import { decodeFloat64Column, decodeUint8Column } from '../../shared/climate';
import { hourlyCsvInput, runScenario, type HourlyCsvInput, type Scenario } from '../../shared/scenario';
import type { RunClimateSnapshot } from '../../shared/report';
import { loadClimateSeries } from '../climate/store';
import type { Db } from '../db/client';
import { runHours, type runs } from '../db/schema';
import { HttpError } from '../http-error';

/**
 * The hourly rows of a finished run, in the command line's --hourly columns. The run keeps only each
 * hour's mode and compressor share; the outdoor states (wet-bulb, dew point, RH, W, h) are recomputed
 * from the stored climate series with the run's own scenario, elevation and clock, exactly as the run
 * computed them, and the stored modes are used as they were.
 */
export function hourlyResultsOf(db: Db, run: typeof runs.$inferSelect): HourlyCsvInput {
  const stored = db.select().from(runHours).where(eq(runHours.runId, run.id)).get();
  if (!stored || run.status !== 'done') throw new HttpError(409, 'not_ready', `Run ${run.id} is ${run.status}; its hours exist once it is done.`);
  const series = run.climateFileId === null ? undefined : loadClimateSeries(db, run.climateFileId);
  if (!series) {
    throw new HttpError(410, 'climate_file_deleted', `The climate file of run ${run.id} was deleted, so its hourly weather is gone; the summary can still be downloaded.`);
  }
  const modes = decodeUint8Column(stored.modes);
  const mechanicalFraction = decodeFloat64Column(stored.mechanicalFraction);
  if (modes.length !== series.timestampsMs.length) {
    throw new HttpError(409, 'series_changed', `Run ${run.id} has ${modes.length} hours but its climate file now has ${series.timestampsMs.length}.`);
  }
  const climate = JSON.parse(run.climateJson) as RunClimateSnapshot;
  const scenario = JSON.parse(run.scenarioJson) as Scenario;
  const computed = runScenario(scenario, series, { elevationM: climate.elevationM, utcOffsetMinutes: climate.utcOffsetMinutes });
  return { ...hourlyCsvInput(series, computed), modes, mechanicalFraction };
}
