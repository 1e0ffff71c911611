// Widens the window past rounding in asin and sin; the dot-product test decides membership.
const Z_SLACK = 1e-9;

/**
 * A slice's cells ordered by z (the sine of latitude) so that the cells within an angle of a
 * centre are searched only among the contiguous run whose latitude lies within that angle of the
 * centre's: a cell at great-circle angle θ differs in latitude by at most θ.
 */
export class LatitudeWindow {
  /** Cell indices (into the unit-vector array) in increasing z. */
  readonly cell: Uint32Array;
  private readonly z: Float64Array;
  private count = 0;

  constructor(capacity: number) {
    this.cell = new Uint32Array(capacity);
    this.z = new Float64Array(capacity);
  }

  /** Orders cells from … to − 1 of the interleaved unit vectors `xyz` by z. */
  sort(xyz: Float64Array, from: number, to: number): void {
    const order = Array.from({ length: to - from }, (_, k) => from + k).sort((a, b) => xyz[3 * a + 2] - xyz[3 * b + 2]);
    this.count = order.length;
    for (let i = 0; i < order.length; i++) {
      this.cell[i] = order[i];
      this.z[i] = xyz[3 * order[i] + 2];
    }
  }

  /** First position whose latitude may be within `angle` (radians) of the latitude with sine `z`. */
  begin(z: number, angle: number): number {
    return this.firstAtLeast(Math.sin(Math.max(-Math.PI / 2, Math.asin(z) - angle)) - Z_SLACK);
  }

  /** One past the last such position. */
  end(z: number, angle: number): number {
    return this.firstAtLeast(Math.sin(Math.min(Math.PI / 2, Math.asin(z) + angle)) + Z_SLACK);
  }

  private firstAtLeast(x: number): number {
    let lo = 0;
    let hi = this.count;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (this.z[mid] < x) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  }
}
