/** An equal-area partition of the sphere into numbered cells. Positions in degrees at the edges. */
export interface EqualAreaGrid {
  /** Canonical name as written in exports: `healpix:32`, `bands:5`. */
  readonly name: string;
  readonly cellCount: number;
  /** Area of each cell in steradians (all cells are equal). */
  readonly cellAreaSr: number;
  /** Cell holding the position (latitude, longitude in degrees). */
  cellOf(latDeg: number, lonDeg: number): number;
  /** Cells of many positions at once, written into `out` (no allocation). */
  cellsOf(latDeg: Float64Array, lonDeg: Float64Array, out: Uint32Array): void;
  /** Centre of a cell as [latitude, longitude] in degrees, written into `out`. */
  cellCentreInto(cell: number, out: Float64Array): Float64Array;
  /**
   * Outline of a cell as a closed ring of [longitude, latitude] in degrees, counter-clockwise
   * seen from above (RFC 7946 exterior order), edges densified so that no step is longer than
   * `maxStepDeg` degrees. Longitudes are continuous (a ring may run past ±180°); splitting at
   * the antimeridian is the writer's job.
   */
  cellRing(cell: number, maxStepDeg?: number): Array<[number, number]>;
}
