// Bundles the CLI (and, when present, the action entry) into dist/ as ESM files for Node 20+.
import { build } from 'esbuild';
import { existsSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

const entries = { cli: 'src/entries/cli.ts', index: 'src/entries/action.ts' };
const entryPoints = Object.fromEntries(Object.entries(entries).filter(([, p]) => existsSync(p)));

/**
 * The files of @actions/core have no side effect a caller relies on when it uses none of their
 * exports, but esbuild cannot know that (the package.json declares nothing). Saying so lets the
 * bundle leave out what the action never calls: @actions/core's OIDC client (and through it
 * @actions/http-client and undici, 430 kB, which every run would load) and its platform probe
 * (@actions/exec). The REST client and its HTTP stack are loaded when a step talks to GitHub.
 */
const sideEffectFree = {
  name: 'side-effect-free-actions-core',
  setup(b) {
    const own = /[\\/]node_modules[\\/]@actions[\\/]core[\\/]/;
    b.onResolve({ filter: /.*/ }, async (args) => {
      if (args.pluginData?.sideEffectFree === true) return undefined;
      if (!own.test(args.importer) && !args.path.startsWith('@actions/core')) return undefined;
      const { path, external, namespace, errors } = await b.resolve(args.path, {
        kind: args.kind,
        importer: args.importer,
        resolveDir: args.resolveDir,
        pluginData: { sideEffectFree: true },
      });
      if (errors.length > 0 || !own.test(path)) return undefined;
      return { path, external, namespace, sideEffects: false };
    });
  },
};

const result = await build({
  entryPoints,
  plugins: [sideEffectFree],
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
  // Minified: about half the size (dist/index.js 2.0 MB → 1.0 MB) and less to parse at start-up.
  // Names are not kept: keepNames wraps every function in an Object.defineProperty call at load,
  // which cost the tiny review about 10 ms of its start-up (issue 14). Nothing reads a minified
  // name: our error classes set `name` themselves, and the bundled libraries compare only the
  // names of built-ins (Uint8Array, Error). A stack trace of an internal error shows minified
  // function names; `node scripts/build.mjs --readable` builds with names kept to read one.
  minify: true,
  keepNames: process.argv.includes('--readable'),
  legalComments: 'none',
  logLevel: 'warning',
  metafile: true,
  // Some CommonJS dependencies call require(); give the ESM bundle one.
  banner: {
    js: "import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);",
  },
});

// `FITGAP_METAFILE=meta.json npm run build` keeps esbuild's record of what went into each chunk
// (inspect it with esbuild's analyzer to see which chunks a command loads and what is in them).
if (process.env.FITGAP_METAFILE)
  writeFileSync(process.env.FITGAP_METAFILE, JSON.stringify(result.metafile));

// Chunk names carry a content hash: remove the chunks of earlier builds (after this one is written,
// so that a process still running the previous build loses its files as late as possible).
const written = new Set(Object.keys(result.metafile.outputs).map((p) => p.replace(/^dist\//, '')));
for (const name of readdirSync('dist/chunks')) {
  if (!written.has(`chunks/${name}`)) rmSync(`dist/chunks/${name}`);
}

// The licenses of the open-source code in dist/ (minified without comments): the notice each of
// these licenses asks to ship with copies. One entry per package whose files were bundled, plus
// jStat, whose functions src/stats/vendor/jstat-subset.js copies, and ajv, whose ucs2length the
// generated validators (src/validate/generated/) copy.
const packages = new Set(['node_modules/jstat', 'node_modules/ajv']);
const bundled = Object.values(result.metafile.outputs).flatMap((output) =>
  Object.entries(output.inputs)
    .filter(([, { bytesInOutput }]) => bytesInOutput > 0)
    .map(([input]) => input),
);
for (const input of bundled) {
  const match = /^(.*node_modules\/(?:@[^/]+\/)?[^/]+)\//.exec(input);
  if (match) packages.add(match[1]);
}
const notices = [...packages]
  .map((dir) => {
    const pkg = JSON.parse(readFileSync(join(dir, 'package.json'), 'utf8'));
    const file = readdirSync(dir).find((f) => /^(licen[cs]e|copying)(\.(md|txt))?$/i.test(f));
    const text =
      file === undefined
        ? `(no license file; package.json: ${pkg.license})`
        : readFileSync(join(dir, file), 'utf8').trim();
    return { id: `${pkg.name}@${pkg.version} (${pkg.license ?? 'see below'})`, text };
  })
  .sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
const seen = new Set();
writeFileSync(
  'dist/licenses.txt',
  'Open-source code bundled in dist/, with its license.\n\n' +
    notices
      .filter(({ id }) => !seen.has(id) && seen.add(id))
      .map(({ id, text }) => `${id}\n\n${text}\n`)
      .join('\n----------------------------------------------------------------------\n\n'),
);
