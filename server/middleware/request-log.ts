import { randomUUID } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { pino, type Logger } from 'pino';

declare module 'node:http' {
  interface IncomingMessage {
    /** Logs under the request's id, with passwords, cookies, tokens and links censored (requestLog). */
    log: Logger;
  }
  interface ServerResponse {
    /** The error a 5xx answer is about, for the request's log line (set by the error handler). */
    err?: Error;
  }
}

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

/** Path segments that are secrets (invitation, reset and confirmation links, API and web), by name. */
const SECRET_SEGMENTS: [RegExp, string][] = [
  [/\/invitations\/[^/]+/, '/invitations/:token'],
  [/\/invite\/[^/]+/, '/invite/:token'],
  [/\/password-reset\/[^/]+/, '/password-reset/:resetToken'],
  [/\/reset-password\/[^/]+/, '/reset-password/:resetToken'],
  [/\/verify-email\/[^/]+/, '/verify-email/:verifyToken'],
];

/** Whether a path may hold one of SECRET_SEGMENTS (most do not: one test instead of five replaces). */
const ANY_SECRET_SEGMENT = /\/(invitations|invite|password-reset|reset-password|verify-email)\//;

/**
 * The path as logged: no query string (the dev mail key travels there), and the secret segment of an
 * invitation, password reset or confirmation link replaced by its name.
 */
export function loggedPath(req: Request): string {
  const url = req.originalUrl;
  const query = url.indexOf('?');
  const path = query === -1 ? url : url.slice(0, query);
  if (!ANY_SECRET_SEGMENT.test(path)) return path;
  return SECRET_SEGMENTS.reduce((out, [pattern, name]) => out.replace(pattern, name), path);
}

/**
 * Keys pino censors wherever code logs an object through `req.log` (the request line itself never holds
 * headers or bodies): passwords, cookies, tokens and links.
 */
export const REDACTED_PATHS = [
  'password',
  '*.password',
  '*.*.password',
  'token',
  '*.token',
  'link',
  '*.link',
  'cookie',
  '*.cookie',
  'headers.cookie',
  '*.headers.cookie',
  'headers.authorization',
  '*.headers.authorization',
  'headers["set-cookie"]',
  '*.headers["set-cookie"]',
];

/** Gives every request an id (echoed in `X-Request-Id`) before anything else runs. */
export const requestId: RequestHandler = (_req, res, next) => {
  res.locals.requestId = randomUUID();
  res.setHeader(REQUEST_ID_HEADER, res.locals.requestId);
  next();
};

/**
 * One JSON line per request once the answer is sent or the connection closes (`time`, `level`,
 * `requestId`, `method`, `path`, `status`, `ms`, `userId`, `msg`), at `warn` for 4xx and `error` for 5xx; a
 * 5xx line carries the error's stack (the error handler hands it over as `res.err`). Lines go to `log`, one
 * string each.
 *
 * pino writes the lines. The request line holds only the fields above, none of them secret, so it is
 * written without redaction and without a logger per request (a child logger per request, as pino-http
 * makes two, was a fifth of a signed-in read's time); `req.log` is a child under the request id with
 * redaction, made only when a route logs through it.
 */
export function requestLog(log: (line: string) => void): RequestHandler {
  const destination = { write: (line: string) => log(line.trimEnd()) };
  const options = {
    base: null,
    timestamp: pino.stdTimeFunctions.isoTime,
    formatters: { level: (label: string) => ({ level: label }) },
  };
  const lines = pino(options, destination);
  const routeLogger = pino(
    { ...options, redact: { paths: REDACTED_PATHS, censor: '[redacted]' } },
    destination,
  );

  return (req, res, next) => {
    const start = Date.now();
    let child: Logger | undefined;
    Object.defineProperty(req, 'log', {
      get: () => (child ??= routeLogger.child({ requestId: res.locals.requestId })),
      configurable: true,
    });
    let logged = false;
    const done = () => {
      if (logged) return;
      logged = true;
      res.off('finish', done);
      res.off('close', done);
      const fields = {
        requestId: res.locals.requestId,
        method: req.method,
        path: loggedPath(req),
        status: res.statusCode,
        ms: Date.now() - start,
        userId: res.locals.user?.id ?? null,
      };
      if (res.err || res.statusCode >= 500) {
        const error = res.err ?? new Error(`failed with status code ${res.statusCode}`);
        lines.error({ ...fields, error: error.stack ?? String(error) }, 'request errored');
      } else {
        const message = res.writableEnded && !req.readableAborted ? 'request completed' : 'request aborted';
        lines[res.statusCode >= 400 ? 'warn' : 'info'](fields, message);
      }
    };
    res.on('finish', done);
    res.on('close', done);
    next();
  };
}
