// @ts-nocheck
import { sql } from 'drizzle-orm';
import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';

export const unitSystems = ['si', 'ip'] as const;
export type UnitSystem = (typeof unitSystems)[number];

export const users = sqliteTable(
  'users',
  {
    id: integer().primaryKey({ autoIncrement: true }),
    email: text().notNull(),
    name: text().notNull(),
    isAdmin: integer({ mode: 'boolean' }).notNull().default(false),
    createdAt: integer({ mode: 'timestamp_ms' })
      .notNull()
      .default(sql`(unixepoch('subsec') * 1000)`),
    /** The OpenID issuer and subject this person signs in as; null until their first sign-in. */
    oidcIssuer: text(),
    oidcSubject: text(),
    lastSignInAt: integer({ mode: 'timestamp_ms' }),
    /** Per-person settings: units shown in the client, and whether a finished run sends an e-mail. */
    unitSystem: text({ enum: unitSystems }).notNull().default('si'),
    runNotices: integer({ mode: 'boolean' }).notNull().default(false),
  },
  (table) => [uniqueIndex('users_email_unique').on(table.email), uniqueIndex('users_oidc_identity_unique').on(table.oidcIssuer, table.oidcSubject)],
);

export const sessions = sqliteTable(
  'sessions',
  {
    /** SHA-256 of the cookie token; the token itself is never stored. */
    tokenHash: text().primaryKey(),
    userId: integer()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    createdAt: integer({ mode: 'timestamp_ms' }).notNull(),
    lastSeenAt: integer({ mode: 'timestamp_ms' }).notNull(),
    /** The absolute end of the session; the idle limit is checked against lastSeenAt. */
    expiresAt: integer({ mode: 'timestamp_ms' }).notNull(),
  },
  (table) => [index('sessions_user_idx').on(table.userId)],
);

/** A sign-in that went to the provider and has not come back yet: PKCE verifier, nonce and where to return. */
export const signInAttempts = sqliteTable('sign_in_attempts', {
  /** SHA-256 of the OAuth state; the browser holds the state itself in a short-lived cookie. */
  stateHash: text().primaryKey(),
  codeVerifier: text().notNull(),
  nonce: text().notNull(),
  returnTo: text().notNull(),
  createdAt: integer({ mode: 'timestamp_ms' }).notNull(),
  expiresAt: integer({ mode: 'timestamp_ms' }).notNull(),
});
