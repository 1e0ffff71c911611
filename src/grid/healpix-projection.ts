import { DEGREES, RADIANS } from '../sphere/earth';
import { nestedCell } from './healpix-nested';

/**
 * The HEALPix mapping between the sphere and the 12 base faces (Górski et al. 2005, ApJ
 * 622:759, §4; its planar form is the HEALPix projection of Calabretta & Roukema 2007,
 * MNRAS 381:865). With z = sin(latitude) and λ = longitude/(π/4) ∈ [0, 8), the plane (t, u) is
 *   equatorial zone |z| ≤ 2/3:  t = λ,  u = 3z/2;
 *   polar caps |z| > 2/3:       u = ±(2 − r) with r = √(3(1 − |z|)), and t = t_c + (λ − t_c)·r,
 *                               pulled towards the centre meridian t_c of the face.
 * Each face is the square |t − t_c| + |u − u_c| ≤ 1 of this plane. Face coordinates (x, y) ∈
 * [0, 1]² run from the face's south corner towards its north-east (x) and north-west (y) corners:
 *   t = t_c + x − y,   u = u_c + x + y − 1,
 * and cell (ix, iy) at nside is the square [ix, ix+1)/nside × [iy, iy+1)/nside.
 */

/** Centre meridian of each face, in units of π/4. */
const FACE_T = [1, 3, 5, 7, 0, 2, 4, 6, 1, 3, 5, 7] as const;
/** Centre height u of each face: north row 1, equatorial row 0, south row −1. */
const FACE_U = [1, 1, 1, 1, 0, 0, 0, 0, -1, -1, -1, -1] as const;

const TWO_THIRDS = 2 / 3;

/**
 * NESTED cell at nside = 2^order holding the position (degrees; the caller guarantees
 * −90 ≤ lat ≤ 90 and a finite longitude). Longitude goes straight from degrees to λ = lon/45 so
 * that meridians at multiples of 45°/nside stay exact. A position on a cell boundary belongs to
 * the cell east of it (greater t): ties go to the larger x and to the smaller y. At the poles the
 * longitude is meaningless and is taken as 0. Near a pole, rounding z = sin(lat) moves a
 * position by at most ~2e-8 rad, 1/6000 of the smallest cell (nside 8192).
 *
 * Positions arrive in random order, so the code avoids data-dependent branches where it can
 * (they cost more than the arithmetic that replaces them): only the cap/belt choice remains.
 */
export function healpixCellOf(order: number, latDeg: number, lonDeg: number): number {
  const nside = 1 << order;
  const last = nside - 1;
  // Floating-point % is a slow library call: only longitudes outside [-360, 360] need it.
  let t = latDeg === 90 || latDeg === -90 ? 0 : (lonDeg >= -360 && lonDeg <= 360 ? lonDeg : lonDeg % 360) / 45;
  t -= 8 * Math.floor(t * 0.125);
  if (t >= 8) t -= 8; // a tiny negative t rounds up to 8
  const z = Math.sin(latDeg * RADIANS);
  let face: number;
  let ix: number;
  let iy: number;
  if (z <= TWO_THIRDS && z >= -TWO_THIRDS) {
    // Indices along the two diagonal families of cell edges, counted in cells from t = −1.
    const u = 1.5 * z;
    const a = Math.floor(nside * (1 + t + u) * 0.5);
    const b = Math.floor(nside * (1 + t - u) * 0.5);
    const fa = a >> order;
    const fb = b >> order;
    // fa − fb is 1 in a north face (number fb), 0 in a belt face (4 + fa), −1 in a south face
    // (8 + fa): face = (min(fa, fb) mod 4) + 4·(1 − (fa − fb)).
    const d = fa - fb;
    face = ((fb + (d & (d >> 31))) & 3) + 4 - 4 * d;
    ix = a & last;
    iy = last - (b & last);
  } else {
    const column = Math.min(3, Math.floor(t * 0.5));
    const tp = t * 0.5 - column;
    const r = nside * Math.sqrt(3 * (1 - Math.abs(z)));
    // South cap: x = r·tp, y = r·(1 − tp); the north cap is its mirror x → 1 − y, y → 1 − x.
    const sx = Math.min(last, Math.floor(r * tp));
    const sy = Math.max(0, Math.ceil(r * (1 - tp)) - 1);
    const south = -Number(z < 0); // all bits set in the south cap, none in the north
    face = column + (south & 8);
    ix = ((last - sy) & ~south) | (sx & south);
    iy = ((last - sx) & ~south) | (sy & south);
  }
  return nestedCell(order, face, ix, iy);
}

/**
 * Inverse: the point at face coordinates (x, y) of `face`, written as [latitude, longitude] in
 * degrees into `out` (degrees, because longitude is then 45·λ exactly). The longitude is
 * continuous over the face (it may fall outside [0, 360)); at a pole (r = 0) it is the face's
 * centre meridian.
 */
export function healpixFacePointInto(face: number, x: number, y: number, out: Float64Array): Float64Array {
  const tc = FACE_T[face];
  // r (distance from the pole in face units) and t − t_c, written so that their ratio is exactly ±1
  // on the meridian edges that reach a pole (x or y = 1 on north faces, 0 on south faces).
  let r = 2; // belt faces never reach a cap
  let dt = 0;
  if (face < 4) {
    r = 1 - x + (1 - y);
    dt = 1 - y - (1 - x);
  } else if (face >= 8) {
    r = x + y;
    dt = x - y;
  }
  if (r < 1) {
    const q = (r * r) / 3; // 1 − |z|
    const sinColat = r * Math.sqrt((2 - q) / 3); // √((1 − z)(1 + z))
    out[0] = Math.atan2(face < 4 ? 1 - q : q - 1, sinColat) * DEGREES;
    out[1] = r === 0 ? tc * 45 : (tc + dt / r) * 45;
  } else {
    out[0] = Math.asin((FACE_U[face] + x + y - 1) * TWO_THIRDS) * DEGREES;
    out[1] = (tc + x - y) * 45;
  }
  return out;
}

/** True when face coordinates (x, y) of `face` are a pole (north corner of a north face, south corner of a south face). */
export function isFacePole(face: number, x: number, y: number): boolean {
  return face < 4 ? x === 1 && y === 1 : face >= 8 && x === 0 && y === 0;
}
