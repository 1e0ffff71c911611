/**
 * Delaunay triangulation in the plane, exact for the given coordinates, with a vertex at
 * infinity closing it into a sphere (as CGAL does; Boissonnat et al. 2002, Comput. Geom. 22):
 * each hull edge a→b bears an "infinite" triangle (b, a, ∞). Points are inserted one by one in
 * index order (callers number them in a spatial order, see sphere-order.ts, which keeps every
 * walk short and memory accesses close together), each located by a visibility walk from the
 * triangle of the previous one (Devillers, Pion & Teillaud 2002, Int. J. Found. Comput. Sci.
 * 13(2)); its triangle or edge is split, and flips restore the Delaunay property (see
 * delaunay-mesh.ts). Orientation and in-circle tests are Shewchuk's adaptive exact predicates
 * (robust-predicates), so nearly cocircular and nearly collinear points — grids, parallels,
 * great circles, tight clusters — come out right, where plain floating point can go wrong.
 */
import { orient2d } from 'robust-predicates';
import { link, next, setTriangle, splitEdge, splitTriangle, type Mesh } from './delaunay-mesh';

/** Half-edge e runs from triangles[e] to the next vertex of its triangle; halfedges[e] is its
 * twin. Vertex n (the number of points) is the vertex at infinity. */
export interface PlanarDelaunay {
  readonly triangles: Uint32Array;
  readonly halfedges: Int32Array;
  /** Half-edges in use (3 × triangles). 0 when all points lie on one line. */
  readonly length: number;
  /** Pairs [point, vertex]: points left out because their coordinates equal the vertex's. */
  readonly coincident: Uint32Array;
}

/** Triangulates the points [x0, y0, x1, y1, …], inserting them in index order. */
export function planarDelaunay(xy: Float64Array): PlanarDelaunay {
  const n = xy.length / 2, infinite = n;
  const seed = firstTriangle(xy);
  if (seed === null) return { triangles: new Uint32Array(0), halfedges: new Int32Array(0), length: 0, coincident: new Uint32Array(0) };
  const capacity = 3 * (2 * n + 2);
  const mesh: Mesh = {
    xy, tri: new Uint32Array(capacity), he: new Int32Array(capacity), inf: infinite, length: 12, stack: new Int32Array(n + 8),
  };
  const [a, b, c] = seed;
  // The triangle (a, b, c) and the infinite triangles on its three edges.
  setTriangle(mesh.tri, 0, a, b, c);
  setTriangle(mesh.tri, 3, b, a, infinite);
  setTriangle(mesh.tri, 6, c, b, infinite);
  setTriangle(mesh.tri, 9, a, c, infinite);
  link(mesh.he, 0, 3); link(mesh.he, 1, 6); link(mesh.he, 2, 9);
  link(mesh.he, 4, 11); link(mesh.he, 7, 5); link(mesh.he, 10, 8);

  const coincident: number[] = [];
  const place: Place = { triangle: 0, edge: -1, vertex: -1 };
  for (let p = 0; p < n; p++) {
    if (p === a || p === b || p === c) continue;
    locate(mesh, p, place);
    if (place.vertex >= 0) coincident.push(p, place.vertex);
    else if (place.edge >= 0) splitEdge(mesh, place.edge, p);
    else splitTriangle(mesh, place.triangle, p);
  }
  return { triangles: mesh.tri, halfedges: mesh.he, length: mesh.length, coincident: Uint32Array.from(coincident) };
}

/** Where a point lies: in `triangle`, on its half-edge `edge`, or at its vertex `vertex` (−1: not). */
interface Place {
  triangle: number;
  edge: number;
  vertex: number;
}

