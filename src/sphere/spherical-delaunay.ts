/**
 * The spherical Delaunay triangulation, which for points on a sphere is the convex hull of the
 * 3-D points (Brown 1979, Inf. Process. Lett. 9(5)). One point, the pivot, is sent to infinity by
 * a stereographic projection centred on it; the planar Delaunay triangulation of the others is
 * then the spherical one minus the pivot's star, because stereographic projection maps circles
 * on the sphere that miss the pivot to circles in the plane, keeping their insides (an empty cap
 * stays an empty disc). In planar-delaunay.ts the pivot is the vertex at infinity, so its star
 * is there too, and the triangles cover the whole sphere.
 */
import { planarDelaunay } from './planar-delaunay';
import { orderByKey } from './radix-order';
import { sphereOrder } from './sphere-order';

export interface SphericalDelaunay {
  /** Vertex k is vector vertices[k]. Vertices are numbered along a space-filling curve, so that
   * vertices close in number are mostly close on the sphere; the last one is the pivot. A vertex
   * whose vector repeats another vertex's is in no triangle or edge (see `repeats`). */
  readonly vertices: Uint32Array;
  /** The vectors of the vertices, [x0, y0, z0, x1, …] in vertex order. */
  readonly points: Float64Array;
  /** Half-edge e runs from vertex triangles[e] to the next vertex of its triangle; halfedges[e]
   * is its twin. */
  readonly triangles: Uint32Array;
  readonly halfedges: Int32Array;
  /** Half-edges in use (3 × triangles). */
  readonly length: number;
  /** Further edges as pairs of vertices [a0, b0, a1, b1, …], where triangles do not tell: all of
   * them when the points lie on one great circle through the pivot (or number two), and, for a
   * vertex whose projection coincides with another's without being the same vector (the two
   * some 1e-16 radians apart), its edges to every other vertex. */
  readonly edges: Uint32Array;
  /** Pairs [i, v]: vector i equals (===) that of vertex v, and is in no triangle or edge. */
  readonly repeats: Uint32Array;
}

/**
 * Spherical Delaunay triangulation of interleaved unit vectors. Its edges hold every Delaunay
 * edge of the distinct vectors, hence every edge of a minimum spanning tree of them.
 */
export function sphericalDelaunay(xyz: Float64Array): SphericalDelaunay {
  const n = xyz.length / 3;
  if (n === 0) {
    return {
      vertices: new Uint32Array(0), points: new Float64Array(0), triangles: new Uint32Array(0), halfedges: new Int32Array(0),
      length: 0, edges: new Uint32Array(0), repeats: new Uint32Array(0),
    };
  }

  const pivot = pivotIndex(xyz);
  const px = xyz[3 * pivot], py = xyz[3 * pivot + 1], pz = xyz[3 * pivot + 2];
  const order = new Uint32Array(n);
  const repeats: number[] = [];
  let m = 0;
  for (let i = 0; i < n; i++) {
    if (i === pivot) continue;
    if (xyz[3 * i] === px && xyz[3 * i + 1] === py && xyz[3 * i + 2] === pz) repeats.push(i, -1); // vertex set below
    else order[m++] = i;
  }
  sphereOrder(xyz, order.subarray(0, m));
  order[m] = pivot; // the planar triangulation's vertex at infinity
  const vertices = order.subarray(0, m + 1);
  for (let k = 1; k < repeats.length; k += 2) repeats[k] = m;

  // An orthonormal basis (e1, e2) of the plane perpendicular to the pivot.
  let e1x = -py, e1y = px, e1z = 0;
  if (Math.abs(pz) > 0.9) { e1x = 0; e1y = -pz; e1z = py; }
  const e1n = Math.sqrt(e1x * e1x + e1y * e1y + e1z * e1z);
  e1x /= e1n; e1y /= e1n; e1z /= e1n;
  const e2x = py * e1z - pz * e1y, e2y = pz * e1x - px * e1z, e2z = px * e1y - py * e1x;
  const xy = new Float64Array(2 * m);
  const points = new Float64Array(3 * (m + 1));
  points[3 * m] = px; points[3 * m + 1] = py; points[3 * m + 2] = pz;
  for (let k = 0; k < m; k++) {
    const i = vertices[k];
    points[3 * k] = xyz[3 * i]; points[3 * k + 1] = xyz[3 * i + 1]; points[3 * k + 2] = xyz[3 * i + 2];
    // With d = x − p: 1 − p·x = |d|²/2 and x·e = d·e (p·e = 0). Working with d keeps the
    // precision of points close to the pivot, which the projection throws far out.
    const dx = xyz[3 * i] - px, dy = xyz[3 * i + 1] - py, dz = xyz[3 * i + 2] - pz;
    const denom = (dx * dx + dy * dy + dz * dz) / 2;
    xy[2 * k] = (dx * e1x + dy * e1y + dz * e1z) / denom;
    xy[2 * k + 1] = (dx * e2x + dy * e2y + dz * e2z) / denom;
  }

  const same = (u: number, v: number): boolean => // vertices u and v have equal vectors
    points[3 * u] === points[3 * v] && points[3 * u + 1] === points[3 * v + 1] && points[3 * u + 2] === points[3 * v + 2];
  const planar = planarDelaunay(xy);
  const edges: number[] = [];
  if (planar.length === 0) aroundCircle(xy, vertices, same, edges, repeats);
  else if (planar.coincident.length > 0) coincidentPoints(planar.coincident, vertices, same, edges, repeats);
  return {
    vertices, points, triangles: planar.triangles, halfedges: planar.halfedges, length: planar.length,
    edges: Uint32Array.from(edges), repeats: Uint32Array.from(repeats),
  };
}

