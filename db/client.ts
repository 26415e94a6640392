import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import Database from 'better-sqlite3';
import { drizzle, type BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import * as schema from './schema';

/** Drizzle over better-sqlite3; `$client` is the driver's handle (pragmas, backups, integrity checks). */
export type Db = BetterSQLite3Database<typeof schema> & { $client: Database.Database };

export interface OpenedDatabase {
  db: Db;
  close: () => void;
}

/** Accepts `file:path`, a plain path, or `:memory:`. */
export function databasePath(url: string): string {
  return url.startsWith('file:') ? url.slice('file:'.length) : url;
}

/** Opens SQLite with WAL (file databases) and foreign keys enforced, creating the parent folder if needed. */
export function openDatabase(url: string): OpenedDatabase {
  const path = databasePath(url);
  const inMemory = path === ':memory:';
  if (!inMemory) mkdirSync(dirname(path), { recursive: true });
  const sqlite = new Database(path);
  if (!inMemory) sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  return { db: drizzle(sqlite, { schema }), close: () => sqlite.close() };
}

/** A database handle or an open transaction: repositories accept either so services can group writes. */
export type DbOrTx = Db | Parameters<Parameters<Db['transaction']>[0]>[0];
