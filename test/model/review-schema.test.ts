/**
 * The review schema is the one source of truth of the review model: the TypeScript types are
 * generated from it (and must not be stale), and the JSON report of every demo and every report
 * fixture validates against it.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildReview } from '../../src/analysis/review.js';
import { reviewFiles } from '../../src/io/review-from-files.js';
import { renderJson } from '../../src/report/json.js';
import { isReview, reviewIssues, reviewValidator } from '../../src/validate/review.js';
import { bakeryArtifacts } from '../fixtures/report/artifacts.js';
import { bakeryReview } from '../fixtures/report/bakery.js';
import { deliveryReview } from '../fixtures/report/delivery.js';
import { hostileReview } from '../fixtures/report/hostile.js';
import { minimalReview } from '../fixtures/report/minimal.js';
import { expectValidReport } from '../report/valid-review.js';
// @ts-expect-error -- a plain ESM build script without type declarations
import { reviewTypes } from '../../scripts/review-types.mjs';

const root = join(import.meta.dirname, '../..');

describe('schema/fitgap-review-1.schema.json', () => {
  it('is draft 2020-12 and published beside the run schema', () => {
    const schema = JSON.parse(
      readFileSync(join(root, 'schema/fitgap-review-1.schema.json'), 'utf8'),
    ) as Record<string, unknown>;
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    expect(schema.$id).toBe('https://fitgap.dev/schema/fitgap-review-1.schema.json');
    const pkg = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { files: string[] };
    expect(pkg.files).toContain('schema');
  });

  it('generates src/model/review.generated.ts exactly as committed (run npm run schema:types)', async () => {
    const generated = (await (reviewTypes as () => Promise<string>)()) as string;
    expect(generated).toBe(readFileSync(join(root, 'src/model/review.generated.ts'), 'utf8'));
  });

  it('is compiled once', () => {
    expect(reviewValidator()).toBe(reviewValidator());
  });
});

describe('the JSON report validates against the schema', () => {
  it.each(['1-interactions', '2-lambda-3', '3-more-data'])('demo %s', async (name) => {
    const { review } = await reviewFiles({
      baseline: 'demo/baseline.json',
      candidate: `demo/${name}.json`,
      config: 'demo/fitgap.yml',
      cwd: root,
    });
    expectValidReport(review);
  });

  it.each([
    ['bakery', bakeryReview],
    ['delivery', deliveryReview],
    ['minimal', minimalReview],
  ])('report fixture %s', (_, make) => {
    expectValidReport(make());
  });

  it('the bakery artifacts reviewed by the analysis', () => {
    const { baseline, candidate } = bakeryArtifacts();
    expectValidReport(
      buildReview({
        baseline,
        candidate,
        settings: { alpha: 0.05, minEffect: 0.1, gapTolerance: 0.1, failOn: ['worse-validation'] },
      }),
    );
  });

  it('refuses a report with text where a code belongs, naming the pointers', () => {
    const doc = JSON.parse(renderJson(hostileReview(3))) as unknown;
    expect(isReview(doc)).toBe(false);
    const pointers = reviewIssues(doc, 'review.json').map((i) => i.pointer);
    expect(pointers).toEqual(expect.arrayContaining(['/movement', '/gate/failOn/1']));
  });

  it('refuses a sentence where a lever had evidence before', () => {
    const doc = JSON.parse(renderJson(bakeryReview())) as { levers: { evidence: unknown[] }[] };
    doc.levers[0]!.evidence = ['Validation error was lowest at epoch 31.'];
    expect(reviewIssues(doc, 'review.json').map((i) => i.pointer)).toContain(
      '/levers/0/evidence/0',
    );
  });
});
