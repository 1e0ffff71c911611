/**
 * Point in polygon on the sphere, for many points against one set of GeoJSON polygons whose
 * edges are great-circle arcs (as d3-geo reads them). Each ring bounds the smaller of the two
 * parts of the sphere it divides, whichever way it runs, so that files written clockwise or
 * anticlockwise read alike; a polygon is its exterior's part less its holes' parts, and a point
 * is inside the set when it is inside any polygon.
 *
 * A ring's side of a point P comes from the parity of the crossings of the ring with the
 * meridian arc from P to a reference pole F (the pole farther from the ring), counted with a
 * half-open rule at vertices so that a crossing through a vertex counts once (the ray-crossing
 * test, Shimrat 1962, Comm. ACM 5(8), carried to the sphere). Whether F itself lies on the
 * ring's left comes from the sum of the signed areas of the triangles fanned out from the
 * other pole −F (Van Oosterom & Strackee 1983's formula): the sum is the area on the ring's
 * left, less 4π when F lies on that side. That area also says which side is the smaller.
 * Edges are indexed by the longitudes they span, so each point meets only the edges that cross
 * its meridian.
 */
import type { MultiPolygon, Polygon, Position } from 'geojson';
import { RADIANS } from '../sphere/earth';

/** Buckets of longitude in the edge index. */
const BUCKETS = 360;
/** A ring whose vertices come this close (in z) to both poles has no pole clear of it. */
const POLE_CLEARANCE = 1e-12;

export interface SphericalPolygons {
  /** Per edge: pole of its great circle (a × b, not normalised), its ends' longitudes (degrees) and ring. */
  readonly normal: Float64Array;
  readonly lonA: Float64Array;
  readonly lonB: Float64Array;
  readonly ring: Uint32Array;
  /** Per ring: +1 when its reference pole is north, −1 south; whether that pole is inside; its polygon. */
  readonly pole: Int8Array;
  readonly poleInside: Uint8Array;
  readonly polygonOf: Uint32Array;
  /** Per polygon: its rings are polygonRingStart[p] … (exterior first). */
  readonly polygonRingStart: Uint32Array;
  /** Edges of longitude bucket k: bucketEdges[bucketStart[k]] … . */
  readonly bucketStart: Uint32Array;
  readonly bucketEdges: Uint32Array;
  /** Rings whose reference pole is inside: they hold a point that no edge crosses. */
  readonly poleInsideRings: Uint32Array;
}

/**
 * Prepares the polygons. `where` names them in messages (e.g. the file). Throws RangeError for a
 * ring that is not closed or has fewer than 4 positions, or that passes through both poles.
 */
export function prepareSphericalPolygons(geometries: ReadonlyArray<Polygon | MultiPolygon>, where: string): SphericalPolygons {
  const normal: number[] = [], lonA: number[] = [], lonB: number[] = [], ringOf: number[] = [];
  const pole: number[] = [], poleInside: number[] = [], polygonOf: number[] = [], polygonRingStart: number[] = [0];
  geometries.forEach((geometry, gi) => {
    const polygons = geometry.type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates;
    polygons.forEach((rings, pi) => {
      rings.forEach((positions, ri) => {
        const name = `${where}, geometry ${gi + 1}${geometry.type === 'MultiPolygon' ? `, polygon ${pi + 1}` : ''}, ring ${ri + 1}`;
        const r = pole.length;
        const prepared = prepareRing(positions, name);
        for (let k = 0; k < prepared.lonA.length; k++) {
          normal.push(prepared.normal[3 * k], prepared.normal[3 * k + 1], prepared.normal[3 * k + 2]);
          lonA.push(prepared.lonA[k]);
          lonB.push(prepared.lonB[k]);
          ringOf.push(r);
        }
        pole.push(prepared.pole);
        poleInside.push(prepared.poleInside ? 1 : 0);
        polygonOf.push(polygonRingStart.length - 1);
      });
      polygonRingStart.push(pole.length);
    });
  });
  const index = longitudeIndex(Float64Array.from(lonA), Float64Array.from(lonB));
  const poleInsideRings: number[] = [];
  poleInside.forEach((inside, r) => {
    if (inside) poleInsideRings.push(r);
  });
  return {
    normal: Float64Array.from(normal), lonA: Float64Array.from(lonA), lonB: Float64Array.from(lonB), ring: Uint32Array.from(ringOf),
    pole: Int8Array.from(pole), poleInside: Uint8Array.from(poleInside), polygonOf: Uint32Array.from(polygonOf),
    polygonRingStart: Uint32Array.from(polygonRingStart), ...index, poleInsideRings: Uint32Array.from(poleInsideRings),
  };
}

function unitVector(p: Position): [number, number, number] {
  if (Math.abs(p[1]) === 90) return [0, 0, Math.sign(p[1])];
  const lat = p[1] * RADIANS, lon = p[0] * RADIANS;
  return [Math.cos(lat) * Math.cos(lon), Math.cos(lat) * Math.sin(lon), Math.sin(lat)];
}

