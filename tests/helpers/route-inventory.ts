import type { Express } from 'express';

export type RouteKey = `${'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE'} /api${string}`;

type Layer = { rawPath?: unknown; route?: { path: unknown; methods: Record<string, boolean> }; handle?: { stack?: Layer[] } };

const METHODS = new Set(['get', 'post', 'put', 'patch', 'delete']);
const join = (prefix: string, path: string) => prefix + (path === '/' ? '' : path);

// Walks the built app's router stack, so every mounted route shows up whatever its router is called.
export function routeInventory(app: Express): RouteKey[] {
  const keys: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        if (typeof layer.route.path !== 'string') throw new Error(`route under ${prefix || '/'} has a non-string path; list it by hand`);
        for (const method of Object.keys(layer.route.methods))
          if (METHODS.has(method)) keys.push(`${method.toUpperCase()} ${join(prefix, layer.route.path) || '/'}`);
      } else if (Array.isArray(layer.handle?.stack)) {
        if (typeof layer.rawPath !== 'string')
          throw new Error(`router mounted under ${prefix || '/'} has no string path (Express's layers changed?)`);
        walk(layer.handle.stack, join(prefix, layer.rawPath));
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return keys.filter((k): k is RouteKey => /^[A-Z]+ \/api(\/|$)/.test(k));
}
