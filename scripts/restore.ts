// npm run restore -- <backup folder>: puts a backup back. Stop the server first.
import { databasePath } from '@/db/client';
import { restoreFrom } from '@/db/backup';
import { loadEnv } from '@/server/env';

const env = loadEnv();
const backup = process.argv[2];
if (!backup) {
  console.error('Name the backup folder: npm run restore -- backups/<folder>');
  process.exit(1);
}
try {
  const manifest = restoreFrom(backup, {
    databasePath: databasePath(env.DATABASE_URL),
    storageDir: env.STORAGE_DIR,
  });
  console.log(`Restored the backup of ${manifest.createdAt} to ${env.DATABASE_URL}`);
} catch (error) {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
}
