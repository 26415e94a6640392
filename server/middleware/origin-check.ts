import type { RequestHandler } from 'express';
import { AppError } from '@/server/app-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Scheme, host and port as the URL standard serialises them (`http://a.test:80` → `http://a.test`). */
function originOf(text: string): string | undefined {
  try {
    const { origin } = new URL(text);
    return origin === 'null' ? undefined : origin;
  } catch {
    return undefined;
  }
}

/**
 * CSRF guard for state-changing requests: a browser's `Origin` must equal one of `allowedOrigins` in
 * scheme, host and port. The Host header is never trusted for this: the request itself chooses it.
 * Requests without `Origin` pass: browsers always send it on cross-origin POST, PATCH and DELETE, so only
 * non-browser clients (scripts, tests) omit it, and they cannot ride a victim's cookie.
 */
export function originCheck(allowedOrigins: string[]): RequestHandler {
  const allowed = new Set(allowedOrigins.map(originOf).filter((origin) => origin !== undefined));
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.get('origin');
    if (origin === undefined) return next();
    const normalised = originOf(origin);
    if (!normalised || !allowed.has(normalised)) {
      throw new AppError('forbidden', 'Cross-site request refused');
    }
    next();
  };
}
