/**
 * One slice's occupied cells as flat polygon buffers for deck.gl's binary SolidPolygonLayer,
 * triangulated here so deck skips its own ear-cutting (the main-thread cost of a first visit).
 *
 * Each cell is drawn as a fan of triangles from the mean of its ring's vertices, appended after
 * the ring: valid for rings star-shaped about that point, which equal-area grid cells are in
 * longitude/latitude (test/web/cell-polygons.test.ts checks every HEALPix cell at nside 16).
 * Fill colours are repeated per vertex: deck's binary polygon attributes are per vertex.
 */
import type { CellEntries, CellShapes } from '../protocol';
import type { CountScale } from '../colour/measure-scale';
import { angleBoundDeg } from './globe-lift';

export interface CellPolygons {
  /** Polygons in the slice, one per occupied cell. */
  readonly length: number;
  /** Entry (index into the view's cell columns) of polygon 0; polygon i is entry firstEntry + i. */
  readonly firstEntry: number;
  /**
   * Polygon i owns vertices startIndices[i] … startIndices[i + 1] − 1 (length + 1 values): its
   * closed ring as in CellShapes, then the fan's apex.
   */
  readonly startIndices: Uint32Array;
  /** [lon, lat] per vertex, degrees. */
  readonly positions: Float32Array;
  /** [r, g, b] per vertex: the fill of the vertex's cell. */
  readonly colours: Uint8Array;
  /** Triangles, three vertex indices each, counter-clockwise like the rings. */
  readonly indices: Uint32Array;
  /** Upper bound, degrees, of the angle from any apex to a vertex of its ring (0 when empty). */
  readonly reachDeg: number;
}

/** Builds slice `slice`'s cell polygons, coloured by `scale` applied to `counts` (a cell column). */
export function buildCellPolygons(
  cells: CellEntries, shapes: CellShapes, slice: number, counts: Uint32Array, scale: CountScale,
): CellPolygons {
  const first = cells.sliceStart[slice];
  const length = cells.sliceStart[slice + 1] - first;
  const { ringStart, coords } = shapes;

  const startIndices = new Uint32Array(length + 1);
  let vertices = 0;
  let triangles = 0;
  for (let i = 0; i < length; i++) {
    startIndices[i] = vertices;
    const shape = cells.shape[first + i];
    const ringLength = ringStart[shape + 1] - ringStart[shape];
    vertices += ringLength + 1;
    triangles += ringLength - 1; // one per edge of the closed ring
  }
  startIndices[length] = vertices;

  const positions = new Float32Array(vertices * 2);
  const colours = new Uint8Array(vertices * 3);
  const indices = new Uint32Array(triangles * 3);
  let t = 0;
  let reach = 0;
  for (let i = 0; i < length; i++) {
    const entry = first + i;
    const shape = cells.shape[entry];
    const from = ringStart[shape];
    const ringLength = ringStart[shape + 1] - from;
    const at = startIndices[i];
    const apex = at + ringLength;
    // Ring copied as is; apex at the mean of its distinct vertices (the last repeats the first).
    let lon = 0;
    let lat = 0;
    for (let v = 0; v < ringLength; v++) {
      const x = coords[(from + v) * 2];
      const y = coords[(from + v) * 2 + 1];
      positions[(at + v) * 2] = x;
      positions[(at + v) * 2 + 1] = y;
      if (v < ringLength - 1) {
        lon += x;
        lat += y;
        indices[t++] = apex;
        indices[t++] = at + v;
        indices[t++] = at + v + 1;
      }
    }
    const apexLon = lon / (ringLength - 1);
    const apexLat = lat / (ringLength - 1);
    positions[apex * 2] = apexLon;
    positions[apex * 2 + 1] = apexLat;
    for (let v = at; v < apex; v++) reach = Math.max(reach, angleBoundDeg(apexLon, apexLat, positions[v * 2], positions[v * 2 + 1]));
    scale.colourInto(counts[entry], colours, at * 3);
    const r = colours[at * 3];
    const g = colours[at * 3 + 1];
    const b = colours[at * 3 + 2];
    for (let v = at + 1; v <= apex; v++) {
      colours[v * 3] = r;
      colours[v * 3 + 1] = g;
      colours[v * 3 + 2] = b;
    }
  }
  return { length, firstEntry: first, startIndices, positions, colours, indices, reachDeg: reach };
}
