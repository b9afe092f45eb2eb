// Benchmark data, generated with a fixed seed: `node bench/generate.mjs DIR [1m] [10m]`.
// Scenario: the late-delivery classifier of the demo, evaluated on a large validation set.
// Every file is written once per DIR; an existing file of the same name is kept (same seed, same
// bytes), so a second run of the bench reuses the data.
import {
  closeSync,
  existsSync,
  mkdirSync,
  openSync,
  renameSync,
  writeFileSync,
  writeSync,
} from 'node:fs';
import { join } from 'node:path';

export const SEED = 20261130;
/** Points of the benchmark's epoch curve: the most an epoch curve may have (src/model/limits.ts). */
export const CURVE_POINTS = 1_000_000;

/** mulberry32: a small, well-known 32-bit PRNG; enough for benchmark data (common practice). */
function random(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const id = (i) => `order-${i}`;

/** Writes `header` and one line per example (in `order`, or 0..n-1) through `line(i)`. */
function writeCsv(path, header, n, order, line) {
  if (existsSync(path)) return;
  const tmp = `${path}.tmp`;
  const fd = openSync(tmp, 'w');
  let piece = `${header}\n`;
  for (let k = 0; k < n; k++) {
    piece += `${line(order === null ? k : order[k])}\n`;
    if (piece.length > 1 << 20) {
      writeSync(fd, piece);
      piece = '';
    }
  }
  writeSync(fd, piece);
  closeSync(fd);
  renameSync(tmp, path);
}

/** Per-example outcomes of two correlated classifiers (about 9.5 % and 9.0 % wrong) and losses. */
function outcomes(n, seed) {
  const next = random(seed);
  const base = new Uint8Array(n);
  const cand = new Uint8Array(n);
  const baseLoss = new Float64Array(n);
  const candLoss = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const b = next() < 0.905 ? 1 : 0;
    const c = b === 1 ? (next() < 0.97 ? 1 : 0) : next() < 0.38 ? 1 : 0;
    base[i] = b;
    cand[i] = c;
    // Cross-entropy of the predicted probability of the true class.
    baseLoss[i] = -Math.log(b === 1 ? 0.5 + 0.5 * next() : 0.5 * next() + 1e-9);
    candLoss[i] = -Math.log(c === 1 ? 0.52 + 0.48 * next() : 0.5 * next() + 1e-9);
  }
  return { base, cand, baseLoss, candLoss };
}

function shuffled(n, seed) {
  const next = random(seed);
  const order = new Int32Array(n);
  for (let i = 0; i < n; i++) order[i] = i;
  for (let i = n - 1; i > 0; i--) {
    const j = Math.floor(next() * (i + 1));
    const t = order[i];
    order[i] = order[j];
    order[j] = t;
  }
  return order;
}

/**
 * A run artifact; `validation` is what its predictions reproduce (repeat 0), which fitgap checks:
 * the error rate for a 0/1 column, the mean loss for losses.
 */
function artifact(name, kind, csv, validation = null, extra = {}) {
  const proportion = kind === 'proportion';
  const v = validation ?? (proportion ? 0.095 : 0.3);
  return {
    format: 'fitgap-run/1',
    run: { name, commit: 'b3e51a0', createdAt: '2026-11-30T10:00:00Z' },
    metric: proportion
      ? { name: 'late_delivery_error', goal: 'minimize', kind }
      : { name: 'log_loss', goal: 'minimize', kind },
    reference: proportion ? 0.02 : 0.05,
    // One repeat: then the paired test on the predictions decides the validation change, the
    // same test the peer runs (with repeats, their spread decides).
    splits: {
      train: { examples: 4000000, values: [proportion ? 0.061 : 0.2] },
      train_dev: { examples: 200000, values: [proportion ? 0.07 : 0.23] },
      validation: { examples: 1000000, values: [round6(v)] },
    },
    hyperparameters: { lambda: 0.01, features: 48, epochs: 40 },
    ...(csv === null ? {} : { predictions: { split: 'validation', path: csv } }),
    ...extra,
  };
}

/** Written on every run (small files): their values follow the generator. */
function writeJson(path, value) {
  writeFileSync(path, `${JSON.stringify(value)}\n`);
}

/** What an artifact states for its predictions: the error rate (0/1), or the mean loss. */
function rate(values) {
  let sum = 0;
  for (let i = 0; i < values.length; i++) sum += values[i];
  return sum / values.length;
}
const round6 = (x) => Math.round(x * 1e6) / 1e6;

/** Standard normal deviate (Box–Muller) from a uniform generator (common practice). */
function gaussian(next) {
  const u = 1 - next(); // (0, 1]: log(u) stays finite
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * next());
}

