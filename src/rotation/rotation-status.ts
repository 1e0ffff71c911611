/**
 * What happened to one position on the way to its palaeoposition. Stored per row (Uint8Array)
 * so that no row is dropped without a reason.
 */
export const ROTATION_STATUS = {
  /** Rotated. */
  ok: 0,
  /** Older than the model reaches for its plate; rotated to the oldest age it reaches (policy `clamp`). */
  clamped: 1,
  /** The row has no plate id. */
  noPlateId: 2,
  /** The plate id is not in the rotation model. */
  plateNotInModel: 3,
  /** Older than the model reaches for its plate (policy `reject`). */
  beyondModel: 4,
  /** No present-day position, or one outside [−90, 90] × [−180, 180] degrees. */
  noPosition: 5,
  /** No age, or a negative one. */
  noAge: 6,
} as const;

export type RotationStatus = (typeof ROTATION_STATUS)[keyof typeof ROTATION_STATUS];
