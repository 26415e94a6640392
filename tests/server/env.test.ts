import { describe, expect, it } from 'vitest';
import { loadEnv } from '@/server/env';

describe('loadEnv', () => {
  it('fills the documented defaults', () => {
    const env = loadEnv({});
    expect(env).toMatchObject({
      NODE_ENV: 'development',
      PORT: 8080,
      HOST: '127.0.0.1',
      DATABASE_URL: 'file:data/tributary.db',
      APP_ORIGIN: 'http://127.0.0.1:8080',
      SESSION_DAYS: 30,
      SEED_DEMO: true,
    });
    expect(env.SMTP_HOST).toBeUndefined();
  });

  it('reads numbers from strings and drops a trailing slash from APP_ORIGIN', () => {
    const env = loadEnv({
      PORT: '3000',
      SESSION_DAYS: '7',
      APP_ORIGIN: 'https://app.example.test/',
      SMTP_PORT: '2525',
    });
    expect([env.PORT, env.SESSION_DAYS, env.APP_ORIGIN, env.SMTP_PORT]).toEqual([
      3000,
      7,
      'https://app.example.test',
      2525,
    ]);
  });

  it('names every bad variable', () => {
    expect(() => loadEnv({ PORT: 'eighty', NODE_ENV: 'staging' })).toThrow(
      /PORT[\s\S]*NODE_ENV|NODE_ENV[\s\S]*PORT/,
    );
  });

  it('requires a real SMTP server in production', () => {
    expect(() => loadEnv({ NODE_ENV: 'production' })).toThrow(/SMTP_HOST/);
    expect(loadEnv({ NODE_ENV: 'production', SMTP_HOST: 'smtp.example.test' }).NODE_ENV).toBe('production');
  });

  it('adds the demo firms by default in development and tests, never in production unless asked by name', () => {
    const production = { NODE_ENV: 'production', SMTP_HOST: 'smtp.example.test' };
    expect(loadEnv({}).SEED_DEMO).toBe(true);
    expect(loadEnv({ NODE_ENV: 'test' }).SEED_DEMO).toBe(true);
    expect(loadEnv({ SEED_DEMO: '0' }).SEED_DEMO).toBe(false);
    expect(loadEnv(production).SEED_DEMO).toBe(false);
    expect(loadEnv({ ...production, SEED_DEMO: '0' }).SEED_DEMO).toBe(false);
    expect(loadEnv({ ...production, SEED_DEMO: '1' }).SEED_DEMO).toBe(true);
    expect(() => loadEnv({ SEED_DEMO: 'yes' })).toThrow(/SEED_DEMO/);
  });

  it('trusts no proxy unless TRUST_PROXY names one (a hop count, or loopback, addresses and subnets)', () => {
    expect(loadEnv({}).TRUST_PROXY).toBeUndefined();
    expect(loadEnv({ TRUST_PROXY: '1' }).TRUST_PROXY).toBe(1);
    expect(loadEnv({ TRUST_PROXY: 'loopback' }).TRUST_PROXY).toBe('loopback');
    expect(loadEnv({ TRUST_PROXY: 'loopback, 10.0.0.0/8, fd00::1' }).TRUST_PROXY).toBe(
      'loopback, 10.0.0.0/8, fd00::1',
    );
    for (const bad of ['true', '*', 'everyone', '10.0.0.0/33', '10.0.0.1/8/2', '']) {
      expect(() => loadEnv({ TRUST_PROXY: bad }), bad).toThrow(/TRUST_PROXY/);
    }
  });
});
