import { sql } from 'drizzle-orm';
import { blob, index, integer, real, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { climateFiles } from './climate';
import { users } from './people';
import { projects } from './projects';

/** A project's own inlet envelope, beside the published presets. */
export const envelopes = sqliteTable(
  'envelopes',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    projectId: integer()
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    note: text().notNull().default(''),
    /** JSON of shared/scenario envelopeSchema. */
    limitsJson: text().notNull(),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull().default(sql`(unixepoch('subsec') * 1000)`),
  },
  (table) => [index('envelopes_project_idx').on(table.projectId)],
);

export const scenarios = sqliteTable(
  'scenarios',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    projectId: integer()
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    /** JSON of shared/scenario scenarioSchema, as last saved. */
    scenarioJson: text().notNull(),
    createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull().default(sql`(unixepoch('subsec') * 1000)`),
    updatedAt: integer({ mode: 'timestamp_ms' }).notNull().default(sql`(unixepoch('subsec') * 1000)`),
  },
  (table) => [index('scenarios_project_idx').on(table.projectId)],
);

export const runStatuses = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export type RunStatus = (typeof runStatuses)[number];

/** One immutable computation: its inputs are copied in, so editing the scenario later changes nothing here. */
export const runs = sqliteTable(
  'runs',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    projectId: integer()
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    scenarioId: integer().references(() => scenarios.id, { onDelete: 'set null' }),
    climateFileId: integer().references(() => climateFiles.id, { onDelete: 'set null' }),
    /** The scenario exactly as run. */
    scenarioJson: text().notNull(),
    /** The climate file as run: name, site, hours, checksum of the original. */
    climateJson: text().notNull(),
    engineVersion: text().notNull(),
    status: text({ enum: runStatuses }).notNull().default('queued'),
    progress: real().notNull().default(0),
    error: text(),
    resultsJson: text(),
    createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull().default(sql`(unixepoch('subsec') * 1000)`),
    startedAt: integer({ mode: 'timestamp_ms' }),
    finishedAt: integer({ mode: 'timestamp_ms' }),
  },
  (table) => [index('runs_project_idx').on(table.projectId), index('runs_status_idx').on(table.status)],
);

/** Per-hour outcome of a finished run, column-wise: mode codes and the compressors' share of the load. */
export const runHours = sqliteTable('run_hours', {
  runId: integer()
    .primaryKey()
    .references(() => runs.id, { onDelete: 'cascade' }),
  modes: blob({ mode: 'buffer' }).notNull(),
  mechanicalFraction: blob({ mode: 'buffer' }).notNull(),
});
