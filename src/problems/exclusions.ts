/**
 * Why an accepted row is in no slice's footprint, one table for both stages that can leave it
 * out: the slice assignment (its age range) and the placement (no palaeoposition). Each reason
 * is a RowProblem with a general wording for summaries; rejects.csv words some with the row's
 * own values (see the placement's describeExclusion).
 */
import type { RowProblem } from './row-problem';

export const EXCLUSION_STAGE = { slice: 'slice', placement: 'placement' } as const;
export type ExclusionStage = (typeof EXCLUSION_STAGE)[keyof typeof EXCLUSION_STAGE];

interface Exclusion extends RowProblem {
  readonly stage: ExclusionStage;
}

/** Every exclusion reason by name, in the order reports list them. */
export const EXCLUSIONS = {
  ageOutside: {
    stage: EXCLUSION_STAGE.slice, field: 'age',
    reason: 'age range reaches outside the time slices, or into a gap between them; expected an age within the chosen bins',
  },
  spansSlices: {
    stage: EXCLUSION_STAGE.slice, field: 'age',
    reason: 'age range spans more than one slice; the "whole-range" rule needs it inside one slice',
  },
  shareTooSmall: {
    stage: EXCLUSION_STAGE.slice, field: 'age',
    reason: 'no slice holds the required share of the age range (the "overlap" rule)',
  },
  needsModel: {
    stage: EXCLUSION_STAGE.placement, field: 'palaeo_lat',
    reason: 'no palaeo_lat/palaeo_lon, and present-day lat/lon can be placed only with a rotation model; expected palaeo_lat and palaeo_lon, or --rotation FILE',
  },
  noPlateId: {
    stage: EXCLUSION_STAGE.placement, field: 'plate_id',
    reason: 'no plate_id, so the present-day lat/lon cannot be reconstructed; expected a plate id of the rotation model',
  },
  plateNotInModel: {
    stage: EXCLUSION_STAGE.placement, field: 'plate_id',
    reason: 'plate_id not in the rotation model; expected one of its plates',
  },
  beyondModel: {
    stage: EXCLUSION_STAGE.placement, field: 'age',
    reason: 'older than the rotation model reaches for its plate; expected an age the model reaches, or --beyond-model clamp',
  },
  noPresentPosition: {
    stage: EXCLUSION_STAGE.placement, field: 'lat',
    reason: 'no present-day lat/lon to reconstruct; expected lat, lon and plate_id',
  },
} as const satisfies Readonly<Record<string, Exclusion>>;
export type ExclusionName = keyof typeof EXCLUSIONS;

// Typed arrays store a reason as a small code; this is the one place codes are given.
/** Reason names in code order: EXCLUSION_NAMES[k] is stored as code k + 1. */
export const EXCLUSION_NAMES = Object.keys(EXCLUSIONS) as readonly ExclusionName[];
/** The code stored for a row that is not excluded. */
export const NOT_EXCLUDED = 0;
/** The code stored for each reason (1, 2, …; NOT_EXCLUDED is none of them). */
export const EXCLUSION_CODE = Object.fromEntries(EXCLUSION_NAMES.map((name, k) => [name, k + 1])) as Readonly<Record<ExclusionName, number>>;

/** The reason a stored code stands for; a RangeError for NOT_EXCLUDED or an unknown code. */
export function exclusionName(code: number): ExclusionName {
  const name = EXCLUSION_NAMES[code - 1];
  if (name === undefined) throw new RangeError(`Exclusion code ${code} stands for no reason; codes run from 1 to ${EXCLUSION_NAMES.length}.`);
  return name;
}
