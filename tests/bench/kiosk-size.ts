import fs from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import type { Plugin } from 'vite';

/** The kiosk player's budget: JavaScript under 60 KB gzipped (issue "Publishing"). */
export const KIOSK_JS_BUDGET_BYTES = 60 * 1024;

/**
 * The JavaScript the kiosk entry loads (its script and every module it preloads), raw and gzipped.
 * @param distDir the build folder
 */
export function kioskEntrySize(distDir: string): { files: string[]; raw: number; gzip: number } {
  const html = fs.readFileSync(path.join(distDir, 'kiosk.html'), 'utf8');
  const files = [...html.matchAll(/(?:src|href)="(\/assets\/[^"]+\.js)"/g)].map((m) => m[1]);
  let raw = 0;
  let gzip = 0;
  for (const file of files) {
    const bytes = fs.readFileSync(path.join(distDir, file));
    raw += bytes.length;
    gzip += gzipSync(bytes, { level: 9 }).length;
  }
  return { files, raw, gzip };
}

/** Prints the kiosk entry's JavaScript size after every build. */
export function kioskSizeReport(): Plugin {
  let outDir = 'dist';
  return {
    name: 'starproof-kiosk-size',
    apply: 'build',
    configResolved(config) {
      outDir = path.resolve(config.root, config.build.outDir);
    },
    closeBundle() {
      if (!fs.existsSync(path.join(outDir, 'kiosk.html'))) return;
      const size = kioskEntrySize(outDir);
      const kb = (n: number) => `${(n / 1024).toFixed(1)} KB`;
      const verdict = size.gzip <= KIOSK_JS_BUDGET_BYTES ? 'within' : 'OVER';
      console.log(`kiosk player JavaScript: ${kb(size.raw)} raw, ${kb(size.gzip)} gzipped (${size.files.length} files; ${verdict} the 60 KB budget)`);
    },
  };
}
