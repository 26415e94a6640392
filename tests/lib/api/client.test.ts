import { afterEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { setActiveOrgId } from '@/lib/api/active-org';
import { ApiError, apiRequest, noContentSchema } from '@/lib/api/client';

type Call = { url: string; init: RequestInit };

function answer(status: number, body: string | null): { calls: Call[] } {
  const calls: Call[] = [];
  vi.stubGlobal('fetch', async (url: string, init: RequestInit) => {
    calls.push({ url, init });
    return new Response(body, { status, headers: body ? { 'Content-Type': 'application/json' } : {} });
  });
  return { calls };
}

async function failure(promise: Promise<unknown>): Promise<ApiError> {
  const error = await promise.then(
    () => null,
    (caught: unknown) => caught,
  );
  expect(error).toBeInstanceOf(ApiError);
  return error as ApiError;
}

afterEach(() => {
  vi.unstubAllGlobals();
  setActiveOrgId(null);
});

describe('apiRequest', () => {
  it('sends the session cookie and JSON body, and returns the parsed answer', async () => {
    const { calls } = answer(200, JSON.stringify({ n: 3, extra: true }));
    const result = await apiRequest('POST', '/api/thing', z.object({ n: z.number() }), { a: 1 });
    expect(result).toEqual({ n: 3 });
    expect(calls[0].url).toBe('/api/thing');
    expect(calls[0].init.credentials).toBe('include');
    expect(calls[0].init.method).toBe('POST');
    expect(calls[0].init.body).toBe('{"a":1}');
    expect((calls[0].init.headers as Record<string, string>)['Content-Type']).toBe('application/json');
  });

  it('names the active firm in X-Org-Id only once one is chosen', async () => {
    const { calls } = answer(200, '{}');
    await apiRequest('GET', '/api/me', z.object({}));
    setActiveOrgId('org_2');
    await apiRequest('GET', '/api/me', z.object({}));
    expect((calls[0].init.headers as Record<string, string>)['X-Org-Id']).toBeUndefined();
    expect((calls[1].init.headers as Record<string, string>)['X-Org-Id']).toBe('org_2');
  });

  it('carries code, status and field messages of a 400 answer', async () => {
    answer(
      400,
      JSON.stringify({
        error: {
          code: 'bad_request',
          message: 'Check the fields',
          fields: { email: ['Enter a valid e-mail address'] },
        },
      }),
    );
    const error = await failure(apiRequest('POST', '/api/auth/sign-in', z.object({}), {}));
    expect(error.code).toBe('bad_request');
    expect(error.status).toBe(400);
    expect(error.message).toBe('Check the fields');
    expect(error.fields).toEqual({ email: ['Enter a valid e-mail address'] });
  });

  it('keeps the status of an error answer that is not in the API error form', async () => {
    answer(502, '<html>Bad gateway</html>');
    const error = await failure(apiRequest('GET', '/api/jobs', z.object({})));
    expect(error.code).toBe('bad_response');
    expect(error.status).toBe(502);
    expect(error.fields).toEqual({});
  });

  it('refuses a success answer in an unexpected shape', async () => {
    answer(200, JSON.stringify({ jobs: 'nope' }));
    const error = await failure(apiRequest('GET', '/api/jobs', z.object({ jobs: z.array(z.string()) })));
    expect(error.code).toBe('bad_response');
    expect(error.status).toBe(200);
  });

  it('reports an unreachable server as status 0', async () => {
    vi.stubGlobal('fetch', async () => {
      throw new TypeError('Failed to fetch');
    });
    const error = await failure(apiRequest('GET', '/api/me', z.object({})));
    expect(error.code).toBe('network');
    expect(error.status).toBe(0);
  });

  it('accepts an empty 204 answer', async () => {
    answer(204, null);
    await expect(apiRequest('DELETE', '/api/jobs/j1', noContentSchema)).resolves.toBeUndefined();
  });
});

describe('ApiError of a sync conflict', () => {
  it('exposes the code and the server’s current record of a 409 version_conflict', async () => {
    const current = { id: 'j1', name: 'Attic', version: 3 };
    answer(
      409,
      JSON.stringify({ error: { code: 'version_conflict', message: 'Changed elsewhere', current } }),
    );
    const error = await failure(apiRequest('PATCH', '/api/jobs/j1', z.object({}), { baseVersion: 2 }));
    expect(error.code).toBe('version_conflict');
    expect(error.status).toBe(409);
    expect(error.current).toEqual(current);
  });

  it('has no current on other errors', async () => {
    answer(409, JSON.stringify({ error: { code: 'id_taken', message: 'That id is already used' } }));
    const error = await failure(apiRequest('POST', '/api/jobs', z.object({}), { name: 'x' }));
    expect(error.code).toBe('id_taken');
    expect(error.current).toBeUndefined();
  });
});
