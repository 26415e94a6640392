import { createHash, timingSafeEqual } from 'node:crypto';
import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { AppError } from '@/server/app-error';
import { isLoopbackHost, machineOnly } from '@/server/middleware/machine-only';
import { validate } from '@/server/middleware/validate';
import { listCapturedMail } from './dev-mail.repository';

const MAX_MESSAGES = 200;

const keyQuery = z.object({ key: z.string().max(200).default('') });

const digest = (text: string) => createHash('sha256').update(text).digest();

/**
 * Development and tests only (never mounted in production): what the fake SMTP server caught. The mail
 * holds invitation links, so it answers only a request from this machine that brings the key the server
 * printed at start; anything else gets the plain API 404.
 */
export function devMailRouter(deps: { db: Db; key: string }): Router {
  const router = Router();
  const expected = digest(deps.key);
  router.get('/', machineOnly, validate({ query: keyQuery }), (req, res) => {
    if (!timingSafeEqual(digest(req.query.key), expected)) {
      throw new AppError('not_found', 'No such API route');
    }
    res.json({ messages: listCapturedMail(deps.db, MAX_MESSAGES) });
  });
  return router;
}

/** The dev mail page with its key, on a loopback origin (the only kind it answers): APP_ORIGIN when loopback. */
export function devMailPageUrl(appOrigin: string, port: number, key: string): string {
  const origin = isLoopbackHost(new URL(appOrigin).host) ? appOrigin : `http://127.0.0.1:${port}`;
  return `${origin}/dev/mail?key=${encodeURIComponent(key)}`;
}
