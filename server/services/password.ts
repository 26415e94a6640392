import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from 'node:crypto';

const KEY_BYTES = 32;
const SALT_BYTES = 16;
/** N = 2^14, r = 8, p = 1: about 50 ms per hash on a 2-core test machine (2^15 took about 120 ms), 16 MiB. */
const DEFAULT_COST = { N: 2 ** 14, r: 8, p: 1 };

function derive(password: string, salt: Buffer, cost: typeof DEFAULT_COST): Promise<Buffer> {
  const options: ScryptOptions = { ...cost, maxmem: 256 * cost.N * cost.r };
  return new Promise((resolve, reject) =>
    scrypt(password.normalize('NFKC'), salt, KEY_BYTES, options, (error, key) =>
      error ? reject(error) : resolve(key),
    ),
  );
}

/** Hashes a password with scrypt; the result `scrypt$N$r$p$salt$key` (base64) carries its own parameters. */
export async function hashPassword(password: string): Promise<string> {
  const salt = randomBytes(SALT_BYTES);
  const key = await derive(password, salt, DEFAULT_COST);
  const { N, r, p } = DEFAULT_COST;
  return ['scrypt', N, r, p, salt.toString('base64'), key.toString('base64')].join('$');
}

/** Constant-time check of a password against a stored hash; a malformed hash never matches. */
export async function verifyPassword(password: string, stored: string): Promise<boolean> {
  const [scheme, n, r, p, saltB64, keyB64] = stored.split('$');
  if (scheme !== 'scrypt' || !saltB64 || !keyB64) return false;
  const cost = { N: Number(n), r: Number(r), p: Number(p) };
  if (![cost.N, cost.r, cost.p].every((v) => Number.isSafeInteger(v) && v > 0)) return false;
  const expected = Buffer.from(keyB64, 'base64');
  if (expected.length !== KEY_BYTES) return false;
  const actual = await derive(password, Buffer.from(saltB64, 'base64'), cost);
  return timingSafeEqual(actual, expected);
}
