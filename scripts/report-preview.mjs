// Renders the report fixtures (demo scenarios and the hostile one) to test-output/report/ as
// markdown, text and JSON, and prints their sizes: `node scripts/report-preview.mjs`.
import { build } from 'esbuild';
import { mkdirSync, writeFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';

const entry = `
import { renderMarkdown, renderText, renderJson } from './src/report/index.ts';
import { bakeryReview } from './test/fixtures/report/bakery.ts';
import { deliveryReview } from './test/fixtures/report/delivery.ts';
import { minimalReview } from './test/fixtures/report/minimal.ts';
import { hostileReview } from './test/fixtures/report/hostile.ts';
export const fixtures = { bakery: bakeryReview(), delivery: deliveryReview(), minimal: minimalReview(), hostile: hostileReview() };
export { renderMarkdown, renderText, renderJson };
`;
mkdirSync('test-output/report', { recursive: true });
await build({
  stdin: { contents: entry, resolveDir: process.cwd(), loader: 'ts' },
  bundle: true,
  platform: 'node',
  format: 'esm',
  outfile: 'test-output/report/preview.mjs',
  logLevel: 'warning',
});
const m = await import(pathToFileURL('test-output/report/preview.mjs').href);
for (const [name, review] of Object.entries(m.fixtures)) {
  const md = m.renderMarkdown(review, { commentKey: 'demo', headSha: 'b71c9e3' });
  const text = m.renderText(review, { color: false });
  const json = m.renderJson(review);
  writeFileSync(`test-output/report/${name}.md`, md);
  writeFileSync(`test-output/report/${name}.txt`, text);
  writeFileSync(`test-output/report/${name}.json`, json);
  console.log(
    `${name}: markdown ${md.length} chars, text ${text.length} chars, json ${json.length} chars`,
  );
}
