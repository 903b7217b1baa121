import type { Express } from 'express';

/** One API route as Express will match it: upper-case method and a path template such as `/api/pages/:id`. */
export interface RouteEntry {
  method: string;
  path: string;
}

interface Layer {
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle: { stack?: Layer[] } & object;
  matchers?: Array<(path: string) => unknown>;
  regexp?: RegExp;
  slash?: boolean;
  name?: string;
  keys?: Array<{ name: string }>;
  // router 2 (Express 5) keeps the mount path string on the layer in `path` only after a match;
  // the original pattern is recovered from the matcher instead (see mountPath).
}

/**
 * The mount path of a `router.use(path, …)` layer. Express 5's router compiles the path with
 * path-to-regexp 8 and keeps only a matcher function; we recover the template by asking the
 * matcher to match a probe and reading back the parameters, falling back to the regexp source.
 */
function mountPath(layer: Layer & Record<string, unknown>): string {
  if (layer.slash) return '';
  const matcher = layer.matchers?.[0];
  const probe = (layer as { __mountPath?: string }).__mountPath;
  if (probe !== undefined) return probe;
  if (layer.regexp) return regexpToPath(layer.regexp);
  throw new Error(`cannot read the mount path of layer ${layer.name ?? '?'} (${String(matcher)})`);
}

function regexpToPath(re: RegExp): string {
  return re.source.replace(/^\^/, '').replace(/\\\/\?\(\?=\\\/\|\$\)$/i, '').replace(/\\\//g, '/');
}

/**
 * Walks the app's router stack, nested routers included, and returns every (method, path).
 * Mount paths are recorded by `recordMountPaths` before the app is built (see below).
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
      walk(layer.handle.stack, join(prefix, mountPath(layer as Layer & Record<string, unknown>)), out);
    }
  }
}

function join(a: string, b: string): string {
  const joined = `${a}/${b}`.replace(/\/+/g, '/');
  return joined.length > 1 ? joined.replace(/\/$/, '') : joined;
}
