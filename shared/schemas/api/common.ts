/**
 * Building blocks of the API's response schemas: the answers' shapes, shared by the server's tests, the client's
 * types and the OpenAPI document (server/openapi.ts).
 */
import { z } from 'zod';
import type { ModeHours } from '../../scenario/results';

export const idSchema = z.number().int().positive();

/** A stored time as the API sends it: an ISO 8601 date-time (a Date written by JSON.stringify). */
export const isoTimeSchema = z.iso.datetime({ offset: true });

export const projectRoleSchema = z.enum(['owner', 'engineer', 'viewer']);
export type ProjectRole = z.infer<typeof projectRoleSchema>;

/** Where a run (or a sweep's point) stands; the one list the server, the queue and every page share. */
export const runStatuses = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export const runStatusSchema = z.enum(runStatuses);
export type RunStatus = z.infer<typeof runStatusSchema>;

/**
 * A nested value whose full type is a TypeScript interface elsewhere in shared/ (an import report, a run's results, a
 * report): the contract checks it is an object with these fields, and the client types it as T.
 */
export const shapedAs =
  <T>() =>
  <S extends z.core.$ZodLooseShape>(shape: S, description: string) =>
    z.looseObject(shape).describe(description) as unknown as z.ZodType<T>;

/** Hours per mode of a run (the engine's ModeHours), with the "of which" counts from scenario-engine 2.0.0 on. */
export const modeHoursSchema = shapedAs<ModeHours>()(
  { free: z.number(), adiabatic: z.number(), mechanical: z.number(), noData: z.number(), total: z.number() },
  'Hours per mode (shared/scenario/results.ts ModeHours)',
);
