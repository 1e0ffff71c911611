/** Number formatting for the demo files: fixed decimals, trailing zeros dropped, no −0. */
import { latOfVector, lonOfVector } from './spherical';

/** Decimals of every written coordinate (1e-4° ≈ 11 m). */
export const COORDINATE_DECIMALS = 4;
/** Decimals of written ages, enough for every stage boundary (e.g. 251.902). */
const AGE_DECIMALS = 3;

export function formatNumber(x: number, decimals: number): string {
  const fixed = x.toFixed(decimals);
  const s = decimals > 0 ? fixed.replace(/0+$/, '').replace(/\.$/, '') : fixed;
  return s === '-0' ? '0' : s;
}

/** [latitude, longitude] of a unit vector as written; longitude in (−180, 180]. */
export function formatPosition(v: ArrayLike<number>): [string, string] {
  const lon = formatNumber(lonOfVector(v), COORDINATE_DECIMALS);
  return [formatNumber(latOfVector(v), COORDINATE_DECIMALS), lon === '-180' ? '180' : lon];
}

export function formatAge(ma: number): string {
  return formatNumber(ma, AGE_DECIMALS);
}
