export { DEFAULT_PLACEMENT, ROTATE_AT, placeOccurrences } from './place-occurrences';
export type { Placement, PlacementSettings, RotateAt } from './place-occurrences';
export {
  PLACEMENT_STATUS, UNPLACED_FIELDS, UNPLACED_REASONS, UNPLACED_STATUSES, isPlaced,
} from './placement-status';
export type { PlacementStatus, UnplacedStatus } from './placement-status';
export { describePlacementProblem } from './placement-problem';
export type { PlacementProblem } from './placement-problem';
export { ADDED_PROPERTIES, PlateFeatureError, plateFeaturesOf } from './plate-features';
export type { PlateFeature, PlateFeatureNote } from './plate-features';
export { reconstructFeaturesAt } from './reconstruct-features';
export type { ReconstructedFeature, ReconstructionNote, SliceTarget } from './reconstruct-features';
export { EXCLUSION_FIELDS, EXCLUSION_REASONS, collectExclusions, exclusionStatus } from './exclusions';
export type { Exclusions } from './exclusions';
export { excludedLines, excludedRows } from './excluded-rows';
