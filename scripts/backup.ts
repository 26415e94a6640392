// npm run backup [-- <folder>]: an online copy of the database and the storage folder while the server runs.
import { join } from 'node:path';
import { databasePath } from '@/db/client';
import { backupTo } from '@/db/backup';
import { loadEnv } from '@/server/env';

const env = loadEnv();
const target = process.argv[2] ?? join('backups', new Date().toISOString().replace(/[:.]/g, '-'));
backupTo({ databasePath: databasePath(env.DATABASE_URL), storageDir: env.STORAGE_DIR }, target)
  .then((manifest) => console.log(`Backup written to ${target} (storage copied: ${manifest.storage})`))
  .catch((error: unknown) => {
    console.error(error instanceof Error ? error.message : error);
    process.exit(1);
  });
