import { isIP } from 'node:net';
import { z } from 'zod';

const PROXY_NAMES = new Set(['loopback', 'linklocal', 'uniquelocal']);

/** One entry of TRUST_PROXY's list: a name Express knows, an address, or an address/prefix subnet. */
function isProxyEntry(entry: string): boolean {
  if (PROXY_NAMES.has(entry)) return true;
  const [address, prefix, extra] = entry.split('/');
  if (extra !== undefined || !isIP(address)) return false;
  return (
    prefix === undefined || (/^\d{1,3}$/.test(prefix) && Number(prefix) <= (isIP(address) === 4 ? 32 : 128))
  );
}

/**
 * TRUST_PROXY: a hop count (`1`), or a comma-separated list of `loopback`, `linklocal`, `uniquelocal`,
 * addresses and subnets. Unset: no proxy is trusted and X-Forwarded-For is ignored.
 */
const trustProxySchema = z
  .string()
  .trim()
  .refine((value) => /^\d+$/.test(value) || value.split(',').every((entry) => isProxyEntry(entry.trim())), {
    message: 'Use a hop count, or loopback, addresses and subnets separated by commas',
  })
  .transform((value) => (/^\d+$/.test(value) ? Number(value) : value))
  .optional();

const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
    PORT: z.coerce.number().int().min(0).max(65535).default(8080),
    HOST: z.string().min(1).default('127.0.0.1'),
    DATABASE_URL: z.string().min(1).default('file:data/tributary.db'),
    SMTP_HOST: z.string().min(1).optional(),
    SMTP_PORT: z.coerce.number().int().min(1).max(65535).optional(),
    SMTP_USER: z.string().min(1).optional(),
    SMTP_PASS: z.string().min(1).optional(),
    MAIL_FROM: z.string().min(1).default('Tributary <no-reply@tributary.test>'),
    APP_ORIGIN: z.url().optional(),
    SESSION_DAYS: z.coerce.number().int().min(1).max(365).default(30),
    WEB_DIR: z.string().min(1).default('dist'),
    STORAGE_DIR: z.string().min(1).default('storage'),
    SEED_DEMO: z.enum(['0', '1'], { message: 'Use 1 or 0' }).optional(),
    TRUST_PROXY: trustProxySchema,
    DEV_MAIL_KEY: z.string().min(16, { message: 'Use at least 16 characters' }).max(200).optional(),
  })
  .transform((env) => ({
    ...env,
    APP_ORIGIN: (env.APP_ORIGIN ?? `http://${env.HOST}:${env.PORT}`).replace(/\/$/, ''),
    // The demo firms share a published password: a production start adds them only when asked by name.
    SEED_DEMO: env.SEED_DEMO === undefined ? env.NODE_ENV !== 'production' : env.SEED_DEMO === '1',
  }));

export type Env = z.infer<typeof envSchema>;

/** Reads and checks the environment once; the only module that touches `process.env`. */
export function loadEnv(source: Record<string, string | undefined> = process.env): Env {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  if (parsed.data.NODE_ENV === 'production' && !parsed.data.SMTP_HOST) {
    throw new Error('Invalid environment:\n  SMTP_HOST: required in production');
  }
  return parsed.data;
}
