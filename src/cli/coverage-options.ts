import { parseArgs, type ParseArgsConfig } from 'node:util';
import { ROTATE_AT, type RotateAt } from '../placement';
import { BEYOND_MODEL, type BeyondModel } from '../rotation';
import { parseBeyondModel, parseMap, parseRotateAt, parseSeed, SHARED_OPTIONS, usageError } from './option-values';

export interface CoverageOptions {
  readonly input: string | undefined;
  readonly bins: string;
  readonly assign: string;
  readonly seed: number;
  readonly grid: string;
  readonly map: Record<string, string>;
  /** Pole table of the rotation model. */
  readonly rotation: string | undefined;
  readonly rotateAt: RotateAt;
  readonly preferModel: boolean;
  readonly beyondModel: BeyondModel;
  readonly out: string;
  readonly session: string | undefined;
  readonly quiet: boolean;
}

export const COVERAGE_DEFAULTS = {
  bins: 'stages', assign: 'midpoint', seed: 1, grid: 'healpix:32', out: 'results', rotateAt: ROTATE_AT.slice, beyondModel: BEYOND_MODEL.reject,
} as const;

/** Options that a session file fixes; giving them beside --session would be ambiguous. */
const SESSION_FIXED = ['bins', 'assign', 'seed', 'grid', 'map', 'rotation', 'rotate-at', 'prefer-model', 'beyond-model'] as const;
/** Options that only mean something with a rotation model. */
const NEED_ROTATION = ['rotate-at', 'prefer-model', 'beyond-model'] as const;

const COVERAGE_OPTIONS = {
  ...SHARED_OPTIONS,
  grid: { type: 'string' },
  'prefer-model': { type: 'boolean' },
  session: { type: 'string' },
} as const satisfies NonNullable<ParseArgsConfig['options']>;

export function parseCoverageOptions(args: readonly string[]): CoverageOptions {
  let parsed;
  try {
    parsed = parseArgs({ args: [...args], allowPositionals: true, strict: true, options: COVERAGE_OPTIONS });
  } catch (error) {
    throw usageError(error);
  }
  const { values, positionals } = parsed;
  if (positionals.length > 1) throw new Error(`coverage takes one occurrence table; got ${positionals.length}: ${positionals.join(', ')}.`);
  if (values.session !== undefined) {
    const clash = SESSION_FIXED.filter((name) => values[name] !== undefined);
    if (clash.length > 0 || positionals.length > 0) {
      throw new Error(`--session fixes the input table and the settings; leave out ${[...clash.map((n) => `--${n}`), ...positionals].join(', ')}.`);
    }
  } else if (positionals.length === 0) {
    throw new Error('coverage needs an occurrence table: driftgrid coverage <occurrences.csv> [options]. See `driftgrid --help`.');
  } else if (values.rotation === undefined) {
    const orphans = NEED_ROTATION.filter((name) => values[name] !== undefined);
    if (orphans.length > 0) throw new Error(`${orphans.map((n) => `--${n}`).join(', ')} need${orphans.length === 1 ? 's' : ''} a rotation model: add --rotation <poles.csv>.`);
  }
  return {
    input: positionals[0],
    bins: values.bins ?? COVERAGE_DEFAULTS.bins,
    assign: values.assign ?? COVERAGE_DEFAULTS.assign,
    seed: values.seed === undefined ? COVERAGE_DEFAULTS.seed : parseSeed(values.seed),
    grid: values.grid ?? COVERAGE_DEFAULTS.grid,
    map: parseMap(values.map ?? []),
    rotation: values.rotation,
    rotateAt: values['rotate-at'] === undefined ? COVERAGE_DEFAULTS.rotateAt : parseRotateAt(values['rotate-at']),
    preferModel: values['prefer-model'] ?? false,
    beyondModel: values['beyond-model'] === undefined ? COVERAGE_DEFAULTS.beyondModel : parseBeyondModel(values['beyond-model']),
    out: values.out ?? COVERAGE_DEFAULTS.out,
    session: values.session,
    quiet: values.quiet ?? false,
  };
}
