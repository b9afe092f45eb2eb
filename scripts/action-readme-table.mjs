// Generates the README's tables of the action's inputs and outputs from action.yml, between
//   <!-- action-inputs:start --> … <!-- action-inputs:end -->
// Usage: node scripts/action-readme-table.mjs            print the tables
//        node scripts/action-readme-table.mjs --write F  replace the marked block in F
//        node scripts/action-readme-table.mjs --check F  exit 1 when the block in F is stale
import { readFileSync, writeFileSync } from 'node:fs';
import { parse } from 'yaml';

const START = '<!-- action-inputs:start -->';
const END = '<!-- action-inputs:end -->';

const cell = (text) => String(text).replace(/\s+/g, ' ').trim().replace(/\|/g, '\\|');

export function tables(actionYmlText) {
  const action = parse(actionYmlText);
  const inputs = Object.entries(action.inputs).map(
    ([name, spec]) =>
      `| \`${name}\` | ${spec.default === undefined ? '' : `\`${cell(spec.default)}\``} | ${cell(spec.description)} |`,
  );
  const outputs = Object.entries(action.outputs).map(
    ([name, spec]) => `| \`${name}\` | ${cell(spec.description)} |`,
  );
  return [
    START,
    '| input | default | meaning |',
    '|---|---|---|',
    ...inputs,
    '',
    '| output | meaning |',
    '|---|---|',
    ...outputs,
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
const block = tables(readFileSync(new URL('../action.yml', import.meta.url), 'utf8'));
if (mode === undefined) {
  process.stdout.write(`${block}\n`);
} else if (mode === '--write' || mode === '--check') {
  const text = readFileSync(file, 'utf8');
  const next = replaceBlock(text, block);
  if (next === null) {
    process.stderr.write(`${file}: no ${START} … ${END} block to fill.\n`);
    process.exit(2);
  }
  if (mode === '--write') writeFileSync(file, next);
  else if (next !== text) {
    process.stderr.write(
      `${file}: the action's inputs table is stale; run node scripts/action-readme-table.mjs --write ${file}\n`,
    );
    process.exit(1);
  }
} else {
  process.stderr.write('usage: action-readme-table.mjs [--write FILE | --check FILE]\n');
  process.exit(2);
}
