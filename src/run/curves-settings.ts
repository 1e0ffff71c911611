/** The settings only the `curves` command reads: how richness is standardised (src/richness). */
export interface CurvesSettings {
  /** SQS target coverage, 0 < quorum ≤ 1. */
  readonly quorum: number;
  /** SQS trials per slice. */
  readonly trials: number;
  /** Occurrences to rarefy to (Hurlbert); no rarefied series when absent. */
  readonly rarefy?: number;
  /** Draws of every row's age within its range; no age series when absent. */
  readonly ageTrials?: number;
  /** Great-circle radius of the circular regions, km. */
  readonly regionKm: number;
}

export const DEFAULT_CURVES_SETTINGS: CurvesSettings = { quorum: 0.5, trials: 200, regionKm: 1500 };

/**
 * Regions stay below a quarter of the circumference (about 10,007 km on the mean sphere), so a
 * region holds at most one pole and is one polygon in regions.geojson.
 */
export const MAX_REGION_KM = 10000;

export const CURVES_EXPECTED = {
  quorum: 'a number above 0 and at most 1, e.g. 0.5',
  trials: 'a whole number from 1 to 100000',
  rarefy: 'a whole number of occurrences, at least 1',
  ageTrials: 'a whole number from 1 to 100000',
  regionKm: `a distance in km above 0 and below ${MAX_REGION_KM}`,
} as const;

const MAX_TRIALS = 100000;

/** Whether a value is acceptable for a curves setting (numbers as parsed; see CURVES_EXPECTED). */
export const CURVES_VALID = {
  quorum: (v: number) => v > 0 && v <= 1,
  trials: (v: number) => Number.isInteger(v) && v >= 1 && v <= MAX_TRIALS,
  rarefy: (v: number) => Number.isInteger(v) && v >= 1,
  ageTrials: (v: number) => Number.isInteger(v) && v >= 1 && v <= MAX_TRIALS,
  regionKm: (v: number) => v > 0 && v < MAX_REGION_KM,
} as const;
