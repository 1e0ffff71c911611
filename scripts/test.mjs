// `npm test`: install what is missing, type-check, run the unit tests, then build the workbench
// and run the browser tests (headless Chromium), and end with one plain "N passed, N failed" line
// summing both runs (what CI reads).
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { buildWeb } from './build-web.mjs';
import { ensureChromium } from './ensure-chromium.mjs';
import { ensureInstall, root, run } from './ensure-install.mjs';

ensureInstall();
run('npx tsc -p tsconfig.core.json');
run('npx tsc -p tsconfig.json');


/** Runs Vitest with a JSON report; returns [passed, failed]. A run that reports nothing counts as one failure. */
function vitest(label, args, report, env = {}, before = () => {}) {
  rmSync(report, { force: true });
  let crashed = false;
  try {
    before();
    run(`npx vitest run ${args} --reporter=default --reporter=json --outputFile.json=${report}`, env);
  } catch (error) {
    crashed = true;
    if (!existsSync(report)) console.error(`driftgrid: ${label} could not run: ${error.message.split('\n')[0]}`);
  }
  if (!existsSync(report)) return [0, 1];
  const summary = JSON.parse(readFileSync(report, 'utf8'));
  // A file that failed outside its tests (it did not load, a hook threw) counts as one failure;
  // so does a non-zero exit with nothing failed (an unhandled error).
  const fileFailures = summary.testResults.filter((file) => file.status === 'failed' && !file.assertionResults.some((t) => t.status === 'failed')).length;
  const failed = summary.numFailedTests + fileFailures;
  return [summary.numPassedTests, failed + (crashed && failed === 0 ? 1 : 0)];
}

const unit = vitest('the unit tests', '', join(root, 'test-artifacts', 'vitest.json'));
const started = performance.now();
const e2e = vitest('the browser tests', '-c vitest.e2e.config.ts', join(root, 'test-artifacts', 'e2e.json'), { E2E_SKIP_BUILD: '1' }, () => {
  ensureChromium();
  buildWeb();
});
console.error(`driftgrid: browser tests (build included) took ${((performance.now() - started) / 1000).toFixed(0)} s`);

const passed = unit[0] + e2e[0];
const failed = unit[1] + e2e[1];
console.log(`${passed} passed, ${failed} failed`);
if (failed > 0 || passed === 0) process.exit(1);