/** Three points of positive orientation, or null when all lie on one line. */
function firstTriangle(xy: Float64Array): [number, number, number] | null {
  const n = xy.length / 2;
  let b = -1;
  for (let i = 1; i < n && b < 0; i++) if (xy[2 * i] !== xy[0] || xy[2 * i + 1] !== xy[1]) b = i;
  if (b < 0) return null;
  for (let c = 1; c < n; c++) {
    const o = orient2d(xy[0], xy[1], xy[2 * b], xy[2 * b + 1], xy[2 * c], xy[2 * c + 1]);
    if (o > 0) return [0, b, c];
    if (o < 0) return [0, c, b];
  }
  return null;
}

/**
 * Visibility walk to a triangle holding p, from `place.triangle` (the last one made): a finite
 * triangle with p inside or on its boundary, or an infinite one with p strictly beyond its hull
 * edge; writes it into `place`. The mesh is Delaunay before every insertion, and there the walk
 * cannot cycle: the cells of a Delaunay subdivision admit no cycle of "in front of" with respect
 * to p (Edelsbrunner 1990, Combinatorica 10(3)), and the triangles of one cell, all of whose
 * vertices lie on its circle, are joined as a tree, which a walk never crosses back.
 */
function locate(mesh: Mesh, p: number, place: Place): void {
  const { xy, tri, he, inf } = mesh;
  const px = xy[2 * p], py = xy[2 * p + 1];
  let e = 3 * place.triangle; // the first half-edge of the current triangle
  let entry = -1; // the half-edge crossed into it, with p strictly on its inner side
  place.edge = -1;
  place.vertex = -1;
  for (;;) {
    const a = tri[e], b = tri[e + 1], c = tri[e + 2];
    if (a === inf || b === inf || c === inf) {
      if (entry >= 0) break; // crossed its hull edge from inside: p is strictly beyond
      const h = c === inf ? e : a === inf ? e + 1 : e + 2;
      const x = tri[h], y = tri[next(h)];
      if (orient2d(xy[2 * x], xy[2 * x + 1], xy[2 * y], xy[2 * y + 1], px, py) > 0) break;
      const into = he[h];
      e = into - (into % 3); // p is inside the hull or on this edge: test all three edges there
      continue;
    }
    const ax = xy[2 * a], ay = xy[2 * a + 1], bx = xy[2 * b], by = xy[2 * b + 1], cx = xy[2 * c], cy = xy[2 * c + 1];
    const oAb = entry === e ? 1 : side(ax, ay, bx, by, px, py);
    if (oAb < 0) { entry = he[e]; e = entry - (entry % 3); continue; }
    const oBc = entry === e + 1 ? 1 : side(bx, by, cx, cy, px, py);
    if (oBc < 0) { entry = he[e + 1]; e = entry - (entry % 3); continue; }
    const oCa = entry === e + 2 ? 1 : side(cx, cy, ax, ay, px, py);
    if (oCa < 0) { entry = he[e + 2]; e = entry - (entry % 3); continue; }
    // On one edge, or on two: at their common vertex.
    const zeros = (oAb === 0 ? 1 : 0) + (oBc === 0 ? 1 : 0) + (oCa === 0 ? 1 : 0);
    if (zeros === 2) place.vertex = oAb !== 0 ? c : oBc !== 0 ? a : b;
    else if (zeros === 1) place.edge = oAb === 0 ? e : oBc === 0 ? e + 1 : e + 2;
    break;
  }
  place.triangle = e / 3;
}

/** Shewchuk's first error bound of the orientation determinant, (3 + 16ε)ε with ε = 2⁻⁵³. */
const ORIENT_BOUND = (3 + 16 * 2 ** -53) * 2 ** -53;

/**
 * orient2d(a, b, c), as robust-predicates computes it: the plain determinant when its first
 * error bound certifies the sign (Shewchuk 1997, Discrete Comput. Geom. 18(3)), else the exact
 * predicate. Checked here first, the bound spares the walk, which tests most, a call and two
 * branches per test.
 */
function side(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  const left = (ay - cy) * (bx - cx), right = (ax - cx) * (by - cy);
  const det = left - right;
  return Math.abs(det) >= ORIENT_BOUND * Math.abs(left + right) ? det : orient2d(ax, ay, bx, by, cx, cy);
}
