import { ROTATE_AT, type RotateAt } from '../placement';
import { ProblemList } from '../problems';
import { BEYOND_MODEL, type BeyondModel } from '../rotation';
import { isSeed } from '../time';
import { AREA_EXPECTED, areaChoiceOf } from './area-choice';
import { ASSIGN_EXPECTED, assignChoiceOf } from './assign-choice';
import { BINS_EXPECTED, binsChoiceOf } from './bins-choice';
import { presentAssignName, presentFieldName } from './former-names';
import { GRID_EXPECTED, gridChoiceOf } from './grid-choice';
import { CURVES_EXPECTED, CURVES_VALID, DEFAULT_CURVES_SETTINGS, type CurvesSettings } from './curves-settings';
import { CURVES_SETTING_NAMES, DEFAULT_RUN_SETTINGS, RUN_SETTING_NAMES, type RunSettingName, type RunSettings } from './run-settings';

/**
 * Where settings come from, which decides how a field is named in a problem: command-line
 * options (`--rotate-at`) or a settings object (`settings.rotateAt`: session files, the page's
 * messages to the worker), so that a bad session file reads the same in the terminal and the page.
 */
export interface SettingsSource {
  /** The file or message, named at the start of each problem (`results/session.json`). */
  readonly name?: string;
  readonly naming: 'option' | 'setting';
}

const OPTION_NAMES: Readonly<Record<RunSettingName, string>> = {
  bins: '--bins', assign: '--assign', seed: '--seed', grid: '--grid', map: '--map',
  rotateAt: '--rotate-at', preferModel: '--prefer-model', beyondModel: '--beyond-model',
  quorum: '--quorum', trials: '--trials', rarefy: '--rarefy', ageTrials: '--age-trials', regionKm: '--region-km',
  area: '--area', bandDeg: '--band-deg', within: '--within',
};

/** Settings a session file must give (format 1 had these; the rotation settings came with format 2). */
const REQUIRED_SETTINGS: readonly RunSettingName[] = ['bins', 'assign', 'seed', 'grid', 'map'];

const SEED_EXPECTED = 'a whole number from 0 to 4294967295';
const BAND_EXPECTED = 'a band width in degrees, more than 0 and at most 180 (e.g. 10)';
const MAP_EXPECTED = 'field=column, e.g. taxon=genus_name';

/**
 * The one reader of run settings. `raw` holds the settings by name, as text (`"equal:10"`,
 * `"healpix:32"`) or JSON values; an absent setting takes its default (a session file must give
 * bins, assign, seed, grid and map). Recorded settings (`naming: 'setting'`) may use the names
 * of earlier session files (former-names.ts), read as the present ones. Every unknown or
 * malformed value is reported, by field, value and what was expected, in one InputError.
 */
export function parseRunSettings(given: object, source: SettingsSource): RunSettings {
  // Any object: a parsed JSON file, options, or SessionSettings; every value is checked below.
  const raw = given as Readonly<Record<string, unknown>>;
  const recorded = source.naming === 'setting';
  const problems = new ProblemList();
  const fieldOf = (name: string): string => (source.naming === 'option' ? OPTION_NAMES[name as RunSettingName] ?? `--${name}` : `settings.${name}`);
  const refuse = (name: string, value: unknown, expected: string): void => {
    problems.add({ field: fieldOf(name), value: shown(value), expected });
  };
  for (const name of Object.keys(raw)) {
    if (!(RUN_SETTING_NAMES as readonly string[]).includes(name)) refuse(name, raw[name], `one of the settings ${RUN_SETTING_NAMES.join(', ')}`);
  }
  if (source.naming === 'setting') {
    for (const name of REQUIRED_SETTINGS) if (raw[name] === undefined) refuse(name, undefined, `a value; a session file gives ${REQUIRED_SETTINGS.join(', ')}`);
  }

  const choice = <T>(name: RunSettingName, read: (text: string) => T | { readonly expected: string }, expected: string, fallback: T): T => {
    const value = raw[name];
    if (value === undefined) return fallback;
    if (typeof value !== 'string') {
      refuse(name, value, expected);
      return fallback;
    }
    const found = read(value);
    if (typeof found === 'object' && found !== null && 'expected' in found) {
      refuse(name, value, found.expected);
      return fallback;
    }
    return found as T;
  };
  const oneOf = <T extends string>(name: RunSettingName, allowed: Readonly<Record<string, T>>, fallback: T): T => {
    const values: readonly string[] = Object.values(allowed);
    return choice<T>(name, (text) => (values.includes(text) ? (text as T) : { expected: values.join(' or ') }), values.join(' or '), fallback);
  };

  const settings: RunSettings = {
    bins: choice('bins', binsChoiceOf, BINS_EXPECTED, DEFAULT_RUN_SETTINGS.bins),
    assign: choice('assign', (text) => assignChoiceOf(recorded ? presentAssignName(text) : text), ASSIGN_EXPECTED, DEFAULT_RUN_SETTINGS.assign),
    seed: seedOf(raw.seed, () => refuse('seed', raw.seed, SEED_EXPECTED)),
    grid: choice('grid', gridChoiceOf, GRID_EXPECTED, DEFAULT_RUN_SETTINGS.grid),
    map: mapOf(raw.map, recorded ? presentFieldName : (field) => field, (value, expected) => refuse('map', value, expected)),
    rotateAt: oneOf<RotateAt>('rotateAt', ROTATE_AT, DEFAULT_RUN_SETTINGS.rotateAt),
    preferModel: booleanOf(raw.preferModel, () => refuse('preferModel', raw.preferModel, 'true or false'), DEFAULT_RUN_SETTINGS.preferModel),
    beyondModel: oneOf<BeyondModel>('beyondModel', BEYOND_MODEL, DEFAULT_RUN_SETTINGS.beyondModel),
    ...curvesOf(raw, refuse),
    area: choice('area', areaChoiceOf, AREA_EXPECTED, DEFAULT_RUN_SETTINGS.area),
    bandDeg: bandOf(raw.bandDeg, () => refuse('bandDeg', raw.bandDeg, BAND_EXPECTED)),
    within: booleanOf(raw.within, () => refuse('within', raw.within, 'true or false'), DEFAULT_RUN_SETTINGS.within),
  };
  problems.throwIfAny(source.name);
  return settings;
}

