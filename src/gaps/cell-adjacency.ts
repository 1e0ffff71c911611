/**
 * Which cells share an edge on the sphere, from the planar mesh: twins join the cells beside
 * every edge of the plane, and the two sides of the cut at the antimeridian are joined where a
 * border edge on +180° and one on −180° overlap along a stretch of latitude (touching at a
 * point does not count, as it does not in the plane).
 */
import type { CellMesh } from './cell-mesh';

/** Neighbours of cell c: neighbour[start[c]] … neighbour[start[c + 1] − 1], ascending. */
export interface CellAdjacency {
  readonly start: Uint32Array;
  readonly neighbour: Uint32Array;
}

/** Overlap, in degrees of latitude, below which two stretches of the cut only touch. */
const OVERLAP_DEG = 1e-9;

export function cellAdjacency(mesh: CellMesh): CellAdjacency {
  const { from, to, twin, piece, pieceCell, cellPieceStart, pieceEdgeStart, vertexLon, vertexLat } = mesh;
  const acrossCut = cutNeighbours(mesh);
  const start = new Uint32Array(mesh.cellCount + 1);
  const out: number[] = [];
  const mine: number[] = [];
  for (let cell = 0; cell < mesh.cellCount; cell++) {
    mine.length = 0;
    for (let e = pieceEdgeStart[cellPieceStart[cell]]; e < pieceEdgeStart[cellPieceStart[cell + 1]]; e++) {
      const other = twin[e] >= 0 ? pieceCell[piece[twin[e]]] : cell;
      if (other !== cell && !mine.includes(other)) mine.push(other);
    }
    for (const other of acrossCut.get(cell) ?? []) if (other !== cell && !mine.includes(other)) mine.push(other);
    mine.sort((a, b) => a - b);
    out.push(...mine);
    start[cell + 1] = out.length;
  }
  return { start, neighbour: Uint32Array.from(out) };

  /** Cells beside each other across the cut: the border edges on +180° and −180° that overlap. */
  function cutNeighbours(m: CellMesh): Map<number, number[]> {
    const cutEast: number[] = [], cutWest: number[] = [];
    for (let e = 0; e < from.length; e++) {
      if (twin[e] < 0 && vertexLon[from[e]] === vertexLon[to[e]] && Math.abs(vertexLon[from[e]]) === 180) {
        (vertexLon[from[e]] > 0 ? cutEast : cutWest).push(e);
      }
    }
    const low = (e: number) => Math.min(vertexLat[from[e]], vertexLat[to[e]]);
    const high = (e: number) => Math.max(vertexLat[from[e]], vertexLat[to[e]]);
    cutEast.sort((a, b) => low(a) - low(b));
    cutWest.sort((a, b) => low(a) - low(b));
    const found = new Map<number, number[]>();
    const join = (a: number, b: number) => {
      const list = found.get(a);
      if (list === undefined) found.set(a, [b]);
      else list.push(b);
    };
    // The stretches of one side tile the cut, so both lists are in order of either end; a sweep
    // meets each overlapping pair once.
    let j = 0;
    for (const e of cutEast) {
      while (j < cutWest.length && high(cutWest[j]) <= low(e) + OVERLAP_DEG) j++;
      for (let k = j; k < cutWest.length && low(cutWest[k]) < high(e) - OVERLAP_DEG; k++) {
        if (Math.min(high(e), high(cutWest[k])) - Math.max(low(e), low(cutWest[k])) > OVERLAP_DEG) {
          const a = m.pieceCell[piece[e]], b = m.pieceCell[piece[cutWest[k]]];
          join(a, b);
          join(b, a);
        }
      }
    }
    return found;
  }
}
