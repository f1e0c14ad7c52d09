import { and, eq } from 'drizzle-orm';
import type { z } from 'zod';
import { DURATION_BINS, HOURLY_RATE_LIMIT_K, X_FACTOR_TABLE, type Proposal } from '../../shared/excursions';
import {
  ALLOWABLE_PRESET_IDS,
  DEFAULT_ALLOWABLE_ID,
  DEFAULT_RECOMMENDED_ID,
  RUN_ENVELOPE,
  type ChosenEnvelope,
  type proposalQuerySchema,
} from '../../shared/excursions/proposal-query';
import { findEnvelopePreset, hallAirSystem, migrateScenario, parseScenario, type Scenario } from '../../shared/scenario';
import type { WorkerPool } from '../../workers/pool';
import { loadClimateSeries } from '../climate/store';
import type { Db } from '../db/client';
import { runs } from '../db/schema';
import { HttpError } from '../http-error';

function chooseEnvelope(id: string, scenario: Scenario): ChosenEnvelope {
  if (id === RUN_ENVELOPE) {
    const { presetId: _presetId, ...limits } = scenario.envelope;
    return { id, label: "The run's envelope", edition: null, note: null, recalledFromMemory: false, limits };
  }
  const preset = findEnvelopePreset(id)!;
  return { id, label: preset.label, edition: preset.edition, note: preset.note, recalledFromMemory: preset.recalledFromMemory, limits: preset.limits };
}

/**
 * Excursion analysis of a finished run's hours against a proposed envelope or setpoint, for operators: the run
 * (404 when not in the project, 409 until done, when its climate file is gone or its scenario no longer validates),
 * the proposal with the envelopes chosen, and the analysis made on the pool's interactive lane (stopped when
 * `signal` aborts).
 */
export async function runExcursions(
  db: Db,
  pool: WorkerPool,
  projectId: number,
  runId: number,
  query: z.infer<typeof proposalQuerySchema>,
  signal: AbortSignal,
) {
  const run = db
    .select()
    .from(runs)
    .where(and(eq(runs.id, runId), eq(runs.projectId, projectId)))
    .get();
  if (!run) throw new HttpError(404, 'not_found', `Run ${runId} was not found in this project.`);
  if (run.status !== 'done') throw new HttpError(409, 'not_ready', `Run ${run.id} is ${run.status}; excursions can be worked out once it is done.`);
  const series = run.climateFileId === null ? undefined : loadClimateSeries(db, run.climateFileId);
  if (!series) throw new HttpError(409, 'climate_file_gone', `The climate file of run ${run.id} has been deleted, so its hours cannot be re-examined.`);
  // A run made by engine 1.0.0 stored retired inputs: migrated (as saved scenarios are) before it is re-examined.
  const parsed = parseScenario(migrateScenario(JSON.parse(run.scenarioJson)).scenario);
  if (!parsed.ok) throw new HttpError(409, 'invalid_scenario', `Run ${run.id}'s scenario no longer validates: ${parsed.errors.join('; ')}`);
  const scenario = parsed.scenario;
  const climate = JSON.parse(run.climateJson) as { name: string; elevationM: number; utcOffsetMinutes: number; site: { name: string } };

  // A hybrid hall's inlet air is its air loop's: the excursions are the air loop's.
  const hallAir = hallAirSystem(scenario.system);
  const supplyAirC = query.supplyAirC ?? hallAir.supplyAirC;
  if (query.floatUpToC !== undefined && query.floatUpToC < supplyAirC) {
    throw new HttpError(400, 'invalid_request', `floatUpToC: must be at or above supplyAirC ${supplyAirC} °C (got ${query.floatUpToC})`, [
      { path: 'floatUpToC', message: `must be at or above supplyAirC ${supplyAirC} °C` },
    ]);
  }
  const runPreset = scenario.envelope.presetId;
  const control = chooseEnvelope(query.control ?? RUN_ENVELOPE, scenario);
  const recommended = chooseEnvelope(query.recommended ?? DEFAULT_RECOMMENDED_ID, scenario);
  const allowable = chooseEnvelope(query.allowable ?? (runPreset && ALLOWABLE_PRESET_IDS.includes(runPreset) ? runPreset : DEFAULT_ALLOWABLE_ID), scenario);
  const proposal: Proposal = {
    supplyAirC,
    floatUpToC: query.floatUpToC ?? null,
    control: control.limits,
    recommended: recommended.limits,
    allowable: allowable.limits,
  };
  const transferList = [series.timestampsMs.buffer, series.dryBulbC.buffer, series.humidity.values.buffer, series.flags.buffer];
  if (series.pressurePa) transferList.push(series.pressurePa.buffer);
  const analysis = await pool.run(
    'analyseExcursions',
    { scenario, series, elevationM: climate.elevationM, proposal },
    { transferList, lane: 'interactive', signal },
  );

  return {
    run: {
      id: run.id,
      scenarioName: scenario.name,
      systemKind: hallAir.kind,
      evaporativeEffectiveness: hallAir.evaporativeEffectiveness,
      heatRejection: hallAir.kind === 'water-side' ? hallAir.heatRejection : null,
      supplyAirC: hallAir.supplyAirC,
      climateName: climate.name,
      siteName: climate.site.name,
      elevationM: climate.elevationM,
      utcOffsetMinutes: climate.utcOffsetMinutes ?? 0,
      hours: JSON.parse(run.resultsJson ?? 'null')?.hours ?? null,
    },
    proposal: { supplyAirC, floatUpToC: proposal.floatUpToC, control, recommended, allowable },
    analysis,
    reference: { xFactorTable: X_FACTOR_TABLE, hourlyRateLimitK: HOURLY_RATE_LIMIT_K, durationBins: DURATION_BINS },
  };
}
