/**
 * Checks at the public edge of the grids. The hot loops test positions inline and call these
 * only to build the message.
 */

/** Densification step of cell outlines when the caller gives none, degrees of arc. */
export const DEFAULT_RING_STEP_DEG = 1;

/** Error for a position that is not on the sphere; `index` is its place in a batch, if any. */
export function invalidPosition(latDeg: number, lonDeg: number, index?: number): RangeError {
  const where = index === undefined ? 'Position' : `Position ${index}`;
  const what =
    latDeg >= -90 && latDeg <= 90
      ? `longitude ${lonDeg} is not a finite number of degrees`
      : `latitude ${latDeg} is outside [-90, 90] degrees`;
  return new RangeError(`${where}: ${what}.`);
}

/** Throws unless the three arrays of a batch have the same length. */
export function assertBatchLengths(lat: ArrayLike<number>, lon: ArrayLike<number>, out: ArrayLike<number>): void {
  if (lat.length !== lon.length || out.length !== lat.length) {
    throw new RangeError(
      `Batch lengths differ: ${lat.length} latitudes, ${lon.length} longitudes, ${out.length} output slots; expected all equal.`,
    );
  }
}

/** Throws unless `cell` is an integer cell number of a grid with `count` cells. */
export function assertCell(gridName: string, count: number, cell: number): void {
  if (!(Number.isInteger(cell) && cell >= 0 && cell < count)) {
    throw new RangeError(`Cell ${cell} is not a cell of ${gridName}: expected an integer from 0 to ${count - 1}.`);
  }
}

/** The densification step, checked: a positive finite number of degrees. */
export function ringStepDeg(maxStepDeg: number | undefined): number {
  if (maxStepDeg === undefined) return DEFAULT_RING_STEP_DEG;
  if (!(maxStepDeg > 0 && maxStepDeg < Infinity)) {
    throw new RangeError(`Outline step ${maxStepDeg} is not allowed: expected a positive number of degrees.`);
  }
  return maxStepDeg;
}
