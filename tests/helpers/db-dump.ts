import { createHash } from 'node:crypto';
import type { Db } from '@/db/client';

export interface DatabaseDump {
  /** SHA-256 of the whole database image (`sqlite3_serialize`): equal means unchanged byte for byte. */
  sha256: string;
  /** Rows per table, to tell what changed when the hash differs. */
  rows: Record<string, number>;
}

/** A fingerprint of the database to compare before and after a request that must change nothing. */
export function databaseDump(db: Db): DatabaseDump {
  const sqlite = db.$client;
  const tables = sqlite
    .prepare("SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name")
    .pluck()
    .all() as string[];
  const rows = Object.fromEntries(
    tables.map((name) => [name, sqlite.prepare(`SELECT count(*) FROM "${name}"`).pluck().get() as number]),
  );
  return { sha256: createHash('sha256').update(sqlite.serialize()).digest('hex'), rows };
}
