// Bundles the server into dist-server/ (part of `npm run build`): index.js (the app) and cli.js
// (migrate, seed, backup, restore). Production runs them with plain `node`, with no TypeScript
// loader in the process. Packages stay in node_modules (native ones cannot be bundled), and the
// optional ones (S3 SDK, pg, the development mailbox) are imported only when configured.
import { rmSync } from 'node:fs';
import path from 'node:path';
import { build } from 'esbuild';

const root = path.resolve(import.meta.dirname, '..');
const outdir = path.join(root, 'dist-server');

// date-fns goes into the bundle, shaken down to the few functions the server uses: loaded from
// node_modules it is some 300 modules whose source Node keeps in memory. (Bundled, zod would bring
// every locale along, so it stays a package.)
const bundled = new Set(['date-fns', '@date-fns/tz']);
const packageOf = (specifier) => specifier.split('/').slice(0, specifier.startsWith('@') ? 2 : 1).join('/');
const externalExceptBundled = {
  name: 'external-except-bundled',
  setup(b) {
    b.onResolve({ filter: /^[^./]/ }, (args) => (bundled.has(packageOf(args.path)) ? undefined : { path: args.path, external: true }));
  },
};

rmSync(outdir, { recursive: true, force: true });
await build({
  absWorkingDir: root,
  entryPoints: { index: 'server/index.ts', cli: 'server/db/cli.ts' },
  outdir,
  bundle: true,
  plugins: [externalExceptBundled],
  platform: 'node',
  format: 'esm',
  target: 'node20',
  // The decorators and class-field rules the sources are type-checked with (the same esbuild tsx runs).
  tsconfig: 'tsconfig.server.json',
  sourcemap: true,
  logLevel: 'warning',
});
console.log('server built into dist-server/ (index.js, cli.js)');
