/**
 * Spherical centroid: the direction of the mean of the positions' unit vectors (the mean
 * direction of directional statistics; Mardia & Jupp 2000, Directional Statistics, §9.2).
 */
import { DEGREES } from './earth';

/**
 * Below this mean resultant length the mean vector is indistinguishable from zero (rounding in
 * a sum of unit vectors is far smaller) and the centroid has no direction: the positions
 * balance out, as antipodal pairs or points spread evenly over a great circle do.
 */
export const CENTROID_UNDEFINED_BELOW = 1e-9;

export interface SphericalCentroid {
  /** Latitude of the mean direction, degrees; NaN when `defined` is false. */
  readonly latDeg: number;
  /** Longitude of the mean direction in [−180, 180], degrees; NaN when `defined` is false. */
  readonly lonDeg: number;
  /** Length of the mean unit vector, 0…1 (1 when all positions coincide). */
  readonly meanResultantLength: number;
  /** False for no positions or a mean resultant length below CENTROID_UNDEFINED_BELOW. */
  readonly defined: boolean;
}

/** Spherical centroid of the positions given as unit vectors (interleaved [x0, y0, z0, x1, …]). */
export function sphericalCentroid(xyz: Float64Array): SphericalCentroid {
  const n = xyz.length / 3;
  let sx = 0, sy = 0, sz = 0;
  for (let o = 0; o < xyz.length; o += 3) {
    sx += xyz[o];
    sy += xyz[o + 1];
    sz += xyz[o + 2];
  }
  const length = n === 0 ? 0 : Math.sqrt(sx * sx + sy * sy + sz * sz) / n;
  if (!(length >= CENTROID_UNDEFINED_BELOW)) {
    return { latDeg: NaN, lonDeg: NaN, meanResultantLength: length, defined: false };
  }
  return {
    latDeg: Math.atan2(sz, Math.sqrt(sx * sx + sy * sy)) * DEGREES,
    lonDeg: Math.atan2(sy, sx) * DEGREES,
    meanResultantLength: length,
    defined: true,
  };
}
