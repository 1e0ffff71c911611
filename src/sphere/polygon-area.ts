/**
 * Area of a spherical polygon with great-circle edges, as the sum of the signed solid angles of
 * the triangles fanned out from its first vertex. Each triangle (a, b, c) of unit vectors has
 * tan(E/2) = a·(b × c) / (1 + a·b + b·c + c·a) (Van Oosterom & Strackee 1983, IEEE Trans.
 * Biomed. Eng. 30(2); the signed form of Eriksson 1990's formula), which is exact for any
 * triangle smaller than a hemisphere and needs no trigonometry on the sides.
 */
import { EARTH_RADIUS_KM } from './earth';

/**
 * Signed area in steradians of the ring of positions, given as unit vectors (interleaved
 * [x0, y0, z0, x1, …]), in the order given, or in the order of `ring` (vector indices) when given; the ring is closed implicitly (a repeated first
 * vertex at the end adds nothing). Positive when counter-clockwise seen from outside (RFC 7946
 * exterior order). The result lies in (−2π, 2π]: a ring holding more than a hemisphere on its
 * left comes out as minus the area of the other side, as in GeographicLib's signed polygon area.
 */
export function polygonAreaSr(xyz: Float64Array, ring?: Uint32Array): number {
  const n = ring === undefined ? xyz.length / 3 : ring.length;
  if (n < 3) return 0;
  const at = (k: number) => 3 * (ring === undefined ? k : ring[k]);
  const a = at(0);
  const ax = xyz[a], ay = xyz[a + 1], az = xyz[a + 2];
  let b = at(1);
  // Neumaier's compensated sum (Neumaier 1974, ZAMM 54): small triangles lose nothing beside big ones.
  let sum = 0;
  let compensation = 0;
  for (let k = 2; k < n; k++) {
    const c = at(k);
    const bx = xyz[b], by = xyz[b + 1], bz = xyz[b + 2], cx = xyz[c], cy = xyz[c + 1], cz = xyz[c + 2];
    // a·(b × c) = a·((b − a) × (c − a)): the differences keep precision in small triangles.
    const ux = bx - ax, uy = by - ay, uz = bz - az;
    const wx = cx - ax, wy = cy - ay, wz = cz - az;
    const det = ax * (uy * wz - uz * wy) + ay * (uz * wx - ux * wz) + az * (ux * wy - uy * wx);
    const dots = 1 + (ax * bx + ay * by + az * bz) + (bx * cx + by * cy + bz * cz) + (cx * ax + cy * ay + cz * az);
    const term = 2 * Math.atan2(det, dots);
    const t = sum + term;
    compensation += Math.abs(sum) >= Math.abs(term) ? sum - t + term : term - t + sum;
    sum = t;
    b = c;
  }
  // Fold into (−2π, 2π]: the fan gives the area only modulo 4π for rings past a hemisphere.
  const area = (sum + compensation) % (4 * Math.PI);
  if (area > 2 * Math.PI) return area - 4 * Math.PI;
  if (area <= -2 * Math.PI) return area + 4 * Math.PI;
  return area;
}

/** Signed area in km² on the mean Earth sphere; see `polygonAreaSr`. */
export function polygonAreaKm2(xyz: Float64Array, ring?: Uint32Array): number {
  return polygonAreaSr(xyz, ring) * EARTH_RADIUS_KM * EARTH_RADIUS_KM;
}
