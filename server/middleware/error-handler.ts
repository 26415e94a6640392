import type { ErrorRequestHandler } from 'express';
import { AppError } from '@/server/app-error';
import { CalcInputError } from '@/lib/calc/types';
import type { ApiErrorBody, ApiErrorCode } from '@/shared/errors';

const STATUS: Record<ApiErrorCode, number> = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  idempotency_key_reused: 409,
  id_taken: 409,
  version_conflict: 409,
  rate_limited: 429,
  internal: 500,
};

/** An error raised while reading the request (body-parser, the router's path decoding) with a 4xx status. */
interface RequestReadError {
  status: number;
  type?: string;
}

function requestReadError(error: unknown): RequestReadError | undefined {
  if (typeof error !== 'object' || error === null || !('status' in error)) return undefined;
  const status = Number(error.status);
  if (!Number.isInteger(status) || status < 400 || status > 499) return undefined;
  return { status, type: 'type' in error && typeof error.type === 'string' ? error.type : undefined };
}

/** What the client is told for each kind of unreadable request; the status comes from the error. */
const READ_MESSAGES: Record<string, string> = {
  'entity.parse.failed': 'The request body is not valid JSON',
  'entity.too.large': 'The request body is too large',
  'charset.unsupported': 'Send the JSON body in UTF-8',
  'encoding.unsupported': 'Send the body uncompressed or with Content-Encoding gzip, deflate or br',
  'content-type.unsupported': 'Send the body as JSON (Content-Type: application/json)',
};

function readErrorMessage(error: unknown, read: RequestReadError): string {
  if (read.type && READ_MESSAGES[read.type]) return READ_MESSAGES[read.type];
  if (error instanceof URIError) return 'The request path has a broken percent-encoding';
  if (typeof error === 'object' && error !== null && 'code' in error && String(error.code).startsWith('Z_')) {
    return 'The compressed request body is broken';
  }
  return 'The request could not be read';
}

/** Drizzle wraps driver errors (`DrizzleQueryError`), so the SQLite code may sit on a `cause`. */
function isUniqueViolation(error: unknown): boolean {
  let current = error;
  while (typeof current === 'object' && current !== null) {
    if ('code' in current && current.code === 'SQLITE_CONSTRAINT_UNIQUE') return true;
    current = 'cause' in current ? current.cause : undefined;
  }
  return false;
}

function describe(error: unknown): { status: number; body: ApiErrorBody } {
  const body = (code: ApiErrorCode, message: string, fields?: Record<string, string[]>) => ({
    status: STATUS[code],
    body: { error: fields ? { code, message, fields } : { code, message } },
  });
  if (error instanceof AppError) {
    const described = body(error.code, error.message, error.fields);
    if (error.current === undefined) return described;
    return { ...described, body: { error: { ...described.body.error, current: error.current } } };
  }
  if (error instanceof CalcInputError)
    return body('bad_request', error.message, { [error.field]: [error.message] });
  const read = requestReadError(error);
  if (read) return { ...body('bad_request', readErrorMessage(error, read)), status: read.status };
  if (isUniqueViolation(error)) return body('conflict', 'That already exists');
  return body('internal', 'Something went wrong on our side');
}

/**
 * Last handler: answers every error with the shared error body, which names the request id. A 5xx error is
 * handed to the request log as `res.err`, so its stack goes into that request's
 * line and never to the client.
 */
export function errorHandler(): ErrorRequestHandler {
  return (error, _req, res, next) => {
    if (res.headersSent) return next(error);
    const { status, body } = describe(error);
    const requestId: string | undefined = res.locals.requestId;
    if (status >= 500) res.err = error instanceof Error ? error : new Error(String(error));
    res.status(status).json(requestId ? { error: { ...body.error, requestId } } : body);
  };
}
