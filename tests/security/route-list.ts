import type { Express } from 'express';

export type RouteEntry = { method: string; path: string };

type Layer = {
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle: { stack?: Layer[] };
  rawPath?: string | string[];
  slash?: boolean;
};

/**
 * Every route the Express app answers, as METHOD + full path, found by walking the router's
 * layers (Express 5's router keeps each layer's raw path on `rawPath`). Nested routers are
 * followed with their mount path; routers mounted without a path add nothing to it.
 */
export function listRoutes(app: Express): RouteEntry[] {
  const out: RouteEntry[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        const paths = ([] as string[]).concat(layer.route.path);
        const methods = Object.entries(layer.route.methods).filter(([, on]) => on).map(([m]) => m.toUpperCase());
        // app.all() registers every HTTP method; one ALL entry reads better than thirty.
        const listed = methods.length > 20 || methods.includes('_ALL') ? ['ALL'] : methods;
        for (const p of paths) {
          const full = (prefix + p).replace(/(.)\/$/, '$1');
          for (const m of listed) out.push({ method: m, path: full });
        }
      } else if (Array.isArray(layer.handle?.stack)) {
        const mount = layer.slash || layer.rawPath === undefined ? '' : String(layer.rawPath);
        walk(layer.handle.stack, prefix + (mount === '/' ? '' : mount));
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return out;
}
