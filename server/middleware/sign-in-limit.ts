import type { Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { AppError } from '@/server/app-error';

export interface RateLimitOptions {
  windowMs: number;
  limit: number;
}

export const DEFAULT_SIGN_IN_LIMIT: RateLimitOptions = { windowMs: 15 * 60 * 1000, limit: 10 };

function emailOf(req: Request): string {
  const email: unknown = req.body?.email;
  return typeof email === 'string' ? email.trim().toLowerCase() : '';
}

/** Failed sign-in attempts per client address and e-mail; successful ones do not count. */
export function signInLimit(options: RateLimitOptions) {
  const minutes = Math.ceil(options.windowMs / 60000);
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${emailOf(req)}`,
    handler: (_req, _res, next) =>
      next(new AppError('rate_limited', `Too many sign-in attempts. Try again in ${minutes} minutes.`)),
  });
}
