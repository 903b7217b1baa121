import type { Express } from 'express';

/** One API route as Express matches it: upper-case method and a path template such as `/api/pages/:id`. */
export interface RouteEntry {
  method: string;
  path: string;
}

/** The parts of an Express 5 (router 2) layer the walk reads. */
interface Layer {
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle: { stack?: Layer[] };
  /** The path given to `router.use(path, …)`; undefined for a bare `use(fn)`. */
  rawPath?: string | RegExp | Array<string | RegExp>;
  slash?: boolean;
}

/**
 * Walks the app's router stack, nested routers included (wherever they are mounted), and returns
 * every (method, path) once. Route layers are read from the router itself, so a new route shows up
 * here without anyone listing it.
 */
export function listRoutes(app: Express): RouteEntry[] {
  const found: RouteEntry[] = [];
  const root = (app as unknown as { router: { stack: Layer[] } }).router;
  walk(root.stack, '', found);
  const seen = new Set<string>();
  return found.filter((r) => {
    const key = `${r.method} ${r.path}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

function walk(stack: Layer[], prefix: string, out: RouteEntry[]) {
  for (const layer of stack) {
    if (layer.route) {
      const paths = Array.isArray(layer.route.path) ? layer.route.path : [layer.route.path];
      for (const p of paths) {
        for (const [method, on] of Object.entries(layer.route.methods)) {
          if (on && method !== '_all') out.push({ method: method.toUpperCase(), path: join(prefix, p) });
        }
      }
    } else if (layer.handle.stack) {
      walk(layer.handle.stack, join(prefix, mountPath(layer)), out);
    }
  }
}

/** A mount path back as a template; regular-expression mounts are not used in this app and fail loudly. */
function mountPath(layer: Layer): string {
  if (layer.slash || layer.rawPath === undefined) return '';
  if (typeof layer.rawPath === 'string') return layer.rawPath;
  throw new Error(`a router is mounted on a pattern the route walk cannot read: ${String(layer.rawPath)}`);
}

function join(a: string, b: string): string {
  const joined = `${a}/${b}`.replace(/\/+/g, '/');
  return joined.length > 1 ? joined.replace(/\/$/, '') : joined;
}
