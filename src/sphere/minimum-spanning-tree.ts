/**
 * Great-circle minimum spanning tree of positions. Chord length grows with arc length, so this is
 * the Euclidean minimum spanning tree of the 3-D unit vectors, which is a subgraph of their
 * Gabriel graph (Matula & Sokal 1980, Geogr. Anal. 12) and hence of the spherical Delaunay
 * triangulation: the diametral ball of an edge meets the sphere in the smallest cap through its
 * ends, and an empty such cap makes the edge Delaunay. Kruskal's algorithm (Kruskal 1956, Proc.
 * AMS 7) on the Delaunay edges, sorted by a radix sort: O(n log n) in all.
 */
import { EARTH_RADIUS_KM } from './earth';
import { unitVectorAngle } from './distance';
import { degreesToUnitVectors } from './unit-vectors';
import { groupEqualTuples } from './tuple-groups';
import { sphericalDelaunayEdges } from './spherical-delaunay';
import { DisjointSets } from './disjoint-sets';
import { orderByKey } from './radix-order';

export interface SpanningTree {
  /** Total length in km on the mean Earth sphere (EARTH_RADIUS_KM). */
  readonly lengthKm: number;
  /** The n − 1 edges as pairs of row indices [a0, b0, a1, b1, …] (empty for n < 2). */
  readonly edges: Uint32Array;
}

/**
 * Minimum spanning tree of the positions (latitude, longitude in degrees) along great circles.
 * Meant for distinct positions; repeated places are allowed and are joined to their first
 * occurrence by edges of length 0 (listed after the others).
 */
export function minimumSpanningTree(latDeg: Float64Array, lonDeg: Float64Array): SpanningTree {
  const n = latDeg.length;
  const xyz = degreesToUnitVectors(latDeg, lonDeg);
  // Equal places have bit-identical unit vectors (see unit-vectors.ts).
  const groupOf = new Uint32Array(n);
  const { count, first } = groupEqualTuples(xyz, 3, groupOf);
  const places = count === n ? xyz : gather(xyz, first);

  const edges = new Uint32Array(2 * Math.max(0, n - 1));
  const treeEdges = placeTree(places);
  let lengthRad = 0;
  for (let k = 0; k < treeEdges.length; k += 2) {
    lengthRad += unitVectorAngle(places, treeEdges[k], treeEdges[k + 1]);
    edges[k] = first[treeEdges[k]];
    edges[k + 1] = first[treeEdges[k + 1]];
  }
  let m = treeEdges.length;
  for (let i = 0; i < n; i++) {
    const leader = first[groupOf[i]];
    if (leader !== i) {
      edges[m++] = leader;
      edges[m++] = i;
    }
  }
  return { lengthKm: lengthRad * EARTH_RADIUS_KM, edges };
}

/** Kruskal over the Delaunay edges of distinct unit vectors; returns the tree as index pairs. */
function placeTree(xyz: Float64Array): Uint32Array {
  const n = xyz.length / 3;
  if (n < 2) return new Uint32Array(0);
  const candidates = sphericalDelaunayEdges(xyz);
  const m = candidates.length / 2;
  const chord2 = new Float64Array(m);
  for (let e = 0; e < m; e++) chord2[e] = squaredChord(xyz, candidates[2 * e], candidates[2 * e + 1]);
  const identity = new Uint32Array(m);
  for (let e = 0; e < m; e++) identity[e] = e;
  const order = orderByKey(chord2, identity);

  const sets = new DisjointSets(n);
  const tree = new Uint32Array(2 * Math.max(0, n - 1));
  for (let k = 0, t = 0; k < m && t < tree.length; k++) {
    const e = order[k];
    const a = candidates[2 * e], b = candidates[2 * e + 1];
    if (sets.union(a, b)) {
      tree[t++] = a;
      tree[t++] = b;
    }
  }
  return tree;
}

function squaredChord(xyz: Float64Array, i: number, j: number): number {
  const dx = xyz[3 * i] - xyz[3 * j];
  const dy = xyz[3 * i + 1] - xyz[3 * j + 1];
  const dz = xyz[3 * i + 2] - xyz[3 * j + 2];
  return dx * dx + dy * dy + dz * dz;
}

function gather(xyz: Float64Array, indices: Uint32Array): Float64Array {
  const out = new Float64Array(3 * indices.length);
  for (let k = 0; k < indices.length; k++) {
    out[3 * k] = xyz[3 * indices[k]];
    out[3 * k + 1] = xyz[3 * indices[k] + 1];
    out[3 * k + 2] = xyz[3 * indices[k] + 2];
  }
  return out;
}
