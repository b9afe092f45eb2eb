// Summarises a V8 CPU profile (`node --cpu-prof`): self time per function, and inclusive time of
// the functions named on the command line. `node bench/profile-summary.mjs FILE.cpuprofile [NAME…]`
import { readFileSync } from 'node:fs';

const [file, ...names] = process.argv.slice(2);
if (file === undefined) throw new Error('usage: node bench/profile-summary.mjs FILE [NAME…]');
const profile = JSON.parse(readFileSync(file, 'utf8'));
const byId = new Map(profile.nodes.map((n) => [n.id, n]));
const parent = new Map();
for (const n of profile.nodes) for (const c of n.children ?? []) parent.set(c, n.id);

// Sample i lasts timeDeltas[i + 1] microseconds (the next delta), as DevTools counts it.
const self = new Map();
let total = 0;
for (let i = 0; i < profile.samples.length; i++) {
  const dt = profile.timeDeltas[i + 1] ?? 0;
  total += dt;
  self.set(profile.samples[i], (self.get(profile.samples[i]) ?? 0) + dt);
}

const label = (n) => {
  const f = n.callFrame;
  const where = f.url === '' ? '' : ` ${f.url.split('/').slice(-2).join('/')}:${f.lineNumber + 1}`;
  return `${f.functionName || '(anonymous)'}${where}`;
};
const selfByLabel = new Map();
for (const [id, t] of self) {
  const key = label(byId.get(id));
  selfByLabel.set(key, (selfByLabel.get(key) ?? 0) + t);
}
const pct = (t) => `${((100 * t) / total).toFixed(1).padStart(5)} %`;
console.log(`total ${(total / 1000).toFixed(0)} ms sampled`);
console.log('self time:');
for (const [key, t] of [...selfByLabel].sort((a, b) => b[1] - a[1]).slice(0, 25))
  console.log(`  ${pct(t)} ${(t / 1000).toFixed(0).padStart(6)} ms  ${key}`);

// Inclusive time: a sample counts for NAME when NAME is on its stack (once per sample).
for (const name of names) {
  let t = 0;
  for (const [id, dt] of self) {
    for (let n = id; n !== undefined; n = parent.get(n)) {
      if (byId.get(n).callFrame.functionName === name) {
        t += dt;
        break;
      }
    }
  }
  console.log(`inclusive ${pct(t)} ${(t / 1000).toFixed(0).padStart(6)} ms  ${name}`);
}
