import { measureLevers, type SliceLevers } from './slice-levers';
import { convexHull, degreesToUnitVectors, latitudeStats, minimumSpanningTree, polygonAreaKm2, sphericalCentroid } from '../sphere';

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

/** The shapes a footprint was measured from, for drawing: indices into the positions. */
export interface FootprintShapes {
  /** Hull vertices in RFC 7946 order, or undefined when there is no hull. */
  readonly hullRing: Uint32Array | undefined;
  /** Spanning-tree edges as index pairs [a0, b0, a1, b1, …]. */
  readonly treeEdges: Uint32Array;
}

/** Footprint measures of distinct positions (latitude, longitude in degrees). */
export function measureFootprint(latDeg: Float64Array, lonDeg: Float64Array): Footprint {
  return measureFootprintWithShapes(latDeg, lonDeg).footprint;
}

/** measureFootprint, keeping the hull and tree it measured (so that views need not build them
 * again), and the slice's levers. The positions become unit vectors once, for hull, area, tree,
 * centroid and levers alike. */
export function measureFootprintWithShapes(latDeg: Float64Array, lonDeg: Float64Array): { footprint: Footprint; levers: SliceLevers; shapes: FootprintShapes } {
  const n = latDeg.length;
  const xyz = degreesToUnitVectors(latDeg, lonDeg);
  const hull = convexHull(xyz);
  const latitude = latitudeStats(latDeg);
  const centroid = sphericalCentroid(xyz);
  const tree = n === 0 ? undefined : minimumSpanningTree(xyz);
  const footprint: Footprint = {
    positions: n,
    hullKm2: hull.kind === 'hull' ? polygonAreaKm2(xyz, hull.ring) : NaN,
    hullNote: hull.kind === 'hull' || n === 0 ? undefined : hull.reason,
    mstKm: tree === undefined ? NaN : tree.lengthKm,
    latMin: latitude.minDeg,
    latMax: latitude.maxDeg,
    latSpan: latitude.spanDeg,
    centroidLat: centroid.latDeg,
    centroidLon: centroid.lonDeg,
  };
  const hullRing = hull.kind === 'hull' ? hull.ring : undefined;
  return { footprint, levers: measureLevers(latDeg, lonDeg, xyz, hullRing), shapes: { hullRing, treeEdges: tree?.edges ?? new Uint32Array(0) } };
}
