/**
 * Writes the demo scenario into assets/demo/: `npm run demo` (or `npx tsx assets/demo/generate.ts`).
 * The output is the same on every run; the files are committed and test/demo checks them.
 */
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildDemo, DEMO_FILES } from './build-demo';

const here = dirname(fileURLToPath(import.meta.url));
const files = buildDemo();
for (const name of DEMO_FILES) {
  writeFileSync(join(here, name), files[name]);
  console.log(`wrote assets/demo/${name} (${files[name].split('\n').length - 1} lines)`);
}
