import type { RequestHandler } from 'express';
import type { ParamsDictionary } from 'express-serve-static-core';
import type { ParsedQs } from 'qs';
import type { z } from 'zod';
import { fieldErrors } from '@/shared/errors';
import { AppError } from '@/server/app-error';

type Parsed<T, Fallback> = T extends z.ZodType ? z.output<T> : Fallback;

interface Schemas<B, Q, P> {
  body?: B;
  query?: Q;
  params?: P;
}

/**
 * Parses the request's body, query and params with shared zod schemas and hands the parsed values on in
 * their place (`req.body`, `req.query`, `req.params`); any failure answers 400 with per-field messages.
 */
export function validate<
  B extends z.ZodType | undefined = undefined,
  Q extends z.ZodType | undefined = undefined,
  P extends z.ZodType | undefined = undefined,
>(
  schemas: Schemas<B, Q, P>,
): RequestHandler<Parsed<P, ParamsDictionary>, unknown, Parsed<B, unknown>, Parsed<Q, ParsedQs>> {
  return (req, _res, next) => {
    const fields: Record<string, string[]> = {};
    const parse = (schema: z.ZodType | undefined, value: unknown) => {
      if (!schema) return value;
      const result = schema.safeParse(value);
      if (result.success) return result.data;
      Object.assign(fields, fieldErrors(result.error));
      return value;
    };
    const body = parse(schemas.body, req.body ?? {});
    const query = parse(schemas.query, req.query);
    const params = parse(schemas.params, req.params);
    if (Object.keys(fields).length > 0) {
      throw new AppError('bad_request', 'Some fields need attention', fields);
    }
    req.body = body as Parsed<B, unknown>;
    // Express 5 exposes `req.query` as a getter; an own property shadows it with the parsed value.
    Object.defineProperty(req, 'query', { value: query, writable: true, configurable: true });
    req.params = params as Parsed<P, ParamsDictionary>;
    next();
  };
}
