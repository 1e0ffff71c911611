/**
 * Where each row's palaeoposition came from, or why it has none. Stored per row (Uint8Array),
 * so that no row is left unplaced without a reason.
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
  /** To be reconstructed, but the row has no present-day lat/lon (reconstruct ignores table palaeocoordinates). */
  noPresentPosition: 8,
} as const;

export type PlacementStatus = (typeof PLACEMENT_STATUS)[keyof typeof PLACEMENT_STATUS];

/** True for a row that has a palaeoposition. */
export function isPlaced(status: number): boolean {
  return status <= PLACEMENT_STATUS.clamped;
}

/** The statuses of rows that are in a slice but could not be placed, in the order reports list them. */
export const UNPLACED_STATUSES = [
  PLACEMENT_STATUS.needsModel, PLACEMENT_STATUS.noPlateId, PLACEMENT_STATUS.plateNotInModel,
  PLACEMENT_STATUS.beyondModel, PLACEMENT_STATUS.noPresentPosition,
] as const;
export type UnplacedStatus = (typeof UNPLACED_STATUSES)[number];

/** A short reason for each unplaced status, for summaries (rejects.csv gets the row's own values). */
export const UNPLACED_REASONS: Readonly<Record<UnplacedStatus, string>> = {
  4: 'no palaeo_lat/palaeo_lon, and present-day lat/lon can be placed only with a rotation model; expected palaeo_lat and palaeo_lon, or --rotation FILE',
  5: 'no plate_id, so the present-day lat/lon cannot be reconstructed; expected a plate id of the rotation model',
  6: 'plate_id not in the rotation model; expected one of its plates',
  7: 'older than the rotation model reaches for its plate; expected an age the model reaches, or --beyond-model clamp',
  8: 'no present-day lat/lon to reconstruct; expected lat, lon and plate_id',
};

/** The table field at fault for each unplaced status (the `field` column of rejects.csv). */
export const UNPLACED_FIELDS: Readonly<Record<UnplacedStatus, string>> = {
  4: 'palaeo_lat',
  5: 'plate_id',
  6: 'plate_id',
  7: 'age',
  8: 'lat',
};