/**
 * The curves settings when any of them is given (the rest take their defaults); none for a run
 * that gives none, so a coverage session reads and writes as before.
 */
function curvesOf(raw: Readonly<Record<string, unknown>>, refuse: (name: string, value: unknown, expected: string) => void): { curves?: CurvesSettings } {
  if (CURVES_SETTING_NAMES.every((name) => raw[name] === undefined)) return {};
  const read = (name: (typeof CURVES_SETTING_NAMES)[number]): number | undefined => {
    const value = raw[name];
    if (value === undefined) return undefined;
    const number = typeof value === 'number' ? value : typeof value === 'string' && value.trim() !== '' ? Number(value) : Number.NaN;
    if (CURVES_VALID[name](number)) return number;
    refuse(name, value, CURVES_EXPECTED[name]);
    return undefined;
  };
  const rarefy = read('rarefy');
  const ageTrials = read('ageTrials');
  return {
    curves: {
      quorum: read('quorum') ?? DEFAULT_CURVES_SETTINGS.quorum,
      trials: read('trials') ?? DEFAULT_CURVES_SETTINGS.trials,
      ...(rarefy === undefined ? {} : { rarefy }),
      ...(ageTrials === undefined ? {} : { ageTrials }),
      regionKm: read('regionKm') ?? DEFAULT_CURVES_SETTINGS.regionKm,
    },
  };
}

/** A seed as a JSON number or as the digits of an option. */
function seedOf(value: unknown, refuse: () => void): number {
  if (value === undefined) return DEFAULT_RUN_SETTINGS.seed;
  const seed = typeof value === 'number' ? value : typeof value === 'string' && /^\s*\d+\s*$/.test(value) ? Number(value) : Number.NaN;
  if (isSeed(seed)) return seed;
  refuse();
  return DEFAULT_RUN_SETTINGS.seed;
}

function booleanOf(value: unknown, refuse: () => void, fallback: boolean): boolean {
  if (value === undefined) return fallback;
  if (typeof value === 'boolean') return value;
  refuse();
  return fallback;
}

/** A band width as a JSON number or as an option's text. */
function bandOf(value: unknown, refuse: () => void): number {
  if (value === undefined) return DEFAULT_RUN_SETTINGS.bandDeg;
  const width = typeof value === 'number' ? value : typeof value === 'string' && value.trim() !== '' ? Number(value) : Number.NaN;
  if (width > 0 && width <= 180) return width;
  refuse();
  return DEFAULT_RUN_SETTINGS.bandDeg;
}

/**
 * Column choices as an object (field → column) or as `field=column` pairs (repeated `--map`),
 * each field by the name `fieldName` gives it.
 */
function mapOf(value: unknown, fieldName: (field: string) => string, refuse: (value: unknown, expected: string) => void): Record<string, string> {
  const map: Record<string, string> = {};
  if (value === undefined) return map;
  if (Array.isArray(value)) {
    for (const pair of value) {
      const at = typeof pair === 'string' ? pair.indexOf('=') : -1;
      if (typeof pair !== 'string' || at <= 0 || at === pair.length - 1) {
        refuse(pair, MAP_EXPECTED);
        continue;
      }
      const field = fieldName(pair.slice(0, at).trim());
      if (field in map) refuse(pair, `each field named once; ${field} is already mapped to ${map[field]}`);
      else map[field] = pair.slice(at + 1);
    }
    return map;
  }
  if (typeof value !== 'object' || value === null) {
    refuse(value, 'an object of field: column');
    return map;
  }
  for (const [written, column] of Object.entries(value)) {
    const field = fieldName(written);
    if (typeof column !== 'string' || column === '') refuse(column, `the header of the column for ${written}`);
    else if (field in map) refuse(column, `each field named once; ${field} is already mapped to ${map[field]}`);
    else map[field] = column;
  }
  return map;
}

/** A value as the user wrote it: text as is, anything else as JSON. */
function shown(value: unknown): string {
  return typeof value === 'string' ? value : value === undefined ? '' : JSON.stringify(value);
}