function prepareRing(positions: readonly Position[], name: string) {
  const last = positions.length - 1;
  if (positions.length < 4 || positions[0][0] !== positions[last][0] || positions[0][1] !== positions[last][1]) {
    throw new RangeError(`${name}: expected a closed ring of at least 4 positions, the last equal to the first.`);
  }
  const v = positions.slice(0, last).map(unitVector);
  const onPole = (k: number) => Math.abs(positions[k][1]) === 90;
  let minZ = Infinity, maxZ = -Infinity;
  for (const [, , z] of v) {
    minZ = Math.min(minZ, z);
    maxZ = Math.max(maxZ, z);
  }
  if (maxZ > 1 - POLE_CLEARANCE && minZ < -1 + POLE_CLEARANCE) throw new RangeError(`${name}: the ring passes through both poles, so no pole is clear of it.`);
  const refPole = maxZ <= -minZ ? 1 : -1; // the pole farther from the vertices
  const normal: number[] = [], lonA: number[] = [], lonB: number[] = [];
  let fan = 0;
  for (let k = 0; k < last; k++) {
    const a = v[k], b = v[(k + 1) % last];
    const n: [number, number, number] = [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
    // Triangle (−F, a, b): tan(E/2) = q·(a × b) / (1 + q·a + a·b + b·q) with q = −F.
    const q = -refPole;
    fan += 2 * Math.atan2(q * n[2], 1 + q * a[2] + a[0] * b[0] + a[1] * b[1] + a[2] * b[2] + q * b[2]);
    const kb = (k + 1) % last;
    // A repeated position, or a pole line (two positions on one pole), is no edge on the sphere.
    if ((n[0] === 0 && n[1] === 0 && n[2] === 0) || (onPole(k) && onPole(kb))) continue;
    // A pole has no longitude: an edge to or from it runs along the other end's meridian.
    normal.push(...n);
    lonA.push(onPole(k) ? positions[kb][0] : positions[k][0]);
    lonB.push(onPole(kb) ? positions[k][0] : positions[kb][0]);
  }
  const poleOnLeft = fan < 0;
  const leftArea = fan + (poleOnLeft ? 4 * Math.PI : 0);
  const smallerIsLeft = leftArea <= 2 * Math.PI;
  return { normal, lonA, lonB, pole: refPole, poleInside: smallerIsLeft === poleOnLeft };
}

/** Degrees wrapped into [−180, 180). */
function wrapped(lon: number): number {
  return lon - 360 * Math.floor((lon + 180) / 360);
}

function bucketOf(lon: number): number {
  return Math.min(BUCKETS - 1, Math.floor(((wrapped(lon) + 180) * BUCKETS) / 360));
}

/** Buckets of longitude, each listing the edges whose longitudes reach into it. */
function longitudeIndex(lonA: Float64Array, lonB: Float64Array): { bucketStart: Uint32Array; bucketEdges: Uint32Array } {
  const spans = (e: number, visit: (bucket: number) => void) => {
    const a = wrapped(lonA[e]), b = wrapped(lonB[e]);
    let west = Math.min(a, b), east = Math.max(a, b);
    if (east - west >= 180) [west, east] = [east, west + 360]; // over the antimeridian
    for (let k = bucketOf(west), end = bucketOf(east); ; k = (k + 1) % BUCKETS) {
      visit(k);
      if (k === end) break;
    }
  };
  const bucketStart = new Uint32Array(BUCKETS + 1);
  for (let e = 0; e < lonA.length; e++) spans(e, (k) => bucketStart[k + 1]++);
  for (let k = 0; k < BUCKETS; k++) bucketStart[k + 1] += bucketStart[k];
  const next = bucketStart.slice(0, BUCKETS);
  const bucketEdges = new Uint32Array(bucketStart[BUCKETS]);
  for (let e = 0; e < lonA.length; e++) spans(e, (k) => (bucketEdges[next[k]++] = e));
  return { bucketStart, bucketEdges };
}

/**
 * Marks in `out` (one byte per point, 1 inside, 0 not) the points (degrees) inside the polygons.
 */
export function pointsInSphericalPolygons(sp: SphericalPolygons, latDeg: Float64Array, lonDeg: Float64Array, out: Uint8Array): Uint8Array {
  const ringCount = sp.pole.length;
  const parity = new Uint8Array(ringCount);
  const touched: number[] = [];
  const insideRing = (r: number) => (parity[r] ^ sp.poleInside[r]) === 1;
  for (let i = 0; i < latDeg.length; i++) {
    const lat = latDeg[i] * RADIANS, lonP = lonDeg[i];
    const px = Math.cos(lat) * Math.cos(lonP * RADIANS), py = Math.cos(lat) * Math.sin(lonP * RADIANS), pz = Math.sin(lat);
    const bucket = bucketOf(lonP);
    for (let k = sp.bucketStart[bucket]; k < sp.bucketStart[bucket + 1]; k++) {
      const e = sp.bucketEdges[k];
      const da = wrapped(sp.lonA[e] - lonP), db = wrapped(sp.lonB[e] - lonP);
      if (da >= 0 === db >= 0 || Math.abs(db - da) >= 180) continue;
      const side = sp.normal[3 * e] * px + sp.normal[3 * e + 1] * py + sp.normal[3 * e + 2] * pz;
      // Eastward edges have the north on their left; count the crossing when it lies between P and F.
      const eastward = db > da;
      const r = sp.ring[e];
      if ((eastward ? side : -side) * sp.pole[r] < 0) {
        if (parity[r] === 0 && !touched.includes(r)) touched.push(r);
        parity[r] ^= 1;
      }
    }
    let inside = false;
    const candidates = touched.length === 0 ? sp.poleInsideRings : [...touched, ...sp.poleInsideRings];
    for (const r of candidates) {
      const p = sp.polygonOf[r];
      const exterior = sp.polygonRingStart[p];
      if (!insideRing(exterior)) continue;
      let inHole = false;
      for (let h = exterior + 1; h < sp.polygonRingStart[p + 1] && !inHole; h++) inHole = insideRing(h);
      if (!inHole) {
        inside = true;
        break;
      }
    }
    out[i] = inside ? 1 : 0;
    for (const r of touched) parity[r] = 0;
    touched.length = 0;
  }
  return out;
}
