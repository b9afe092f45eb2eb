// The floor of reviewing a large curve: read the artifact and JSON.parse it.
// `node bench/floor-json.mjs FILE`
import { readFileSync } from 'node:fs';

const doc = JSON.parse(readFileSync(process.argv[2] ?? '', 'utf8'));
process.stdout.write(`${Object.keys(doc).length}\n`);
