// Reads the route table of a running Express 5 app (router 2.x layers), so
// robustness tests cover every route that exists, not a list kept by hand.
import type { Server } from 'node:http';

interface Layer {
  rawPath?: string | string[];
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

export interface RouteEntry {
  method: string;
  path: string;
  key: string;
}

function walk(stack: Layer[], prefix: string, out: RouteEntry[]): void {
  for (const layer of stack) {
    const raw = layer.route ? layer.route.path : layer.rawPath;
    const paths = raw === undefined ? [''] : Array.isArray(raw) ? raw : [raw];
    for (const p of paths) {
      const joined = p === '/' && !layer.route ? prefix : prefix + (p === '/' && prefix ? '' : p);
      if (layer.route) {
        for (const [method, on] of Object.entries(layer.route.methods)) {
          if (!on || method === '_all') continue;
          const m = method.toUpperCase();
          out.push({ method: m, path: joined, key: `${m} ${joined}` });
        }
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, joined, out);
      }
    }
  }
}

/** Every METHOD /path under /api (HEAD, which Express derives from GET, left out). */
export function apiRoutes(server: Server): RouteEntry[] {
  const app = server.listeners('request')[0] as unknown as { router: { stack: Layer[] } };
  const out: RouteEntry[] = [];
  walk(app.router.stack, '', out);
  const seen = new Set<string>();
  return out.filter((r) => r.path.startsWith('/api/') && r.method !== 'HEAD' && !seen.has(r.key) && seen.add(r.key));
}
