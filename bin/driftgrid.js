#!/usr/bin/env node
// Launcher for the `driftgrid` command; the bundle is built by `npm install` (prepare script).
import { existsSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { dirname, join } from 'node:path';

const bundle = join(dirname(fileURLToPath(import.meta.url)), '..', 'dist', 'driftgrid.mjs');
if (!existsSync(bundle)) {
  console.error('driftgrid: the command is not built yet; run `npm install` (or `node scripts/build-cli.mjs`) first.');
  process.exit(1);
}
const { main } = await import(pathToFileURL(bundle).href);
process.exitCode = await main(process.argv.slice(2));
