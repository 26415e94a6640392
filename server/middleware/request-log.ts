import { randomUUID } from 'node:crypto';
import type { Request, RequestHandler } from 'express';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Locals {
      /** Names the request in the log, in the `X-Request-Id` header and in any error body. */
      requestId: string;
    }
  }
}

export const REQUEST_ID_HEADER = 'X-Request-Id';

/**
 * The path as logged: no query string (the dev mail key travels there), and the secret path segment of an
 * invitation or password reset link replaced by its name. Headers and bodies are never logged, so neither are passwords or
 * cookies.
 */
export function loggedPath(req: Request): string {
  return req.originalUrl
    .split('?')[0]
    .replace(/\/invitations\/[^/]+/, '/invitations/:token')
    .replace(/\/password-reset\/[^/]+/, '/password-reset/:resetToken')
    .replace(/\/verify-email\/[^/]+/, '/verify-email/:verifyToken');
}

/** One JSON line: when, how grave, which request, then the fields of the event. */
export function logLine(
  level: 'info' | 'warn' | 'error',
  requestId: string,
  fields: Record<string, unknown>,
): string {
  return JSON.stringify({ time: new Date().toISOString(), level, requestId, ...fields });
}

/** Gives every request an id (echoed in `X-Request-Id`) before anything else runs. */
export const requestId: RequestHandler = (_req, res, next) => {
  res.locals.requestId = randomUUID();
  res.setHeader(REQUEST_ID_HEADER, res.locals.requestId);
  next();
};

/** One JSON line per request once the answer is sent: method, path, status, milliseconds, user id. */
export function requestLog(log: (line: string) => void): RequestHandler {
  return (req, res, next) => {
    const startedAt = performance.now();
    res.on('finish', () => {
      const status = res.statusCode;
      const level = status >= 500 ? 'error' : status >= 400 ? 'warn' : 'info';
      log(
        logLine(level, res.locals.requestId, {
          method: req.method,
          path: loggedPath(req),
          status,
          ms: Number((performance.now() - startedAt).toFixed(1)),
          userId: res.locals.user?.id ?? null,
        }),
      );
    });
    next();
  };
}
