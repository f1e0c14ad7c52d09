import { mkdirSync } from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { sql } from 'drizzle-orm';
import { drizzle, type BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import { migrationsFolder } from '../paths';
import * as schema from './schema';

export type Db = BetterSQLite3Database<typeof schema> & { $client: Database.Database };

/**
 * A connection to an existing database file with this server's settings, without migrating: what a pool thread
 * opens to store a run's results itself (workers/execute-and-store-run.ts). WAL mode is kept in the file.
 */
export function connectDatabase(file: string, { fileMustExist = true }: { fileMustExist?: boolean } = {}): Db {
  const sqlite = new Database(file, { fileMustExist });
  sqlite.pragma('journal_mode = WAL');
  // Under WAL, NORMAL syncs at checkpoints instead of at every commit: the database stays consistent after a crash
  // or power cut, but the last commits before a power cut may be lost (DEVELOPERS.md, "The database").
  sqlite.pragma('synchronous = NORMAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  const db = drizzle({ client: sqlite, schema, casing: 'snake_case' });
  // The pool's threads write to the same file (they store the run queue's runs). A transaction that began deferred,
  // read, and then wrote after a thread committed would fail at once with SQLITE_BUSY_SNAPSHOT (busy_timeout cannot
  // help it), so every transaction takes the write lock as it begins (IMMEDIATE), waiting for it up to busy_timeout.
  const deferredByDefault = db.transaction.bind(db);
  db.transaction = ((run, config) => deferredByDefault(run, { behavior: 'immediate', ...config })) as Db['transaction'];
  return db;
}

/** Opens (creating if needed) the SQLite file in WAL mode and brings its schema up to date. */
export function openDatabase(file: string): Db {
  if (file !== ':memory:') mkdirSync(path.dirname(file), { recursive: true });
  const db = connectDatabase(file, { fileMustExist: false });
  migrate(db, { migrationsFolder });
  return db;
}

/** How long the database takes to answer a trivial query, in milliseconds (the health check's probe); throws if it cannot. */
export function databaseLatencyMs(db: Db): number {
  const started = performance.now();
  db.get(sql`select 1`);
  return performance.now() - started;
}

/** A transaction handle; code that must work inside or outside one takes `DbOrTx`. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type DbOrTx = Db | Tx;
