// Bundles the CLI (and, when present, the action entry) into dist/ as ESM files for Node 20+.
import { build } from 'esbuild';
import { existsSync, readdirSync, rmSync } from 'node:fs';

const entries = { cli: 'src/entries/cli.ts', index: 'src/entries/action.ts' };
const entryPoints = Object.fromEntries(Object.entries(entries).filter(([, p]) => existsSync(p)));

const result = await build({
  entryPoints,
  outdir: 'dist',
  bundle: true,
  // Split per command and mode (they are imported when they run): start-up parses only what runs.
  // Shared code goes to dist/chunks/; the entries stay dist/cli.js and dist/index.js.
  splitting: true,
  chunkNames: 'chunks/[name]-[hash]',
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
  metafile: true,
  // Some CommonJS dependencies call require(); give the ESM bundle one.
  banner: {
    js: "import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);",
  },
});

// Chunk names carry a content hash: remove the chunks of earlier builds (after this one is written,
// so that a process still running the previous build loses its files as late as possible).
const written = new Set(Object.keys(result.metafile.outputs).map((p) => p.replace(/^dist\//, '')));
for (const name of readdirSync('dist/chunks')) {
  if (!written.has(`chunks/${name}`)) rmSync(`dist/chunks/${name}`);
}
