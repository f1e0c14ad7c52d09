import { sql } from 'drizzle-orm';
import { integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';

export const users = sqliteTable(
  'users',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    email: text().notNull(),
    name: text().notNull(),
    isAdmin: integer({ mode: 'boolean' }).notNull().default(false),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull().default(sql`(unixepoch('subsec') * 1000)`),
  },
  (table) => [uniqueIndex('users_email_unique').on(table.email)],
);

export const sessions = sqliteTable('sessions', {
  /** SHA-256 of the cookie token; the token itself is never stored. */
  tokenHash: text().primaryKey(),
  userId: integer()
    .notNull()
    .references(() => users.id, { onDelete: 'cascade' }),
  createdAt: integer({ mode: 'timestamp_ms' }).notNull(),
  lastSeenAt: integer({ mode: 'timestamp_ms' }).notNull(),
  expiresAt: integer({ mode: 'timestamp_ms' }).notNull(),
});
