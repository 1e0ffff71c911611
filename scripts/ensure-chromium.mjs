// Makes sure a headless-capable Chromium exists for the browser tests and benchmarks: Debian's
// `chromium` package at /usr/bin/chromium, installed with apt-get when missing.
// Uses only Node built-ins.
import { execSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export const CHROMIUM_PATH = '/usr/bin/chromium';

/** Path of the Chromium executable; installs it with apt-get when it is missing. */
export function ensureChromium() {
  if (existsSync(CHROMIUM_PATH)) return CHROMIUM_PATH;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  const sudo = isRoot ? '' : 'sudo ';
  console.error(`driftgrid: ${CHROMIUM_PATH} is missing; installing it with "${sudo}apt-get install -y chromium" (about 30 s)…`);
  const install = () => execSync(`${sudo}apt-get install -y chromium`, { stdio: ['ignore', 'ignore', 'pipe'], env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  try {
    try {
      install();
    } catch (error) {
      // A fresh machine often has no package lists yet ("Unable to locate package chromium").
      const message = String(error?.stderr ?? '');
      if (!/unable to locate package|has no installation candidate/i.test(message)) throw error;
      execSync(`${sudo}apt-get update`, { stdio: ['ignore', 'ignore', 'pipe'] });
      install();
    }
  } catch (error) {
    const detail = String(error?.stderr ?? error?.message ?? error).trim().split('\n').slice(-3).join('\n');
    throw new Error(
      `Cannot install Chromium for the browser tests (${sudo}apt-get install -y chromium failed). ` +
        `Install the Debian package "chromium" by hand so that ${CHROMIUM_PATH} exists, then rerun.\n${detail}`,
    );
  }
  if (!existsSync(CHROMIUM_PATH)) throw new Error(`apt-get installed chromium, but ${CHROMIUM_PATH} still does not exist.`);
  return CHROMIUM_PATH;
}
