import { ROTATE_AT, type RotateAt } from '../placement';
import { BEYOND_MODEL, type BeyondModel } from '../rotation';
import type { AreaChoice } from './area-choice';
import type { AssignChoice } from './assign-choice';
import type { BinsChoice } from './bins-choice';
import type { CurvesSettings } from './curves-settings';
import type { GridChoice } from './grid-choice';

/** Every setting that shapes a run's numbers, the same for the command line, the page and session files. */
export interface RunSettings {
  readonly bins: BinsChoice;
  readonly assign: AssignChoice;
  /** Seed of the drawn assignment (`draw`): a whole number 0 … 2^32 − 1 (Mulberry32's state). */
  readonly seed: number;
  readonly grid: GridChoice;
  /** Explicit column choices, field → column header. */
  readonly map: Readonly<Record<string, string>>;
  readonly rotateAt: RotateAt;
  readonly preferModel: boolean;
  readonly beyondModel: BeyondModel;
  /** Richness standardisation, present for the `curves` command only (coverage sessions stay as they were). */
  readonly curves?: CurvesSettings;
  /** The available area of `gaps` (a `file` area is the run's area input). */
  readonly area: AreaChoice;
  /** Width of the latitude bands of belts.csv, degrees (0 < W <= 180). */
  readonly bandDeg: number;
  /** True when only occurrences placed inside the run's fixed region (its `within` input) are kept. */
  readonly within: boolean;
}

export const DEFAULT_RUN_SETTINGS: RunSettings = {
  bins: { kind: 'chart', rank: 'stages' },
  assign: { kind: 'mid-age' },
  seed: 1,
  grid: { kind: 'healpix', nside: 32 },
  map: {},
  rotateAt: ROTATE_AT.slice,
  preferModel: false,
  beyondModel: BEYOND_MODEL.reject,
  area: { kind: 'occupied' },
  bandDeg: 10,
  within: false,
};

/** The names of the curves settings, flat beside the others in session files and messages. */
export const CURVES_SETTING_NAMES = ['quorum', 'trials', 'rarefy', 'ageTrials', 'regionKm'] as const;

/** The settings' names, in the order session files write them. */
export const RUN_SETTING_NAMES = [
  'bins', 'assign', 'seed', 'grid', 'map', 'rotateAt', 'preferModel', 'beyondModel', 'area', 'bandDeg', 'within', ...CURVES_SETTING_NAMES,
] as const;
export type RunSettingName = (typeof RUN_SETTING_NAMES)[number];
