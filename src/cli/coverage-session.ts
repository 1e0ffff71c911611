import { readFile } from 'node:fs/promises';
import { dirname, isAbsolute, relative, resolve } from 'node:path';
import { parseSession, type SessionInput } from '../export/session';
import { COVERAGE_DEFAULTS, type CoverageOptions } from './coverage-options';
import { checkUnchanged } from './file-digest';
import { parseBeyondModel, parseRotateAt } from './option-values';

/** With --session: the recorded inputs (checked unchanged) and settings; otherwise the options as given. */
export async function resolveSession(options: CoverageOptions): Promise<CoverageOptions> {
  if (options.session === undefined) return options;
  const session = parseSession(await readFile(options.session, 'utf8'), options.session);
  const base = dirname(options.session);
  const recorded = async (input: SessionInput): Promise<string> => {
    const path = resolve(base, input.path);
    await checkUnchanged(path, input);
    return path;
  };
  const occurrences = await recorded(session.inputs.occurrences);
  const bins = session.inputs.bins === undefined ? session.settings.bins : await recorded(session.inputs.bins);
  const rotation = session.inputs.rotation === undefined ? undefined : await recorded(session.inputs.rotation);
  const { assign, seed, grid, map, rotateAt, preferModel, beyondModel } = session.settings;
  return {
    ...options, input: occurrences, bins, assign, seed, grid, map: { ...map }, rotation,
    rotateAt: rotateAt === undefined ? COVERAGE_DEFAULTS.rotateAt : parseRotateAt(rotateAt),
    preferModel: preferModel ?? false,
    beyondModel: beyondModel === undefined ? COVERAGE_DEFAULTS.beyondModel : parseBeyondModel(beyondModel),
  };
}

/** Input paths are recorded relative to the results folder, where session.json is written. */
export function sessionInput(path: string, digest: { sha256: string; bytes: number }, outFolder: string): SessionInput {
  const fromOut = relative(resolve(outFolder), resolve(path));
  return { path: isAbsolute(fromOut) ? fromOut : fromOut.split('\\').join('/'), ...digest };
}
