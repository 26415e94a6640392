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
  rate_limited: 429,
  internal: 500,
};

function isBodyParserError(error: unknown): error is { type: string; status: number } {
  return typeof error === 'object' && error !== null && 'type' in error && 'status' in error;
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
  if (error instanceof AppError) return body(error.code, error.message, error.fields);
  if (error instanceof CalcInputError)
    return body('bad_request', error.message, { [error.field]: [error.message] });
  if (isBodyParserError(error) && error.type === 'entity.parse.failed') {
    return body('bad_request', 'The request body is not valid JSON');
  }
  if (isBodyParserError(error) && error.type === 'entity.too.large') {
    return { ...body('bad_request', 'The request body is too large'), status: 413 };
  }
  if (isUniqueViolation(error)) return body('conflict', 'That already exists');
  return body('internal', 'Something went wrong on our side');
}

/** Last handler: answers every error with the shared error body; stack traces go to the log only. */
export function errorHandler(log: (message: string) => void): ErrorRequestHandler {
  return (error, req, res, next) => {
    if (res.headersSent) return next(error);
    const { status, body } = describe(error);
    if (status >= 500)
      log(`${req.method} ${req.path} failed: ${error instanceof Error ? error.stack : String(error)}`);
    res.status(status).json(body);
  };
}
