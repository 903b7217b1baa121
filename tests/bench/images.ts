/**
 * `npm run bench:images`: a 24-megapixel JPEG into every rendition (4 sizes × AVIF, WebP, JPEG),
 * with sharp as Starproof does it and with ImageMagick's `convert` making the same files, in the
 * same run. Then two images at once through sharp. Prints wall time, peak resident memory and the
 * ratio. Targets (issue 7): at least 3× faster than convert, peak RSS under 500 MB, also with two
 * at once. Each sharp run happens in a fresh child process so its peak memory is its own.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import sharp from 'sharp';
import { RENDITION_SPECS } from '../../shared/media/renditions.ts';

const CONVERT = '/usr/bin/convert'; // Debian's ImageMagick; /usr/local/bin/convert may be a stand-in
const here = fileURLToPath(import.meta.url);
const work = fs.mkdtempSync(path.join(os.tmpdir(), 'starproof-bench-'));

/** A 6000 × 4000 "sky": smooth gradients with grain and stars, so encoders see photo-like content. */
async function makeSource(file: string) {
  const width = 6000;
  const height = 4000;
  const base = await sharp({
    create: { width, height, channels: 3, background: '#000000', noise: { type: 'gaussian', mean: 18, sigma: 9 } },
  })
    .raw()
    .toBuffer();
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const i = (y * width + x) * 3;
      const glow = Math.exp(-(((x - 3800) / 1500) ** 2 + ((y - 1700) / 900) ** 2));
      base[i] = Math.min(255, base[i] + 160 * glow + (20 * x) / width);
      base[i + 1] = Math.min(255, base[i + 1] + 60 * glow);
      base[i + 2] = Math.min(255, base[i + 2] + 110 * glow + (30 * y) / height);
      if ((x * 7919 + y * 104729) % 9973 === 0) base[i] = base[i + 1] = base[i + 2] = 255;
    }
  }
  await sharp(base, { raw: { width, height, channels: 3 } })
    .jpeg({ quality: 90 })
    .toFile(file);
}

