import { randomBytes } from 'node:crypto';
import { mkdir, readFile, rm, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';

/**
 * Where uploaded files' bytes live, by a random key the storage makes; the database keeps the key, the name
 * and the SHA-256. A local folder by default; an S3-compatible store fits the same three calls.
 */
export interface FileStorage {
  /** Stores `bytes` under a new random key and answers the key. */
  put(bytes: Buffer): Promise<string>;
  read(key: string): Promise<Buffer>;
  /** Removes the file; a key with no file is fine (an upload undone twice). */
  remove(key: string): Promise<void>;
}

/** 128 random bits as hex: the only form a key takes, so a key can never name a path. */
const KEY = /^[0-9a-f]{32}$/;

function checkedKey(key: string): string {
  if (!KEY.test(key)) throw new Error('Not a storage key');
  return key;
}

/**
 * Files in `dir` (the STORAGE_DIR, outside the web root; `npm run backup` copies it beside the database),
 * two hex characters of fan-out so no folder grows huge: `dir/3f/3fa9….bin`.
 */
export function createLocalStorage(dir: string): FileStorage {
  const root = resolve(dir);
  const pathOf = (key: string) => join(root, checkedKey(key).slice(0, 2), `${key}.bin`);
  return {
    async put(bytes) {
      const key = randomBytes(16).toString('hex');
      await mkdir(join(root, key.slice(0, 2)), { recursive: true });
      // 'wx': never overwrite, even on the (astronomically unlikely) repeat of a random key.
      await writeFile(pathOf(key), bytes, { flag: 'wx' });
      return key;
    },
    read: (key) => readFile(pathOf(key)),
    remove: (key) => rm(pathOf(key), { force: true }),
  };
}
