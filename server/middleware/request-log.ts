import { randomUUID } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Request, RequestHandler, Response } from 'express';
import { pino } from 'pino';
import { pinoHttp } from 'pino-http';

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

/**
 * The path as logged: no query string (the dev mail key travels there), and the secret segment of an
 * invitation, password reset or confirmation link replaced by its name.
 */
export function loggedPath(req: Request): string {
  return SECRET_SEGMENTS.reduce(
    (path, [pattern, name]) => path.replace(pattern, name),
    req.originalUrl.split('?')[0],
  );
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

/** The fields of a request's line: method, path, status, user id (pino-http adds the milliseconds). */
function requestFields(req: IncomingMessage, res: ServerResponse) {
  const response = res as Response;
  return {
    method: req.method,
    path: loggedPath(req as Request),
    status: res.statusCode,
    userId: response.locals?.user?.id ?? null,
  };
}

/**
 * pino-http: one JSON line per request once the answer is sent (`time`, `level`, `requestId`, `method`,
 * `path`, `status`, `ms`, `userId`, `msg`), at `warn` for 4xx and `error` for 5xx; a 5xx line carries the
 * error's stack (the error handler hands it over as `res.err`). Lines go to `log`, one string each.
 */
export function requestLog(log: (line: string) => void): RequestHandler {
  const logger = pino(
    {
      base: null,
      timestamp: pino.stdTimeFunctions.isoTime,
      formatters: { level: (label) => ({ level: label }) },
      redact: { paths: REDACTED_PATHS, censor: '[redacted]' },
    },
    { write: (line: string) => log(line.trimEnd()) },
  );
  return pinoHttp({
    logger,
    genReqId: (_req, res) => (res as Response).locals.requestId,
    quietReqLogger: true,
    quietResLogger: true,
    customAttributeKeys: { reqId: 'requestId', responseTime: 'ms' },
    customLogLevel: (_req, res, error) =>
      error || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info',
    customSuccessObject: (req, res, value: { ms: number }) => ({ ...requestFields(req, res), ms: value.ms }),
    customErrorObject: (req, res, error, value: { ms: number }) => ({
      ...requestFields(req, res),
      ms: value.ms,
      error: error.stack ?? String(error),
    }),
  }) as RequestHandler;
}
