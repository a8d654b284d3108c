import type { Express, Router } from 'express';

/** Mount paths of every router mounted with `mount`, so tests can enumerate full route paths. */
export const mountPaths = new WeakMap<object, string>();

export function mount(app: Express, path: string, router: Router) {
  mountPaths.set(router, path);
  app.use(path, router);
}

export interface RouteEntry {
  method: string;
  path: string;
}

interface LayerLike {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: LayerLike[] };
}

/** Every method + path the app serves, from the Express router stack. Throws on a router not mounted via `mount`. */
export function listRoutes(app: Express): RouteEntry[] {
  const out: RouteEntry[] = [];
  const walk = (stack: LayerLike[], base: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const m of Object.keys(layer.route.methods))
          out.push({ method: m.toUpperCase(), path: base + layer.route.path });
      } else if (layer.handle?.stack) {
        const p = mountPaths.get(layer.handle);
        if (p === undefined)
          throw new Error('A router was mounted without mount(): its routes cannot be listed');
        walk(layer.handle.stack, base + p);
      }
    }
  };
  walk((app as unknown as { router: { stack: LayerLike[] } }).router.stack, '');
  return out.map((r) => ({ ...r, path: r.path.replace(/\/$/, '') || '/' }));
}
