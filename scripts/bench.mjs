// `npm run bench`: runs every test/bench/*.bench.ts (or those named on the command line) in turn.
// Each prints its own figures and the ratio against its reference implementation.
import { readdirSync } from 'node:fs';
import { ensureInstall, run } from './ensure-install.mjs';

ensureInstall();
run('node scripts/build-cli.mjs');
const wanted = process.argv.slice(2);
const benches = readdirSync('test/bench')
  .filter((name) => name.endsWith('.bench.ts'))
  .filter((name) => wanted.length === 0 || wanted.some((w) => name.includes(w)))
  .sort();
for (const name of benches) {
  console.log(`\n## ${name}`);
  run(`npx tsx test/bench/run-one.ts test/bench/${name}`);
}
