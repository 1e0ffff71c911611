import { centralAngle } from '../sphere/distance';
import { RADIANS } from '../sphere/earth';
import { nestedFace, nestedX, nestedY } from './healpix-nested';
import { healpixFacePointInto, isFacePole } from './healpix-projection';

const FACE_SIDE_RAD = Math.sqrt((4 * Math.PI) / 12);

/**
 * Outline of a NESTED cell at nside = 2^order as a closed ring of [lon, lat] degrees,
 * counter-clockwise seen from above (south → east → north → west corner). Each edge is sampled
 * evenly in the face coordinates and mapped through the exact inverse projection, so every
 * vertex lies on the true cell boundary; samples are added until no step exceeds `maxStepDeg`
 * of arc. Longitudes are continuous and shifted by a multiple of 360° so that the cell centre
 * lies in [-180, 180). A pole corner is written twice, at the longitudes of the two meridian
 * edges that meet there, so the ring also reads correctly in plain lon/lat.
 */
export function healpixRing(order: number, cell: number, maxStepDeg: number): Array<[number, number]> {
  const nside = 1 << order;
  const face = nestedFace(order, cell);
  const x0 = nestedX(order, cell) / nside;
  const y0 = nestedY(order, cell) / nside;
  const x1 = x0 + 1 / nside;
  const y1 = y0 + 1 / nside;
  const xs = [x0, x1, x1, x0];
  const ys = [y0, y0, y1, y1];
  const ring: Array<[number, number]> = [];
  for (let k = 0; k < 4; k++) {
    appendEdge(ring, face, xs[k], ys[k], xs[(k + 1) % 4], ys[(k + 1) % 4], maxStepDeg * RADIANS);
  }
  ring.push([ring[0][0], ring[0][1]]);
  const centre = healpixFacePointInto(face, (x0 + x1) / 2, (y0 + y1) / 2, new Float64Array(2));
  const shift = 360 * Math.floor((centre[1] + 180) / 360);
  if (shift !== 0) for (const vertex of ring) vertex[0] -= shift;
  return ring;
}

/** Appends the samples of edge a → b, without b unless b is a pole. */
function appendEdge(
  ring: Array<[number, number]>,
  face: number,
  ax: number,
  ay: number,
  bx: number,
  by: number,
  maxStepRad: number,
): void {
  const point = new Float64Array(2);
  let lat: Float64Array;
  let lon: Float64Array;
  // First guess: a face side spans about √(4π/12) rad (the square root of a base cell's area);
  // the loop below still checks every step and refines.
  let n = Math.max(1, Math.ceil((FACE_SIDE_RAD * Math.hypot(bx - ax, by - ay)) / maxStepRad));
  for (;;) {
    lat = new Float64Array(n + 1);
    lon = new Float64Array(n + 1);
    for (let i = 0; i <= n; i++) {
      const s = i / n;
      healpixFacePointInto(face, i === n ? bx : ax + (bx - ax) * s, i === n ? by : ay + (by - ay) * s, point);
      lat[i] = point[0];
      lon[i] = point[1];
    }
    let longest = 0;
    for (let i = 0; i < n; i++) longest = Math.max(longest, centralAngle(lat[i] * RADIANS, lon[i] * RADIANS, lat[i + 1] * RADIANS, lon[i + 1] * RADIANS));
    if (longest <= maxStepRad) break;
    n = Math.max(n + 1, Math.ceil((n * longest) / maxStepRad));
  }
  // Edges that reach a pole are meridians: the pole takes the meridian's longitude.
  if (isFacePole(face, ax, ay)) lon[0] = lon[1];
  const endsAtPole = isFacePole(face, bx, by);
  if (endsAtPole) lon[n] = lon[n - 1];
  for (let i = 0; i < n; i++) ring.push([lon[i], lat[i]]);
  if (endsAtPole) ring.push([lon[n], lat[n]]);
}
