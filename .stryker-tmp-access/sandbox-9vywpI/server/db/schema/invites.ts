// @ts-nocheck
import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { users } from './people';
import { projectRoles, projects } from './projects';

/** An invitation to a project by e-mail; the link carries a signed token whose id is hashed here. */
export const invites = sqliteTable(
  'invites',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    projectId: integer()
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    email: text().notNull(),
    role: text({ enum: projectRoles }).notNull(),
    /** SHA-256 of the token's random id, so a leaked database cannot mint working links. */
    tokenIdHash: text().notNull(),
    invitedBy: integer().references(() => users.id, { onDelete: 'set null' }),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull(),
    expiresAt: integer({ mode: 'timestamp_ms' }).notNull(),
    acceptedAt: integer({ mode: 'timestamp_ms' }),
    acceptedBy: integer().references(() => users.id, { onDelete: 'set null' }),
    revokedAt: integer({ mode: 'timestamp_ms' }),
  },
  (table) => [index('invites_project_idx').on(table.projectId)],
);
