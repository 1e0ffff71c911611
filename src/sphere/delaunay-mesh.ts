/**
 * The half-edge mesh of planar-delaunay.ts and the local operations of one insertion: splitting
 * a triangle or an edge at the new point p, then Lawson's flips (Lawson 1977) of the edges
 * opposite p until every one is locally Delaunay again. Half-edge e runs from tri[e] to the next
 * vertex of its triangle; he[e] is its twin. Vertex `inf` is the vertex at infinity: a triangle
 * (b, a, ∞) stands for the outside of the hull edge a→b. Every triangle made while inserting p
 * has p third, so the edge opposite p is its first. Predicates are exact (robust-predicates,
 * after Shewchuk 1997); with them a point strictly inside a circumcircle always makes a convex
 * quadrilateral, so no flip can fold the mesh.
 */
import { incircle, orient2d } from 'robust-predicates';

export interface Mesh {
  readonly xy: Float64Array;
  readonly tri: Uint32Array;
  readonly he: Int32Array;
  readonly inf: number;
  /** Half-edges in use. */
  length: number;
  /** Edges opposite the new point still to check. */
  readonly stack: Int32Array;
}

/** Replaces triangle t = (a, b, c) by (a, b, p), (b, c, p), (c, a, p) and makes the mesh Delaunay. */
export function splitTriangle(mesh: Mesh, t: number, p: number): void {
  const { tri, he } = mesh;
  const e = 3 * t, u = mesh.length, v = u + 3;
  mesh.length += 6;
  const a = tri[e], b = tri[e + 1], c = tri[e + 2];
  const hBc = he[e + 1], hCa = he[e + 2];
  tri[e + 2] = p;
  setTriangle(tri, u, b, c, p);
  setTriangle(tri, v, c, a, p);
  link(he, e + 1, u + 2); link(he, e + 2, v + 1);
  link(he, u, hBc); link(he, u + 1, v + 2);
  link(he, v, hCa);
  mesh.stack[0] = e; mesh.stack[1] = u; mesh.stack[2] = v;
  legalize(mesh, p, 3);
}

/**
 * Splits half-edge e = a→b of triangle (a, b, c), and its twin's triangle (b, a, d), at p on the
 * open segment ab, into (c, a, p), (b, c, p), (a, d, p), (d, b, p); then makes the mesh Delaunay.
 */
export function splitEdge(mesh: Mesh, e: number, p: number): void {
  const { tri, he } = mesh;
  const f = he[e];
  const en = next(e), ep = prev(e), fn = next(f), fp = prev(f);
  const a = tri[e], b = tri[en], c = tri[ep], d = tri[fp];
  const hBc = he[en], hCa = he[ep], hAd = he[fn], hDb = he[fp];
  const s = e - (e % 3), t = f - (f % 3), u = mesh.length, w = u + 3;
  mesh.length += 6;
  setTriangle(tri, s, c, a, p);
  setTriangle(tri, u, b, c, p);
  setTriangle(tri, t, a, d, p);
  setTriangle(tri, w, d, b, p);
  link(he, s, hCa); link(he, s + 1, t + 2); link(he, s + 2, u + 1);
  link(he, u, hBc); link(he, u + 2, w + 1);
  link(he, t, hAd); link(he, t + 1, w + 2);
  link(he, w, hDb);
  mesh.stack[0] = s; mesh.stack[1] = u; mesh.stack[2] = t; mesh.stack[3] = w;
  legalize(mesh, p, 4);
}

/**
 * Lawson's flips from the `size` edges on the stack, each the first edge a→b of a triangle
 * (a, b, p). Flipping it for the edge p→s across makes (a, s, p) and (s, b, p), whose first
 * edges go on the stack. Only edges opposite p can have become illegal (Guibas & Stolfi 1985,
 * ACM Trans. Graph. 4(2); de Berg et al. 2008, Computational Geometry, ch. 9).
 */
function legalize(mesh: Mesh, p: number, size: number): void {
  const { xy, tri, he, inf, stack } = mesh;
  const px = xy[2 * p], py = xy[2 * p + 1];
  while (size > 0) {
    const e = stack[--size];
    const f = he[e], k = f % 3, g = f - k; // f = b→a in triangle g = (b, a, s) in some rotation
    const fn = k === 2 ? g : f + 1, fp = k === 0 ? g + 2 : f - 1;
    const s = tri[fp];
    if (s === inf) continue; // nothing lies beyond the hull
    const a = tri[e], b = tri[e + 1];
    const sx = xy[2 * s], sy = xy[2 * s + 1];
    // For an infinite triangle the circle is the half-plane beyond its hull edge: (∞, b, p) is
    // the outside of p→b, (a, ∞, p) that of a→p.
    const illegal = a === inf ? orient2d(xy[2 * b], xy[2 * b + 1], px, py, sx, sy) > 0
      : b === inf ? orient2d(px, py, xy[2 * a], xy[2 * a + 1], sx, sy) > 0
      : incircle(xy[2 * a], xy[2 * a + 1], xy[2 * b], xy[2 * b + 1], px, py, sx, sy) < 0;
    if (!illegal) continue;
    const hAs = he[fn], hSb = he[fp], hBp = he[e + 1];
    tri[e + 1] = s;
    setTriangle(tri, g, s, b, p);
    link(he, e, hAs); link(he, e + 1, g + 2);
    link(he, g, hSb); link(he, g + 1, hBp);
    stack[size++] = e;
    stack[size++] = g;
  }
}

export function setTriangle(tri: Uint32Array, e: number, a: number, b: number, c: number): void {
  tri[e] = a;
  tri[e + 1] = b;
  tri[e + 2] = c;
}

export function link(he: Int32Array, a: number, b: number): void {
  he[a] = b;
  he[b] = a;
}

export function next(e: number): number {
  return e % 3 === 2 ? e - 2 : e + 1;
}

function prev(e: number): number {
  return e % 3 === 0 ? e + 2 : e - 1;
}
