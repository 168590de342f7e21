import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';

export interface Chunk {
  file: string;
  gzipKb: number;
}

export interface BundleSizes {
  /** What index.html loads before anything shows: its scripts, preloaded modules and styles. */
  firstScreen: { js: Chunk[]; css: Chunk[]; jsGzipKb: number; cssGzipKb: number };
  /** Every other script or stylesheet, loaded when a route or a heavy view needs it. */
  lazy: Chunk[];
  buildSeconds: number;
}

const gzipKb = (file: string) => gzipSync(fs.readFileSync(file), { level: 9 }).length / 1024;
const sum = (chunks: Chunk[]) => chunks.reduce((n, c) => n + c.gzipKb, 0);

/** Builds the client into `outDir` (not dist/, which a running server may be serving). */
function build(outDir: string): number {
  const started = performance.now();
  const result = spawnSync(process.execPath, [path.join('node_modules', 'vite', 'bin', 'vite.js'), 'build', '--outDir', outDir, '--emptyOutDir', '--logLevel', 'error'], { encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`vite build failed:\n${result.stderr || result.stdout}`);
  return (performance.now() - started) / 1000;
}

/** The assets index.html names: module scripts, modulepreload links and stylesheets. */
function firstScreenFiles(outDir: string): { js: string[]; css: string[] } {
  const html = fs.readFileSync(path.join(outDir, 'index.html'), 'utf8');
  const refs = (pattern: RegExp) => [...html.matchAll(pattern)].map((m) => m[1]);
  const js = [...refs(/<script[^>]+src="\/([^"]+\.js)"/g), ...refs(/<link[^>]+rel="modulepreload"[^>]+href="\/([^"]+\.js)"/g)];
  const css = refs(/<link[^>]+rel="stylesheet"[^>]+href="\/([^"]+\.css)"/g);
  return { js: [...new Set(js)], css: [...new Set(css)] };
}

export function measureBundle(outDir: string): BundleSizes {
  const buildSeconds = build(outDir);
  const first = firstScreenFiles(outDir);
  const chunk = (file: string): Chunk => ({ file: path.basename(file), gzipKb: gzipKb(path.join(outDir, file)) });
  const js = first.js.map(chunk);
  const css = first.css.map(chunk);
  const assets = path.join(outDir, 'assets');
  const lazy = fs
    .readdirSync(assets)
    .filter((f) => (f.endsWith('.js') || f.endsWith('.css')) && ![...first.js, ...first.css].includes(`assets/${f}`))
    .map((f) => chunk(path.join('assets', f)))
    .sort((a, b) => b.gzipKb - a.gzipKb);
  return { firstScreen: { js, css, jsGzipKb: sum(js), cssGzipKb: sum(css) }, lazy, buildSeconds };
}
