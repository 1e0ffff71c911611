import { parseArgs, type ParseArgsConfig } from 'node:util';
import { extname } from 'node:path';
import type { RunSettings } from '../run';
import { DEFAULT_OUT } from './coverage-options';
import { settingsFromOptions, SHARED_OPTIONS, usageError } from './option-values';

/** What rotate reads: an occurrence (or site) table, or GeoJSON polygons. */
export const ROTATE_INPUT = { table: 'table', geojson: 'geojson' } as const;
export type RotateInput = (typeof ROTATE_INPUT)[keyof typeof ROTATE_INPUT];

export interface RotateOptions {
  readonly input: string;
  readonly kind: RotateInput;
  readonly rotation: string;
  /** Bins, assignment, column map, rotateAt and beyondModel (the grid and preferModel do not apply). */
  readonly settings: RunSettings;
  /** The user's bins table, when `--bins` names a file. */
  readonly binsFile: string | undefined;
  readonly singleFile: boolean;
  readonly out: string;
  readonly quiet: boolean;
}

const GEOJSON_EXTENSIONS = ['.geojson', '.json'];
/** Options about rows of a table, meaningless for polygons (reconstructed at each slice's mid-age). */
const TABLE_ONLY = ['assign', 'seed', 'map', 'rotate-at'] as const;

const ROTATE_OPTIONS = { ...SHARED_OPTIONS, 'single-file': { type: 'boolean' } } as const satisfies NonNullable<ParseArgsConfig['options']>;

export function parseRotateOptions(args: readonly string[]): RotateOptions {
  let parsed;
  try {
    parsed = parseArgs({ args: [...args], allowPositionals: true, strict: true, options: ROTATE_OPTIONS });
  } catch (error) {
    throw usageError(error);
  }
  const { values, positionals } = parsed;
  if (positionals.length !== 1) {
    throw new Error(`rotate takes one input, a table or a GeoJSON file; got ${positionals.length === 0 ? 'none' : positionals.join(', ')}. See \`driftgrid --help\`.`);
  }
  const input = positionals[0];
  if (values.rotation === undefined) throw new Error('rotate needs a rotation model: add --rotation <poles.csv>.');
  const kind = GEOJSON_EXTENSIONS.includes(extname(input).toLowerCase()) ? ROTATE_INPUT.geojson : ROTATE_INPUT.table;
  if (kind === ROTATE_INPUT.geojson) {
    const tableOnly = TABLE_ONLY.filter((name) => values[name] !== undefined);
    if (tableOnly.length > 0) {
      throw new Error(`${tableOnly.map((n) => `--${n}`).join(', ')} appl${tableOnly.length === 1 ? 'ies' : 'y'} to tables; ${input} is GeoJSON, whose polygons are rotated to each slice's mid-age.`);
    }
  } else if (values['single-file'] !== undefined) {
    throw new Error(`--single-file applies to GeoJSON input; ${input} is read as a table (GeoJSON files end in .geojson or .json).`);
  }
  return {
    input,
    kind,
    rotation: values.rotation,
    ...settingsFromOptions(values),
    singleFile: values['single-file'] ?? false,
    out: values.out ?? DEFAULT_OUT,
    quiet: values.quiet ?? false,
  };
}
