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
  const { occurrences, bins, rotation, area, within, indicators } = session.inputs;
  const lacking = (setting: string, input: string) => new Error(`${options.session}: settings.${setting} but inputs.${input} records no file.`);
  if (settings.bins.kind === 'file' && bins === undefined) throw lacking('bins is "file"', 'bins');
  if (settings.area.kind === 'file' && area === undefined) throw lacking('area is "file"', 'area');
  if (settings.within && within === undefined) throw lacking('within is true', 'within');
  return {
    ...options,
    input: await recorded(occurrences),
    settings,
    binsFile: settings.bins.kind === 'file' && bins !== undefined ? await recorded(bins) : undefined,
    rotation: rotation === undefined ? undefined : await recorded(rotation),
    areaFile: settings.area.kind === 'file' && area !== undefined ? await recorded(area) : undefined,
    withinFile: settings.within && within !== undefined ? await recorded(within) : undefined,
    indicators: indicators === undefined ? undefined : await recorded(indicators),
  };
}

/** Input paths are recorded relative to the results folder, where session.json is written. */
export function sessionInput(path: string, digest: { sha256: string; bytes: number }, outFolder: string): SessionInput {
  const fromOut = relative(resolve(outFolder), resolve(path));
  return { path: isAbsolute(fromOut) ? fromOut : fromOut.split('\\').join('/'), ...digest };
}
