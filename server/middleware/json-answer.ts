import type { Express, Response } from 'express';

/**
 * A JSON answer written as one string with its headers: Content-Type and Content-Length as Express sets
 * them, no body on HEAD, 204 or 304.
 */
export function sendJsonText(res: Response, text: string): Response {
  if (!res.hasHeader('Content-Type')) res.setHeader('Content-Type', 'application/json; charset=utf-8');
  if (res.statusCode === 204 || res.statusCode === 304) {
    res.removeHeader('Content-Type');
    res.end();
    return res;
  }
  res.setHeader('Content-Length', Buffer.byteLength(text));
  if (res.req.method === 'HEAD') res.end();
  else res.end(text);
  return res;
}

/**
 * `res.json` for this app. Express's own goes through `res.send`, which turns any body over 1,000
 * characters into a Buffer (written beside the headers with writev) and checks request freshness for ETags
 * this app does not make (`etag` is off).
 */
function json(this: Response, body: unknown): Response {
  return sendJsonText(this, JSON.stringify(body));
}

/** Puts the app's `res.json` on the responses of `app` (Express's way to extend them: `app.response`). */
export function useJsonAnswer(app: Express): void {
  (app.response as { json: (body: unknown) => Response }).json = json;
}
