// npm run bench: builds bench/bench.ts, runs every variant in its own process (3 rounds, median),
// and prints ratios of variants measured side by side in this one run, against targets.
import { execFileSync } from 'node:child_process';
import { build } from 'esbuild';

const out = 'node_modules/.cache/fitgap-bench/bench.mjs';
await build({
  entryPoints: ['bench/bench.ts'],
  outfile: out,
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  logLevel: 'warning',
  banner: {
    js: "import { createRequire as __r } from 'node:module'; const require = __r(import.meta.url);",
  },
});
execFileSync(process.execPath, [out, 'prepare'], { stdio: 'inherit' });

const run = (variant) =>
  JSON.parse(execFileSync(process.execPath, [out, variant], { encoding: 'utf8' }).trim());
const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const results = {};
for (let round = 0; round < 3; round++) {
  for (const v of [
    'pair-streaming-in-order',
    'pair-streaming-shuffled',
    'pair-naive-maps',
    'curves-epochs-1k',
    'curves-epochs-100k',
  ]) {
    const r = run(v);
    (results[v] ??= []).push(r);
  }
}
const ms = (v) => median(results[v].map((r) => r.ms));
const mb = (v) => median(results[v].map((r) => r.maxRssMb));

console.log('variant                      median ms   peak RSS MB');
for (const v of Object.keys(results))
  console.log(`${v.padEnd(28)} ${ms(v).toFixed(0).padStart(9)}   ${mb(v).toFixed(0).padStart(11)}`);

const targets = [
  [
    'pairing 1M rows: streaming time / naive maps time',
    ms('pair-streaming-in-order') / ms('pair-naive-maps'),
    1.5,
  ],
  [
    'pairing 1M rows: streaming peak RSS / naive maps peak RSS',
    mb('pair-streaming-in-order') / mb('pair-naive-maps'),
    0.6,
  ],
  [
    'pairing 1M rows: shuffled time / in-order time',
    ms('pair-streaming-shuffled') / ms('pair-streaming-in-order'),
    2.0,
  ],
  [
    'epoch curve: 100k points time / 1k points time',
    ms('curves-epochs-100k') / ms('curves-epochs-1k'),
    150,
  ],
];
console.log('\nratio (measured side by side in this run)                      value   target');
let failed = 0;
for (const [label, value, limit] of targets) {
  const ok = value <= limit;
  if (!ok) failed++;
  console.log(
    `${label.padEnd(60)} ${value.toFixed(2).padStart(7)}   <= ${limit}  ${ok ? 'ok' : 'MISSED'}`,
  );
}
process.exitCode = failed > 0 ? 1 : 0;
