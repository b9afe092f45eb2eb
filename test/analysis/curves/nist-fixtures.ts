/**
 * Loader for the NIST StRD nonlinear-regression fixtures in test/fixtures/curves/. Each CSV's first
 * line names its source (NIST/ITL StRD, read in lmfit-py's copy); the second carries the model,
 * the two published starts and the certified values, which this loader parses.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export interface NistDataset {
  name: string;
  x: number[];
  y: number[];
  start1: number[];
  start2: number[];
  certified: number[];
  certifiedSd: number[];
  certifiedRss: number;
}

export function fixturePath(file: string): string {
  return fileURLToPath(new URL(`../../fixtures/curves/${file}`, import.meta.url));
}

export function loadNist(name: string): NistDataset {
  const lines = readFileSync(fixturePath(`nist-strd-${name}.csv`), 'utf8').split('\n');
  const meta = lines[1] ?? '';
  const params = [
    ...meta.matchAll(
      /b(\d)=([-+0-9.Ee]+) \(sd ([-+0-9.Ee]+)\), start1=([-+0-9.Ee]+), start2=([-+0-9.Ee]+)/g,
    ),
  ];
  const rss = /certified RSS=([-+0-9.Ee]+)/.exec(meta);
  if (params.length === 0 || !rss)
    throw new Error(`nist-strd-${name}.csv: no certified values on line 2`);
  const rows = lines.slice(3).filter((l) => l.trim() !== '');
  return {
    name,
    x: rows.map((l) => Number(l.split(',')[0])),
    y: rows.map((l) => Number(l.split(',')[1])),
    certified: params.map((m) => Number(m[2])),
    certifiedSd: params.map((m) => Number(m[3])),
    start1: params.map((m) => Number(m[4])),
    start2: params.map((m) => Number(m[5])),
    certifiedRss: Number(rss[1]),
  };
}

/** Log relative error: the number of correct significant digits (McCullough 1998, common practice). */
export function lre(estimate: number, certified: number): number {
  if (estimate === certified) return 15;
  return Math.min(15, -Math.log10(Math.abs(estimate - certified) / Math.abs(certified)));
}
