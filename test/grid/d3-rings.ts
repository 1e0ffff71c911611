// Helpers for reading our cell rings with d3-geo. d3-geo takes a counter-clockwise ring (RFC 7946
// order, which our rings use) as the complement of the small area it encloses, so the ring is
// reversed before d3 sees it (see /work/shared/STACK.md).
import type { Polygon } from 'geojson';

/** The ring as a d3-geo polygon (clockwise, as d3 expects for a small area). */
export function d3Polygon(ring: Array<[number, number]>): Polygon {
  return { type: 'Polygon', coordinates: [ring.slice().reverse()] };
}

/** Difference of two longitudes in degrees, folded into [-180, 180). */
export function lonDifference(a: number, b: number): number {
  return ((((a - b + 180) % 360) + 360) % 360) - 180;
}
