// @ts-nocheck
import { and, eq } from 'drizzle-orm';
import { z } from 'zod';
import { DURATION_BINS, HOURLY_RATE_LIMIT_K, X_FACTOR_TABLE, type Proposal } from '../../shared/excursions';
import {
  ALLOWABLE_PRESET_IDS,
  DEFAULT_ALLOWABLE_ID,
  DEFAULT_RECOMMENDED_ID,
  proposalQuerySchema,
  RUN_ENVELOPE,
  type ChosenEnvelope,
} from '../../shared/excursions/proposal-query';
import { findEnvelopePreset, hallAirSystem, migrateScenario, parseScenario, type Scenario } from '../../shared/scenario';
import type { AppDeps } from '../app';
import { access, route, type RouteSpec } from '../auth/access';
import { loadClimateSeries } from '../climate/store';
import { runs } from '../db/schema';
import { HttpError } from '../http-error';
import { closedRequestSignal } from '../request-signal';

const runParams = z.object({ runId: z.coerce.number().int().positive('runId must be a positive whole number') });

function chooseEnvelope(id: string, scenario: Scenario): ChosenEnvelope {
  if (id === RUN_ENVELOPE) {
    const { presetId: _presetId, ...limits } = scenario.envelope;
    return { id, label: "The run's envelope", edition: null, note: null, recalledFromMemory: false, limits };
  }
  const preset = findEnvelopePreset(id)!;
  return { id, label: preset.label, edition: preset.edition, note: preset.note, recalledFromMemory: preset.recalledFromMemory, limits: preset.limits };
}

/** Excursion analysis of a run's hours against a proposed envelope or setpoint, for operators. */
export function excursionRoutes(deps: AppDeps): RouteSpec[] {
  const { db, pool } = deps;
  return [
    // Read-only: the proposal travels in the address, so a page can be bookmarked and taken to a review.
    route('get', '/projects/:projectId/runs/:runId/excursions', access.viewer, async (req, res) => {
      const { runId } = runParams.parse(req.params);
      const query = proposalQuerySchema.parse(req.query);
      const run = db
        .select()
        .from(runs)
        .where(and(eq(runs.id, runId), eq(runs.projectId, req.projectId!)))
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
        { transferList, lane: 'interactive', signal: closedRequestSignal(res) },
      );

      res.json({
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
      });
    }),
  ];
}
