/** Answers of the project routes (server/routes/projects.ts). */
import { z } from 'zod';
import { idSchema, projectRoleSchema } from './common';

/** A project as a person's list gives it, with their role in it (an admin who is not a member sees it as owner). */
export const projectSummarySchema = z.object({ id: idSchema, name: z.string(), description: z.string(), role: projectRoleSchema });
export type ProjectSummary = z.infer<typeof projectSummarySchema>;

/** GET /projects: a signed-out visitor gets an empty list with `signedIn: false`, not a 401. */
export const projectListResponse = z.object({ projects: z.array(projectSummarySchema), signedIn: z.literal(false).optional() });

export const projectCreatedResponse = z.object({ project: projectSummarySchema.extend({ createdAt: z.iso.datetime() }) });

export const projectUpdatedResponse = z.object({ project: projectSummarySchema.omit({ role: true }).extend({ createdAt: z.iso.datetime() }) });

/** What a project stores against its limit, bytes (GET /projects/:projectId/storage). */
export const projectStorageSchema = z.object({
  /** Climate files: original bytes and hourly series. */
  climateFileBytes: z.number().int().nonnegative(),
  /** Finished runs' hourly outcomes. */
  runBytes: z.number().int().nonnegative(),
  /** Runs queued or running, counted at what they will store when done. */
  pendingRunBytes: z.number().int().nonnegative(),
  /** Full issue lists of uploads (downloadable CSV). */
  issueListBytes: z.number().int().nonnegative(),
  usedBytes: z.number().int().nonnegative(),
  limitBytes: z.number().int().positive(),
});
export type ProjectStorage = z.infer<typeof projectStorageSchema>;
export const projectStorageResponse = z.object({ storage: projectStorageSchema });
