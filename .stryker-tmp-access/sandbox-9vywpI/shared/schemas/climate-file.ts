// @ts-nocheck
import { z } from 'zod';
import { withoutControlCharacters } from './plain-text';
import { isKnownTimeZone } from '../time-zone';

/** A column named by its 0-based index or its header text. */
const columnRef = z.union([z.number().int().min(0), z.string().min(1).max(200)]);
const temperatureUnit = z.enum(['C', 'F', 'K']);
const pressureUnit = z.enum(['Pa', 'hPa', 'kPa', 'inHg', 'psi']);

/** What a person may fix in the proposed mapping before importing; anything left out is detected. */
export const mappingOverrideSchema = z
  .object({
    delimiter: z.enum([',', ';', '\t']),
    decimalSeparator: z.enum(['.', ',']),
    time: z.discriminatedUnion('layout', [
      z.object({ layout: z.literal('iso'), column: columnRef }),
      z.object({
        layout: z.literal('date-time'),
        dateColumn: columnRef,
        timeColumn: columnRef,
        dateOrder: z.enum(['YMD', 'DMY', 'MDY']).optional(),
      }),
      z.object({
        layout: z.literal('ymdh'),
        year: columnRef,
        month: columnRef,
        day: columnRef,
        hour: columnRef,
        minute: columnRef.nullable().optional(),
        hourConvention: z.enum(['ending-1-24', 'beginning-0-23']).optional(),
      }),
    ]),
    dryBulb: z.object({ column: columnRef, unit: temperatureUnit }),
    humidity: z.discriminatedUnion('quantity', [
      z.object({ column: columnRef, quantity: z.literal('relative-humidity'), unit: z.enum(['%', 'fraction']) }),
      z.object({ column: columnRef, quantity: z.literal('dew-point'), unit: temperatureUnit }),
      z.object({ column: columnRef, quantity: z.literal('wet-bulb'), unit: temperatureUnit }),
      z.object({ column: columnRef, quantity: z.literal('humidity-ratio'), unit: z.enum(['g/kg', 'kg/kg', 'gr/lb']) }),
    ]),
    pressure: z.object({ column: columnRef, unit: pressureUnit }).nullable(),
  })
  .partial();

export type MappingOverride = z.infer<typeof mappingOverrideSchema>;

export const timeBases = ['site-civil', 'site-standard', 'utc'] as const;
export type TimeBasis = (typeof timeBases)[number];

/** Query of the upload and preview routes (the file itself is the request body). */
export const climateUploadQuerySchema = z.object({
  name: z
    .string()
    .trim()
    .min(1, 'name must not be empty')
    .max(120)
    .refine(...withoutControlCharacters('name'))
    .optional(),
  fileName: z.string().trim().min(1).max(255).default('upload.csv'),
  /**
   * How local timestamps without an offset are read: the site's civil time (with daylight saving),
   * its standard time all year (as many weather files are written), or UTC.
   */
  timeBasis: z.enum(timeBases).default('site-civil'),
  maxGapHours: z.coerce.number().int().min(0, 'maxGapHours must be 0 or more').max(168, 'maxGapHours must be at most 168').default(6),
  /**
   * The file gives RH (or dew point) below 0 °C over ice; by default both are over liquid water at every
   * temperature (WMO-No. 8). Sent as `true` or `false` in the query.
   */
  humidityOverIce: z
    .enum(['true', 'false'], { message: 'humidityOverIce must be true or false' })
    .default('false')
    .transform((text) => text === 'true'),
  mapping: z
    .string()
    .max(10_000)
    .optional()
    .transform((text, ctx) => {
      if (text === undefined || text === '') return undefined;
      try {
        return JSON.parse(text) as unknown;
      } catch {
        ctx.addIssue({ code: 'custom', message: 'mapping must be JSON' });
        return z.NEVER;
      }
    })
    .pipe(mappingOverrideSchema.optional()),
});

/** At most this many files in one upload: thirty years of monthly files fit. */
export const MAX_FILES_PER_UPLOAD = 400;

/** The files of one upload (a multipart body), checked before any is read. */
export const uploadedFilesSchema = z
  .array(
    z.object({
      fileName: z.string().trim().min(1, 'every file needs a name').max(255, 'file names must be at most 255 characters'),
      byteLength: z.number().int().min(1, 'a file of the set is empty'),
    }),
  )
  .min(1, 'send at least one file')
  .max(MAX_FILES_PER_UPLOAD, `send at most ${MAX_FILES_PER_UPLOAD} files at once`)
  .refine((files) => new Set(files.map((f) => f.fileName)).size === files.length, 'two files of the set have the same name');

export const siteInputSchema = z.object({
  name: z
    .string()
    .trim()
    .min(1, 'name must not be empty')
    .max(120)
    .refine(...withoutControlCharacters('name')),
  latitude: z.number().min(-90).max(90).nullable().default(null),
  longitude: z.number().min(-180).max(180).nullable().default(null),
  elevationM: z.number().min(-450, 'elevationM must be at least −450 m').max(6000, 'elevationM must be at most 6000 m').default(0),
  timeZone: z.string().default('UTC').refine(isKnownTimeZone, 'timeZone must be an IANA time zone such as Europe/Oslo or a fixed offset such as UTC-07:00'),
});

export type SiteInput = z.infer<typeof siteInputSchema>;
