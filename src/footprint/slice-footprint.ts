import { convexHull, latitudeStats, minimumSpanningTree, polygonAreaKm2, sphericalCentroid } from '../sphere';

/** Geographic footprint of one slice, measured over its distinct positions. */
export interface Footprint {
  /** Distinct positions in the slice. */
  readonly positions: number;
  /** Spherical convex-hull area, km²; NaN when there is no hull (see hullNote). */
  readonly hullKm2: number;
  /** Why there is no hull, when there is none. */
  readonly hullNote: string | undefined;
  /** Great-circle minimum spanning tree length, km (0 for one position, NaN for none). */
  readonly mstKm: number;
  /** Latitude extent, degrees (NaN for no positions). */
  readonly latMin: number;
  readonly latMax: number;
  readonly latSpan: number;
  /** Spherical centroid, degrees; NaN when the positions balance out (no mean direction). */
  readonly centroidLat: number;
  readonly centroidLon: number;
}

/** Footprint measures of distinct positions (latitude, longitude in degrees). */
export function measureFootprint(latDeg: Float64Array, lonDeg: Float64Array): Footprint {
  const n = latDeg.length;
  const hull = convexHull(latDeg, lonDeg);
  const latitude = latitudeStats(latDeg);
  const centroid = sphericalCentroid(latDeg, lonDeg);
  return {
    positions: n,
    hullKm2: hull.kind === 'hull' ? polygonAreaKm2(latDeg, lonDeg, hull.ring) : NaN,
    hullNote: hull.kind === 'hull' || n === 0 ? undefined : hull.reason,
    mstKm: n === 0 ? NaN : minimumSpanningTree(latDeg, lonDeg).lengthKm,
    latMin: latitude.minDeg,
    latMax: latitude.maxDeg,
    latSpan: latitude.spanDeg,
    centroidLat: centroid.latDeg,
    centroidLon: centroid.lonDeg,
  };
}
