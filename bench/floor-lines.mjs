// The floor of a paired review: read both files (1 MiB reads) and look at every byte once,
// counting lines. Any reader of the rows does at least this. `node bench/floor-lines.mjs FILE…`
import { Buffer } from 'node:buffer';
import { open } from 'node:fs/promises';

const buf = Buffer.allocUnsafe(1 << 20);
let lines = 0;
for (const path of process.argv.slice(2)) {
  const handle = await open(path, 'r');
  for (;;) {
    const { bytesRead } = await handle.read(buf, 0, buf.length, null);
    if (bytesRead === 0) break;
    for (let i = 0; i < bytesRead; i++) if (buf[i] === 10) lines++;
  }
  await handle.close();
}
process.stdout.write(`${lines}\n`);
