import { readFileSync } from 'node:fs';

/** Reads a reference CSV from test/fixtures/stats (first line is a `# Source:` comment). */
function readRows(name: string): string[][] {
  const text = readFileSync(new URL(`../fixtures/stats/${name}`, import.meta.url), 'utf8');
  const lines = text.split(/\r?\n/).filter((line) => line !== '' && !line.startsWith('#'));
  return lines.slice(1).map((line) => line.split(','));
}

/** NIST AUTO83B mpg: US and Japanese cars. */
export function auto83b(): { us: number[]; japan: number[] } {
  const us: number[] = [];
  const japan: number[] = [];
  for (const [group, mpg] of readRows('nist-auto83b-mpg.csv')) {
    const value = Number(mpg);
    if (group === 'US') us.push(value);
    else if (group === 'Japan') japan.push(value);
    else throw new Error(`unexpected group ${group}`);
  }
  return { us, japan };
}

/** R `sleep`: extra hours of sleep for the same 10 patients (ID order) under drug 1 and drug 2. */
export function sleep(): { group1: number[]; group2: number[] } {
  const group1: number[] = [];
  const group2: number[] = [];
  for (const [, group, extra] of readRows('r-sleep-student1908.csv')) {
    (group === '1' ? group1 : group2).push(Number(extra));
  }
  return { group1, group2 };
}
