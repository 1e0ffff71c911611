/**
 * The placed rows of an analysis in slice order, as columns: rows of slice s are
 * start[s] … start[s + 1] − 1 (the layout `analyse` builds for cell tallies). Kernels trust it:
 * codes lie below their dictionary sizes, cells are grid cell numbers.
 */
export interface RichnessInput {
  /** sliceCount + 1 row offsets. */
  readonly start: Uint32Array;
  /** Taxon code of each row, 0 … taxonCount − 1. */
  readonly taxon: Uint32Array;
  readonly taxonCount: number;
  /**
   * Collection code of each row; ABSENT_CODE (0xFFFFFFFF) marks a row that names no collection,
   * which then counts as a collection of its own.
   */
  readonly collection: Uint32Array;
  /** Collection codes are below this (the dictionary size, or the number of distinct positions). */
  readonly collectionCount: number;
  /** Grid cell of each row. */
  readonly cell: Uint32Array;
  /** Reference code of each row when the table has references; ABSENT_CODE where a row names none. */
  readonly reference?: Uint32Array;
}

