import type { IncomingMessage, ServerResponse } from 'node:http';
import type { RequestHandler } from 'express';
import helmet from 'helmet';

/**
 * helmet's defaults plus a CSP the exported Expo web bundle runs under: its own scripts only, inline
 * styles (react-native-web injects them), data:/blob: images and fonts. `upgrade-insecure-requests` is off
 * outside production so plain-http loopback servers keep working.
 */
function helmetFor(production: boolean) {
  return helmet({
    contentSecurityPolicy: {
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'", "'unsafe-inline'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        frameAncestors: ["'none'"],
        baseUri: ["'self'"],
        formAction: ["'self'"],
        upgradeInsecureRequests: production ? [] : null,
      },
    },
    strictTransportSecurity: production,
  });
}

/**
 * The headers helmet sets are the same on every answer (no nonces), so they are worked out once by running
 * helmet against a stand-in response, and each request then gets them in one step instead of a chain of a
 * dozen middlewares. `X-Powered-By`, which helmet removes, is switched off in the app (`x-powered-by`).
 */
export function securityHeaders(production: boolean): RequestHandler {
  const headers: [string, string][] = [];
  const standIn = {
    setHeader: (name: string, value: unknown) => headers.push([name, String(value)]),
    removeHeader: () => undefined,
  };
  helmetFor(production)({} as IncomingMessage, standIn as unknown as ServerResponse, () => undefined);
  return (_req, res, next) => {
    for (const [name, value] of headers) res.setHeader(name, value);
    next();
  };
}
