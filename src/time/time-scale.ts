/**
 * An ordered set of time slices, oldest first. Slice i covers top_ma < age <= base_ma
 * (an age on a boundary belongs to the younger unit, whose base it is); an age of 0 belongs
 * to the youngest slice.
 */
export interface TimeScale {
  /** How the scale was chosen, as the user wrote it: `stages`, `equal:10`, a file name. */
  readonly label: string;
  readonly names: readonly string[];
  /** Older boundary of each slice, Ma, decreasing with the index. */
  readonly baseMa: Float64Array;
  /** Younger boundary of each slice, Ma. */
  readonly topMa: Float64Array;
}

/** How an occurrence with an age range is given to one slice. */
export type AssignRule =
  | { readonly kind: 'mid-age' }
  | { readonly kind: 'whole-range' }
  | { readonly kind: 'share'; readonly fraction: number }
  | { readonly kind: 'draw'; readonly seed: number };

export interface SliceAssignment {
  /** Slice index of each row, or -1 where none takes it. */
  readonly slice: Int32Array;
  /** Why each row went to no slice: the EXCLUSION_CODE of a slice-stage reason, NOT_EXCLUDED where assigned. */
  readonly reason: Uint8Array;
  /** Age used for the row (the mid-age, or the draw), Ma; NaN where unassigned. */
  readonly age: Float64Array;
}
