// @ts-nocheck
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';

/**
 * Who did what, when, in which project. Actor and project are plain ids (no foreign key) so the trail
 * outlives a deleted person or project; the names are copied in at the time for the same reason.
 */
export const auditEvents = sqliteTable(
  'audit_events',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    at: integer({ mode: 'timestamp_ms' }).notNull(),
    actorId: integer(),
    actorName: text(),
    projectId: integer(),
    projectName: text(),
    /** Dotted verb such as `auth.sign-in`, `member.role-changed`, `climate.upload`, `run.start`. */
    action: text().notNull(),
    /** What it was done to, in words: `invite for ana@firm.example`, `climate file 12`. */
    target: text().notNull().default(''),
    /** Extra facts as JSON. */
    detailJson: text().notNull().default('{}'),
  },
  (table) => [
    index('audit_events_at_idx').on(table.at),
    index('audit_events_project_idx').on(table.projectId, table.at),
    index('audit_events_actor_idx').on(table.actorId, table.at),
  ],
);
