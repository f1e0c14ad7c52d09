/** Answers of the future-climate projection and excursion routes (server/routes/{projections,excursions}.ts). */
import { z } from 'zod';
import type { ExcursionAnalysis } from '../../excursions/analyse-proposal';
import type { ChosenEnvelope } from '../../excursions/proposal-query';
import type { Derivation } from '../../morphing/derivation';
import type { MonthlyClimate } from '../../morphing/monthly-comparison';
import { idSchema, modeHoursSchema, shapedAs } from './common';
import { climateFileListingSchema } from './climate-files';

export const monthlyClimateSchema = shapedAs<MonthlyClimate>()(
  {
    dryBulbC: z.array(z.unknown()),
    meanDailyMaxC: z.array(z.number().nullable()),
    meanDailyMinC: z.array(z.number().nullable()),
    dewPointC: z.array(z.unknown()),
  },
  'Monthly statistics of a climate file (shared/morphing/monthly-comparison.ts MonthlyClimate)',
);

/** POST …/projections/preview: the monthly statistics a projection would have, nothing stored. */
export const projectionPreviewResponse = z.object({
  comparison: z.object({ parent: monthlyClimateSchema, projection: monthlyClimateSchema }),
  alphaByMonth: z.array(z.number()),
  clampedHighHours: z.number().int(),
  clampedLowHours: z.number().int(),
  lostHours: z.number().int(),
});
export type ProjectionPreview = z.infer<typeof projectionPreviewResponse>;

/** How a projection was made (shared/morphing/derivation.ts Derivation). */
export const derivationSchema = shapedAs<Derivation>()(
  {
    kind: z.literal('projection'),
    method: z.string(),
    citation: z.string(),
    parent: z.object({ id: idSchema, name: z.string(), sha256: z.string(), hours: z.number() }),
    alphaByMonth: z.array(z.number()),
  },
  'How a projection was made (shared/morphing/derivation.ts Derivation)',
);

export const projectionCreatedResponse = z.object({ climateFile: climateFileListingSchema, derivation: derivationSchema });
/** GET /projects/:projectId/projections/:fileId. */
export const projectionResponse = z.object({
  climateFile: climateFileListingSchema,
  parent: climateFileListingSchema.nullable(),
  derivation: derivationSchema,
});
export type ProjectionRecord = z.infer<typeof projectionResponse>;

const chosenEnvelopeSchema = shapedAs<ChosenEnvelope>()(
  { id: z.string(), label: z.string(), edition: z.string().nullable(), recalledFromMemory: z.boolean() },
  'An envelope chosen for an excursion check (shared/excursions/proposal-query.ts ChosenEnvelope)',
);

/** GET …/runs/:runId/excursions: a proposed setpoint or envelope checked against the run's hours. */
export const excursionsResponse = z.object({
  run: z.object({
    id: idSchema,
    scenarioName: z.string(),
    systemKind: z.enum(['direct-air', 'indirect-air', 'water-side']),
    evaporativeEffectiveness: z.number(),
    heatRejection: z.enum(['dry-cooler', 'cooling-tower']).nullable(),
    supplyAirC: z.number(),
    climateName: z.string(),
    siteName: z.string(),
    elevationM: z.number(),
    utcOffsetMinutes: z.number(),
    hours: modeHoursSchema.nullable(),
  }),
  proposal: z.object({
    supplyAirC: z.number(),
    floatUpToC: z.number().nullable(),
    control: chosenEnvelopeSchema,
    recommended: chosenEnvelopeSchema,
    allowable: chosenEnvelopeSchema,
  }),
  /** JSON turns NaN into null: a run without data hours has null X-factor and inlet range. */
  analysis: shapedAs<ExcursionAnalysis>()(
    { applied: z.looseObject({ supplyAirC: z.number() }), modes: z.looseObject({ free: z.number() }), eventsPerYear: z.number().nullable() },
    'The excursion analysis (shared/excursions/analyse-proposal.ts ExcursionAnalysis)',
  ),
  reference: z.object({
    xFactorTable: z.array(z.object({ dryBulbC: z.number(), xFactor: z.number() })),
    hourlyRateLimitK: z.number(),
    durationBins: z.array(z.object({ fromHours: z.number(), toHours: z.number().nullable() })),
  }),
});
export type ExcursionsResponse = z.infer<typeof excursionsResponse>;