/** GNU time's "Maximum resident set size" (kB) is the peak of the process tree's largest member. */
function timed(cmd: string, args: string[]): { seconds: number; cpuSeconds: number; peakMb: number } {
  const started = process.hrtime.bigint();
  const out = spawnSync('/usr/bin/time', ['-v', cmd, ...args], { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  let seconds = Number(process.hrtime.bigint() - started) / 1e9;
  if (out.status !== 0) throw new Error(`${cmd} failed:\n${out.stderr}`);
  const field = (name: string) => Number(new RegExp(`${name}: ([\\d.]+)`).exec(out.stderr)?.[1] ?? NaN);
  const kb = field('Maximum resident set size \\(kbytes\\)');
  let cpuSeconds = field('User time \\(seconds\\)') + field('System time \\(seconds\\)');
  // Our child reports the work's own times on its last line; convert's process is all work.
  const own = /^\{.*\}$/m.exec(out.stdout ?? '');
  if (own) ({ seconds, cpuSeconds } = JSON.parse(own[0]) as { seconds: number; cpuSeconds: number });
  return { seconds, cpuSeconds, peakMb: kb / 1024 };
}

/** ImageMagick: decode once, then per rendition resize (and crop for kiosk) and write three formats. */
function convertArgs(source: string, outDir: string): string[] {
  const args = [source, '-auto-orient', '-colorspace', 'sRGB', '-strip'];
  for (const spec of RENDITION_SPECS) {
    const geometry =
      spec.fit === 'cover'
        ? [`-resize`, `${spec.width}x${spec.height}^>`, '-gravity', 'center', '-extent', `${spec.width}x${spec.height}`]
        : ['-resize', `${spec.width}x${spec.height}>`];
    args.push('(', '+clone', ...geometry, '-write', path.join(outDir, `${spec.name}.jpg`));
    args.push('-quality', '80', '-write', path.join(outDir, `${spec.name}.webp`));
    args.push('-quality', '55', '-write', path.join(outDir, `${spec.name}.avif`), '+delete', ')');
  }
  return [...args, 'null:'];
}

/** In a fresh process: render, and report the time of the work alone (not Node's and tsx's start-up). */
async function child(sources: string[]) {
  const { renderAll } = await import('../../server/media/render.ts');
  const cpu = process.cpuUsage();
  const started = process.hrtime.bigint();
  await Promise.all(sources.map((s) => renderAll(s, { x: 0.6, y: 0.45 }, 100_000_000)));
  const used = process.cpuUsage(cpu);
  console.log(
    JSON.stringify({ seconds: Number(process.hrtime.bigint() - started) / 1e9, cpuSeconds: (used.user + used.system) / 1e6 }),
  );
}

async function main() {
  if (process.argv[2] === '--child') return child(process.argv.slice(3));
  if (!fs.existsSync(CONVERT) || !/ImageMagick/.test(execFileSync(CONVERT, ['-version'], { encoding: 'utf8' }))) {
    throw new Error(`${CONVERT} is not ImageMagick's convert; install Debian's imagemagick.`);
  }
  const a = path.join(work, 'sky-a.jpg');
  const b = path.join(work, 'sky-b.jpg');
  console.log('Making two 24-megapixel JPEGs (6000 × 4000)…');
  await makeSource(a);
  fs.copyFileSync(a, b);
  fs.appendFileSync(b, Buffer.from([0])); // a different file, the same picture
  const node = process.execPath;
  const tsx = ['--import', 'tsx', here, '--child'];
  // Warm the disk cache and the libraries once, untimed.
  spawnSync(node, [...tsx, a]);

  const sharpOne = timed(node, [...tsx, a]);
  const out = path.join(work, 'magick');
  fs.mkdirSync(out);
  const magick = timed(CONVERT, convertArgs(a, out));
  const sharpTwo = timed(node, [...tsx, a, b]);

  const row = (label: string, r: ReturnType<typeof timed>) =>
    console.log(
      `${label.padEnd(40)} ${r.seconds.toFixed(2).padStart(7)} s wall ${r.cpuSeconds.toFixed(2).padStart(7)} s CPU ${r.peakMb.toFixed(0).padStart(6)} MB peak RSS`,
    );
  console.log(`\nMALLOC_ARENA_MAX=${process.env.MALLOC_ARENA_MAX ?? '(unset: glibc default, more fragmentation with threads)'}`);
  console.log(
    `12 renditions (thumbnail 400, page 1600, kiosk 1920×1080 and 3840×2160 crops; AVIF, WebP, JPEG) on ${os.cpus().length} cores:`,
  );
  row('sharp (Starproof), one image', sharpOne);
  row('ImageMagick convert, one image', magick);
  row('sharp (Starproof), two images at once', sharpTwo);
  const ratio = magick.seconds / sharpOne.seconds;
  const cpuRatio = magick.cpuSeconds / sharpOne.cpuSeconds;
  console.log(
    `\nsharp is ${ratio.toFixed(1)}× faster than convert by wall time (target ≥ 3×): ${ratio >= 3 ? 'met' : 'NOT met'}`,
  );
  console.log(
    `         ${cpuRatio.toFixed(1)}× by CPU time (steadier when the machine is busy; load average now ${os.loadavg()[0].toFixed(1)})`,
  );
  console.log(
    `peak RSS one image ${sharpOne.peakMb.toFixed(0)} MB, two at once ${sharpTwo.peakMb.toFixed(0)} MB (target < 500 MB): ${Math.max(sharpOne.peakMb, sharpTwo.peakMb) < 500 ? 'met' : 'NOT met'}`,
  );
  console.log(
    '(sharp times are of the rendering alone, without Node.js start-up; peak RSS includes Node.js itself, about 60 MB.)',
  );
  fs.rmSync(work, { recursive: true, force: true });
}

await main();
