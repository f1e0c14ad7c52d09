/** Answers of the sweep routes (server/routes/sweeps.ts). */
import { z } from 'zod';
import { scenarioSchema } from '../../scenario/schema';
import { SWEEP_INPUT_PATHS, type SweepAxis, type SweepPoint, type SweepProgress, type SweepValue } from '../../sweep';
import { idSchema, isoTimeSchema, modeHoursSchema, runStatusSchema, shapedAs } from './common';
import { sweepPointValuesSchema } from './runs';

/** How far a sweep has got: points per status and the share that finished. */
export const sweepProgressSchema = z.object({
  total: z.number().int(),
  done: z.number().int(),
  failed: z.number().int(),
  cancelled: z.number().int(),
  running: z.number().int(),
  queued: z.number().int(),
  /** 0…1: the share of points that finished (done, failed or cancelled). */
  fraction: z.number().min(0).max(1),
  /** No point waits or runs any more. */
  finished: z.boolean(),
}) satisfies z.ZodType<SweepProgress>;

/** A swept input with its range (or presets) and the values it takes. */
export const sweptAxisSchema = shapedAs<SweepAxis & { values: SweepValue[] }>()(
  { input: z.enum(SWEEP_INPUT_PATHS), values: z.array(z.union([z.number(), z.string()])) },
  'A swept input with its range or presets and its values (shared/sweep SweepAxis)',
);

/** One point of a sweep: its run, the swept values there, and (once done) the figures its charts read. */
export const sweepPointSchema = shapedAs<SweepPoint>()(
  {
    runId: idSchema,
    values: sweepPointValuesSchema,
    status: runStatusSchema,
    progress: z.number(),
    error: z.string().nullable(),
    results: z.looseObject({ hours: modeHoursSchema, coolingKwh: z.number(), excursionHours: z.number(), breaksEnvelope: z.boolean() }).nullable(),
  },
  "A sweep's point (shared/sweep/series.ts SweepPoint)",
);

/** A sweep as the project's sweep list gives it: what was swept and how far it has got, no results. */
export const sweepListingSchema = z.object({
  id: idSchema,
  projectId: idSchema,
  name: z.string(),
  baseScenarioId: idSchema.nullable(),
  climateFileId: idSchema.nullable(),
  createdBy: idSchema.nullable(),
  createdAt: isoTimeSchema,
  axes: z.array(sweptAxisSchema),
  climate: z.object({ name: z.string(), siteName: z.string() }),
  progress: sweepProgressSchema,
});
export type SweepListing = z.infer<typeof sweepListingSchema>;
export const sweepListResponse = z.object({ sweeps: z.array(sweepListingSchema) });

/** One sweep with its base scenario and every point's status and results. */
export const sweepRecordSchema = sweepListingSchema.extend({ baseScenario: scenarioSchema, points: z.array(sweepPointSchema) });
export type SweepRecord = z.infer<typeof sweepRecordSchema>;
export const sweepResponse = z.object({ sweep: sweepRecordSchema });

export const sweepCancelledResponse = z.object({ cancelled: z.number().int().nonnegative() });
