import { readFile } from 'node:fs/promises';
import { dirname, isAbsolute, relative, resolve } from 'node:path';
import type { SessionInput } from '../export/session';
import { readSession } from '../run';
import type { CoverageOptions } from './coverage-options';
import { checkUnchanged } from './file-digest';

/** With --session: the recorded inputs (checked unchanged) and settings; otherwise the options as given. */
export async function resolveSession(options: CoverageOptions): Promise<CoverageOptions> {
  if (options.session === undefined) return options;
  const { session, settings } = readSession(await readFile(options.session, 'utf8'), options.session);
  const base = dirname(options.session);
  const recorded = async (input: SessionInput): Promise<string> => {
    const path = resolve(base, input.path);
    await checkUnchanged(path, input);
    return path;
  };
  const { occurrences, bins, rotation } = session.inputs;
  if (settings.bins.kind === 'file' && bins === undefined) {
    throw new Error(`${options.session}: settings.bins is "file" but inputs.bins records no bins table.`);
  }
  return {
    ...options,
    input: await recorded(occurrences),
    settings,
    binsFile: settings.bins.kind === 'file' && bins !== undefined ? await recorded(bins) : undefined,
    rotation: rotation === undefined ? undefined : await recorded(rotation),
  };
}

/** Input paths are recorded relative to the results folder, where session.json is written. */
export function sessionInput(path: string, digest: { sha256: string; bytes: number }, outFolder: string): SessionInput {
  const fromOut = relative(resolve(outFolder), resolve(path));
  return { path: isAbsolute(fromOut) ? fromOut : fromOut.split('\\').join('/'), ...digest };
}
