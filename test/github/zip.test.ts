import { strToU8, zipSync } from 'fflate';
import { describe, expect, test } from 'vitest';
import { pickRunFiles } from '../../src/io/github/artifacts.js';
import { InputError } from '../../src/model/errors.js';
import { listEntries, readEntry, unsafeName } from '../../src/io/github/zip.js';

const RUN = JSON.stringify({
  format: 'fitgap-run/1',
  predictions: { split: 'validation', path: 'preds/validation.csv' },
});
const label = 'artifact "base"';

function message(fn: () => unknown): string {
  try {
    fn();
  } catch (error) {
    expect(error).toBeInstanceOf(InputError);
    return (error as Error).message;
  }
  throw new Error('expected a refusal');
}

describe('unsafeName', () => {
  test.each([
    ['run.json', null],
    ['a/b/run.json', null],
    ['a/..b/run.json', null],
    ['../run.json', "a '..' path segment"],
    ['a/../../run.json', "a '..' path segment"],
    ['a\\..\\run.json', "a '..' path segment"],
    ['/etc/passwd', 'an absolute path'],
    ['\\\\server\\share', 'an absolute path'],
    ['C:/x.json', 'an absolute path'],
    ['', 'an empty or NUL-containing name'],
    ['a\0.json', 'an empty or NUL-containing name'],
  ])('%j → %s', (name, expected) => {
    expect(unsafeName(name)).toBe(expected);
  });
});

describe('listEntries', () => {
  test('reads names, sizes and methods from the central directory', () => {
    const zip = zipSync({
      'run.json': strToU8(RUN),
      'dir/': new Uint8Array(0),
      'stored.txt': [strToU8('abc'), { level: 0 }],
    });
    const entries = listEntries(zip, label);
    expect(entries.map((e) => [e.name, e.size, e.method, e.directory])).toEqual([
      ['run.json', RUN.length, 8, false],
      ['dir/', 0, 8, true], // fflate deflates even an empty directory entry
      ['stored.txt', 3, 0, false],
    ]);
  });

  test('refuses a symbolic link (Unix mode 0o120000 in the external attributes)', () => {
    const zip = zipSync({
      'run.json': strToU8(RUN),
      link: [strToU8('/etc/passwd'), { os: 3, attrs: (0o120777 << 16) >>> 0 }],
    });
    expect(message(() => listEntries(zip, label))).toBe(
      'artifact "base" must not contain symbolic links (got "link"). The archive was refused as a whole.',
    );
  });

  test('a regular Unix file with the same attribute layout passes', () => {
    const zip = zipSync({ 'run.json': [strToU8(RUN), { os: 3, attrs: (0o100644 << 16) >>> 0 }] });
    expect(listEntries(zip, label)).toHaveLength(1);
  });

  test('refuses bytes that are not a zip', () => {
    expect(message(() => listEntries(strToU8('not a zip at all, just text'), label))).toContain(
      'must be a zip archive',
    );
  });
});

describe('readEntry', () => {
  test('inflates within the budget and spends it', () => {
    const zip = zipSync({ 'run.json': strToU8(RUN) });
    const [entry] = listEntries(zip, label);
    const budget = { remaining: 10_000, limit: 10_000 };
    expect(new TextDecoder().decode(readEntry(zip, entry!, budget, label))).toBe(RUN);
    expect(budget.remaining).toBe(10_000 - RUN.length);
  });

  test('stops while inflating once the budget is spent, whatever the directory declares', () => {
    const big = new Uint8Array(5_000_000).fill(32);
    const zip = zipSync({ 'bomb.json': big });
    const [entry] = listEntries(zip, label);
    expect(zip.length).toBeLessThan(10_000);
    const lying = { ...entry!, size: 10 };
    expect(
      message(() => readEntry(zip, lying, { remaining: 100_000, limit: 100_000 }, label)),
    ).toContain('must inflate to at most 100000 bytes (got more while inflating "bomb.json")');
  });

  test('refuses an entry whose inflated size differs from its declared size', () => {
    const zip = zipSync({ 'run.json': strToU8(RUN) });
    const [entry] = listEntries(zip, label);
    expect(
      message(() => readEntry(zip, { ...entry!, size: 3 }, { remaining: 1e6, limit: 1e6 }, label)),
    ).toContain(`must hold 3 bytes in "run.json" as its directory says (got ${RUN.length})`);
  });
});

describe('corrupt archives', () => {
  test('a corrupt deflate stream is refused with the archive and the entry named', () => {
    const zip = zipSync({ 'run.json': strToU8(RUN.repeat(50)) });
    const [entry] = listEntries(zip, label);
    const start = entry!.localOffset + 30 + 'run.json'.length;
    const broken = zip.slice();
    // Block type 3 (reserved) in the first deflate header: invalid data from the first byte.
    broken[start] = 0xff;
    expect(message(() => readEntry(broken, entry!, { remaining: 1e6, limit: 1e6 }, label))).toMatch(
      /^artifact "base" must hold readable data in "run\.json" \(got invalid deflate data/,
    );
  });

  test('a stored entry shorter than its directory says is refused', () => {
    const zip = zipSync({ 'run.json': [strToU8(RUN), { level: 0 }] });
    const [entry] = listEntries(zip, label);
    expect(
      message(() =>
        readEntry(
          zip.subarray(0, zip.length),
          { ...entry!, compressedSize: 5 },
          { remaining: 1e6, limit: 1e6 },
          label,
        ),
      ),
    ).toContain(
      'must hold readable data in "run.json" (got 5 stored bytes where its directory says',
    );
  });

  test('random damage never escapes as anything but a refusal', () => {
    const zip = zipSync({
      'run.json': strToU8(RUN.repeat(20)),
      'p.csv': strToU8('id,correct\n1,1\n'),
    });
    for (let seed = 0; seed < 300; seed++) {
      const broken = zip.slice();
      const at = (seed * 7919) % broken.length;
      broken[at] = (broken[at] ?? 0) ^ (1 + (seed % 255));
      try {
        for (const entry of listEntries(broken, label))
          readEntry(broken, entry, { remaining: 1e6, limit: 1e6 }, label);
      } catch (error) {
        expect(error).toBeInstanceOf(InputError);
      }
    }
  });
});

describe('pickRunFiles', () => {
  const zip = zipSync({
    'out/run.json': strToU8(RUN),
    'out/preds/validation.csv': strToU8('id,correct\n1,1\n'),
    'out/other.json': strToU8('{}'),
    'model.bin': new Uint8Array(100),
  });

  test("takes the entry with the candidate's name and the predictions it names, nothing else", () => {
    const picked = pickRunFiles(zip, { preferredName: 'run.json', limitBytes: 1e6, label });
    expect(picked.run).toBe('out/run.json');
    expect([...picked.files.keys()]).toEqual(['out/run.json', 'out/preds/validation.csv']);
  });

  test('without a name match and several JSON files, lists them', () => {
    expect(
      message(() => pickRunFiles(zip, { preferredName: 'candidate.json', limitBytes: 1e6, label })),
    ).toBe(
      'artifact "base" must hold one run artifact named "candidate.json" or exactly one .json file (got "out/run.json", "out/other.json").',
    );
  });

  test('predictions that climb out of the run folder are not extracted', () => {
    const escaping = JSON.stringify({ predictions: { split: 'validation', path: '../../x.csv' } });
    const z = zipSync({ 'run.json': strToU8(escaping), 'x.csv': strToU8('id,correct\n') });
    expect([
      ...pickRunFiles(z, { preferredName: null, limitBytes: 1e6, label }).files.keys(),
    ]).toEqual(['run.json']);
  });
});
