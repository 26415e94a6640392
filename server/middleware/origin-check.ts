import type { RequestHandler } from 'express';
import { verifyRequestOrigin } from 'lucia';
import { AppError } from '@/server/app-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * CSRF guard for state-changing requests: a browser's `Origin` must name this host or one of
 * `allowedOrigins`. Requests without `Origin` pass: browsers always send it on cross-origin POST, PATCH and
 * DELETE, so only non-browser clients (scripts, tests) omit it, and they cannot ride a victim's cookie.
 */
export function originCheck(allowedOrigins: string[]): RequestHandler {
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.get('origin');
    if (origin === undefined) return next();
    const host = req.get('host');
    const allowed = host ? [host, ...allowedOrigins] : allowedOrigins;
    if (!verifyRequestOrigin(origin, allowed)) {
      throw new AppError('forbidden', 'Cross-site request refused');
    }
    next();
  };
}
