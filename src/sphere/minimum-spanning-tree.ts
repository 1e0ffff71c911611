/**
 * Great-circle minimum spanning tree of positions. Chord length grows with arc length, so this is
 * the Euclidean minimum spanning tree of the 3-D unit vectors, which is a subgraph of their
 * Gabriel graph (Matula & Sokal 1980, Geogr. Anal. 12) and hence of the spherical Delaunay
 * triangulation: the diametral ball of an edge meets the sphere in the smallest cap through its
 * ends, and an empty such cap makes the edge Delaunay. The tree is picked from the Delaunay
 * edges with Kruskal's algorithm (Kruskal 1956, Proc. AMS 7) after two cheap steps that settle
 * most of it (see spanningTree); O(n log n) in all.
 */
import { EARTH_RADIUS_KM } from './earth';
import { unitVectorAngle } from './distance';
import { sphericalDelaunay, type SphericalDelaunay } from './spherical-delaunay';
import { DisjointSets } from './disjoint-sets';
import { orderByKey } from './radix-order';

export interface SpanningTree {
  /** Total length in km on the mean Earth sphere (EARTH_RADIUS_KM). */
  readonly lengthKm: number;
  /** The n − 1 edges as pairs of row indices [a0, b0, a1, b1, …] (empty for n < 2). */
  readonly edges: Uint32Array;
}

/**
 * Minimum spanning tree along great circles of the positions given as unit vectors
 * (interleaved [x0, y0, z0, x1, …]). Meant for distinct positions; repeated places are allowed
 * and are joined to their first occurrence by edges of length 0 (listed after the others).
 */
export function minimumSpanningTree(xyz: Float64Array): SpanningTree {
  const n = xyz.length / 3;
  // Equal places have bit-identical unit vectors (see unit-vectors.ts); the triangulation takes
  // one of them as a vertex and reports the others as repeats.
  const delaunay = sphericalDelaunay(xyz);
  const { vertices, points, repeats } = delaunay;
  const first = vertices.slice(); // the first row at each vertex's place
  for (let k = 0; k < repeats.length; k += 2) first[repeats[k + 1]] = Math.min(first[repeats[k + 1]], repeats[k]);

  const edges = new Uint32Array(2 * Math.max(0, n - 1));
  const tree = spanningTree(points, delaunay, n - repeats.length / 2);
  let lengthRad = 0;
  for (let k = 0; k < tree.length; k += 2) {
    lengthRad += unitVectorAngle(points, tree[k], tree[k + 1]);
    edges[k] = first[tree[k]];
    edges[k + 1] = first[tree[k + 1]];
  }
  let m = tree.length;
  for (let k = 0; k < repeats.length; k += 2) {
    const leader = first[repeats[k + 1]];
    if (repeats[k] !== leader) { edges[m++] = leader; edges[m++] = repeats[k]; }
  }
  for (let v = 0; v < vertices.length && m < edges.length; v++) {
    if (vertices[v] !== first[v]) { edges[m++] = first[v]; edges[m++] = vertices[v]; }
  }
  return { lengthKm: lengthRad * EARTH_RADIUS_KM, edges };
}

/**
 * The tree of the `places` distinct vertices (vectors in vertex order in `xyz`) as pairs of
 * vertices, from the Delaunay edges in three steps, each exact
 * for the squared chords as computed, ties broken by candidate number (a total order, so that
 * the tree is unique and every step agrees with it):
 * 1. An edge strictly longer than both others of a triangle is dropped: the longest edge of a
 *    cycle is in no minimum spanning tree (the cycle property).
 * 2. Each vertex's shortest edge is in the tree (the cut property; the first round of Borůvka's
 *    algorithm, Borůvka 1926).
 * 3. Kruskal's algorithm over the edges still joining different parts, in order of length.
 */
