import { createHash } from 'node:crypto';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { Db } from '@/db/client';
import { AppError } from '@/server/app-error';
import {
  bodyHash,
  findKeptWrite,
  isStale,
  keepAnswer,
  releaseKey,
  reserveKey,
  sweepKeptWrites,
} from '@/server/services/idempotency/idempotency-store';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Locals {
      /** An upload's key, checked by `idempotentUpload` once the form is read (its hash needs the file). */
      pendingIdempotency?: (hash: string, next: NextFunction) => void;
    }
  }
}

export const IDEMPOTENCY_HEADER = 'idempotency-key';
export const REPLAYED_HEADER = 'Idempotent-Replayed';

const WRITES = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
/** 8–100 visible ASCII characters (a UUID fits). */
const KEY_PATTERN = /^[\x21-\x7e]{8,100}$/;
/** Sign-in, sign-out and passwords set or end sessions: a stored copy of their answer would not. */
const NOT_KEPT = /^\/api\/auth(\/|$)/;
/** Refusals that say nothing about the write itself (who is asking, too often): a retry may fare better. */
const NOT_KEPT_STATUSES = new Set([401, 403, 429]);
const SWEEP_EVERY_MS = 60_000;

const keepable = (status: number) =>
  ((status >= 200 && status < 300) || (status >= 400 && status < 500)) && !NOT_KEPT_STATUSES.has(status);

/**
 * Answers a write sent again under the same Idempotency-Key with the answer it got the first time, without
 * running it (docs/sync-protocol.md). Keys belong to the signed-in person; writes of nobody signed in, and
 * the auth routes, pass through. Uploads are checked by `idempotentUpload` after their form is read.
 */
export function idempotency(db: Db): RequestHandler {
  let lastSweep = 0;

  const begin = (
    req: Request,
    res: Response,
    next: NextFunction,
    userId: string,
    key: string,
    hash: string,
  ) => {
    const now = new Date();
    if (now.getTime() - lastSweep > SWEEP_EVERY_MS) {
      lastSweep = now.getTime();
      sweepKeptWrites(db, now);
    }
    const method = req.method;
    const path = req.originalUrl;
    const kept = findKeptWrite(db, userId, key);
    if (kept && !isStale(kept, now)) {
      if (kept.method !== method || kept.path !== path || kept.bodyHash !== hash) {
        throw new AppError(
          'idempotency_key_reused',
          'This Idempotency-Key was used for another change: send this one with a new key',
        );
      }
      if (kept.status === null) {
        res.setHeader('Retry-After', '1');
        throw new AppError('rate_limited', 'This change is still being saved: try again in a moment');
      }
      res.setHeader(REPLAYED_HEADER, 'true');
      res.status(kept.status);
      if (kept.response === null) res.end();
      else res.json(kept.response);
      return;
    }
    reserveKey(db, { userId, key, method, path, bodyHash: hash }, now);
    let answer: unknown;
    const json = res.json.bind(res);
    res.json = (body: unknown) => {
      answer = body;
      return json(body);
    };
    let settled = false;
    const settle = (finished: boolean) => {
      if (settled) return;
      settled = true;
      const type = String(res.getHeader('content-type') ?? '');
      const readable = answer !== undefined || type === '';
      try {
        if (finished && readable && keepable(res.statusCode)) {
          keepAnswer(db, userId, key, res.statusCode, answer);
        } else {
          releaseKey(db, userId, key);
        }
      } catch {
        // The answer is already sent; a key the database would not take is left to expire after a day.
      }
    };
    res.on('finish', () => settle(true));
    res.on('close', () => settle(res.writableFinished));
    next();
  };

  return (req, res, next) => {
    const key = req.get(IDEMPOTENCY_HEADER);
    const user = res.locals.user;
    if (key === undefined || !WRITES.has(req.method) || !user || NOT_KEPT.test(req.originalUrl)) {
      return next();
    }
    if (!KEY_PATTERN.test(key)) {
      const message = 'Send an Idempotency-Key of 8 to 100 visible characters (a UUID fits)';
      throw new AppError('bad_request', message, { 'Idempotency-Key': [message] });
    }
    if (req.is('multipart/form-data')) {
      res.locals.pendingIdempotency = (hash, then) => begin(req, res, then, user.id, key, hash);
      return next();
    }
    begin(req, res, next, user.id, key, bodyHash(req.body));
  };
}

/**
 * Put after an upload route's form reader: checks the pending Idempotency-Key with the hash of the form's
 * fields and the file's own SHA-256, so a retried upload (whose multipart boundary differs) matches.
 */
export const idempotentUpload: RequestHandler = (req, res, next) => {
  const pending = res.locals.pendingIdempotency;
  if (!pending) return next();
  res.locals.pendingIdempotency = undefined;
  const file = req.file && {
    name: req.file.originalname,
    sha256: createHash('sha256').update(req.file.buffer).digest('hex'),
  };
  pending(bodyHash({ fields: req.body ?? {}, file: file ?? null }), next);
};
