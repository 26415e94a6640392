import { isIP } from 'node:net';
import type { Request, RequestHandler } from 'express';
import { AppError } from '@/server/app-error';

/** Headers a proxy adds when it passes on a request from elsewhere. */
const FORWARDING_HEADERS = ['forwarded', 'x-forwarded-for', 'x-forwarded-host', 'x-real-ip'];

function isLoopbackAddress(address: string): boolean {
  const plain = address.replace(/^::ffff:/i, '');
  if (isIP(plain) === 4) return plain.startsWith('127.');
  return plain === '::1';
}

/** The Host header's name without its port: `localhost`, `127.0.0.1` or `[::1]` pass. */
export function isLoopbackHost(host: string | undefined): boolean {
  if (!host) return false;
  const name = host.toLowerCase().replace(/:\d+$/, '');
  if (name === 'localhost' || name === '[::1]') return true;
  return isIP(name) === 4 && name.startsWith('127.');
}

/**
 * True only for a request this machine made to itself: the TCP peer is a loopback address (the socket's,
 * never `req.ip`, so no proxy setting can fake it), no proxy header says it came from elsewhere (a proxy on
 * this machine would otherwise pass outside traffic through loopback), and the Host header names loopback
 * (a page whose domain was rebound to 127.0.0.1 in a local browser still sends its own domain there).
 */
export function isFromThisMachine(req: Request): boolean {
  if (!isLoopbackAddress(req.socket.remoteAddress ?? '')) return false;
  if (FORWARDING_HEADERS.some((name) => req.headers[name] !== undefined)) return false;
  return isLoopbackHost(req.headers.host);
}

/** Anything not from this machine gets the API's plain 404, as if the route did not exist. */
export const machineOnly: RequestHandler = (req, _res, next) => {
  if (!isFromThisMachine(req)) throw new AppError('not_found', 'No such API route');
  next();
};
