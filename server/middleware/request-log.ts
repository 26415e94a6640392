import type { RequestHandler } from 'express';

/** Invitation tokens travel in the path; keep them out of the log. */
function redact(url: string): string {
  return url.split('?')[0].replace(/\/invitations\/[^/]+/, '/invitations/:token');
}

/** One line per request once the answer is sent: method, path, status, milliseconds. */
export function requestLog(log: (line: string) => void): RequestHandler {
  return (req, res, next) => {
    const startedAt = performance.now();
    res.on('finish', () => {
      const ms = (performance.now() - startedAt).toFixed(1);
      log(`${req.method} ${redact(req.originalUrl)} ${res.statusCode} ${ms}ms`);
    });
    next();
  };
}
