// @ts-nocheck
import { sql } from 'drizzle-orm';
import { integer, primaryKey, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { users } from './people';

export const projects = sqliteTable('projects', {
  id: integer().primaryKey({ autoIncrement: true }),
  name: text().notNull(),
  description: text().notNull().default(''),
  createdAt: integer({ mode: 'timestamp_ms' })
    .notNull()
    .default(sql`(unixepoch('subsec') * 1000)`),
});

export const projectRoles = ['owner', 'engineer', 'viewer'] as const;
export type ProjectRole = (typeof projectRoles)[number];

export const memberships = sqliteTable(
  'memberships',
  {
    projectId: integer()
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    userId: integer()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: text({ enum: projectRoles }).notNull(),
  },
  (table) => [primaryKey({ columns: [table.projectId, table.userId] })],
);