/**
 * A log loss logged once per training step, n steps (binary cross-entropy, so it starts near
 * ln 2 ≈ 0.69, a coin flip): the training loss falls as a power law with mini-batch noise; the
 * validation loss (the same model on the held-out split, with slowly wandering evaluation noise)
 * follows it down and starts to rise at 45 % of the run as the model overfits. With the bench's
 * seed its minimum is 0.165 at step 427,798 and it ends at 0.262, so early stopping has a point to
 * find. Values carry six significant digits, as a logger prints them.
 */
function epochCurve(n, seed) {
  const next = random(seed);
  const points = new Array(n);
  const digits = (v) => Number(v.toPrecision(6));
  let drift = 0;
  for (let i = 0; i < n; i++) {
    const t = (i + 1) / n;
    const fall = 0.55 * (1 + 400 * t) ** -0.55;
    const train = 0.14 + fall - 0.03 * t;
    // Overfitting: a quadratic rise after 45 % of the run.
    const over = t > 0.45 ? 0.06 * ((t - 0.45) / 0.55) ** 2 : 0;
    // Slowly wandering evaluation noise (AR(1)) plus a little white noise.
    drift = 0.999 * drift + 0.0004 * gaussian(next);
    points[i] = {
      x: i + 1,
      train: digits(train * (1 + 0.08 * gaussian(next))),
      validation: digits(0.17 + fall + over + drift + 0.002 * gaussian(next)),
    };
  }
  return points;
}

export function generate(dir, sizes) {
  mkdirSync(dir, { recursive: true });
  writeJson(join(dir, 'tiny-baseline.json'), artifact('eta-baseline', 'proportion', null));
  writeJson(join(dir, 'tiny-candidate.json'), artifact('eta-dropout', 'proportion', null));
  // The baseline of the curve workload: same metric (log loss), no curve.
  writeJson(join(dir, 'tiny-baseline-loss.json'), artifact('eta-baseline', 'continuous', null));
  for (const size of sizes) {
    const n = size === '10m' ? 10_000_000 : 1_000_000;
    // Same seed, same outcomes: computed on every run for the artifacts' values, written once.
    const o = outcomes(n, SEED + n);
    writeCsv(join(dir, `base-${size}.csv`), 'id,correct', n, null, (i) => `${id(i)},${o.base[i]}`);
    writeCsv(join(dir, `cand-${size}.csv`), 'id,correct', n, null, (i) => `${id(i)},${o.cand[i]}`);
    if (!existsSync(join(dir, `cand-${size}-shuffled.csv`)))
      writeCsv(
        join(dir, `cand-${size}-shuffled.csv`),
        'id,correct',
        n,
        shuffled(n, SEED + 1),
        (i) => `${id(i)},${o.cand[i]}`,
      );
    const wrong = (correct) => 1 - rate(correct);
    writeJson(
      join(dir, `baseline-${size}.json`),
      artifact('eta-baseline', 'proportion', `base-${size}.csv`, wrong(o.base)),
    );
    writeJson(
      join(dir, `candidate-${size}.json`),
      artifact('eta-dropout', 'proportion', `cand-${size}.csv`, wrong(o.cand)),
    );
    writeJson(
      join(dir, `candidate-${size}-shuffled.json`),
      artifact('eta-dropout', 'proportion', `cand-${size}-shuffled.csv`, wrong(o.cand)),
    );
    if (size === '1m') {
      writeCsv(
        join(dir, `base-${size}-loss.csv`),
        'id,loss',
        n,
        null,
        (i) => `${id(i)},${o.baseLoss[i]}`,
      );
      writeCsv(
        join(dir, `cand-${size}-loss.csv`),
        'id,loss',
        n,
        null,
        (i) => `${id(i)},${o.candLoss[i]}`,
      );
      writeJson(
        join(dir, 'baseline-1m-loss.json'),
        artifact('eta-baseline', 'continuous', 'base-1m-loss.csv', rate(o.baseLoss)),
      );
      writeJson(
        join(dir, 'candidate-1m-loss.json'),
        artifact('eta-dropout', 'continuous', 'cand-1m-loss.csv', rate(o.candLoss)),
      );
      // The longest epoch curve an artifact may hold (MAX_EPOCH_POINTS in src/model/limits.ts);
      // about 50 MB, so the bench reads it with --max-artifact-mb. Written once (it takes seconds).
      const curve = join(dir, 'candidate-epochs-1m.json');
      if (!existsSync(curve)) {
        writeJson(
          `${curve}.tmp`,
          artifact('eta-dropout', 'continuous', null, null, {
            curves: { epochs: epochCurve(CURVE_POINTS, SEED + 2) },
          }),
        );
        renameSync(`${curve}.tmp`, curve);
      }
    }
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const [dir, ...sizes] = process.argv.slice(2);
  if (dir === undefined) throw new Error('usage: node bench/generate.mjs DIR [1m] [10m]');
  generate(dir, sizes.length > 0 ? sizes : ['1m']);
}
