/**
 * Outlines of a slice's gaps as GeoJSON geometry (RFC 7946): the edges of the planar mesh
 * between a gap cell and a cell that is not in a gap, or on the border of the plane, walked
 * into rings. Shared cell edges thus drop out, holes stay, and the cut at the antimeridian and
 * the pole lines come from the cell pieces themselves, so every ring lies within
 * [−180°, 180°] and no two consecutive positions are alike (vertices are snapped, see
 * SnappedVertices). The gap is on the left of every ring: exteriors run anticlockwise, holes
 * clockwise (RFC 7946 §3.1.6).
 *
 * Where two cells of a gap meet only at a corner, the walk turns towards the cells outside
 * the gap (it takes the first boundary edge met turning anticlockwise from the way it came),
 * so a ring never passes a vertex twice: a hole that touches its exterior does so at a point,
 * as the OGC simple-features rules allow.
 */
import type { MultiPolygon, Polygon, Position } from 'geojson';
import type { GapGrid } from './gap-grid';
import type { SliceGaps } from './slice-gaps';

const TWO_PI = 2 * Math.PI;

/** One geometry per gap, in the order of `gaps`: a Polygon, or a MultiPolygon where the cut or a
 * pole line divides the gap into parts in the plane. */
export function gapOutlines(g: GapGrid, gaps: SliceGaps): Array<Polygon | MultiPolygon> {
  const { from, to, twin, piece, pieceCell, cellPieceStart, pieceEdgeStart, vertexLon, vertexLat } = g.mesh;
  const gapOf = new Int32Array(g.grid.cellCount).fill(-1);
  for (let gap = 0; gap < gaps.gapCount; gap++) {
    for (let k = gaps.cellStart[gap]; k < gaps.cellStart[gap + 1]; k++) gapOf[gaps.cells[k]] = gap;
  }
  const partOf = planarParts(g, gaps, gapOf);
  // Boundary half-edges, and for each vertex the list of those leaving it.
  const boundary: number[] = [];
  for (const cell of gaps.cells) {
    for (let e = pieceEdgeStart[cellPieceStart[cell]]; e < pieceEdgeStart[cellPieceStart[cell + 1]]; e++) {
      if (twin[e] < 0 || gapOf[pieceCell[piece[twin[e]]]] < 0) boundary.push(e);
    }
  }
  const firstOut = new Int32Array(vertexLon.length).fill(-1);
  const nextOut = new Int32Array(boundary.length);
  for (let b = 0; b < boundary.length; b++) {
    const v = from[boundary[b]];
    nextOut[b] = firstOut[v];
    firstOut[v] = b;
  }
  const seen = new Uint8Array(boundary.length);
  /** Per gap, per planar part: [exterior, ...holes] as they are found. */
  const polygons: Array<Map<number, { exterior?: Position[]; holes: Position[][] }>> = Array.from({ length: gaps.gapCount }, () => new Map());
  for (let b0 = 0; b0 < boundary.length; b0++) {
    if (seen[b0] !== 0) continue;
    const ring: Position[] = [];
    let twiceArea = 0;
    for (let b = b0; seen[b] === 0; ) {
      seen[b] = 1;
      const e = boundary[b];
      ring.push([vertexLon[from[e]], vertexLat[from[e]]]);
      twiceArea += vertexLon[from[e]] * vertexLat[to[e]] - vertexLon[to[e]] * vertexLat[from[e]];
      b = nextBoundary(e, firstOut[to[e]]);
    }
    ring.push([ring[0][0], ring[0][1]]);
    const e0 = boundary[b0];
    const parts = polygons[gapOf[pieceCell[piece[e0]]]];
    const part = partOf[piece[e0]];
    const polygon = parts.get(part) ?? { holes: [] };
    parts.set(part, polygon);
    if (twiceArea > 0) polygon.exterior = ring;
    else polygon.holes.push(ring);
  }
  return polygons.map((parts, gap) => {
    const coordinates = [...parts.values()].map(({ exterior, holes }) => {
      if (exterior === undefined) throw new Error(`Gap ${gap + 1}: a part of its outline has holes but no exterior.`);
      return [exterior, ...holes];
    });
    return coordinates.length === 1 ? { type: 'Polygon', coordinates: coordinates[0] } : { type: 'MultiPolygon', coordinates };
  });

  /** The boundary edge to follow edge e: of those leaving its end, the first met turning
   * anticlockwise from the way back (a single one is taken as it is). */
  function nextBoundary(e: number, first: number): number {
    if (nextOut[first] < 0) return first;
    const v = to[e];
    const back = Math.atan2(vertexLat[from[e]] - vertexLat[v], vertexLon[from[e]] - vertexLon[v]);
    let best = first, bestTurn = Infinity;
    for (let b = first; b >= 0; b = nextOut[b]) {
      const w = to[boundary[b]];
      let turn = Math.atan2(vertexLat[w] - vertexLat[v], vertexLon[w] - vertexLon[v]) - back;
      turn -= TWO_PI * Math.floor(turn / TWO_PI);
      if (turn === 0) turn = TWO_PI;
      if (turn < bestTurn) {
        best = b;
        bestTurn = turn;
      }
    }
    return best;
  }
}

/** Label of each gap piece's planar part: pieces of gap cells joined through twin edges. */
function planarParts(g: GapGrid, gaps: SliceGaps, gapOf: Int32Array): Int32Array {
  const { twin, piece, pieceCell, cellPieceStart, pieceEdgeStart } = g.mesh;
  const label = new Int32Array(pieceCell.length).fill(-1);
  const queue: number[] = [];
  let parts = 0;
  for (const cell of gaps.cells) {
    for (let p0 = cellPieceStart[cell]; p0 < cellPieceStart[cell + 1]; p0++) {
      if (label[p0] >= 0) continue;
      label[p0] = parts;
      queue.length = 0;
      queue.push(p0);
      while (queue.length > 0) {
        const p = queue.pop() as number;
        for (let e = pieceEdgeStart[p]; e < pieceEdgeStart[p + 1]; e++) {
          const t = twin[e];
          if (t < 0) continue;
          const q = piece[t];
          if (label[q] < 0 && gapOf[pieceCell[q]] >= 0) {
            label[q] = parts;
            queue.push(q);
          }
        }
      }
      parts++;
    }
  }
  return label;
}
