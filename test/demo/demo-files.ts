// Reading the committed demo files for the tests: plain splitting, no project code, so the
// checks do not lean on the reader they may one day be used to test.
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const DEMO_DIR = join(dirname(fileURLToPath(import.meta.url)), '..', '..', 'assets', 'demo');

export function demoText(name: string): string {
  return readFileSync(join(DEMO_DIR, name), 'utf8');
}

/** Header names and the records as arrays of fields (the clean files hold no quotes). */
export function demoCsv(name: string): { header: string[]; rows: string[][] } {
  const lines = demoText(name).split('\n');
  if (lines.pop() !== '') throw new Error(`${name} should end with a newline.`);
  return { header: lines[0].split(','), rows: lines.slice(1).map((l) => l.split(',')) };
}

/** Column accessor by header name. */
export function columns(header: readonly string[]): Record<string, number> {
  return Object.fromEntries(header.map((h, i) => [h, i]));
}
