// Bundles the server into dist-server/ (part of `npm run build`): index.js (the app) and cli.js
// (migrate, seed, backup, restore). Production runs them with plain `node`, with no TypeScript
// loader in the process. Packages stay in node_modules (native ones cannot be bundled), and the
// optional ones (S3 SDK, pg, the development mailbox) are imported only when configured.
import { rmSync } from 'node:fs';
import path from 'node:path';
import { build } from 'esbuild';

const root = path.resolve(import.meta.dirname, '..');
const outdir = path.join(root, 'dist-server');

rmSync(outdir, { recursive: true, force: true });
await build({
  absWorkingDir: root,
  entryPoints: { index: 'server/index.ts', cli: 'server/db/cli.ts' },
  outdir,
  bundle: true,
  packages: 'external',
  platform: 'node',
  format: 'esm',
  target: 'node20',
  // The decorators and class-field rules the sources are type-checked with (the same esbuild tsx runs).
  tsconfig: 'tsconfig.server.json',
  sourcemap: true,
  logLevel: 'warning',
});
console.log('server built into dist-server/ (index.js, cli.js)');
