/** Answers every caller may read: health and the error body (server/routes/health.ts, server/middleware/errors.ts). */
import { z } from 'zod';
import { isoTimeSchema } from './common';

export const healthResponse = z.object({
  status: z.literal('ok'),
  /** The app's release (package.json). */
  version: z.string(),
  /** The engine new runs are made by, e.g. 'scenario-engine 2.0.0'. */
  engineVersion: z.string(),
  database: z.object({ reachable: z.boolean(), latencyMs: z.number().nonnegative() }),
  time: isoTimeSchema,
});
export type Health = z.infer<typeof healthResponse>;

/** Every API error answers with this body: a stable code, a sentence for people, and details where there are any. */
export const apiErrorBodySchema = z.object({
  error: z.object({ code: z.string().min(1), message: z.string().min(1), details: z.unknown().optional() }),
});
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;

/** The details of a 400 `invalid_request`: each field that failed and why. */
export const invalidFieldsSchema = z.array(z.object({ path: z.string(), message: z.string() }));
