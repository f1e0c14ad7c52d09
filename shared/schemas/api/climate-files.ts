/** Answers of the climate-file routes (server/routes/climate-files.ts, server/routes/projections.ts; a file as lists show it: server/climate/listing.ts). */
import { z } from 'zod';
import type { DetectedMapping, ImportReport } from '../../climate/types';
import type { ClimateSummary } from '../../climate-summary';
import type { HumidityKind } from '../../psychrometrics/bulk';
import { idSchema, isoTimeSchema, shapedAs } from './common';
import { siteSchema } from './sites';

/** The importer's report of one file: counts, issues, years (shared/climate/types.ts ImportReport). */
export const importReportSchema = shapedAs<ImportReport>()(
  {
    ok: z.boolean(),
    summary: z.string(),
    years: z.array(z.number().int()),
    counts: z.looseObject({ hours: z.number(), measuredHours: z.number(), filledHours: z.number(), missingHours: z.number() }),
    issues: z.array(z.looseObject({ kind: z.string(), severity: z.enum(['error', 'warning', 'info']), message: z.string() })),
  },
  'The import report (shared/climate/types.ts ImportReport)',
);

/** The columns the importer read, found or as the person fixed them (shared/climate/types.ts DetectedMapping). */
export const detectedMappingSchema = shapedAs<DetectedMapping>()(
  { delimiter: z.enum([',', ';', '\t']), decimalSeparator: z.enum(['.', ',']), headers: z.array(z.string()), confidence: z.number() },
  'The detected column mapping (shared/climate/types.ts DetectedMapping)',
);

/** Coverage per year, monthly statistics and design conditions (shared/climate-summary ClimateSummary). */
export const climateSummarySchema = shapedAs<ClimateSummary>()(
  {
    years: z.array(z.object({ year: z.number(), hours: z.number(), measuredHours: z.number(), filledHours: z.number(), missingHours: z.number() })),
    completenessPct: z.number(),
    monthly: z.looseObject({ dryBulbC: z.array(z.unknown()), dewPointC: z.array(z.unknown()) }),
    design: z.looseObject({}),
    meanPressurePa: z.number(),
  },
  'A climate file summary (shared/climate-summary ClimateSummary)',
);

/** The humidity a stored series holds, with its unit in the name (shared/psychrometrics/bulk.ts HumidityKind). */
export const humidityKindSchema = z.enum(['relative-humidity-pct', 'dew-point-c', 'wet-bulb-c', 'humidity-ratio-kgkg']) satisfies z.ZodType<HumidityKind>;

/** The listing row of a climate file (without mapping and report). */
export const climateFileListingSchema = z.object({
  id: idSchema,
  projectId: idSchema,
  siteId: idSchema,
  siteName: z.string(),
  name: z.string(),
  originalFileName: z.string(),
  byteSize: z.number().int().nonnegative(),
  sha256: z.string(),
  humidityKind: humidityKindSchema,
  hasPressure: z.boolean(),
  hours: z.number().int().nonnegative(),
  measuredHours: z.number().int().nonnegative(),
  filledHours: z.number().int().nonnegative(),
  missingHours: z.number().int().nonnegative(),
  firstHourMs: z.number(),
  lastHourMs: z.number(),
  /** Calendar years the file covers, counted on the file's own clock (an hour ending at midnight belongs to the day before). */
  years: z.array(z.number().int()),
  /** For a future-climate projection: the file it was made from (null once that file is deleted). */
  parentId: idSchema.nullable(),
  /** For a future-climate projection: its method and the parent's name; null for an upload. */
  projection: z.object({ method: z.string(), parentName: z.string() }).nullable(),
  createdBy: idSchema.nullable(),
  createdAt: isoTimeSchema,
});
export type ClimateFileListing = z.infer<typeof climateFileListingSchema>;

/** GET /projects/:projectId/climate-files: the site's elevation rides along (forms derate the envelope for it). */
export const climateFileListResponse = z.object({ climateFiles: z.array(climateFileListingSchema.extend({ siteElevationM: z.number() })) });
export type ListedClimateFile = z.infer<typeof climateFileListResponse>['climateFiles'][number];

export const climateFileDetailResponse = z.object({
  climateFile: climateFileListingSchema,
  site: siteSchema,
  mapping: detectedMappingSchema,
  report: importReportSchema,
  summary: climateSummarySchema,
});
export type ClimateFileDetail = z.infer<typeof climateFileDetailResponse>;

/** One of the first hours an upload preview shows: SI, humidity in the unit of its kind (%, °C or kg/kg). */
export const previewHourSchema = z.object({
  timestampMs: z.number(),
  dryBulbC: z.number().nullable(),
  humidity: z.number().nullable(),
  pressurePa: z.number().nullable(),
  /** 0 measured, 1 filled, 2 missing */
  flag: z.number().int().min(0).max(2),
});

/** POST …/climate-files/preview: the file imported without being stored. */
export const climatePreviewResponse = z.object({
  ok: z.boolean(),
  mapping: detectedMappingSchema,
  report: importReportSchema,
  humidityKind: humidityKindSchema.nullable(),
  firstLines: z.array(z.string()),
  preview: z.array(previewHourSchema),
});
export type ClimatePreview = z.infer<typeof climatePreviewResponse>;

export const climateFileCreatedResponse = z.object({ climateFile: climateFileListingSchema, report: importReportSchema });

/** The 422 `import_rejected` answer's details when the importer refuses the file. */
export const rejectedImportDetailsSchema = z.object({ report: importReportSchema, mapping: detectedMappingSchema });

/** GET …/climate-files/:fileId/hours: the stored hourly series, SI, one array per column; humidity in the unit of its kind. */
export const climateFileHoursResponse = z.object({
  humidityKind: humidityKindSchema,
  timestampsMs: z.array(z.number()),
  dryBulbC: z.array(z.number().nullable()),
  humidity: z.array(z.number().nullable()),
  pressurePa: z.array(z.number().nullable()).nullable(),
  /** 0 measured, 1 filled, 2 missing */
  flags: z.array(z.number().int().min(0).max(2)),
});
export type ClimateFileHours = z.infer<typeof climateFileHoursResponse>;
