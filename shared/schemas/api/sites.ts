/** Answers of the site routes (server/routes/sites.ts). */
import { z } from 'zod';
import { idSchema, isoTimeSchema } from './common';

export const siteSchema = z.object({
  id: idSchema,
  projectId: idSchema,
  name: z.string(),
  latitude: z.number().nullable(),
  longitude: z.number().nullable(),
  elevationM: z.number(),
  timeZone: z.string(),
  createdAt: isoTimeSchema,
});
export type Site = z.infer<typeof siteSchema>;

export const siteListResponse = z.object({ sites: z.array(siteSchema) });
export const siteResponse = z.object({ site: siteSchema });
