import { parseArgs, type ParseArgsConfig } from 'node:util';
import type { RunSettings } from '../run';
import { settingsFromOptions, SHARED_OPTIONS, usageError } from './option-values';

export interface CoverageOptions {
  readonly input: string | undefined;
  readonly settings: RunSettings;
  /** The user's bins table, when `--bins` names a file. */
  readonly binsFile: string | undefined;
  /** Pole table of the rotation model. */
  readonly rotation: string | undefined;
  /** The fixed region (`--within`). */
  readonly withinFile: string | undefined;
  /** gaps only: the area polygons (`--area <file>`) and the indicator table. */
  readonly areaFile: string | undefined;
  readonly indicators: string | undefined;
  readonly out: string;
  readonly session: string | undefined;
  readonly quiet: boolean;
}

/** Results folder when --out is not given. */
export const DEFAULT_OUT = 'results';

/** Options that a session file fixes; giving them beside --session would be ambiguous. */
const SESSION_FIXED = [
  'bins', 'assign', 'seed', 'grid', 'map', 'rotation', 'rotate-at', 'prefer-model', 'beyond-model',
  'quorum', 'trials', 'rarefy', 'age-trials', 'region-km', 'within',
] as const;
/** Options that only mean something with a rotation model. */
const NEED_ROTATION = ['rotate-at', 'prefer-model', 'beyond-model'] as const;

const COVERAGE_OPTIONS = {
  ...SHARED_OPTIONS,
  grid: { type: 'string' },
  'prefer-model': { type: 'boolean' },
  session: { type: 'string' },
  within: { type: 'string' },
} as const satisfies NonNullable<ParseArgsConfig['options']>;

/** `curves` reads what `coverage` reads, and how richness is standardised. */
const CURVES_OPTIONS = {
  ...COVERAGE_OPTIONS,
  quorum: { type: 'string' },
  trials: { type: 'string' },
  rarefy: { type: 'string' },
  'age-trials': { type: 'string' },
  'region-km': { type: 'string' },
} as const satisfies NonNullable<ParseArgsConfig['options']>;

type CurvesOptionName = Exclude<keyof typeof CURVES_OPTIONS, keyof typeof COVERAGE_OPTIONS>;

/**
 * Refuses what no command that reads one occurrence table can take: more than one table, none
 * (`usage` shows how to give it), settings beside the session that fixes them (`sessionFixed`),
 * and rotation options without a rotation model.
 */
export function checkTableCommand(
  command: string, usage: string, values: Readonly<Record<string, unknown>>, positionals: readonly string[], sessionFixed: readonly string[],
): void {
  if (positionals.length > 1) throw new Error(`${command} takes one occurrence table; got ${positionals.length}: ${positionals.join(', ')}.`);
  if (values.session !== undefined) {
    const clash = sessionFixed.filter((name) => values[name] !== undefined);
    if (clash.length > 0 || positionals.length > 0) {
      throw new Error(`--session fixes the input table and the settings; leave out ${[...clash.map((n) => `--${n}`), ...positionals].join(', ')}.`);
    }
  } else if (positionals.length === 0) {
    throw new Error(`${command} needs an occurrence table: ${usage}. See \`driftgrid --help\`.`);
  } else if (values.rotation === undefined) {
    const orphans = NEED_ROTATION.filter((name) => values[name] !== undefined);
    if (orphans.length > 0) throw new Error(`${orphans.map((n) => `--${n}`).join(', ')} need${orphans.length === 1 ? 's' : ''} a rotation model: add --rotation <poles.csv>.`);
  }
}

/** The options of `coverage`, or of `curves` (which also reads the curves settings). */
export function parseCoverageOptions(args: readonly string[], command: 'coverage' | 'curves' = 'coverage'): CoverageOptions {
  let parsed;
  try {
    parsed = parseArgs({ args: [...args], allowPositionals: true, strict: true, options: command === 'curves' ? CURVES_OPTIONS : COVERAGE_OPTIONS });
  } catch (error) {
    throw usageError(error);
  }
  // Both option sets as one shape: the curves options are simply absent for coverage.
  const values: typeof parsed.values & { readonly [name in CurvesOptionName]?: string } = parsed.values;
  const { positionals } = parsed;
  checkTableCommand(command, `driftgrid ${command} <occurrences.csv> [options]`, values, positionals, SESSION_FIXED);
  return {
    input: positionals[0],
    ...settingsFromOptions(values),
    rotation: values.rotation,
    indicators: undefined,
    out: values.out ?? DEFAULT_OUT,
    session: values.session,
    quiet: values.quiet ?? false,
  };
}
