// Generates the README's hyperparameter vocabulary tables from src/analysis/levers/vocabulary.ts,
// between
//   <!-- hyperparameter-vocabulary:start --> … <!-- hyperparameter-vocabulary:end -->
// Usage: node scripts/vocabulary-table.mjs            print the tables
//        node scripts/vocabulary-table.mjs --write F  replace the marked block in F
//        node scripts/vocabulary-table.mjs --check F  exit 1 when the block in F is stale
import { readFileSync, writeFileSync } from 'node:fs';
import { Buffer } from 'node:buffer';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';

const START = '<!-- hyperparameter-vocabulary:start -->';
const END = '<!-- hyperparameter-vocabulary:end -->';

/** The TypeScript table, bundled in memory (no build step, no dist/ dependency). */
async function loadVocabulary() {
  const entry = fileURLToPath(new URL('../src/analysis/levers/vocabulary.ts', import.meta.url));
  const out = await build({
    entryPoints: [entry],
    bundle: true,
    write: false,
    format: 'esm',
    platform: 'node',
    logLevel: 'warning',
  });
  const code = out.outputFiles[0].text;
  return import(`data:text/javascript;base64,${Buffer.from(code).toString('base64')}`);
}

const cell = (text) => String(text).replace(/\s+/g, ' ').trim().replace(/\|/g, '\\|');
const names = (list) => list.map((n) => `\`${n}\``).join(', ');

const HIGHER = {
  regularization: ['stronger regularization', 'weaker regularization'],
  capacity: ['more capacity', 'less capacity'],
  features: ['more features', 'fewer features'],
  'polynomial-degree': ['richer features', 'poorer features'],
  'data-size': ['more data', 'less data'],
  epochs: ['longer training', 'shorter training'],
  'early-stopping-patience': ['stops later', 'stops earlier'],
  'learning-rate': ['larger steps', 'smaller steps'],
};

function direction(group) {
  const words = HIGHER[group.role];
  if (words === undefined) return '—';
  return group.inverse ? `higher = ${words[1]} (inverse)` : `higher = ${words[0]}`;
}

const VALUES = {
  count: 'integer',
  'count-or-fraction': 'integer, or a fraction in (0, 1)',
  fraction: 'fraction in [0, 1]',
  'non-negative': 'real ≥ 0',
  positive: 'real > 0',
  units: 'integer, or an array of layer sizes (total units)',
};
const UNLIMITED = {
  null: 'null = no limit',
  'null-or-non-positive': 'null or ≤ 0 = no limit',
};

function values(group) {
  if (group.role === 'inert') return '—';
  const scale = group.scale === 'log' ? 'log scale' : 'linear scale';
  const limit = group.unlimited === undefined ? '' : `; ${UNLIMITED[group.unlimited]}`;
  return `${VALUES[group.domain]}, ${scale}${limit}`;
}

export function tables({ VOCABULARY, AMBIGUOUS }) {
  const rows = VOCABULARY.map(
    (g) =>
      `| ${names(g.names)} | ${g.role} | ${direction(g)} | ${cell(values(g))} | ${cell(g.source)}${g.caveat === undefined ? '' : `. Note: ${cell(g.caveat)}`} |`,
  );
  const ambiguous = AMBIGUOUS.map(
    (g) => `| ${names(g.names)} | ${g.readings.map(cell).join('; ')} | ${cell(g.source)} |`,
  );
  return [
    START,
    'Names match case-insensitively, with `-` and `_` alike and camelCase read as snake_case',
    '(`learningRate` = `learning_rate`); a path such as `model.C`, `optimizer/lr` or a pipeline’s',
    '`clf__C` is looked up whole, then by its last segment. A `hyperparameters` map in the config',
    'overrides any row and maps names fitgap does not know.',
    '',
    '| names | role | direction | values | source |',
    '|---|---|---|---|---|',
    ...rows,
    '',
    'Ambiguous names have no role until the config maps one:',
    '',
    '| names | readings | source |',
    '|---|---|---|',
    ...ambiguous,
    END,
  ].join('\n');
}

function replaceBlock(text, block) {
  const start = text.indexOf(START);
  const end = text.indexOf(END);
  if (start < 0 || end < start) return null;
  return text.slice(0, start) + block + text.slice(end + END.length);
}

const [mode, file] = process.argv.slice(2);
const block = tables(await loadVocabulary());
if (mode === undefined) {
  process.stdout.write(`${block}\n`);
} else if ((mode === '--write' || mode === '--check') && file !== undefined) {
  const text = readFileSync(file, 'utf8');
  const next = replaceBlock(text, block);
  if (next === null) {
    process.stderr.write(`${file}: no ${START} … ${END} block to fill.\n`);
    process.exit(2);
  }
  if (mode === '--write') writeFileSync(file, next);
  else if (next !== text) {
    process.stderr.write(
      `${file}: the hyperparameter vocabulary table is stale; run node scripts/vocabulary-table.mjs --write ${file}\n`,
    );
    process.exit(1);
  }
} else {
  process.stderr.write('usage: vocabulary-table.mjs [--write FILE | --check FILE]\n');
  process.exit(2);
}
