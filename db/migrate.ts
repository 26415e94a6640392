import { fileURLToPath } from 'node:url';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import type { Db } from './client';

const migrationsFolder = fileURLToPath(new URL('./migrations', import.meta.url));

/** Applies the committed drizzle-kit migrations that this database has not seen yet. */
export function migrateDatabase(db: Db): void {
  migrate(db, { migrationsFolder });
}
