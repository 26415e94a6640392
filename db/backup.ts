import { cpSync, existsSync, mkdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import Database from 'better-sqlite3';

/** What a backup folder holds, written last: a folder without it is not a finished backup. */
export interface BackupManifest {
  createdAt: string;
  database: 'tributary.db';
  /** True when the storage folder (uploaded files) was copied to `storage/`. */
  storage: boolean;
  /** `PRAGMA integrity_check` of the copy. */
  integrity: 'ok';
}

export const MANIFEST = 'manifest.json';

function integrity(path: string): string {
  const db = new Database(path, { readonly: true });
  try {
    return String(db.pragma('integrity_check', { simple: true }));
  } finally {
    db.close();
  }
}

/**
 * Copies the database while the server runs, with SQLite's online backup API (better-sqlite3 `backup`):
 * the copy is one consistent snapshot, taken in a single step so writes going on meanwhile cannot keep
 * restarting it. Then copies the storage folder, checks the copy and writes the manifest.
 */
export async function backupTo(source: { databasePath: string; storageDir: string }, target: string) {
  if (existsSync(target)) throw new Error(`${target} exists already: choose a new folder for the backup`);
  mkdirSync(target, { recursive: true });
  const databaseCopy = join(target, 'tributary.db');
  const db = new Database(source.databasePath, { readonly: true, fileMustExist: true });
  try {
    await db.backup(databaseCopy, { progress: ({ totalPages }) => Math.max(totalPages, 1) });
  } finally {
    db.close();
  }
  const checked = integrity(databaseCopy);
  if (checked !== 'ok') throw new Error(`The copy failed its integrity check: ${checked}`);
  const storage = existsSync(source.storageDir);
  if (storage) cpSync(source.storageDir, join(target, 'storage'), { recursive: true });
  const manifest: BackupManifest = {
    createdAt: new Date().toISOString(),
    database: 'tributary.db',
    storage,
    integrity: 'ok',
  };
  writeFileSync(join(target, MANIFEST), `${JSON.stringify(manifest, null, 2)}\n`);
  return manifest;
}

/**
 * Puts a backup back in place of the database and the storage folder; run it with the server stopped.
 * The database is copied beside its place and renamed over it, and the old database's `-wal` and `-shm`
 * files are removed: SQLite would otherwise replay the old write-ahead log onto the restored file.
 */
export function restoreFrom(
  backup: string,
  target: { databasePath: string; storageDir: string },
): BackupManifest {
  const manifestPath = join(backup, MANIFEST);
  if (!existsSync(manifestPath)) throw new Error(`${backup} has no ${MANIFEST}: not a finished backup`);
  const manifest = JSON.parse(readFileSync(manifestPath, 'utf8')) as BackupManifest;
  const databaseCopy = join(backup, manifest.database);
  const checked = integrity(databaseCopy);
  if (checked !== 'ok') throw new Error(`The backup's database failed its integrity check: ${checked}`);

  mkdirSync(dirname(target.databasePath), { recursive: true });
  const incoming = `${target.databasePath}.restoring`;
  cpSync(databaseCopy, incoming);
  for (const suffix of ['-wal', '-shm']) rmSync(`${target.databasePath}${suffix}`, { force: true });
  renameSync(incoming, target.databasePath);

  if (manifest.storage) {
    rmSync(target.storageDir, { recursive: true, force: true });
    cpSync(join(backup, 'storage'), target.storageDir, { recursive: true });
  }
  return manifest;
}
