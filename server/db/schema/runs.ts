import { sql } from 'drizzle-orm';
import { blob, index, integer, real, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { climateFiles } from './climate';
import { users } from './people';
import { projects } from './projects';
import { runStatuses } from '../../../shared/schemas/api/common';

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
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
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
    /**
     * JSON of server/scenarios/migrate-saved.ts ScenarioMigrationRecord: the retired inputs the start-up migration
     * replaced (path, before, after, note) and whether an engineer or owner has dismissed the notice; null when never migrated.
     */
    migrationJson: text(),
    createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
    updatedAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
  },
  (table) => [index('scenarios_project_idx').on(table.projectId)],
);

/**
 * A study that varies one or two scenario inputs over a range on one climate file: each point is a run
 * (runs.sweepId), so sweep points are ordinary immutable runs.
 */
export const sweeps = sqliteTable(
  'sweeps',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    projectId: integer()
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    baseScenarioId: integer().references(() => scenarios.id, { onDelete: 'set null' }),
    climateFileId: integer().references(() => climateFiles.id, { onDelete: 'set null' }),
    /** JSON: the base scenario as swept and the swept inputs with their values. */
    specJson: text().notNull(),
    createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
  },
  (table) => [index('sweeps_project_idx').on(table.projectId)],
);

export { runStatuses, type RunStatus } from '../../../shared/schemas/api/common';

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
    /** Set when the run is one point of a sweep; deleting the sweep deletes its runs. */
    sweepId: integer().references(() => sweeps.id, { onDelete: 'cascade' }),
    /** JSON: the swept inputs' values at this point, e.g. {"system.supplyAirC": 24}. */
    sweepPointJson: text(),
    status: text({ enum: runStatuses }).notNull().default('queued'),
    progress: real().notNull().default(0),
    error: text(),
    resultsJson: text(),
    createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
    startedAt: integer({ mode: 'timestamp_ms' }),
    finishedAt: integer({ mode: 'timestamp_ms' }),
  },
  (table) => [index('runs_project_idx').on(table.projectId), index('runs_status_idx').on(table.status), index('runs_sweep_idx').on(table.sweepId)],
);

/**
 * Per-hour outcome of a finished run, column-wise: mode codes, the compressors' share of the load and (engine 2.0.0
 * on; null before) the humidified flag of each hour.
 */
export const runHours = sqliteTable('run_hours', {
  runId: integer()
    .primaryKey()
    .references(() => runs.id, { onDelete: 'cascade' }),
  modes: blob({ mode: 'buffer' }).notNull(),
  mechanicalFraction: blob({ mode: 'buffer' }).notNull(),
  humidified: blob({ mode: 'buffer' }),
});

export const shareTargets = ['run', 'comparison'] as const;
export type ShareTarget = (typeof shareTargets)[number];

/**
 * A read-only link to a report of a run or a comparison. Only the token's hash is kept. Members of the project
 * can open it while it is not revoked; with publicUntil set, anyone can until then.
 */
export const shareLinks = sqliteTable(
  'share_links',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    projectId: integer()
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    tokenHash: text().notNull().unique(),
    target: text({ enum: shareTargets }).notNull(),
    /** The run ids shown, in order (one for a run report; the first is the baseline of a comparison). */
    runIdsJson: text().notNull(),
    title: text().notNull(),
    publicUntil: integer({ mode: 'timestamp_ms' }),
    createdBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
    revokedAt: integer({ mode: 'timestamp_ms' }),
  },
  (table) => [index('share_links_project_idx').on(table.projectId)],
);
