import type { Express } from 'express';
import type { AccessLevel } from '../../shared/schemas/auth';

/** One method + full path of the app, with the level its first handler declares (undefined when none). */
export type RouteEntry = { method: string; path: string; access: AccessLevel | undefined };

type Handler = ((...args: unknown[]) => unknown) & { access?: AccessLevel; stack?: Layer[] };
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

function pathsOf(raw: Layer['rawPath'] | string | string[], where: string): string[] {
  const list = Array.isArray(raw) ? raw : [raw ?? '/'];
  return list.map((p) => {
    if (typeof p !== 'string')
      throw new Error(`route-table: a RegExp path under ${where} cannot be probed; use a string path`);
    return p;
  });
}

function walk(stack: Layer[], prefix: string, out: RouteEntry[]) {
  for (const layer of stack) {
    if (layer.route) {
      const methods = Object.keys(layer.route.methods).filter((m) => layer.route!.methods[m]);
      for (const path of pathsOf(layer.route.path, prefix)) {
        for (const m of methods) {
          const method = m === '_all' ? 'ALL' : m.toUpperCase();
          const first = layer.route.stack.find((l) => m === '_all' || l.method === m || l.method === undefined);
          out.push({ method, path: join(prefix, path), access: first?.handle.access });
        }
      }
    } else if (Array.isArray(layer.handle.stack)) {
      for (const mount of pathsOf(layer.rawPath, prefix)) walk(layer.handle.stack, join(prefix, mount), out);
    }
  }
}

/**
 * Every route of an Express 5 app, read from its router stack (app.router.stack; nested routers through
 * layer.handle.stack, mount paths from layer.rawPath, route layers through layer.route), so routes added
 * later anywhere in the tree are found without a registry.
 */
export function routeTable(app: Express): RouteEntry[] {
  const out: RouteEntry[] = [];
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '', out);
  return out;
}

/** A concrete URL for a route path: parameters become 999999999, wildcards "x", optional groups are kept. */
export function probeUrl(path: string): string {
  return path
    .replace(/[{}]/g, '')
    .replace(/:(\w+)/g, '999999999')
    .replace(/\*(\w+)/g, 'x');
}
