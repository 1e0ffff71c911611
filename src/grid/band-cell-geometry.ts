import { DEGREES, RADIANS } from '../sphere/earth';

/**
 * Geometry of one latitude-longitude quadrangle (the cells of `bands:DEG`), degrees at the edges.
 */

/**
 * Spherical centroid of the quadrangle — the direction of its mean position vector — written as
 * [lat, lon] degrees into `out`. Integrating the unit vector over dA = cos φ dφ dλ gives, with
 * Δ the longitude span and the x axis on the middle meridian,
 *   ∫z dA = Δ (sin²φ₁ − sin²φ₀)/2,   ∫x dA = 2 sin(Δ/2) [φ/2 + sin 2φ/4] from φ₀ to φ₁.
 * A row of one column round a pole thus has its centre at the pole.
 */
export function bandCellCentroidInto(
  southDeg: number,
  northDeg: number,
  westDeg: number,
  eastDeg: number,
  out: Float64Array,
): Float64Array {
  const s0 = Math.sin(southDeg * RADIANS);
  const s1 = Math.sin(northDeg * RADIANS);
  const span = (eastDeg - westDeg) * RADIANS;
  const along = (phi: number): number => phi / 2 + Math.sin(2 * phi) / 4;
  const z = (span * (s1 * s1 - s0 * s0)) / 2;
  const x = 2 * Math.sin(span / 2) * (along(northDeg * RADIANS) - along(southDeg * RADIANS));
  out[0] = Math.atan2(z, x) * DEGREES;
  out[1] = (westDeg + eastDeg) / 2;
  return out;
}

/**
 * Outline of the quadrangle as a closed ring of [lon, lat] degrees, counter-clockwise seen from
 * above (south-west → south-east → north-east → north-west corner), no step longer than
 * `maxStepDeg` of arc. On a parallel a step of δ longitude is at most δ·cos φ of arc (a chord
 * is never longer than its arc), which sets the number of steps; at a pole that is one step.
 */
export function bandCellRing(
  southDeg: number,
  northDeg: number,
  westDeg: number,
  eastDeg: number,
  maxStepDeg: number,
): Array<[number, number]> {
  const ring: Array<[number, number]> = [];
  parallel(ring, southDeg, westDeg, eastDeg, maxStepDeg);
  meridian(ring, eastDeg, southDeg, northDeg, maxStepDeg);
  parallel(ring, northDeg, eastDeg, westDeg, maxStepDeg);
  meridian(ring, westDeg, northDeg, southDeg, maxStepDeg);
  ring.push([westDeg, southDeg]);
  return ring;
}

/** Appends the points of a parallel from lon `from` towards `to`, without the end point. */
function parallel(ring: Array<[number, number]>, latDeg: number, from: number, to: number, maxStepDeg: number): void {
  const arc = Math.abs(to - from) * Math.cos(latDeg * RADIANS);
  const n = Math.max(1, Math.ceil(arc / maxStepDeg));
  for (let i = 0; i < n; i++) ring.push([from + ((to - from) * i) / n, latDeg]);
}

/** Appends the points of a meridian from lat `from` towards `to`, without the end point. */
function meridian(ring: Array<[number, number]>, lonDeg: number, from: number, to: number, maxStepDeg: number): void {
  const n = Math.max(1, Math.ceil(Math.abs(to - from) / maxStepDeg));
  for (let i = 0; i < n; i++) ring.push([lonDeg, from + ((to - from) * i) / n]);
}
