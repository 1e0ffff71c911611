/**
 * Edges of the spherical Delaunay triangulation, which for points on a sphere is the convex hull
 * of the 3-D points (Brown 1979, Inf. Process. Lett. 9(5)). One point, the pivot, is sent to
 * infinity by a stereographic projection centred on it; the planar Delaunay triangulation of
 * the others is then the spherical one minus the pivot's star, because stereographic projection
 * maps circles on the sphere that miss the pivot to circles in the plane, keeping their insides
 * (an empty cap stays an empty disc). The pivot's neighbours are the vertices of the planar
 * convex hull, or, in planar-delaunay.ts, of the vertex at infinity.
 */
import { planarDelaunay } from './planar-delaunay';
import { orderByKey } from './radix-order';

/**
 * Edges of the spherical Delaunay triangulation of interleaved unit vectors, all different, as
 * pairs of indices [a0, b0, a1, b1, …], each edge once — plus, in the rare case below, more:
 * the result always holds every Delaunay edge, hence every edge of a minimum spanning tree.
 */
export function sphericalDelaunayEdges(xyz: Float64Array): Uint32Array {
  const n = xyz.length / 3;
  if (n < 2) return new Uint32Array(0);
  if (n === 2) return Uint32Array.of(0, 1);

  const pivot = pivotIndex(xyz);
  const px = xyz[3 * pivot], py = xyz[3 * pivot + 1], pz = xyz[3 * pivot + 2];
  // An orthonormal basis (e1, e2) of the plane perpendicular to the pivot.
  let e1x = -py, e1y = px, e1z = 0;
  if (Math.abs(pz) > 0.9) { e1x = 0; e1y = -pz; e1z = py; }
  const e1n = Math.sqrt(e1x * e1x + e1y * e1y + e1z * e1z);
  e1x /= e1n; e1y /= e1n; e1z /= e1n;
  const e2x = py * e1z - pz * e1y, e2y = pz * e1x - px * e1z, e2z = px * e1y - py * e1x;

  const global = new Uint32Array(n - 1); // planar index → vertex index
  const coords = new Float64Array(2 * (n - 1));
  for (let i = 0, k = 0; i < n; i++) {
    if (i === pivot) continue;
    // With d = x − p: 1 − p·x = |d|²/2 and x·e = d·e (p·e = 0). Working with d keeps the
    // precision of points close to the pivot, which the projection throws far out.
    const dx = xyz[3 * i] - px, dy = xyz[3 * i + 1] - py, dz = xyz[3 * i + 2] - pz;
    const denom = (dx * dx + dy * dy + dz * dz) / 2;
    coords[2 * k] = (dx * e1x + dy * e1y + dz * e1z) / denom;
    coords[2 * k + 1] = (dx * e2x + dy * e2y + dz * e2z) / denom;
    global[k++] = i;
  }

  const planar = planarDelaunay(coords);
  const out = new EdgeList(3 * n + planar.coincident.length * n);
  if (planar.length === 0) {
    // All projected points on one line, i.e. all points on one circle through the pivot: join
    // them in order along the line, and the pivot, at infinity, to both ends.
    const along = alongLine(coords);
    for (let j = 0; j + 1 < along.length; j++) out.add(global[along[j]], global[along[j + 1]]);
    out.add(pivot, global[along[0]]);
    out.add(pivot, global[along[along.length - 1]]);
    return out.edges();
  }
  const { triangles, halfedges, infinite } = planar;
  const vertex = (k: number) => (k === infinite ? pivot : global[k]);
  for (let e = 0; e < planar.length; e++) {
    if (halfedges[e] < e) continue; // the twin stands for it
    out.add(vertex(triangles[e]), vertex(triangles[e % 3 === 2 ? e - 2 : e + 1]));
  }
  // A point whose projection coincides with another's (some 1e-16 radians apart on the sphere)
  // has no place of its own in the plane: join it to every other point.
  for (const k of planar.coincident) for (let i = 0; i < n; i++) if (i !== global[k]) out.add(global[k], i);
  return out.edges();
}

/** Indices of collinear points in order along their line. */
function alongLine(coords: Float64Array): Uint32Array {
  const m = coords.length / 2;
  // The direction from the first point to the one farthest from it.
  let dx = 0, dy = 0;
  for (let k = 1; k < m; k++) {
    const ex = coords[2 * k] - coords[0], ey = coords[2 * k + 1] - coords[1];
    if (ex * ex + ey * ey > dx * dx + dy * dy) { dx = ex; dy = ey; }
  }
  const along = new Float64Array(m);
  for (let k = 0; k < m; k++) along[k] = coords[2 * k] * dx + coords[2 * k + 1] * dy;
  return orderByKey(along, Uint32Array.from({ length: m }, (_, k) => k));
}

/** A growable list of index pairs. */
class EdgeList {
  private pairs: Uint32Array;
  private length = 0;

  constructor(capacityEdges: number) {
    this.pairs = new Uint32Array(2 * capacityEdges);
  }

  add(a: number, b: number): void {
    if (this.length + 2 > this.pairs.length) {
      const grown = new Uint32Array(2 * this.pairs.length + 16);
      grown.set(this.pairs);
      this.pairs = grown;
    }
    this.pairs[this.length++] = a;
    this.pairs[this.length++] = b;
  }

  edges(): Uint32Array {
    return this.pairs.slice(0, this.length);
  }
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
