// Bundles the CLI (and, when present, the action entry) into dist/ as ESM files for Node 20+.
import { build } from 'esbuild';
import { existsSync } from 'node:fs';

const entries = { cli: 'src/entries/cli.ts', index: 'src/entries/action.ts' };
const entryPoints = Object.fromEntries(Object.entries(entries).filter(([, p]) => existsSync(p)));

await build({
  entryPoints,
  outdir: 'dist',
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  sourcemap: false,
  // Minified (about half the size: dist/index.js 2.0 MB → 1.0 MB), names kept so that class names
  // (InputError) and stack traces of an internal error stay readable.
  minify: true,
  keepNames: true,
  legalComments: 'none',
  logLevel: 'warning',
  // Some CommonJS dependencies call require(); give the ESM bundle one.
  banner: {
    js: "import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);",
  },
});
