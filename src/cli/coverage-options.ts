import { parseArgs } from 'node:util';

export interface CoverageOptions {
  readonly input: string | undefined;
  readonly bins: string;
  readonly assign: string;
  readonly seed: number;
  readonly grid: string;
  readonly map: Record<string, string>;
  readonly out: string;
  readonly session: string | undefined;
  readonly quiet: boolean;
}

export const COVERAGE_DEFAULTS = { bins: 'stages', assign: 'midpoint', seed: 1, grid: 'healpix:32', out: 'results' } as const;

/** Options that a session file fixes; giving them beside --session would be ambiguous. */
const SESSION_FIXED = ['bins', 'assign', 'seed', 'grid', 'map'] as const;

export function parseCoverageOptions(args: readonly string[]): CoverageOptions {
  let parsed;
  try {
    parsed = parseArgs({
      args: [...args],
      allowPositionals: true,
      strict: true,
      options: {
        bins: { type: 'string' },
        assign: { type: 'string' },
        seed: { type: 'string' },
        grid: { type: 'string' },
        map: { type: 'string', multiple: true },
        out: { type: 'string' },
        session: { type: 'string' },
        quiet: { type: 'boolean' },
      },
    });
  } catch (error) {
    throw new Error(`${(error as Error).message}. See \`driftgrid --help\`.`);
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
  }
  return {
    input: positionals[0],
    bins: values.bins ?? COVERAGE_DEFAULTS.bins,
    assign: values.assign ?? COVERAGE_DEFAULTS.assign,
    seed: values.seed === undefined ? COVERAGE_DEFAULTS.seed : parseSeed(values.seed),
    grid: values.grid ?? COVERAGE_DEFAULTS.grid,
    map: parseMap(values.map ?? []),
    out: values.out ?? COVERAGE_DEFAULTS.out,
    session: values.session,
    quiet: values.quiet ?? false,
  };
}

function parseSeed(text: string): number {
  const seed = Number(text);
  if (!Number.isInteger(seed) || seed < 0 || seed > 0xffffffff) {
    throw new Error(`--seed "${text}": expected a whole number from 0 to 4294967295.`);
  }
  return seed;
}

function parseMap(pairs: readonly string[]): Record<string, string> {
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
