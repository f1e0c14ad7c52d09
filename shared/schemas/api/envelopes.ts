/** Answers of the envelope routes (server/routes/envelopes.ts). */
import { z } from 'zod';
import type { EnvelopeLimits, EnvelopePreset } from '../../scenario/envelopes';
import { idSchema, isoTimeSchema, shapedAs } from './common';

const limitsShape = {
  dryBulbMinC: z.number(),
  dryBulbMaxC: z.number(),
  dewPointMinC: z.number(),
  dewPointMaxC: z.number(),
  rhMinPct: z.number(),
  rhMaxPct: z.number(),
};
export const envelopeLimitsSchema = shapedAs<EnvelopeLimits>()(limitsShape, 'Inlet limits (shared/scenario/envelopes.ts EnvelopeLimits)');

export const envelopePresetSchema = z.object({
  id: z.string(),
  label: z.string(),
  edition: z.string(),
  limits: envelopeLimitsSchema,
  recalledFromMemory: z.boolean(),
  note: z.string(),
}) satisfies z.ZodType<EnvelopePreset>;
export const envelopePresetsResponse = z.object({ presets: z.array(envelopePresetSchema) });

/** A project's own inlet envelope. */
export const projectEnvelopeSchema = z.object({
  id: idSchema,
  projectId: idSchema,
  name: z.string(),
  note: z.string(),
  limits: envelopeLimitsSchema,
  createdAt: isoTimeSchema,
});
export type ProjectEnvelope = z.infer<typeof projectEnvelopeSchema>;
export const envelopeListResponse = z.object({ envelopes: z.array(projectEnvelopeSchema) });
export const envelopeResponse = z.object({ envelope: projectEnvelopeSchema });
