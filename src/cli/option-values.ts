import type { ParseArgsConfig } from 'node:util';
import { ROTATE_AT, type RotateAt } from '../placement';
import { BEYOND_MODEL, type BeyondModel } from '../rotation';

/** `--seed`: a whole number that fits Mulberry32's 32-bit state. */
export function parseSeed(text: string): number {
  const seed = Number(text);
  if (!Number.isInteger(seed) || seed < 0 || seed > 0xffffffff) {
    throw new Error(`--seed "${text}": expected a whole number from 0 to 4294967295.`);
  }
  return seed;
}

/** `--map field=column`, repeatable. */
export function parseMap(pairs: readonly string[]): Record<string, string> {
  const map: Record<string, string> = {};
  for (const pair of pairs) {
    const at = pair.indexOf('=');
    if (at <= 0 || at === pair.length - 1) throw new Error(`--map "${pair}": expected field=column, e.g. --map taxon=genus_name.`);
    const field = pair.slice(0, at).trim();
    if (field in map) throw new Error(`--map names the field "${field}" twice.`);
    map[field] = pair.slice(at + 1);
  }
  return map;
}

/** `--rotate-at slice|occurrence`. */
export function parseRotateAt(text: string): RotateAt {
  const values: readonly string[] = Object.values(ROTATE_AT);
  if (!values.includes(text)) throw new Error(`--rotate-at "${text}": expected ${values.join(' or ')}.`);
  return text as RotateAt;
}

/** `--beyond-model reject|clamp`. */
export function parseBeyondModel(text: string): BeyondModel {
  const values: readonly string[] = Object.values(BEYOND_MODEL);
  if (!values.includes(text)) throw new Error(`--beyond-model "${text}": expected ${values.join(' or ')}.`);
  return text as BeyondModel;
}

/** The options `coverage` and `reconstruct` both take, as node:util parseArgs specs. */
export const SHARED_OPTIONS = {
  bins: { type: 'string' },
  assign: { type: 'string' },
  seed: { type: 'string' },
  map: { type: 'string', multiple: true },
  rotation: { type: 'string' },
  'rotate-at': { type: 'string' },
  'beyond-model': { type: 'string' },
  out: { type: 'string' },
  quiet: { type: 'boolean' },
} as const satisfies NonNullable<ParseArgsConfig['options']>;

/** An option error from node:util parseArgs, pointing to --help. */
export function usageError(error: unknown): Error {
  return new Error(`${(error as Error).message}. See \`driftgrid --help\`.`);
}
