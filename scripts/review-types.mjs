// Generates src/model/review.generated.ts, the TypeScript types of the `fitgap-review/1` report,
// from schema/fitgap-review-1.schema.json (the one source of truth). `--check` exits 1 when the
// committed file is stale instead of writing it.
import { readFile, writeFile } from 'node:fs/promises';
import { compile } from 'json-schema-to-typescript';
import prettier from 'prettier';

const SCHEMA = 'schema/fitgap-review-1.schema.json';
const TARGET = 'src/model/review.generated.ts';

export async function reviewTypes() {
  const schema = JSON.parse(await readFile(SCHEMA, 'utf8'));
  const body = await compile(schema, 'Review', {
    bannerComment: `/* Generated from ${SCHEMA} by scripts/review-types.mjs: do not edit; run \`npm run schema:types\`. */`,
    additionalProperties: false,
    format: false,
  });
  const options = (await prettier.resolveConfig(TARGET)) ?? {};
  return prettier.format(body, { ...options, filepath: TARGET });
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const text = await reviewTypes();
  if (process.argv.includes('--check')) {
    const current = await readFile(TARGET, 'utf8').catch(() => '');
    if (current !== text) {
      console.error(`${TARGET} is stale: run npm run schema:types`);
      process.exit(1);
    }
  } else await writeFile(TARGET, text);
}
