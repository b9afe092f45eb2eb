// npm run bench [-- --quick] [-- --turns N] [-- --only inorder,shuffled,loss,startup,curve,10m]
//
// Builds dist/, generates the benchmark data with a fixed seed (bench/generate.mjs) into
// $TMPDIR/fitgap-bench-<seed> (kept for the next run), and runs each comparison in alternating
// turns (A, B, A, B, …), every run in its own process, after one untimed warm-up turn. Prints one
// table of medians, spreads (min–max) and ratios against the targets, floor and peer included, and
// the machine it ran on. Wall time is what is compared; CPU time (user + sys) and peak RSS come
// from /usr/bin/time when it exists. --quick leaves out the 10M-row workloads; --only runs the named
// groups (10m names both 10M groups) and prints their rows alone.
import { spawnSync } from 'node:child_process';
import {
  existsSync,
  mkdtempSync,
  readFileSync,
  readdirSync,
  rmSync,
  statSync,
  writeFileSync,
} from 'node:fs';
import { cpus, loadavg, tmpdir, totalmem } from 'node:os';
import { join, resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import { generate, SEED } from '../bench/generate.mjs';

const args = process.argv.slice(2);
const quick = args.includes('--quick');
const turnsArg = args.indexOf('--turns');
const TURNS = turnsArg >= 0 ? Number(args[turnsArg + 1]) : 5;
const onlyArg = args.indexOf('--only');
const only = onlyArg >= 0 ? new Set(args[onlyArg + 1].split(',')) : null;
/** Whether the group runs: all of them unless --only names some (`10m` stands for both 10M groups). */
const wanted = (key) =>
  only === null || only.has(key) || (key.startsWith('10m') && only.has('10m'));
const ROOT = resolve('.');
const DATA = join(tmpdir(), `fitgap-bench-${SEED}`);
const node = process.execPath;
const TIME = existsSync('/usr/bin/time') ? '/usr/bin/time' : null;

function sh(cmd, argv, options = {}) {
  const r = spawnSync(cmd, argv, { encoding: 'utf8', ...options });
  if (r.status !== 0) throw new Error(`${cmd} ${argv.join(' ')} failed: ${r.stderr}`);
  return r.stdout;
}

console.log('building dist/ …');
sh(node, ['scripts/gen-validators.mjs']);
sh(node, ['scripts/build.mjs']);
console.log(`generating data in ${DATA} (seed ${SEED}; kept for the next run) …`);
generate(DATA, quick ? ['1m'] : ['1m', '10m']);

/** A Python with pandas and scipy: the peer runs there, or is skipped. */
function findPython() {
  for (const py of ['python3', '/usr/bin/python3']) {
    const r = spawnSync(
      py,
      ['-c', 'import pandas, scipy; print(pandas.__version__, scipy.__version__)'],
      {
        encoding: 'utf8',
      },
    );
    if (r.status === 0) return { py, versions: r.stdout.trim() };
  }
  return null;
}
const python = findPython();

const scratch = mkdtempSync(join(tmpdir(), 'fitgap-bench-run-'));
writeFileSync(join(scratch, 'event.json'), '{}');
const actionEnv = {
  // Node's own settings of this machine (NODE_OPTIONS, NODE_EXTRA_CA_CERTS…), which the floor
  // `node -e ''` and the CLI runs inherit too: loading extra CA certificates alone costs every
  // Node process about 40 ms here, so leaving them out would understate the action's start-up.
  ...Object.fromEntries(Object.entries(process.env).filter(([k]) => k.startsWith('NODE_'))),
  PATH: process.env.PATH ?? '',
  GITHUB_ACTIONS: 'true',
  GITHUB_EVENT_NAME: 'push',
  GITHUB_EVENT_PATH: join(scratch, 'event.json'),
  GITHUB_REPOSITORY: 'crumb/eta',
  // Nothing is sent: no pull request, comment and status check off.
  GITHUB_API_URL: 'http://127.0.0.1:9',
  GITHUB_SHA: 'b3e51a0b3e51a0b3e51a0b3e51a0b3e51a0b3e51',
  GITHUB_WORKSPACE: DATA,
  GITHUB_OUTPUT: join(scratch, 'output'),
  GITHUB_STEP_SUMMARY: join(scratch, 'summary'),
  RUNNER_TEMP: scratch,
  INPUT_MODE: 'review',
  INPUT_CANDIDATE: 'tiny-candidate.json',
  INPUT_BASELINE: 'tiny-baseline.json',
  'INPUT_GITHUB-TOKEN': 'unused',
  INPUT_COMMENT: 'off',
  'INPUT_COMMENT-KEY': 'default',
  'INPUT_STATUS-CHECK': 'off',
  'INPUT_REPORT-ARTIFACT': 'fitgap-report',
  'INPUT_ARCHIVE-LIMIT-MB': '50',
};

const cli = (b, c) => [
  node,
  join(ROOT, 'dist/cli.js'),
  'review',
  '--baseline',
  b,
  '--candidate',
  c,
];
const floor = (...files) => [node, join(ROOT, 'bench/floor-lines.mjs'), ...files];
const peer = (b, c) => (python === null ? null : [python.py, join(ROOT, 'bench/peer.py'), b, c]);

const workloads = {
  'fitgap 1M': cli('baseline-1m.json', 'candidate-1m.json'),
  'fitgap 1M shuffled': cli('baseline-1m.json', 'candidate-1m-shuffled.json'),
  'fitgap 1M loss': cli('baseline-1m-loss.json', 'candidate-1m-loss.json'),
  'fitgap 10M': cli('baseline-10m.json', 'candidate-10m.json'),
  'fitgap 10M shuffled': cli('baseline-10m.json', 'candidate-10m-shuffled.json'),
  'floor 1M': floor('base-1m.csv', 'cand-1m.csv'),
  'floor 1M shuffled': floor('base-1m.csv', 'cand-1m-shuffled.csv'),
  'floor 10M': floor('base-10m.csv', 'cand-10m.csv'),
  'peer 1M': peer('base-1m.csv', 'cand-1m.csv'),
  'peer 1M shuffled': peer('base-1m.csv', 'cand-1m-shuffled.csv'),
  'fitgap start-up (CLI)': cli('tiny-baseline.json', 'tiny-candidate.json'),
  'fitgap start-up (action)': [node, join(ROOT, 'dist/index.js')],
  "node -e ''": [node, '-e', ''],
  // The curve artifact is about 50 MB: over the 16 MiB default, so the documented flag raises it.
  'fitgap curve 1M': [
    ...cli('tiny-baseline-loss.json', 'candidate-epochs-1m.json'),
    '--max-artifact-mb',
    '128',
  ],
  'floor curve 1M': [node, join(ROOT, 'bench/floor-json.mjs'), 'candidate-epochs-1m.json'],
};

/** One run in its own process: wall ms (measured here), CPU ms and peak RSS MB (/usr/bin/time). */
function measure(name) {
  const argv = workloads[name];
  const action = name.includes('(action)');
  if (action) for (const f of ['output', 'summary']) writeFileSync(join(scratch, f), '');
  const out = join(scratch, 'time');
  const [cmd, ...rest] = TIME === null ? argv : [TIME, '-f', '%U %S %M', '-o', out, ...argv];
  const start = performance.now();
  const r = spawnSync(cmd, rest, {
    cwd: DATA,
    stdio: ['ignore', 'ignore', 'pipe'],
    encoding: 'utf8',
    ...(action ? { env: actionEnv } : {}),
  });
  const wall = performance.now() - start;
  // fitgap exits 1 when the gate fails; that is a finished review.
  if (r.status !== 0 && !(r.status === 1 && name.startsWith('fitgap')))
    throw new Error(`${name} exited ${r.status}: ${r.stderr}`);
  if (TIME === null) return { wall, cpu: NaN, rss: NaN };
  const [user, sys, kb] = readFileSync(out, 'utf8').trim().split('\n').pop().split(' ').map(Number);
  return { wall, cpu: (user + sys) * 1000, rss: kb / 1024 };
}

const groups = [
  { key: 'inorder', members: ['fitgap 1M', 'floor 1M', 'peer 1M'], turns: TURNS },
  {
    key: 'shuffled',
    members: ['fitgap 1M shuffled', 'floor 1M shuffled', 'peer 1M shuffled'],
    turns: TURNS,
  },
  { key: 'loss', members: ['fitgap 1M loss', 'fitgap 1M'], turns: TURNS + 2 },
  {
    key: 'startup',
    members: ['fitgap start-up (CLI)', 'fitgap start-up (action)', "node -e ''"],
    turns: 2 * TURNS + 1,
  },
  { key: 'curve', members: ['fitgap curve 1M', 'floor curve 1M'], turns: TURNS },
  ...(quick
    ? []
    : [
        { key: '10m', members: ['fitgap 10M', 'fitgap 1M', 'floor 10M'], turns: 3 },
        { key: '10m-shuffled', members: ['fitgap 10M shuffled', 'fitgap 1M shuffled'], turns: 3 },
      ]),
].filter((g) => wanted(g.key));

const results = {};
const loads = [];
for (const group of groups) {
  const members = group.members.filter((m) => workloads[m] !== null);
  process.stdout.write(`${group.key}: ${members.join(' / ')} × ${group.turns} `);
  loads.push(loadavg()[0]);
  for (const m of members) measure(m); // warm-up: page cache, not timed
  const samples = (results[group.key] = Object.fromEntries(members.map((m) => [m, []])));
  for (let turn = 0; turn < group.turns; turn++) {
    for (const m of members) samples[m].push(measure(m));
    process.stdout.write('.');
  }
  loads.push(loadavg()[0]);
  process.stdout.write('\n');
}

// fitgap and the peer must agree on the paired test they both ran (checked once, not timed).
function agreement() {
  if (python === null) return 'peer skipped';
  const notes = [];
  for (const [b, c, pb, pc] of [
    ['baseline-1m.json', 'candidate-1m.json', 'base-1m.csv', 'cand-1m.csv'],
    ['baseline-1m.json', 'candidate-1m-shuffled.json', 'base-1m.csv', 'cand-1m-shuffled.csv'],
  ]) {
    const ours = JSON.parse(
      spawnSync(
        node,
        [
          join(ROOT, 'dist/cli.js'),
          'review',
          '--baseline',
          b,
          '--candidate',
          c,
          '--format',
          'json',
        ],
        {
          cwd: DATA,
          encoding: 'utf8',
        },
      ).stdout,
    ).paired;
    const theirs = JSON.parse(sh(python.py, [join(ROOT, 'bench/peer.py'), pb, pc], { cwd: DATA }));
    const same =
      ours.rows === theirs.rows &&
      ours.discordant.baselineOnly === theirs.baselineOnly &&
      ours.discordant.candidateOnly === theirs.candidateOnly;
    notes.push(`${c}: ${same ? 'same' : 'DIFFERENT'} pairs and discordant counts`);
  }
  return notes.join('; ');
}
const agreed = wanted('inorder') && wanted('shuffled') ? agreement() : 'not checked (--only)';
rmSync(scratch, { recursive: true, force: true });

const median = (xs) => {
  const s = [...xs].sort((a, b) => a - b);
  const h = Math.floor(s.length / 2);
  return s.length % 2 === 1 ? s[h] : (s[h - 1] + s[h]) / 2;
};
const stat = (group, name, field = 'wall') => {
  const xs = results[group]?.[name]?.map((r) => r[field]);
  return xs === undefined ? null : { med: median(xs), min: Math.min(...xs), max: Math.max(...xs) };
};
const secs = (ms) => (ms >= 10000 ? `${(ms / 1000).toFixed(1)} s` : `${(ms / 1000).toFixed(2)} s`);
const cell = (group, name) => {
  const w = stat(group, name);
  if (w === null) return 'skipped';
  const cpu = stat(group, name, 'cpu');
  const rss = stat(group, name, 'rss');
  return `${secs(w.med)} (${secs(w.min)}–${secs(w.max)}); CPU ${Number.isNaN(cpu.med) ? 'n/a' : secs(cpu.med)}; ${Number.isNaN(rss.med) ? 'n/a' : `${rss.med.toFixed(0)} MB`}`;
};
const ratio = (group, a, b, field = 'wall') => {
  const x = stat(group, a, field);
  const y = stat(group, b, field);
  return x === null || y === null ? NaN : x.med / y.med;
};
const times = (r) => (Number.isNaN(r) ? 'n/a' : `${r.toFixed(2)}×`);
const verdict = (ok) =>
  typeof ok === 'string' ? ok : ok === null ? 'skipped' : ok ? 'ok' : 'MISSED';

const rows = [];
const row = (comparison, ours, ref, value, cpuValue, target, ok) =>
  rows.push([comparison, ours, ref, value, cpuValue, target, verdict(ok)]);

if (wanted('inorder')) {
  const r = ratio('inorder', 'fitgap 1M', 'floor 1M');
  row(
    'paired review, 2 × 1M `id,correct`, ids in order, vs floor',
    cell('inorder', 'fitgap 1M'),
    `floor: ${cell('inorder', 'floor 1M')}`,
    times(r),
    times(ratio('inorder', 'fitgap 1M', 'floor 1M', 'cpu')),
    '≤ 1.5× (must: ≤ 2.5×)',
    r <= 1.5 ? 'ok' : r <= 2.5 ? 'MISSED 1.5×; must met' : 'MISSED',
  );
}
if (wanted('inorder') && python !== null) {
  const r = ratio('inorder', 'peer 1M', 'fitgap 1M');
  const rss = stat('inorder', 'fitgap 1M', 'rss')?.med ?? NaN;
  row(
    'the same vs the peer (pandas read + merge, scipy exact binomial)',
    cell('inorder', 'fitgap 1M'),
    `peer: ${cell('inorder', 'peer 1M')}`,
    `${r.toFixed(1)}× faster`,
    `${ratio('inorder', 'peer 1M', 'fitgap 1M', 'cpu').toFixed(1)}× less`,
    '≥ 6× faster; peak RSS ≤ 150 MB',
    r >= 6 && !(rss > 150),
  );
} else if (wanted('inorder'))
  row(
    'the same vs the peer',
    cell('inorder', 'fitgap 1M'),
    'peer skipped: no python3 with pandas and scipy',
    'n/a',
    'n/a',
    '≥ 6× faster; peak RSS ≤ 150 MB',
    null,
  );
if (wanted('shuffled')) {
  const r = ratio('shuffled', 'fitgap 1M shuffled', 'floor 1M shuffled');
  row(
    'candidate ids shuffled, 1M, vs floor',
    cell('shuffled', 'fitgap 1M shuffled'),
    `floor: ${cell('shuffled', 'floor 1M shuffled')}`,
    times(r),
    times(ratio('shuffled', 'fitgap 1M shuffled', 'floor 1M shuffled', 'cpu')),
    '≤ 4×',
    r <= 4,
  );
  if (python !== null)
    row(
      'the same vs the peer (no target)',
      cell('shuffled', 'fitgap 1M shuffled'),
      `peer: ${cell('shuffled', 'peer 1M shuffled')}`,
      `${ratio('shuffled', 'peer 1M shuffled', 'fitgap 1M shuffled').toFixed(1)}× faster`,
      `${ratio('shuffled', 'peer 1M shuffled', 'fitgap 1M shuffled', 'cpu').toFixed(1)}× less`,
      '',
      true,
    );
}
if (wanted('loss')) {
  const r = ratio('loss', 'fitgap 1M loss', 'fitgap 1M');
  row(
    '`id,loss` (paired t) vs `id,correct`, 1M',
    cell('loss', 'fitgap 1M loss'),
    `correct: ${cell('loss', 'fitgap 1M')}`,
    times(r),
    times(ratio('loss', 'fitgap 1M loss', 'fitgap 1M', 'cpu')),
    '≤ 1.3×',
    r <= 1.3,
  );
}
if (!quick && wanted('10m')) {
  const r = ratio('10m', 'fitgap 10M', 'fitgap 1M');
  const rss = stat('10m', 'fitgap 10M', 'rss')?.med ?? NaN;
  row(
    '10M per side, ids in order, vs 1M',
    cell('10m', 'fitgap 10M'),
    `1M: ${cell('10m', 'fitgap 1M')}`,
    times(r),
    times(ratio('10m', 'fitgap 10M', 'fitgap 1M', 'cpu')),
    '≤ 11×; peak RSS ≤ 300 MB',
    r <= 11 && !(rss > 300),
  );
  row(
    '10M in order vs floor (no target)',
    cell('10m', 'fitgap 10M'),
    `floor: ${cell('10m', 'floor 10M')}`,
    times(ratio('10m', 'fitgap 10M', 'floor 10M')),
    times(ratio('10m', 'fitgap 10M', 'floor 10M', 'cpu')),
    '',
    true,
  );
  const s = ratio('10m-shuffled', 'fitgap 10M shuffled', 'fitgap 1M shuffled');
  const srss = stat('10m-shuffled', 'fitgap 10M shuffled', 'rss')?.med ?? NaN;
  row(
    '10M per side, candidate shuffled, vs 1M shuffled',
    cell('10m-shuffled', 'fitgap 10M shuffled'),
    `1M: ${cell('10m-shuffled', 'fitgap 1M shuffled')}`,
    times(s),
    times(ratio('10m-shuffled', 'fitgap 10M shuffled', 'fitgap 1M shuffled', 'cpu')),
    '≤ 11×; peak RSS ≤ 600 MB',
    s <= 11 && !(srss > 600),
  );
}
for (const entry of wanted('startup') ? ['CLI', 'action'] : []) {
  const name = `fitgap start-up (${entry})`;
  const plus = stat('startup', name).med - stat('startup', "node -e ''").med;
  const cpuPlus = stat('startup', name, 'cpu').med - stat('startup', "node -e ''", 'cpu').med;
  row(
    `start-up: ${entry} reviewing two small artifacts vs \`node -e ''\``,
    cell('startup', name),
    `node -e '': ${cell('startup', "node -e ''")}`,
    `+${plus.toFixed(0)} ms`,
    Number.isNaN(cpuPlus) ? 'n/a' : `+${cpuPlus.toFixed(0)} ms`,
    '≤ +80 ms',
    plus <= 80,
  );
}
if (wanted('curve')) {
  // An epoch curve of 1,000,000 points, the most one may have (MAX_EPOCH_POINTS in
  // src/model/limits.ts), against reading and parsing the same file.
  const r = ratio('curve', 'fitgap curve 1M', 'floor curve 1M');
  row(
    'epoch curve of 1,000,000 points (validate, analyse, downsample) vs `JSON.parse` of the file',
    cell('curve', 'fitgap curve 1M'),
    `JSON.parse: ${cell('curve', 'floor curve 1M')}`,
    times(r),
    times(ratio('curve', 'fitgap curve 1M', 'floor curve 1M', 'cpu')),
    '≤ 1.5×',
    r <= 1.5,
  );
}
{
  // The entries load their chunks (dist/chunks/) as they run: count the entry and every chunk.
  const chunks = readdirSync('dist/chunks').reduce(
    (sum, name) => sum + statSync(join('dist/chunks', name)).size,
    0,
  );
  const size = statSync('dist/index.js').size + chunks;
  const cliSize = statSync('dist/cli.js').size + chunks;
  row(
    '`dist/` size (dist/index.js and every chunk)',
    `${(size / 1e6).toFixed(2)} MB`,
    `dist/cli.js: ${(cliSize / 1e6).toFixed(2)} MB`,
    '',
    '',
    '≤ 1.5 MB',
    size <= 1.5e6,
  );
}

const header = [
  'comparison',
  'fitgap: median (min–max); CPU; peak RSS',
  'reference',
  'ratio',
  'CPU ratio',
  'target',
  '',
];
console.log('');
console.log(`| ${header.join(' | ')} |`);
console.log(`|${header.map(() => '---').join('|')}|`);
for (const r of rows) console.log(`| ${r.join(' | ')} |`);
console.log('');
const mem = (totalmem() / 2 ** 30).toFixed(1);
console.log(
  `Machine: ${cpus().length} CPUs (${cpus()[0]?.model ?? 'unknown'}), ${mem} GiB, Node ${process.version}` +
    `${python === null ? ', no pandas/scipy' : `, ${python.py} with pandas ${python.versions.replace(' ', ', scipy ')}`}.`,
);
console.log(
  `Load average (1 min) at the start and end of each group: ${loads.map((l) => l.toFixed(1)).join(', ')}.`,
);
console.log(
  `Turns: ${groups.map((g) => `${g.key} ${g.turns}`).join(', ')} (after one warm-up turn each).`,
);
console.log(`Agreement with the peer: ${agreed}.`);
console.log(`Command: npm run bench${args.length > 0 ? ` -- ${args.join(' ')}` : ''}`);
