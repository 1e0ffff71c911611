/**
 * Where each row's palaeoposition came from, or why it has none. Stored per row (Uint8Array),
 * so that no row is left unplaced without a reason. A status that leaves a row out has the name
 * of its reason in EXCLUSIONS (src/problems), which gives its field and wording.
 */
export const PLACEMENT_STATUS = {
  /** palaeo_lat/palaeo_lon as given in the table. */
  fromTable: 0,
  /** present-day lat/lon turned by the rotation model to the reconstruction age. */
  fromModel: 1,
  /** As fromModel, but at the oldest age the model reaches for the plate (`--beyond-model clamp`). */
  clamped: 2,
  /** The row is in no time slice, so it has no age to be placed at (the slice assignment says why). */
  noSlice: 3,
  /** No palaeocoordinates, and no rotation model to reconstruct its present-day lat/lon. */
  needsModel: 4,
  /** To be reconstructed, but the row has no plate id. */
  noPlateId: 5,
  /** To be reconstructed, but its plate is not in the rotation model. */
  plateNotInModel: 6,
  /** To be reconstructed at an age older than the model reaches for its plate (`--beyond-model reject`). */
  beyondModel: 7,
  /** To be reconstructed, but the row has no present-day lat/lon (rotate ignores table palaeocoordinates). */
  noPresentPosition: 8,
} as const;

export type PlacementStatus = (typeof PLACEMENT_STATUS)[keyof typeof PLACEMENT_STATUS];
