// Once per e2e run: make sure Chromium is there and the workbench is built (the build is skipped
// when E2E_SKIP_BUILD=1 and dist/web exists, as after `npm test`'s own build). The test files run
// in processes started afterwards, which inherit E2E_SKIP_BUILD=1 and so do not build again.
import { ensureChromium } from '../../scripts/ensure-chromium.mjs';
import { ensureWebBuilt } from './harness';

export default async function setup(): Promise<void> {
  ensureChromium();
  await ensureWebBuilt();
  process.env.E2E_SKIP_BUILD = '1';
}
