// @ts-nocheck
import { sql } from 'drizzle-orm';
import { blob, index, integer, real, sqliteTable, text, type AnySQLiteColumn } from 'drizzle-orm/sqlite-core';
import { projects } from './projects';
import { users } from './people';

export const sites = sqliteTable(
  'sites',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    projectId: integer()
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    latitude: real(),
    longitude: real(),
    /** Sets barometric pressure by the standard atmosphere when a file has none. */
    elevationM: real().notNull().default(0),
    timeZone: text().notNull().default('UTC'),
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
  },
  (table) => [index('sites_project_idx').on(table.projectId)],
);

/** One uploaded hourly series; the listing row, without the heavy columns. */
export const climateFiles = sqliteTable(
  'climate_files',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    projectId: integer()
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    siteId: integer()
      .notNull()
      .references(() => sites.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    originalFileName: text().notNull(),
    byteSize: integer().notNull(),
    sha256: text().notNull(),
    /** The mapping used (JSON of the importer's DetectedMapping). */
    mappingJson: text().notNull(),
    /** The validation report (JSON of the importer's ImportReport). */
    reportJson: text().notNull(),
    humidityKind: text().notNull(),
    hasPressure: integer({ mode: 'boolean' }).notNull(),
    hours: integer().notNull(),
    measuredHours: integer().notNull(),
    filledHours: integer().notNull(),
    missingHours: integer().notNull(),
    firstHourMs: integer().notNull(),
    lastHourMs: integer().notNull(),
    /** For a derived file (a future-climate projection): the file it was made from. */
    parentId: integer().references((): AnySQLiteColumn => climateFiles.id, { onDelete: 'set null' }),
    /** For a derived file: how it was made (JSON: method, change factors, note); null for uploads. */
    derivationJson: text(),
    createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
  },
  (table) => [index('climate_files_project_idx').on(table.projectId), index('climate_files_site_idx').on(table.siteId)],
);

/** The file as uploaded: the user's evidence, downloadable again. */
export const climateOriginals = sqliteTable('climate_originals', {
  climateFileId: integer()
    .primaryKey()
    .references(() => climateFiles.id, { onDelete: 'cascade' }),
  bytes: blob({ mode: 'buffer' }).notNull(),
});

/** The hourly series column-wise: one little-endian typed-array blob per quantity. */
export const climateSeries = sqliteTable('climate_series', {
  climateFileId: integer()
    .primaryKey()
    .references(() => climateFiles.id, { onDelete: 'cascade' }),
  timestampsMs: blob({ mode: 'buffer' }).notNull(),
  dryBulbC: blob({ mode: 'buffer' }).notNull(),
  humidity: blob({ mode: 'buffer' }).notNull(),
  pressurePa: blob({ mode: 'buffer' }),
  flags: blob({ mode: 'buffer' }).notNull(),
});

/**
 * The full issue list of an import whose report was cut to its first 200 issues, as gzipped CSV for download.
 * Linked to the climate file when the import was stored (deleted with it); a preview's or a refused upload's list
 * is kept until newer ones push it out (server/climate/issue-lists.ts).
 */
export const climateIssueLists = sqliteTable(
  'climate_issue_lists',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    projectId: integer()
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    climateFileId: integer().references(() => climateFiles.id, { onDelete: 'cascade' }),
    issues: integer().notNull(),
    csvGzip: blob({ mode: 'buffer' }).notNull(),
    createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
  },
  (t) => [index('climate_issue_lists_project_idx').on(t.projectId)],
);
