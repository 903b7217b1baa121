import fs from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import type { Plugin } from 'vite';

/** What each HTML entry may load before anything else, gzipped (issues "Publishing" and "Hardening"). */
export const BUNDLE_BUDGETS: Record<string, { label: string; bytes: number }> = {
  'index.html': { label: 'staff app initial JavaScript', bytes: 250 * 1024 },
  'kiosk.html': { label: 'kiosk player JavaScript', bytes: 60 * 1024 },
};

/**
 * The JavaScript an HTML entry loads up front (its script and every module it preloads), raw and gzipped.
 * Lazily loaded routes (the editor, the chart) are not counted: they load only where used.
 * @param distDir the build folder
 * @param entry the HTML file name
 */
export function entrySize(distDir: string, entry: string): { files: string[]; raw: number; gzip: number } {
  const html = fs.readFileSync(path.join(distDir, entry), 'utf8');
  const files = [...new Set([...html.matchAll(/(?:src|href)="(\/assets\/[^"]+\.js)"/g)].map((m) => m[1]))];
  let raw = 0;
  let gzip = 0;
  for (const file of files) {
    const bytes = fs.readFileSync(path.join(distDir, file));
    raw += bytes.length;
    gzip += gzipSync(bytes, { level: 9 }).length;
  }
  return { files, raw, gzip };
}

/** Prints each entry's size after every build and fails the build when one is over its budget. */
export function bundleBudget(): Plugin {
  let outDir = 'dist';
  return {
    name: 'starproof-bundle-budget',
    apply: 'build',
    configResolved(config) {
      outDir = path.resolve(config.root, config.build.outDir);
    },
    closeBundle() {
      const kb = (n: number) => `${(n / 1024).toFixed(1)} KB`;
      const over: string[] = [];
      for (const [entry, budget] of Object.entries(BUNDLE_BUDGETS)) {
        if (!fs.existsSync(path.join(outDir, entry))) continue;
        const size = entrySize(outDir, entry);
        const fits = size.gzip <= budget.bytes;
        console.log(
          `${budget.label}: ${kb(size.raw)} raw, ${kb(size.gzip)} gzipped (${size.files.length} files; ${fits ? 'within' : 'OVER'} the ${kb(budget.bytes)} budget)`,
        );
        if (!fits) over.push(`${budget.label} is ${kb(size.gzip)} gzipped, over its ${kb(budget.bytes)} budget`);
      }
      if (over.length) throw new Error(`Bundle budget exceeded: ${over.join('; ')}. Load the new code lazily or trim it.`);
    },
  };
}
