import type { Application } from 'express';
import type { AccessLevel } from '../../../shared/schemas/auth';
import type { Schemas } from '../../http/middleware/validate';

/** One mounted API route: method, Express path, declared access and the zod schemas its `handle()` validates with. */
export type MountedRoute = { method: string; path: string; access: AccessLevel | undefined; schemas: Schemas };

type Handler = ((...args: unknown[]) => unknown) & { access?: AccessLevel; schemas?: Schemas; stack?: Layer[] };
type Layer = {
  rawPath?: string | RegExp | (string | RegExp)[];
  handle: Handler;
  method?: string;
  route?: { path: string | string[]; methods: Record<string, boolean>; stack: Layer[] };
};

function join(prefix: string, path: string): string {
  const joined = `${prefix}/${path}`.replace(/\/+/g, '/');
  return joined.length > 1 ? joined.replace(/\/$/, '') : joined;
}

const strings = (raw: Layer['rawPath'] | string | string[]) =>
  (Array.isArray(raw) ? raw : [raw ?? '/']).filter((p): p is string => typeof p === 'string');

function walk(stack: Layer[], prefix: string, out: MountedRoute[]) {
  for (const layer of stack) {
    if (layer.route) {
      const methods = Object.keys(layer.route.methods).filter((m) => layer.route!.methods[m] && m !== '_all');
      for (const path of strings(layer.route.path)) {
        for (const m of methods) {
          const handlers = layer.route.stack.filter((l) => l.method === m || l.method === undefined);
          const schemas = handlers.find((l) => l.handle.schemas)?.handle.schemas ?? {};
          out.push({ method: m.toUpperCase(), path: join(prefix, path), access: handlers[0]?.handle.access, schemas });
        }
      }
    } else if (Array.isArray(layer.handle.stack)) {
      for (const mount of strings(layer.rawPath)) walk(layer.handle.stack, join(prefix, mount), out);
    }
  }
}

/** The API routes an Express 5 app has mounted (read from its router stack, as the route-matrix test does). */
export function mountedApiRoutes(app: Application): MountedRoute[] {
  const out: MountedRoute[] = [];
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '', out);
  return out.filter((r) => r.path.startsWith('/api/'));
}
