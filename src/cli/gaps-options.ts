import { parseArgs, type ParseArgsConfig } from 'node:util';
import { DEFAULT_OUT, checkTableCommand, type CoverageOptions } from './coverage-options';
import { settingsFromOptions, SHARED_OPTIONS, usageError } from './option-values';

const GAPS_OPTIONS = {
  ...SHARED_OPTIONS,
  grid: { type: 'string' },
  'prefer-model': { type: 'boolean' },
  session: { type: 'string' },
  within: { type: 'string' },
  area: { type: 'string' },
  'band-deg': { type: 'string' },
  indicators: { type: 'string' },
} as const satisfies NonNullable<ParseArgsConfig['options']>;

/** Options a gaps session fixes; giving them beside --session would be ambiguous. */
const GAPS_SESSION_FIXED = [
  'bins', 'assign', 'seed', 'grid', 'map', 'rotation', 'rotate-at', 'prefer-model', 'beyond-model', 'within', 'area', 'band-deg', 'indicators',
] as const;

/** `driftgrid gaps`: the options of coverage, and the area, the band width and the indicator table. */
export function parseGapsOptions(args: readonly string[]): CoverageOptions {
  let parsed;
  try {
    parsed = parseArgs({ args: [...args], allowPositionals: true, strict: true, options: GAPS_OPTIONS });
  } catch (error) {
    throw usageError(error);
  }
  const { values, positionals } = parsed;
  checkTableCommand('gaps', 'driftgrid gaps <occurrences.csv> --area <land.geojson|occupied|all> [options]', values, positionals, GAPS_SESSION_FIXED);
  return {
    input: positionals[0],
    ...settingsFromOptions(values),
    rotation: values.rotation,
    indicators: values.indicators,
    out: values.out ?? DEFAULT_OUT,
    session: values.session,
    quiet: values.quiet ?? false,
  };
}
