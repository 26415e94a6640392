import type { Request, RequestHandler } from 'express';
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

/** A client address may fail this many times the per-e-mail limit, across all e-mails, in one window. */
export const ADDRESS_LIMIT_MULTIPLE = 10;

function limiter(options: RateLimitOptions, key: (req: Request) => string) {
  const minutes = Math.ceil(options.windowMs / 60000);
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    keyGenerator: key,
    handler: (_req, _res, next) =>
      next(new AppError('rate_limited', `Too many sign-in attempts. Try again in ${minutes} minutes.`)),
  });
}

/**
 * Failed sign-in attempts are limited twice: per client address and e-mail (guessing one person's password)
 * and per client address alone at a multiple of that (trying many e-mails). Successful ones do not count.
 */
export function signInLimit(options: RateLimitOptions): RequestHandler {
  const address = (req: Request) => ipKeyGenerator(req.ip ?? '');
  const byAddress = limiter({ ...options, limit: options.limit * ADDRESS_LIMIT_MULTIPLE }, address);
  const byEmail = limiter(options, (req) => `${address(req)}|${emailOf(req)}`);
  return (req, res, next) =>
    byAddress(req, res, (error?: unknown) => (error ? next(error) : byEmail(req, res, next)));
}
