import { existsSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import compression from 'compression';
import express, { type Express, type RequestHandler, type Response } from 'express';
import type { Db } from '@/db/client';
import { apiRouter } from './api/api.router';
import { readSession } from './middleware/auth';
import { errorHandler } from './middleware/error-handler';
import { idempotency } from './middleware/idempotency';
import { useJsonAnswer } from './middleware/json-answer';
import { originCheck } from './middleware/origin-check';
import { requestId, requestLog } from './middleware/request-log';
import { securityHeaders } from './middleware/security-headers';
import {
  DEFAULT_SIGN_IN_LIMIT,
  DEFAULT_SIGN_UP_LIMIT,
  type RateLimitOptions,
} from './middleware/auth-limits';
import type { Mailer } from './services/mail/mailer';
import { createSessions } from './services/sessions';
import { createLocalStorage, type FileStorage } from './services/storage/file-storage';

export interface AppOptions {
  db: Db;
  mailer: Mailer;
  /**
   * Uploaded files (design request photos and documents). Without one, a fresh folder under the system's
   * temp folder: for tests and benches, which keep no files; the server passes its STORAGE_DIR.
   */
  storage?: FileStorage;
  /** Public origin of the web app: invitation links and the CSRF origin check use it. */
  appOrigin: string;
  production?: boolean;
  sessionDays?: number;
  signInLimit?: RateLimitOptions;
  signUpLimit?: RateLimitOptions;
  /**
   * Express `trust proxy`: the proxy in front whose X-Forwarded-For names the client (a hop count, or
   * addresses, subnets and `loopback`). Off by default: the socket's address is the client's.
   */
  trustProxy?: number | string;
  /**
   * Key that opens GET /api/dev/mail (captured mail, from this machine only); without one, or in
   * production, the route is not mounted.
   */
  devMailKey?: string;
  /** Folder of the exported web app; served with an SPA fallback when it holds an index.html. */
  webDir?: string;
  /** Request log (one JSON line per request, 5xx stacks included); silent when omitted. */
  log?: (line: string) => void;
}

/** Exported bundles, fonts and images carry a content hash in their path: cache them for good. */
const HASHED_PATH = /[\\/](_expo[\\/]static|assets)[\\/]/;

/** API answers carry personal data (and errors name e-mails): no browser or proxy may keep a copy. */
const noStore: RequestHandler = (_req, res, next) => {
  res.setHeader('Cache-Control', 'no-store');
  next();
};

/**
 * compression, only for requests that accept an encoding: one without Accept-Encoding would get the body as
 * it is anyway, so it skips compression's wrapping of the response and gets only its `Vary` header.
 */
function compressWhenAccepted(): RequestHandler {
  const compress = compression();
  return (req, res, next) => {
    if (req.headers['accept-encoding']) return compress(req, res, next);
    res.setHeader('Vary', 'Accept-Encoding');
    next();
  };
}

function cacheHeaders(res: Response, path: string): void {
  res.setHeader('Cache-Control', HASHED_PATH.test(path) ? 'public, max-age=31536000, immutable' : 'no-cache');
}

/** Builds the Express app without listening, so tests drive it with supertest. */
export function createApp(options: AppOptions): Express {
  const production = options.production ?? false;
  const sessions = createSessions(options.db, {
    sessionDays: options.sessionDays ?? 30,
    secureCookies: production,
  });

  const app = express();
  app.set('trust proxy', options.trustProxy ?? false);
  // API answers are never cached (no-store), so an ETag would be a hash of every body for nothing.
  app.set('etag', false);
  app.disable('x-powered-by');
  useJsonAnswer(app);
  app.use(requestId);
  if (options.log) app.use(requestLog(options.log));
  app.use(securityHeaders(production));
  app.use(compressWhenAccepted());
  app.use(
    '/api',
    noStore,
    express.json({ limit: '200kb' }),
    readSession(sessions),
    originCheck([options.appOrigin]),
    idempotency(options.db),
  );
  app.use(
    '/api',
    apiRouter({
      db: options.db,
      mailer: options.mailer,
      storage: options.storage ?? createLocalStorage(mkdtempSync(join(tmpdir(), 'tributary-storage-'))),
      sessions,
      appOrigin: options.appOrigin,
      signInLimit: options.signInLimit ?? DEFAULT_SIGN_IN_LIMIT,
      signUpLimit: options.signUpLimit ?? DEFAULT_SIGN_UP_LIMIT,
      devMailKey: production ? undefined : options.devMailKey,
    }),
  );

  const webDir = options.webDir && resolve(options.webDir);
  if (webDir && existsSync(join(webDir, 'index.html'))) {
    app.use(express.static(webDir, { index: false, setHeaders: cacheHeaders }));
    app.get('/{*splat}', (_req, res) => {
      res.sendFile(join(webDir, 'index.html'));
    });
  }

  app.use(errorHandler());
  return app;
}
