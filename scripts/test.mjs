// `npm test`: install what is missing, type-check, run every test, and end with one plain
// "N passed, N failed" line (what CI reads).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { ensureInstall, root, run } from './ensure-install.mjs';

ensureInstall();
run('npx tsc -p tsconfig.core.json');
run('npx tsc -p tsconfig.json');
const results = join(root, 'test-artifacts', 'vitest.json');
let failed = false;
try {
  run(`npx vitest run --reporter=default --reporter=json --outputFile.json=${results}`);
} catch {
  failed = true;
}
const summary = JSON.parse(readFileSync(results, 'utf8'));
console.log(`${summary.numPassedTests} passed, ${summary.numFailedTests} failed`);
if (failed || summary.numFailedTests > 0 || summary.numPassedTests === 0) process.exit(1);
