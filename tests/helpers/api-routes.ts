import type { Express } from 'express';
import type { ValidatedSchemas } from '@/server/middleware/validate';

export type HttpMethod = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface ApiRoute {
  method: HttpMethod;
  /** Express path with its parameters, e.g. `/api/jobs/:jobId`. */
  path: string;
  /** What the route's `validate` middleware checks. */
  schemas: ValidatedSchemas;
}

/** The parts of router 2.x's layers this listing reads (`rawPath` is the path the layer was added with). */
interface Layer {
  rawPath?: unknown;
  handle: { stack?: Layer[]; schemas?: ValidatedSchemas };
  route?: { methods: Record<string, boolean>; stack: { method?: string; handle: Layer['handle'] }[] };
}

const METHODS: HttpMethod[] = ['get', 'post', 'put', 'patch', 'delete'];

function join(prefix: string, path: unknown): string {
  const part = typeof path === 'string' && path !== '/' ? path : '';
  return `${prefix}${part}`;
}

function walk(stack: Layer[], prefix: string, out: ApiRoute[]): void {
  for (const layer of stack) {
    if (layer.route) {
      const path = join(prefix, layer.rawPath);
      for (const method of METHODS.filter((m) => layer.route?.methods[m])) {
        const schemas: ValidatedSchemas = {};
        for (const step of layer.route.stack) {
          if (step.method === undefined || step.method === method)
            Object.assign(schemas, step.handle.schemas);
        }
        out.push({ method, path, schemas });
      }
    } else if (Array.isArray(layer.handle.stack)) {
      walk(layer.handle.stack, join(prefix, layer.rawPath), out);
    }
  }
}

/**
 * Every `/api` route the app answers, read from the Express router itself, so a route added anywhere shows
 * up here without being listed by hand.
 */
export function listApiRoutes(app: Express): ApiRoute[] {
  const out: ApiRoute[] = [];
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '', out);
  return out.filter((route) => route.path.startsWith('/api/'));
}

/** `/api/jobs/:jobId` → `['jobId']`. */
export function routeParams(path: string): string[] {
  return [...path.matchAll(/:(\w+)/g)].map((match) => match[1]);
}