function spanningTree(xyz: Float64Array, delaunay: SphericalDelaunay, places: number): Uint32Array {
  const n = xyz.length / 3;
  const { triangles, halfedges, length, edges: further } = delaunay;
  // Candidates (ends and squared chords); three spare slots for the writes below.
  const capacity = length / 2 + further.length / 2 + 3;
  const ends = new Uint32Array(2 * capacity);
  const keys = new Float64Array(capacity);
  let m = 0;
  // One pass over the triangles: an edge is settled at the second of its two triangles, once
  // both have marked their longest edge. Written without branches (every candidate slot is
  // written, and kept by counting it): the tests are unpredictable, so branches on them
  // mispredict.
  const longest = new Uint8Array(length);
  for (let e = 0; e < length; e += 3) {
    const a = triangles[e], b = triangles[e + 1], c = triangles[e + 2];
    const ax = xyz[3 * a], ay = xyz[3 * a + 1], az = xyz[3 * a + 2];
    const bx = xyz[3 * b], by = xyz[3 * b + 1], bz = xyz[3 * b + 2];
    const cx = xyz[3 * c], cy = xyz[3 * c + 1], cz = xyz[3 * c + 2];
    const ab = (ax - bx) * (ax - bx) + (ay - by) * (ay - by) + (az - bz) * (az - bz);
    const bc = (bx - cx) * (bx - cx) + (by - cy) * (by - cy) + (bz - cz) * (bz - cz);
    const ca = (cx - ax) * (cx - ax) + (cy - ay) * (cy - ay) + (cz - az) * (cz - az);
    const lAb = +(ab > bc) & +(ab > ca), lBc = +(bc > ab) & +(bc > ca), lCa = +(ca > ab) & +(ca > bc);
    longest[e] = lAb; longest[e + 1] = lBc; longest[e + 2] = lCa;
    const f0 = halfedges[e], f1 = halfedges[e + 1], f2 = halfedges[e + 2];
    ends[2 * m] = a; ends[2 * m + 1] = b; keys[m] = ab;
    m += +(f0 < e) & (lAb ^ 1) & (longest[f0] ^ 1);
    ends[2 * m] = b; ends[2 * m + 1] = c; keys[m] = bc;
    m += +(f1 < e) & (lBc ^ 1) & (longest[f1] ^ 1);
    ends[2 * m] = c; ends[2 * m + 1] = a; keys[m] = ca;
    m += +(f2 < e) & (lCa ^ 1) & (longest[f2] ^ 1);
  }
  for (let k = 0; k < further.length; k += 2, m++) {
    ends[2 * m] = further[k];
    ends[2 * m + 1] = further[k + 1];
    keys[m] = squaredChord(xyz, further[k], further[k + 1]);
  }
  // Each vertex's shortest candidate; strictly shorter only, so that among equal keys the first
  // stays, as in the total order.
  const nearest = new Int32Array(n).fill(-1);
  for (let k = 0; k < m; k++) {
    const a = ends[2 * k], b = ends[2 * k + 1];
    if (nearest[a] < 0 || keys[k] < keys[nearest[a]]) nearest[a] = k;
    if (nearest[b] < 0 || keys[k] < keys[nearest[b]]) nearest[b] = k;
  }

  const sets = new DisjointSets(n);
  const tree = new Uint32Array(2 * Math.max(0, places - 1));
  let t = 0;
  const join = (k: number): void => {
    const a = ends[2 * k], b = ends[2 * k + 1];
    if (sets.union(a, b)) {
      tree[t++] = a;
      tree[t++] = b;
    }
  };
  for (let v = 0; v < n; v++) if (nearest[v] >= 0) join(nearest[v]);
  // Each vertex's part after step 2; the candidates between different parts go on to step 3.
  const part = new Uint32Array(n);
  for (let v = 0; v < n; v++) part[v] = sets.find(v);
  const rest = new Uint32Array(m + 1);
  let r = 0;
  for (let k = 0; k < m; k++) {
    rest[r] = k;
    r += +(part[ends[2 * k]] !== part[ends[2 * k + 1]]);
  }
  const order = orderByKey(keys, rest.subarray(0, r));
  for (let j = 0; j < r && t < tree.length; j++) join(order[j]);
  return tree;
}

function squaredChord(xyz: Float64Array, i: number, j: number): number {
  const dx = xyz[3 * i] - xyz[3 * j];
  const dy = xyz[3 * i + 1] - xyz[3 * j + 1];
  const dz = xyz[3 * i + 2] - xyz[3 * j + 2];
  return dx * dx + dy * dy + dz * dz;
}
