/**
 * Turns the designed motions of world.ts into total-reconstruction poles, one per plate every
 * 10 Myr. A designed rotation is "spin about the present-day centre, then carry the centre
 * along the shortest arc to its position at that age".
 */
import {
  createQuaternion, identityInto, multiplyQuaternionsInto, poleFromQuaternion,
  quaternionFromAxisAngleInto, type Quaternion,
} from '../../src/rotation/quaternion';
import { RADIANS } from '../../src/sphere/earth';
import { angleBetween, vectorFromLatLonInto, type Vec3 } from './spherical';
import { FIXED_PLATE, POLE_TABLE_OLDEST_MA, POLE_TABLE_STEP_MYR, type PlateDesign } from './world';
import type { PoleRow } from './rotation-table';

/** Decimals of pole latitude, longitude and angle in poles.csv (1e-4° ≈ 11 m). */
export const POLE_DECIMALS = 4;

/** The rotation about the axis a×b that carries unit vector a onto b (identity when a = b). */
function shortestArcInto(a: Vec3, b: Vec3, out: Quaternion): Quaternion {
  const x = a[1] * b[2] - a[2] * b[1], y = a[2] * b[0] - a[0] * b[2], z = a[0] * b[1] - a[1] * b[0];
  const s = Math.hypot(x, y, z);
  if (s === 0) return identityInto(out);
  return quaternionFromAxisAngleInto(x / s, y / s, z / s, angleBetween(a, b) * RADIANS, out);
}

/** Point a fraction f of the way along the great circle from a to b (vector slerp). */
function alongArcInto(a: Vec3, b: Vec3, f: number, out: Vec3): Vec3 {
  const theta = angleBetween(a, b) * RADIANS;
  if (theta === 0) {
    out.set(a);
    return out;
  }
  const ka = Math.sin((1 - f) * theta) / Math.sin(theta), kb = Math.sin(f * theta) / Math.sin(theta);
  for (let i = 0; i < 3; i++) out[i] = ka * a[i] + kb * b[i];
  return out;
}

/** Centre (unit vector) and spin (degrees) of the designed motion at `ageMa`. */
function designedPlacement(plate: PlateDesign, ageMa: number, centre: Vec3): number {
  const m = plate.motion, land = plate.landmass;
  if (m.kind === 'rift') {
    const f = Math.min(ageMa / m.riftMa, 1);
    const now = vectorFromLatLonInto(land.lat, land.lon, new Float64Array(3));
    alongArcInto(now, vectorFromLatLonInto(m.dockedLat, m.dockedLon, new Float64Array(3)), f, centre);
    return f * m.spinDeg;
  }
  const k = m.keyframes.findIndex((key) => key.ageMa >= ageMa);
  const young = m.keyframes[Math.max(k - 1, 0)], old = m.keyframes[k];
  const f = old === young ? 0 : (ageMa - young.ageMa) / (old.ageMa - young.ageMa);
  alongArcInto(
    vectorFromLatLonInto(young.lat, young.lon, new Float64Array(3)),
    vectorFromLatLonInto(old.lat, old.lon, new Float64Array(3)), f, centre,
  );
  return young.spinDeg + f * (old.spinDeg - young.spinDeg);
}

/** The designed rotation of a plate relative to its parent at `ageMa`. */
function designedRotationInto(plate: PlateDesign, ageMa: number, out: Quaternion): Quaternion {
  const land = plate.landmass;
  const now = vectorFromLatLonInto(land.lat, land.lon, new Float64Array(3));
  const then = new Float64Array(3);
  const spinDeg = designedPlacement(plate, ageMa, then);
  const spin = quaternionFromAxisAngleInto(now[0], now[1], now[2], spinDeg * RADIANS, createQuaternion());
  return multiplyQuaternionsInto(shortestArcInto(now, then, createQuaternion()), spin, out);
}

function round(x: number, decimals: number): number {
  const r = Number(x.toFixed(decimals));
  return r === 0 ? 0 : r; // no −0
}

/** Rows of the pole table, plate by plate, youngest first; values rounded as written. */
export function poleTableRows(plates: readonly PlateDesign[]): PoleRow[] {
  const rows: PoleRow[] = [];
  const q = createQuaternion();
  for (const plate of plates) {
    const relativeTo = plate.motion.kind === 'rift' ? plate.motion.relativeTo : FIXED_PLATE;
    for (let age = 0; age <= POLE_TABLE_OLDEST_MA; age += POLE_TABLE_STEP_MYR) {
      const pole = poleFromQuaternion(designedRotationInto(plate, age, q));
      rows.push({
        plateId: plate.landmass.plateId, ageMa: age, relativeTo,
        poleLat: round(pole.lat, POLE_DECIMALS), poleLon: round(pole.lon, POLE_DECIMALS),
        angleDeg: round(pole.angle, POLE_DECIMALS),
      });
    }
  }
  return rows;
}
