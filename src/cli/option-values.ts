import type { ParseArgsConfig } from 'node:util';
import { namesBuiltInArea, namesBuiltInBins, parseRunSettings, type RunSettings } from '../run';

/** The options `coverage` and `rotate` both take, as node:util parseArgs specs. */
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

/** The run settings options give, as parseArgs read them. */
interface SettingOptions {
  readonly bins?: string;
  readonly assign?: string;
  readonly seed?: string;
  readonly grid?: string;
  readonly map?: readonly string[];
  readonly 'rotate-at'?: string;
  readonly 'prefer-model'?: boolean;
  readonly 'beyond-model'?: string;
  readonly quorum?: string;
  readonly trials?: string;
  readonly rarefy?: string;
  readonly 'age-trials'?: string;
  readonly 'region-km'?: string;
  readonly area?: string;
  readonly 'band-deg'?: string;
  readonly within?: string;
}

/** The run settings of the options, and the files some of them name. */
export interface OptionSettings {
  readonly settings: RunSettings;
  readonly binsFile: string | undefined;
  /** The area polygons, when `--area` names a file. */
  readonly areaFile: string | undefined;
  /** The fixed region of `--within`. */
  readonly withinFile: string | undefined;
}

/**
 * The run settings in the options, read by parseRunSettings (so a bad value reads as it does in a
 * session file, named by its option); `--bins` with a path means own bins, read from `binsFile`,
 * `--area` with a path an area file, and `--within` a fixed region.
 */
export function settingsFromOptions(values: SettingOptions): OptionSettings {
  const binsFile = values.bins === undefined || namesBuiltInBins(values.bins) ? undefined : values.bins;
  const areaFile = values.area === undefined || namesBuiltInArea(values.area) ? undefined : values.area;
  const raw = {
    bins: binsFile === undefined ? values.bins : 'file',
    assign: values.assign,
    seed: values.seed,
    grid: values.grid,
    map: values.map,
    rotateAt: values['rotate-at'],
    preferModel: values['prefer-model'],
    beyondModel: values['beyond-model'],
    quorum: values.quorum,
    trials: values.trials,
    rarefy: values.rarefy,
    ageTrials: values['age-trials'],
    regionKm: values['region-km'],
    area: areaFile === undefined ? values.area : 'file',
    bandDeg: values['band-deg'],
    within: values.within === undefined ? undefined : true,
  };
  const given = Object.fromEntries(Object.entries(raw).filter(([, value]) => value !== undefined));
  return { settings: parseRunSettings(given, { naming: 'option' }), binsFile, areaFile, withinFile: values.within };
}

/** An option error from node:util parseArgs, pointing to --help. */
export function usageError(error: unknown): Error {
  return new Error(`${(error as Error).message}. See \`driftgrid --help\`.`);
}
