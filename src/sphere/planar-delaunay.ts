/**
 * Delaunay triangulation in the plane, exact for the given coordinates, with a vertex at
 * infinity closing it into a sphere (as CGAL does; Boissonnat et al. 2002, Comput. Geom. 22):
 * each hull edge (a, b) bears an "infinite" triangle (b, a, ∞). Points are inserted in Z-order
 * (Morton 1966) of their coordinate ranks, each located by a visibility walk from the last new
 * triangle (Devillers, Pion & Teillaud 2002, Int. J. Found. Comput. Sci. 13(2)), its triangle
 * split, and Lawson's flips (Lawson 1977) restore the Delaunay property. Orientation and
 * in-circle tests are Shewchuk's adaptive exact predicates (robust-predicates), so nearly
 * cocircular and nearly collinear points — grids, parallels, great circles, tight clusters —
 * come out right, where plain floating point (Delaunator's in-circle test) can go wrong.
 */
import { orient2d } from 'robust-predicates';
import { finiteTriangle, link, next, orient, setTriangle, splitEdge, splitTriangle, type Mesh } from './delaunay-mesh';
import { zOrder } from './z-order';

/** Half-edge e runs from triangles[e] to the next vertex of its triangle; halfedges[e] is its
 * twin. Vertex `infinite` (= the number of points) is the vertex at infinity. */
export interface PlanarDelaunay {
  readonly triangles: Uint32Array;
  readonly halfedges: Int32Array;
  /** Half-edges in use (3 × triangles). 0 when all points lie on one line. */
  readonly length: number;
  readonly infinite: number;
  /** Points left out because their coordinates equal those of a point already in. */
  readonly coincident: Uint32Array;
}

/** Triangulates the points [x0, y0, x1, y1, …]. */
export function planarDelaunay(xy: Float64Array): PlanarDelaunay {
  const n = xy.length / 2;
  const seed = firstTriangle(xy);
  const empty = { triangles: new Uint32Array(0), halfedges: new Int32Array(0), length: 0, infinite: n, coincident: new Uint32Array(0) };
  if (seed === null) return empty;
  const capacity = 3 * (2 * n + 2);
  const mesh: Mesh = { xy, tri: new Uint32Array(capacity), he: new Int32Array(capacity), inf: n, length: 0, stack: [] };
  const [a, b, c] = seed;
  // The triangle (a, b, c) and the infinite triangles on its three edges.
  setTriangle(mesh, 0, a, b, c);
  setTriangle(mesh, 3, b, a, n);
  setTriangle(mesh, 6, c, b, n);
  setTriangle(mesh, 9, a, c, n);
  mesh.length = 12;
  link(mesh.he, 0, 3); link(mesh.he, 1, 6); link(mesh.he, 2, 9);
  link(mesh.he, 4, 11); link(mesh.he, 7, 5); link(mesh.he, 10, 8);

  const coincident: number[] = [];
  const order = zOrder(xy);
  for (let k = 0; k < n; k++) {
    const p = order[k];
    if (p === a || p === b || p === c) continue;
    if (!insertPoint(mesh, p, Math.floor(mesh.length / 3) - 1)) coincident.push(p);
  }
  return { triangles: mesh.tri, halfedges: mesh.he, length: mesh.length, infinite: n, coincident: Uint32Array.from(coincident) };
}

/** Three points of positive orientation, or null when all points lie on one line. */
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

/** Inserts p; false when its coordinates equal a vertex's. */
function insertPoint(mesh: Mesh, p: number, start: number): boolean {
  const t = locate(mesh, p, start);
  let onEdge = -1;
  // An infinite triangle is only found with p strictly beyond its hull edge; a finite one may
  // have p on an edge, or on two (at a vertex).
  for (let k = 0; k < 3 && finiteTriangle(mesh, t); k++) {
    const e = 3 * t + k;
    if (orient(mesh, mesh.tri[e], mesh.tri[next(e)], p) !== 0) continue;
    if (onEdge >= 0) return false;
    onEdge = e;
  }
  if (onEdge >= 0) splitEdge(mesh, onEdge, p);
  else splitTriangle(mesh, t, p);
  return true;
}

/**
 * A triangle holding p: a finite one holding it (edges included), or an infinite one whose hull
 * edge has p strictly outside. Visibility walk, falling back to a scan if it runs too long.
 */
function locate(mesh: Mesh, p: number, start: number): number {
  const { tri, he, inf } = mesh;
  let t = start;
  for (let steps = 0; steps < 4 * mesh.length; steps++) {
    let moved = false;
    for (let j = 0; j < 3 && !moved; j++) {
      const e = 3 * t + ((j + steps) % 3); // varying the first edge tried rules out cycles
      const q = tri[e], r = tri[next(e)];
      if (q === inf || r === inf) continue;
      const o = orient(mesh, q, r, p);
      if (finiteTriangle(mesh, t) ? o < 0 : o <= 0) {
        t = Math.floor(he[e] / 3);
        moved = true;
      }
    }
    if (!moved) return t;
  }
  for (let u = 0; u < mesh.length / 3; u++) if (holds(mesh, u, p)) return u;
  throw new Error(`Planar Delaunay: no triangle holds point ${p}.`);
}

function holds(mesh: Mesh, t: number, p: number): boolean {
  for (let k = 0; k < 3; k++) {
    const e = 3 * t + k;
    const q = mesh.tri[e], r = mesh.tri[next(e)];
    if (q === mesh.inf || r === mesh.inf) continue;
    const o = orient(mesh, q, r, p);
    if (finiteTriangle(mesh, t) ? o < 0 : o <= 0) return false;
  }
  return true;
}