/**
 * Vertices the planar triangulation left out, given as pairs [u, v] of vertices with equal
 * projections: u is a repeat when its vector equals v's, and otherwise (the two some 1e-16
 * radians apart) is joined to every vertex that is not a repeat.
 */
function coincidentPoints(
  coincident: Uint32Array, vertices: Uint32Array, same: (u: number, v: number) => boolean, edges: number[], repeats: number[],
): void {
  const left = new Uint8Array(vertices.length);
  for (let k = 0; k < coincident.length; k += 2) {
    const u = coincident[k], v = coincident[k + 1];
    if (!same(u, v)) continue;
    repeats.push(vertices[u], v);
    left[u] = 1;
  }
  for (let k = 0; k < coincident.length; k += 2) {
    const u = coincident[k];
    if (left[u] === 0) for (let v = 0; v < vertices.length; v++) if (v !== u && left[v] === 0) edges.push(u, v);
  }
}

/**
 * Vertices 0..m−1 whose projections all lie on one line, i.e. on one circle through the pivot
 * (vertex m): adds the edges joining them in order along the line, and the pivot, at infinity,
 * to both ends; a vertex equal to the previous one along the line is a repeat.
 */
function aroundCircle(
  xy: Float64Array, vertices: Uint32Array, same: (u: number, v: number) => boolean, edges: number[], repeats: number[],
): void {
  const m = xy.length / 2;
  if (m === 0) return;
  // The direction from the first point to the one farthest from it.
  let dx = 0, dy = 0;
  for (let k = 1; k < m; k++) {
    const ex = xy[2 * k] - xy[0], ey = xy[2 * k + 1] - xy[1];
    if (ex * ex + ey * ey > dx * dx + dy * dy) { dx = ex; dy = ey; }
  }
  const along = new Float64Array(m);
  const identity = new Uint32Array(m);
  for (let k = 0; k < m; k++) {
    along[k] = xy[2 * k] * dx + xy[2 * k + 1] * dy;
    identity[k] = k;
  }
  const sorted = orderByKey(along, identity);
  let last = sorted[0];
  edges.push(m, last);
  for (let k = 1; k < m; k++) {
    const u = sorted[k];
    if (same(u, last)) {
      repeats.push(vertices[u], last);
    } else {
      edges.push(last, u);
      last = u;
    }
  }
  if (last !== sorted[0]) edges.push(m, last);
}

/**
 * The point least aligned with the mean direction: most points then lie far from it, so few
 * are thrown far out by the projection. Any point would do.
 */
function pivotIndex(xyz: Float64Array): number {
  const n = xyz.length / 3;
  let sx = 0, sy = 0, sz = 0;
  for (let i = 0; i < n; i++) {
    sx += xyz[3 * i];
    sy += xyz[3 * i + 1];
    sz += xyz[3 * i + 2];
  }
  let best = 0;
  let lowest = Infinity;
  for (let i = 0; i < n; i++) {
    const d = sx * xyz[3 * i] + sy * xyz[3 * i + 1] + sz * xyz[3 * i + 2];
    if (d < lowest) {
      lowest = d;
      best = i;
    }
  }
  return best;
}
