import { z } from 'zod';
import { apiErrorBodySchema, type ApiErrorCode } from '@/shared/errors';
import { getActiveOrgId } from './active-org';

/** Codes of errors raised in the client itself rather than sent by the server. */
export type ClientErrorCode = 'network' | 'bad_response';

/** Every failed API call ends in one of these: the server's code, HTTP status and field messages. */
export class ApiError extends Error {
  readonly code: ApiErrorCode | ClientErrorCode;
  /** HTTP status; 0 when the server could not be reached. */
  readonly status: number;
  /** Field path → messages, from a 400 answer. */
  readonly fields: Record<string, string[]>;
  /** With `version_conflict`: the server's record now, as its GET answers it. */
  readonly current: unknown;

  constructor(
    code: ApiErrorCode | ClientErrorCode,
    status: number,
    message: string,
    fields: Record<string, string[]> = {},
    current?: unknown,
  ) {
    super(message);
    this.name = 'ApiError';
    this.code = code;
    this.status = status;
    this.fields = fields;
    this.current = current;
  }
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/**
 * Calls the Tributary API on the same origin with the session cookie, sends the active firm as
 * `X-Org-Id`, and parses the answer with `schema`. Throws {@link ApiError} for every failure.
 */
export async function apiRequest<S extends z.ZodType>(
  method: Method,
  path: string,
  schema: S,
  body?: unknown,
): Promise<z.infer<S>> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  const orgId = getActiveOrgId();
  if (orgId) headers['X-Org-Id'] = orgId;

  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      credentials: 'include',
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiError('network', 0, 'Could not reach Tributary. Check your connection and try again.');
  }

  const text = await response.text();
  const json = parseJson(text);

  if (!response.ok) {
    const parsed = apiErrorBodySchema.safeParse(json);
    if (parsed.success) {
      const { code, message, fields, current } = parsed.data.error;
      throw new ApiError(code, response.status, message, fields, current);
    }
    throw new ApiError(
      'bad_response',
      response.status,
      `The server answered ${response.status} without an explanation.`,
    );
  }

  const parsed = schema.safeParse(text === '' ? undefined : json);
  if (!parsed.success) {
    throw new ApiError('bad_response', response.status, 'The server’s answer was not in the expected form.');
  }
  return parsed.data;
}

/** The JSON of an answer's text, or undefined when it is empty or not JSON. */
export function parseJson(text: string): unknown {
  if (text === '') return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** A 204 answer: no body. */
export const noContentSchema = z.undefined();
