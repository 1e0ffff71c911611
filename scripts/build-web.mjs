// Builds the browser workbench (web/) into dist/web with Vite. Always builds: it takes seconds.
// `node scripts/build-web.mjs` or `import { buildWeb } from './build-web.mjs'`.
import { execFileSync } from 'node:child_process';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { root } from './ensure-install.mjs';

export const webOut = join(root, 'dist', 'web');

export function buildWeb() {
  const started = performance.now();
  execFileSync(join(root, 'node_modules', '.bin', 'vite'), ['build', '--logLevel', 'warn'], { cwd: root, stdio: 'inherit' });
  console.error(`driftgrid: built the workbench into dist/web in ${((performance.now() - started) / 1000).toFixed(1)} s`);
  return webOut;
}

if (process.argv[1] === fileURLToPath(import.meta.url)) buildWeb();
