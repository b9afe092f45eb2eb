import { readFileSync } from 'node:fs';
import { expect, test } from 'vitest';

test('the README shows examples/pr-review.yml verbatim', () => {
  const readme = readFileSync('README.md', 'utf8');
  const example = readFileSync('examples/pr-review.yml', 'utf8');
  expect(readme).toContain(`\`\`\`yaml\n${example}\`\`\``);
});
