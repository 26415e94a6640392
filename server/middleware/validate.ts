import type { IncomingHttpHeaders } from 'node:http';
import type { RequestHandler } from 'express';
import type { ParamsDictionary } from 'express-serve-static-core';
import type { ParsedQs } from 'qs';
import type { z } from 'zod';
import { MAX_FIELD_MESSAGES, fieldErrors } from '@/shared/errors';
import { AppError } from '@/server/app-error';

type Parsed<T, Fallback> = T extends z.ZodType ? z.output<T> : Fallback;

interface Schemas<B, Q, P> {
  body?: B;
  query?: Q;
  params?: P;
}

const hasBody = (headers: IncomingHttpHeaders) =>
  headers['transfer-encoding'] !== undefined || Number(headers['content-length'] ?? 0) > 0;

/** What `validate` checks, kept on the middleware so a listing of the routes can read each route's schemas. */
export interface ValidatedSchemas {
  body?: z.ZodType;
  query?: z.ZodType;
  params?: z.ZodType;
}

/**
 * Parses the request's body, query and params with shared zod schemas and hands the parsed values on in
 * their place (`req.body`, `req.query`, `req.params`); any failure answers 400 with per-field messages (at
 * most MAX_FIELD_MESSAGES of them, so a huge bad body cannot make a huge answer).
 */
export function validate<
  B extends z.ZodType | undefined = undefined,
  Q extends z.ZodType | undefined = undefined,
  P extends z.ZodType | undefined = undefined,
>(
  schemas: Schemas<B, Q, P>,
): RequestHandler<Parsed<P, ParamsDictionary>, unknown, Parsed<B, unknown>, Parsed<Q, ParsedQs>> & {
  schemas: ValidatedSchemas;
} {
  const handler: RequestHandler<
    Parsed<P, ParamsDictionary>,
    unknown,
    Parsed<B, unknown>,
    Parsed<Q, ParsedQs>
  > = (req, _res, next) => {
    if (schemas.body && hasBody(req.headers) && !req.is('application/json')) {
      // express.json leaves other types unread: a form or text body would be judged as an empty one.
      throw Object.assign(new Error('Not a JSON body'), { status: 415, type: 'content-type.unsupported' });
    }
    const issues: z.core.$ZodIssue[] = [];
    const parse = (schema: z.ZodType | undefined, value: unknown) => {
      if (!schema) return value;
      const result = schema.safeParse(value);
      if (result.success) return result.data;
      issues.push(...result.error.issues);
      return value;
    };
    const body = parse(schemas.body, req.body ?? {});
    const query = parse(schemas.query, req.query);
    const params = parse(schemas.params, req.params);
    if (issues.length > 0) {
      const shown = Math.min(issues.length, MAX_FIELD_MESSAGES);
      const message =
        shown < issues.length
          ? `Some fields need attention (the first ${shown} of ${issues.length} problems are listed)`
          : 'Some fields need attention';
      throw new AppError('bad_request', message, fieldErrors(issues));
    }
    req.body = body as Parsed<B, unknown>;
    // Express 5 exposes `req.query` as a getter; an own property shadows it with the parsed value.
    Object.defineProperty(req, 'query', { value: query, writable: true, configurable: true });
    req.params = params as Parsed<P, ParamsDictionary>;
    next();
  };
  return Object.assign(handler, { schemas: schemas as ValidatedSchemas });
}
