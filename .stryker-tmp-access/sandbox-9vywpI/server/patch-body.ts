// @ts-nocheck
import type { z } from 'zod';
import { HttpError } from './http-error';

/**
 * A PATCH body: only the fields the request carries, each checked by the schema's own rule. A schema's
 * defaults fill what a POST leaves out; on a PATCH they would blank what the caller never sent (a
 * description, a site's elevation and time zone), so fields absent from the body are dropped again after
 * parsing. A body that changes nothing is refused.
 */
export function parsePatch<Shape extends z.ZodRawShape>(schema: z.ZodObject<Shape>, body: unknown): Partial<z.infer<z.ZodObject<Shape>>> {
  const parsed = schema.partial().parse(body ?? {}) as Record<string, unknown>;
  const sent = body !== null && typeof body === 'object' ? (body as Record<string, unknown>) : {};
  const patch = Object.fromEntries(Object.entries(parsed).filter(([key]) => Object.hasOwn(sent, key)));
  if (Object.keys(patch).length === 0) {
    throw new HttpError(400, 'invalid_request', `Nothing to change: send at least one of ${Object.keys(schema.shape).join(', ')}.`);
  }
  return patch as Partial<z.infer<z.ZodObject<Shape>>>;
}
