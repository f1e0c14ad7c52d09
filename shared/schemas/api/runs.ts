/** Answers of the run routes (server/routes/runs.ts, server/runs/run-json.ts). */
import { z } from 'zod';
import type { ComparableResults } from '../../metrics';
import type { ScenarioResults } from '../../scenario/run';
import { scenarioSchema } from '../../scenario/schema';
import type { SweepPointValues } from '../../sweep';
import { idSchema, isoTimeSchema, modeHoursSchema, runStatusSchema, shapedAs } from './common';

/** The swept inputs' values at a sweep's point, e.g. {"system.supplyAirC": 24}. */
export const sweepPointValuesSchema = z.record(z.string(), z.union([z.number(), z.string()])) as unknown as z.ZodType<SweepPointValues>;

/** The climate file as it was when the run was made. */
export const runClimateSchema = z.object({
  id: idSchema,
  name: z.string(),
  sha256: z.string(),
  hours: z.number().int(),
  firstHourMs: z.number(),
  lastHourMs: z.number(),
  site: z.object({ id: idSchema, name: z.string(), elevationM: z.number(), timeZone: z.string() }),
  elevationM: z.number(),
  utcOffsetMinutes: z.number(),
  /** The file was read with humidity over ice below 0 °C (import option); absent for runs made before the option. */
  humidityOverIce: z.boolean().optional(),
});
export type RunClimate = z.infer<typeof runClimateSchema>;

/** A run's whole results (shared/scenario/run.ts ScenarioResults). */
export const scenarioResultsSchema = shapedAs<ScenarioResults>()(
  {
    engineVersion: z.string(),
    hours: modeHoursSchema,
    hoursByMonth: z.array(z.looseObject({ month: z.number() })),
    hoursByHourOfDay: z.array(z.looseObject({ hour: z.number() })),
    hoursByYear: z.array(z.looseObject({ year: z.number() })),
    energy: z.looseObject({ coolingKwh: z.number() }),
    water: z.looseObject({ totalL: z.number() }),
    // Results stored by an older engine may lack a figure or hold null for it; lists leave such a field out.
    peakMechanicalLoadKw: z.number().nullable(),
    excursions: z.looseObject({ hours: z.number() }).optional(),
  },
  "A run's results (shared/scenario/run.ts ScenarioResults)",
);

/** The totals a run list carries (shared/metrics.ts ComparableResults). */
export const listedResultsSchema = shapedAs<ComparableResults>()(
  {
    hours: modeHoursSchema,
    energy: z.looseObject({ coolingKwh: z.number() }),
    water: z.looseObject({ totalL: z.number() }),
    peakMechanicalLoadKw: z.number().nullable().optional(),
  },
  "A run's totals (shared/metrics.ts ComparableResults)",
);

const runFields = {
  id: idSchema,
  projectId: idSchema,
  scenarioId: idSchema.nullable(),
  climateFileId: idSchema.nullable(),
  status: runStatusSchema,
  /** 0…1 while running */
  progress: z.number().min(0).max(1),
  error: z.string().nullable(),
  /** The engine that made (or will make) the run, e.g. "scenario-engine 2.0.0". */
  engineVersion: z.string(),
  /** Set when the run is one point of a sweep, with that sweep's name and the swept inputs' values here. */
  sweepId: idSchema.nullable(),
  sweepName: z.string().nullable(),
  sweepPoint: sweepPointValuesSchema.nullable(),
  createdBy: idSchema.nullable(),
  createdAt: isoTimeSchema,
  startedAt: isoTimeSchema.nullable(),
  finishedAt: isoTimeSchema.nullable(),
};

/** One run as GET /projects/:projectId/runs/:runId gives it: the inputs as run and the results (null until done). */
export const runRecordSchema = z.object({ ...runFields, scenario: scenarioSchema, climate: runClimateSchema, results: scenarioResultsSchema.nullable() });
export type RunRecord = z.infer<typeof runRecordSchema>;
export const runResponse = z.object({ run: runRecordSchema });

/** A run as the project's run list gives it: totals only, no per-month tables. */
export const runListingSchema = z.object({ ...runFields, scenario: scenarioSchema, climate: runClimateSchema, results: listedResultsSchema.nullable() });
export type RunListing = z.infer<typeof runListingSchema>;
export const runListResponse = z.object({ runs: z.array(runListingSchema) });

/** POST /projects/:projectId/runs: each run as GET gives it, and whether an earlier identical run was reused. */
export const runsCreatedResponse = z.object({ runs: z.array(runRecordSchema.extend({ reused: z.boolean() })) });
export type QueuedRun = z.infer<typeof runsCreatedResponse>['runs'][number];

/** GET …/runs/:runId/hours: each hour's mode code, compressors' share and humidified flag. */
export const runHoursResponse = z.object({
  modeNames: z.array(z.string()),
  modes: z.array(z.number().int()),
  mechanicalFraction: z.array(z.number().min(0).max(1)),
  /** 1 for a free-cooling hour whose evaporative stage only added moisture; null for runs made before engine 2.0.0. */
  humidified: z.array(z.number().int()).nullable(),
});
