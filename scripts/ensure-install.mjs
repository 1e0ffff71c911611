// Installs the npm packages when node_modules is missing or older than the lock file.
// Uses only Node built-ins, because it runs before anything is installed.
import { execSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dirname, join } from 'node:path';

export const root = join(dirname(fileURLToPath(import.meta.url)), '..');

export function ensureInstall() {
  const marker = join(root, 'node_modules', '.package-lock.json');
  const lock = join(root, 'package-lock.json');
  const stale = !existsSync(marker) || (existsSync(lock) && statSync(lock).mtimeMs > statSync(marker).mtimeMs + 1000);
  if (stale) {
    console.error('driftgrid: installing npm packages (first run)…');
    execSync(existsSync(lock) ? 'npm ci --no-audit --no-fund' : 'npm install --no-audit --no-fund', { cwd: root, stdio: 'inherit' });
  } else if (!existsSync(join(root, 'dist', 'driftgrid.mjs'))) {
    run('node scripts/build-cli.mjs');
  }
}

export function run(command, env = {}) {
  execSync(command, { cwd: root, stdio: 'inherit', env: { ...process.env, ...env } });
}
