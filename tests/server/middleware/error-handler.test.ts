import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { CalcInputError } from '@/lib/calc/types';
import { AppError } from '@/server/app-error';
import { errorHandler } from '@/server/middleware/error-handler';
import { requestLog } from '@/server/middleware/request-log';

function appThrowing(error: unknown, logged: string[] = []) {
  const app = express();
  app.use(requestLog((line) => logged.push(line)));
  app.get('/boom', () => {
    throw error;
  });
  app.use(errorHandler());
  return app;
}

describe('error handler', () => {
  it('answers an unexpected error with a bare 500: the stack goes to the log, not the client', async () => {
    const logged: string[] = [];
    const res = await request(appThrowing(new Error('secret path /etc/tributary.db'), logged)).get('/boom');
    expect(res.status).toBe(500);
    expect(res.body).toEqual({ error: { code: 'internal', message: 'Something went wrong on our side' } });
    expect(res.text).not.toContain('secret');
    expect(logged.join('\n')).toContain('secret path /etc/tributary.db');
    expect(logged.join('\n')).toContain('at ');
  });

  it('turns a CalcInputError into 400 with that field', async () => {
    const res = await request(appThrowing(new CalcInputError('spanFt', 'Span must be above 0'))).get('/boom');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: {
        code: 'bad_request',
        message: 'Span must be above 0',
        fields: { spanFt: ['Span must be above 0'] },
      },
    });
  });

  it.each([
    ['unauthorized', 401],
    ['forbidden', 403],
    ['not_found', 404],
    ['conflict', 409],
    ['rate_limited', 429],
  ] as const)('maps AppError %s to %i', async (code, status) => {
    const res = await request(appThrowing(new AppError(code, 'message'))).get('/boom');
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe(code);
  });

  it('maps a unique-constraint race to 409 instead of 500', async () => {
    const error = Object.assign(new Error('UNIQUE constraint failed: users.email'), {
      code: 'SQLITE_CONSTRAINT_UNIQUE',
    });
    const res = await request(appThrowing(error)).get('/boom');
    expect(res.status).toBe(409);
    expect(res.text).not.toContain('users.email');
  });

  it('answers a 4xx error from reading the request with its status and a message, and logs no stack', async () => {
    const logged: string[] = [];
    const notAllowed = Object.assign(new Error('internal detail'), { status: 405, expose: true });
    const res = await request(appThrowing(notAllowed, logged)).get('/boom');
    expect(res.status).toBe(405);
    expect(res.body).toEqual({ error: { code: 'bad_request', message: 'The request could not be read' } });
    expect(logged).toHaveLength(1);
    expect(JSON.parse(logged[0])).toMatchObject({ level: 'warn', status: 405 });
    expect(logged[0]).not.toContain('internal detail');
    expect(JSON.parse(logged[0])).not.toHaveProperty('error');
  });

  it('keeps a 5xx error with a status a bare 500 and logs it', async () => {
    const logged: string[] = [];
    const broken = Object.assign(new Error('stream.encoding.set'), { status: 500 });
    const res = await request(appThrowing(broken, logged)).get('/boom');
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe('internal');
    expect(logged.join('\n')).toContain('stream.encoding.set');
  });
});
