/** Answers of the report and share-link routes (server/routes/reports.ts). */
import { z } from 'zod';
import type { ComparisonReportData, ReportData, RunReportData } from '../../report/report-data';
import { idSchema, isoTimeSchema, shapedAs } from './common';

export const runReportSchema = shapedAs<RunReportData>()(
  { kind: z.literal('run'), projectName: z.string(), generatedAt: z.string(), run: z.looseObject({ id: idSchema }) },
  "A run's report (shared/report/report-data.ts RunReportData)",
);
export const comparisonReportSchema = shapedAs<ComparisonReportData>()(
  { kind: z.literal('comparison'), projectName: z.string(), generatedAt: z.string(), baselineId: idSchema, runs: z.array(z.looseObject({ id: idSchema })) },
  'A comparison report (shared/report/report-data.ts ComparisonReportData)',
);
export const reportDataSchema = z.union([runReportSchema, comparisonReportSchema]) as unknown as z.ZodType<ReportData>;

export const runReportResponse = z.object({ report: runReportSchema });
export const comparisonReportResponse = z.object({ report: comparisonReportSchema });

export const shareTargetSchema = z.enum(['run', 'comparison']);
export const shareStateSchema = z.enum(['members', 'public', 'public-ended', 'revoked']);
export type ShareState = z.infer<typeof shareStateSchema>;

/** A link as its owner's list shows it; the token itself is never stored, so never listed. */
export const shareLinkSchema = z.object({
  id: idSchema,
  target: shareTargetSchema,
  runIds: z.array(idSchema),
  title: z.string(),
  publicUntil: isoTimeSchema.nullable(),
  createdAt: isoTimeSchema,
  createdByName: z.string().nullable(),
  revokedAt: isoTimeSchema.nullable(),
  state: shareStateSchema,
});
export type ShareLink = z.infer<typeof shareLinkSchema>;
export const shareLinkListResponse = z.object({ links: z.array(shareLinkSchema) });
/** POST …/share-links: the token is shown once, here. */
export const shareLinkCreatedResponse = z.object({ link: shareLinkSchema, token: z.string(), path: z.string() });
export const shareLinkResponse = z.object({ link: shareLinkSchema });

/** GET /shared/:token. */
export const sharedReportResponse = z.object({
  link: z.object({ title: z.string(), target: shareTargetSchema, publicUntil: isoTimeSchema.nullable() }),
  report: reportDataSchema,
});
export type SharedReport = z.infer<typeof sharedReportResponse>;
