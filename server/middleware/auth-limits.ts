import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { AppError } from '@/server/app-error';

export interface RateLimitOptions {
  windowMs: number;
  limit: number;
}

export const DEFAULT_SIGN_IN_LIMIT: RateLimitOptions = { windowMs: 15 * 60 * 1000, limit: 10 };
/** Sign-ups (each makes an account and a firm) per client address per hour. */
export const DEFAULT_SIGN_UP_LIMIT: RateLimitOptions = { windowMs: 60 * 60 * 1000, limit: 10 };

function emailOf(req: Request): string {
  const email: unknown = req.body?.email;
  return typeof email === 'string' ? email.trim().toLowerCase() : '';
}

/**
 * The client's address as Express sees it: the socket's, unless `trust proxy` names the proxy in front, in
 * which case the address that proxy reports. IPv6 clients count by their /56.
 */
const clientAddress = (req: Request) => ipKeyGenerator(req.ip ?? '');

/** A client address may fail this many times the per-e-mail limit, across all e-mails, in one window. */
export const ADDRESS_LIMIT_MULTIPLE = 10;

function limiter(
  options: RateLimitOptions,
  key: (req: Request) => string,
  what: { message: string; skipSuccessfulRequests: boolean },
) {
  const minutes = Math.ceil(options.windowMs / 60000);
  return rateLimit({
    windowMs: options.windowMs,
    limit: options.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: what.skipSuccessfulRequests,
    keyGenerator: key,
    // Without a trusted proxy an X-Forwarded-For header is the client's own claim: ignored on purpose.
    validate: { xForwardedForHeader: false },
    handler: (_req, _res, next) =>
      next(
        new AppError(
          'rate_limited',
          `${what.message} Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`,
        ),
      ),
  });
}

/**
 * Failed sign-in attempts are limited twice: per client address and e-mail (guessing one person's password)
 * and per client address alone at a multiple of that (trying many e-mails). Successful ones do not count.
 */
export function signInLimit(options: RateLimitOptions): RequestHandler {
  const what = { message: 'Too many sign-in attempts.', skipSuccessfulRequests: true };
  const byAddress = limiter(
    { ...options, limit: options.limit * ADDRESS_LIMIT_MULTIPLE },
    clientAddress,
    what,
  );
  const byEmail = limiter(options, (req) => `${clientAddress(req)}|${emailOf(req)}`, what);
  return (req, res, next) =>
    byAddress(req, res, (error?: unknown) => (error ? next(error) : byEmail(req, res, next)));
}

/**
 * Every sign-up attempt counts, made or refused, per client address: one address cannot mass-produce
 * accounts and firms, and the "already exists" answer stays a slow way to learn who has an account.
 */
export function signUpLimit(options: RateLimitOptions): RequestHandler {
  return limiter(options, clientAddress, {
    message: 'Too many sign-ups from this address.',
    skipSuccessfulRequests: false,
  });
}

/** Reset-link requests per client address, every one counted: each may send an e-mail. */
export function passwordResetLimit(options: RateLimitOptions): RequestHandler {
  return limiter(options, clientAddress, {
    message: 'Too many reset requests from this address.',
    skipSuccessfulRequests: false,
  });
}
