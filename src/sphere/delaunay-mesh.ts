/**
 * The half-edge mesh of planar-delaunay.ts and its local operations: splitting a triangle or an
 * edge at a new vertex, and Lawson's flips (Lawson 1977) that make the mesh Delaunay again.
 * Vertex `inf` is the vertex at infinity; an infinite triangle (x, y, inf) stands for the
 * outside of hull edge x→y. Predicates are exact (robust-predicates, after Shewchuk 1997).
 */
import { incircle, orient2d } from 'robust-predicates';

/** Half-edge e runs from tri[e] to the next vertex of its triangle; he[e] is its twin. */
export interface Mesh {
  readonly xy: Float64Array;
  readonly tri: Uint32Array;
  readonly he: Int32Array;
  readonly inf: number;
  length: number;
  readonly stack: number[];
}

/** Replaces triangle (a, b, c) by (a, b, p), (b, c, p), (c, a, p). */
export function splitTriangle(mesh: Mesh, t: number, p: number): void {
  const { tri, he } = mesh;
  const e0 = 3 * t, e1 = e0 + 1, e2 = e0 + 2;
  const a = tri[e0], b = tri[e1], c = tri[e2];
  const h1 = he[e1], h2 = he[e2];
  const u = mesh.length, v = u + 3;
  mesh.length += 6;
  tri[e2] = p; // (a, b, p)
  setTriangle(mesh, u, b, c, p);
  setTriangle(mesh, v, c, a, p);
  link(he, u, h1);
  link(he, v, h2);
  link(he, e1, u + 2); // b→p with p→b
  link(he, u + 1, v + 2); // c→p with p→c
  link(he, v + 1, e2); // a→p with p→a
  mesh.stack.push(e0, u, v);
  flip(mesh);
}

/** Splits edge e = a→b of (a, b, c) and of its twin's triangle (b, a, d) at p. */
export function splitEdge(mesh: Mesh, e: number, p: number): void {
  const { tri, he } = mesh;
  const f = he[e];
  const en = next(e), ep = prev(e), fn = next(f), fp = prev(f);
  const a = tri[e], b = tri[en], c = tri[ep], d = tri[fp];
  const hBc = he[en], hAd = he[fn];
  const u = mesh.length, w = u + 3;
  mesh.length += 6;
  tri[en] = p; // (a, p, c)
  setTriangle(mesh, u, p, b, c);
  tri[fn] = p; // (b, p, d)
  setTriangle(mesh, w, p, a, d);
  link(he, u + 1, hBc);
  link(he, u + 2, en); // c→p with p→c
  link(he, w + 1, hAd);
  link(he, w + 2, fn); // d→p with p→d
  link(he, e, w); // a→p with p→a
  link(he, f, u); // b→p with p→b
  mesh.stack.push(ep, u + 1, fp, w + 1);
  flip(mesh);
}

/** Lawson's flips from the half-edges on the stack, following every flip's outer edges. */
function flip(mesh: Mesh): void {
  const { tri, he, stack } = mesh;
  while (stack.length > 0) {
    const e = stack.pop()!;
    const f = he[e];
    const n = next(e), pv = prev(e), fn = next(f), fp = prev(f);
    // Triangle (p, q, r) on one side of the edge p→q, triangle (q, p, s) on the other.
    const p = tri[e], q = tri[n], r = tri[pv], s = tri[fp];
    if (!inCircle(mesh, p, q, r, s)) continue;
    // The new triangles (s, r, p) and (r, s, q) must be properly oriented.
    if (!positive(mesh, s, r, p) || !positive(mesh, r, s, q)) continue;
    const hPv = he[pv], hFn = he[fn], hFp = he[fp], hN = he[n];
    tri[e] = s; tri[n] = r; tri[pv] = p;
    tri[f] = r; tri[fn] = s; tri[fp] = q;
    link(he, e, f);
    link(he, n, hPv);
    link(he, pv, hFn);
    link(he, fn, hFp);
    link(he, fp, hN);
    stack.push(n, pv, fn, fp);
  }
}

/**
 * True when s lies strictly inside the circumcircle of triangle (p, q, r). For an infinite
 * triangle (x, y, ∞) the "circle" is the half-plane beyond the hull edge x→y (with the open
 * segment itself, so that no flat triangle survives on the hull).
 */
function inCircle(mesh: Mesh, p: number, q: number, r: number, s: number): boolean {
  const inf = mesh.inf;
  if (s === inf) return false;
  if (p === inf) return beyondEdge(mesh, q, r, s);
  if (q === inf) return beyondEdge(mesh, r, p, s);
  if (r === inf) return beyondEdge(mesh, p, q, s);
  const xy = mesh.xy;
  return incircle(xy[2 * p], xy[2 * p + 1], xy[2 * q], xy[2 * q + 1], xy[2 * r], xy[2 * r + 1], xy[2 * s], xy[2 * s + 1]) < 0;
}

function beyondEdge(mesh: Mesh, x: number, y: number, s: number): boolean {
  const o = orient(mesh, x, y, s);
  return o > 0 || (o === 0 && between(mesh, x, y, s));
}

/** True for a finite triangle of positive orientation, or any infinite one. */
function positive(mesh: Mesh, a: number, b: number, c: number): boolean {
  if (a === mesh.inf || b === mesh.inf || c === mesh.inf) return true;
  return orient(mesh, a, b, c) > 0;
}

/** For s on the line through x and y: true when it lies strictly between them. */
function between(mesh: Mesh, x: number, y: number, s: number): boolean {
  const xy = mesh.xy;
  const k = xy[2 * x] !== xy[2 * y] ? 0 : 1; // compare along an axis the segment is not parallel to
  const lo = Math.min(xy[2 * x + k], xy[2 * y + k]), hi = Math.max(xy[2 * x + k], xy[2 * y + k]);
  return xy[2 * s + k] > lo && xy[2 * s + k] < hi;
}

export function finiteTriangle(mesh: Mesh, t: number): boolean {
  return mesh.tri[3 * t] !== mesh.inf && mesh.tri[3 * t + 1] !== mesh.inf && mesh.tri[3 * t + 2] !== mesh.inf;
}

export function orient(mesh: Mesh, a: number, b: number, c: number): number {
  const xy = mesh.xy;
  return orient2d(xy[2 * a], xy[2 * a + 1], xy[2 * b], xy[2 * b + 1], xy[2 * c], xy[2 * c + 1]);
}

export function setTriangle(mesh: Mesh, e: number, a: number, b: number, c: number): void {
  mesh.tri[e] = a;
  mesh.tri[e + 1] = b;
  mesh.tri[e + 2] = c;
}

export function link(he: Int32Array, a: number, b: number): void {
  he[a] = b;
  he[b] = a;
}

export function next(e: number): number {
  return e % 3 === 2 ? e - 2 : e + 1;
}

export function prev(e: number): number {
  return e % 3 === 0 ? e + 2 : e - 1;
}

