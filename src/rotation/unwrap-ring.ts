/**
 * A ring of points on the sphere as a closed [lon, lat] ring whose longitudes run on without
 * jumps (past ±180° where the ring does), ready for a planar antimeridian cut.
 *
 * Every ring is read with the polygon on its left (RFC 7946: exteriors anticlockwise, holes
 * clockwise). Each edge between consecutive points is shorter than 180° of arc, so its change
 * of longitude is the one in (−180°, 180°]. Two cases need care:
 * - A point on a pole has no longitude: it becomes two points on the pole line, at the
 *   longitude the ring arrives on and the one it leaves on, joined westward along the north
 *   pole line or eastward along the south one by the angle of the sector on the ring's left.
 *   An edge whose change of longitude is within AMBIGUOUS_DEG of ±180° passes within a few
 *   centimetres of a pole; it is routed through that pole the same way.
 * - Where an edge crosses the antimeridian (an odd multiple of 180° unwrapped), the exact
 *   great-circle crossing is put in as a point, so that a later planar cut there is exact.
 * - A ring that winds once around a pole (its longitudes advance by ±360°) encloses it on one
 *   side: the ring is closed along that pole line (north when an exterior runs eastward or a
 *   hole westward, south otherwise), so that planar readers fill the right side and great-circle
 *   readers see only meridians and zero-length edges on the pole.
 * No two consecutive positions are written alike (a reader on the sphere, such as s2, refuses a
 * ring with a repeated vertex), at the precision positions are written to, SAME_PLACE_DEG:
 * a point that close to the one before it (a repeated input vertex, the two ends of an input's
 * pole line carried off the pole) is left out; a point that close to a pole is on it; a point
 * that close to the antimeridian is put on it, so no crossing is put in beside it.
 */
import { DEGREES, RADIANS } from '../sphere/earth';

export type LonLat = [number, number];

/** Degrees: one unit of the last decimal written for a position (DECIMALS.degrees = 6), so
 * positions kept at least this far apart in longitude or latitude are written apart. */
const SAME_PLACE_DEG = 1e-6;
/** A point closer to a pole than this (radians, SAME_PLACE_DEG of latitude) is on the pole. */
const POLE_DISTANCE = SAME_PLACE_DEG * RADIANS;
/** Longitude changes within this of ±180° (degrees) are edges over a pole; see above. */
const AMBIGUOUS_DEG = 1e-4;

/** `lon` put on the nearest odd multiple of 180° when it is within SAME_PLACE_DEG of it. */
function snappedToCut(lon: number): number {
  const cut = 360 * Math.round((lon - 180) / 360) + 180;
  return Math.abs(lon - cut) < SAME_PLACE_DEG ? cut : lon;
}

function mod360(x: number): number {
  return ((x % 360) + 360) % 360;
}

/** Change of longitude from `from` to `to` through the pole (+1 north, −1 south), keeping the
 * sector on the left of the ring: westward over the north pole, eastward over the south. */
function overPole(pole: number, from: number, to: number): number {
  return pole > 0 ? -mod360(from - to) : mod360(to - from);
}

/**
 * Latitude (degrees) at which the great-circle edge from point a to point b of `xyz` meets the
 * antimeridian: along n × m, n = a × b the edge's pole and m = (0, 1, 0) the pole of the meridian
 * plane 0°/180°, taken on the side x < 0. Putting this point into the ring lets the planar
 * splitter cut exactly there instead of on the straight lon/lat line between a and b.
 */
function crossingLat(xyz: Float64Array, a: number, b: number): number {
  const ax = xyz[3 * a], ay = xyz[3 * a + 1], az = xyz[3 * a + 2], bx = xyz[3 * b], by = xyz[3 * b + 1], bz = xyz[3 * b + 2];
  const nx = ay * bz - az * by, nz = ax * by - ay * bx;
  // d = n × (0, 1, 0) = (−nz, 0, nx); its side with x < 0 is the antimeridian.
  const s = -nz < 0 ? 1 : -1;
  return Math.atan2(s * nx, Math.abs(nz)) * DEGREES;
}

/**
 * The unwrapped ring of the unit vectors xyz (3 per point, the ring not repeating its first
 * point), closed, and the number of times it winds eastward around the north pole (−1, 0, 1).
 * `exterior` says whether the ring is a polygon's exterior (else a hole): it decides which
 * pole a winding ring is closed along. Throws RangeError for a ring winding more than once.
 */
export function unwrapRing(xyz: Float64Array, exterior: boolean): { ring: LonLat[]; winding: number } {
  const n = xyz.length / 3;
  const poleOf = (i: number) => (Math.hypot(xyz[3 * i], xyz[3 * i + 1]) < POLE_DISTANCE ? Math.sign(xyz[3 * i + 2]) : 0);
  const latOf = (i: number) => Math.atan2(xyz[3 * i + 2], Math.hypot(xyz[3 * i], xyz[3 * i + 1])) * DEGREES;
  const lonOf = (i: number) => Math.atan2(xyz[3 * i + 1], xyz[3 * i]) * DEGREES;
  let first = 0;
  while (first < n && poleOf(first) !== 0) first++;
  if (first === n) throw new RangeError('A ring with every point on a pole has no area.');
  const ring: LonLat[] = [[snappedToCut(lonOf(first)), latOf(first)]];
  let lon = ring[0][0], pendingPole = 0, prev = first;
  for (let step = 1; step <= n; step++) {
    const i = (first + step) % n;
    const pole = poleOf(i);
    if (pole !== 0) {
      pendingPole = pole;
      continue;
    }
    const raw = lonOf(i), lat = latOf(i);
    let delta = raw - lon - 360 * Math.round((raw - lon) / 360);
    if (pendingPole === 0 && Math.abs(delta) > 180 - AMBIGUOUS_DEG) pendingPole = Math.sign(xyz[3 * prev + 2] + xyz[3 * i + 2]);
    if (pendingPole !== 0) {
      delta = overPole(pendingPole, lon, raw);
      ring.push([lon, 90 * pendingPole]);
      if (Math.abs(delta) >= SAME_PLACE_DEG) ring.push([lon + delta, 90 * pendingPole]);
      pendingPole = 0;
    }
    else {
      const next = snappedToCut(lon + delta);
      if (Math.abs(next - lon) < SAME_PLACE_DEG && Math.abs(lat - ring[ring.length - 1][1]) < SAME_PLACE_DEG) {
        // The same written place as the point before: keep one, the ring's own first point at the close.
        if (step < n) continue;
        if (ring.length > 1) ring.pop();
      }
      const low = Math.min(lon, next), high = Math.max(lon, next);
      const cut = 360 * Math.floor((high - 180) / 360) + 180; // the last odd multiple of 180° not above `high`
      if (cut > low && cut < high) ring.push([cut, crossingLat(xyz, prev, i)]);
      delta = next - lon;
    }
    lon += delta;
    ring.push([lon, lat]);
    prev = i;
  }
  const winding = Math.round((lon - ring[0][0]) / 360);
  if (Math.abs(winding) > 1) throw new RangeError(`A ring winds ${Math.abs(winding)} times around a pole; a simple ring winds at most once.`);
  const last = ring[ring.length - 1];
  last[0] = ring[0][0] + 360 * winding; // exact, free of rounding in the sum of changes
  if (winding !== 0) {
    const capLat = (winding > 0) === exterior ? 90 : -90;
    ring.push([last[0], capLat], [ring[0][0], capLat], [ring[0][0], ring[0][1]]);
  }
  return { ring, winding };
}
