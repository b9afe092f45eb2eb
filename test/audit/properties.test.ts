/**
 * Properties (fast-check) of the audit's small parsers: a file an artifact names never leaves the
 * artifact's folder; a typed path never leaves the repository; the canonical JSON of a value
 * round-trips and does not depend on key order; a range parses into its two ends or is refused.
 */
import fc from 'fast-check';
import { posix } from 'node:path';
import { describe, expect, it } from 'vitest';
import { repositoryPath, resolveRange } from '../../src/io/audit-git.js';
import { besideArtifact } from '../../src/io/audit-side.js';
import { UsageError } from '../../src/model/errors.js';
import { canonicalJson } from '../../src/report/audit-record.js';

const segment = fc.constantFrom('..', '.', '', 'a', 'b.csv', 'runs', '..a', 'a..', '\\', '/');
const pathLike = fc.array(segment, { maxLength: 6 }).map((parts) => parts.join('/'));

describe('paths', () => {
  it('besideArtifact: null, or a normalized path inside the artifact folder', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('runs/model.json', 'model.json', 'a/b/run.json'),
        pathLike,
        (artifact, name) => {
          const out = besideArtifact(artifact, name);
          if (out === null) return;
          const folder = posix.dirname(artifact);
          expect(out).toBe(posix.normalize(out));
          expect(out.split('/')).not.toContain('..');
          if (folder !== '.') expect(out.startsWith(`${folder}/`)).toBe(true);
          expect(out).not.toBe(folder);
        },
      ),
    );
  });

  it('repositoryPath: null, or a relative path without ".." segments', () => {
    fc.assert(
      fc.property(fc.constantFrom('', 'sub/', 'a/b/'), pathLike, (prefix, typed) => {
        const out = repositoryPath(prefix, typed);
        if (out === null) return;
        expect(posix.isAbsolute(out)).toBe(false);
        expect(out.split('/')).not.toContain('..');
      }),
    );
  });
});

describe('canonical JSON', () => {
  it('round-trips JSON values and ignores key order', () => {
    fc.assert(
      fc.property(fc.jsonValue(), (value) => {
        const text = canonicalJson(value);
        expect(JSON.parse(text)).toEqual(JSON.parse(JSON.stringify(value)));
        const reordered = JSON.parse(JSON.stringify(value), (_k, v: unknown) =>
          v !== null && typeof v === 'object' && !Array.isArray(v)
            ? Object.fromEntries(Object.entries(v).reverse())
            : v,
        ) as unknown;
        expect(canonicalJson(reordered)).toBe(text);
      }),
    );
  });
});

describe('ranges', () => {
  it('A..B is split at its two dots; anything else is a usage error before git runs', async () => {
    const seen: string[][] = [];
    const git = async (args: readonly string[]) => {
      seen.push([...args]);
      return Buffer.from(`${'f'.repeat(40)}\n`);
    };
    await fc.assert(
      fc.asyncProperty(fc.string({ maxLength: 12 }), async (text) => {
        seen.length = 0;
        const result = await resolveRange(git, text).catch((e: unknown) => e);
        if (result instanceof UsageError) {
          expect(seen).toEqual([]);
          return;
        }
        const [a, b] = seen.map((args) => args[args.length - 1]);
        expect(`${a?.replace(/\^\{commit\}$/, '')}..${b?.replace(/\^\{commit\}$/, '')}`).toBe(text);
        for (const args of seen) expect(args).toContain('--end-of-options');
      }),
    );
  });
});
