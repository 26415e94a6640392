import { Router } from 'express';
import type { Db } from '@/db/client';
import { listCapturedMail } from './dev-mail.repository';

const MAX_MESSAGES = 200;

/** Development and tests only (not mounted in production): what the fake SMTP server caught. */
export function devMailRouter(deps: { db: Db }): Router {
  const router = Router();
  router.get('/', (_req, res) => {
    res.json({ messages: listCapturedMail(deps.db, MAX_MESSAGES) });
  });
  return router;
}
