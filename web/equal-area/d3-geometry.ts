/**
 * The view's columnar outlines and paths as GeoJSON geometry for d3-geo. Rings arrive in
 * RFC 7946 order (exteriors counter-clockwise, holes clockwise); d3-geo reads a ring's inside
 * as the area on its right, so a counter-clockwise ring would be taken for the rest of the globe
 * (see /work/shared/STACK.md). Every ring is therefore reversed before d3 sees it.
 */
import type { FeatureCollection, Geometry, MultiLineString, Polygon, Position } from 'geojson';
import type { CellShapes, PathSet } from '../protocol';

/** Outline of distinct cell `shape` as a d3 polygon (clockwise). */
export function cellPolygon(shapes: CellShapes, shape: number): Polygon {
  const from = shapes.ringStart[shape];
  const to = shapes.ringStart[shape + 1];
  const ring: Position[] = [];
  for (let v = to - 1; v >= from; v--) ring.push([shapes.coords[2 * v], shapes.coords[2 * v + 1]]);
  return { type: 'Polygon', coordinates: [ring] };
}

/** Every path of one slice of a PathSet as one MultiLineString (empty when the slice has none). */
export function slicePaths(set: PathSet, slice: number): MultiLineString {
  const lines: Position[][] = [];
  for (let p = set.sliceStart[slice]; p < set.sliceStart[slice + 1]; p++) {
    const line: Position[] = [];
    for (let v = set.pathStart[p]; v < set.pathStart[p + 1]; v++) line.push([set.coords[2 * v], set.coords[2 * v + 1]]);
    lines.push(line);
  }
  return { type: 'MultiLineString', coordinates: lines };
}

function reversedRings(rings: Position[][]): Position[][] {
  return rings.map((ring) => ring.slice().reverse());
}

function rewindGeometry(geometry: Geometry): Geometry {
  switch (geometry.type) {
    case 'Polygon': return { type: 'Polygon', coordinates: reversedRings(geometry.coordinates) };
    case 'MultiPolygon': return { type: 'MultiPolygon', coordinates: geometry.coordinates.map(reversedRings) };
    case 'GeometryCollection': return { type: 'GeometryCollection', geometries: geometry.geometries.map(rewindGeometry) };
    default: return geometry;
  }
}

/** A copy of RFC 7946 features with every polygon ring reversed for d3 (the input is not touched). */
export function rewindForD3(collection: FeatureCollection): FeatureCollection {
  return {
    type: 'FeatureCollection',
    features: collection.features.map((f) => ({ ...f, geometry: f.geometry === null ? f.geometry : rewindGeometry(f.geometry) })),
  };
}

/**
 * Whether the edge a→b is one that reconstruction adds where it cuts a ring at the antimeridian
 * or closes a ring around a pole along the pole line (src/rotation/reconstruct-geometry.ts): it
 * bounds the fill but is no coastline, and on a polar map it would show as a line from the pole.
 */
function isCutEdge(a: Position, b: Position): boolean {
  return (Math.abs(a[0]) === 180 && a[0] === b[0]) || (Math.abs(a[1]) === 90 && a[1] === b[1]);
}

function appendRingEdges(ring: Position[], lines: Position[][]): void {
  let line: Position[] = [];
  for (let k = 0; k + 1 < ring.length; k++) {
    if (isCutEdge(ring[k], ring[k + 1])) {
      if (line.length > 1) lines.push(line);
      line = [];
      continue;
    }
    if (line.length === 0) line.push(ring[k]);
    line.push(ring[k + 1]);
  }
  if (line.length > 1) lines.push(line);
}

function appendGeometryEdges(geometry: Geometry, lines: Position[][]): void {
  switch (geometry.type) {
    case 'Polygon': for (const ring of geometry.coordinates) appendRingEdges(ring, lines); break;
    case 'MultiPolygon': for (const polygon of geometry.coordinates) for (const ring of polygon) appendRingEdges(ring, lines); break;
    case 'GeometryCollection': for (const g of geometry.geometries) appendGeometryEdges(g, lines); break;
    default: break;
  }
}

/** The outlines of the polygons to stroke: every ring edge except cut and pole-line edges. */
export function polygonEdges(collection: FeatureCollection): MultiLineString {
  const lines: Position[][] = [];
  for (const feature of collection.features) if (feature.geometry !== null) appendGeometryEdges(feature.geometry, lines);
  return { type: 'MultiLineString', coordinates: lines };
}
