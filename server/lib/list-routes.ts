import type { Express } from 'express';

interface RouteLayer {
  rawPath?: string | string[];
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: RouteLayer[] };
}

/** Every method + path the app answers, read from Express's router stack (for the authorization matrix). */
export function listRoutes(app: Express): { method: string; path: string }[] {
  const found: { method: string; path: string }[] = [];
  const walk = (stack: RouteLayer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const method of Object.keys(layer.route.methods)) {
          if (method !== '_all') found.push({ method: method.toUpperCase(), path: prefix + layer.route.path });
        }
      } else if (layer.handle?.stack) {
        const mount = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
        walk(layer.handle.stack, prefix + mount);
      }
    }
  };
  walk((app as unknown as { router: { stack: RouteLayer[] } }).router.stack, '');
  return found;
}
