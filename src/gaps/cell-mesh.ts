/**
 * The cells of a grid as one planar mesh in longitude/latitude, built once per grid and shared
 * by every slice: each cell outline (grid.cellRing, densified) is cut at the antimeridian into
 * pieces, the pieces' vertices are snapped together (SnappedVertices) and their edges become
 * half-edges, each paired with its twin, the same edge run the other way in the piece beside.
 * Where a parallel is a row edge of a bands grid, the rows above and below split it at
 * different longitudes: every edge along a parallel is split at the vertices of the other side
 * lying on it, so that twins match vertex for vertex. Edges without a twin lie on the border
 * of the plane (the cut at ±180°, the pole lines at ±90°); any other edge without one means the
 * outlines do not fit together, and building the mesh fails.
 */
import { splitAtAntimeridian } from '../sphere/split-antimeridian';
import type { EqualAreaGrid } from '../grid/equal-area-grid';
import { SnappedVertices } from './snapped-vertices';

/** Longest step, in degrees of arc, between vertices of a gap outline (as for exported cells). */
export const GAP_EDGE_STEP_DEG = 1;

export interface CellMesh {
  readonly cellCount: number;
  /** Vertex positions, degrees: x = longitude in [−180, 180], y = latitude. */
  readonly vertexLon: Float64Array;
  readonly vertexLat: Float64Array;
  /** Half-edge e runs from vertex from[e] to to[e] with its piece on the left. */
  readonly from: Uint32Array;
  readonly to: Uint32Array;
  readonly piece: Uint32Array;
  /** The half-edge running the other way beside it, or −1 on the border of the plane. */
  readonly twin: Int32Array;
  /** Cell of each piece; pieces of cell c are cellPieceStart[c] … cellPieceStart[c + 1] − 1. */
  readonly pieceCell: Uint32Array;
  readonly cellPieceStart: Uint32Array;
  /** Half-edges of piece p are pieceEdgeStart[p] … pieceEdgeStart[p + 1] − 1. */
  readonly pieceEdgeStart: Uint32Array;
}

/** Closeness, in degrees, below which a position counts as on the border of the plane. */
const BORDER_DEG = 1e-9;

export function buildCellMesh(grid: EqualAreaGrid, stepDeg = GAP_EDGE_STEP_DEG): CellMesh {
  const vertices = new SnappedVertices();
  const rings: number[][] = [];
  const pieceCell: number[] = [];
  const cellPieceStart = new Uint32Array(grid.cellCount + 1);
  for (let cell = 0; cell < grid.cellCount; cell++) {
    for (const part of splitAtAntimeridian(grid.cellRing(cell, stepDeg))) {
      const ids: number[] = [];
      for (let k = 0; k + 1 < part.length; k++) {
        const id = vertices.idOf(part[k][0], part[k][1]);
        if (id !== ids[ids.length - 1]) ids.push(id);
      }
      while (ids.length > 1 && ids[0] === ids[ids.length - 1]) ids.pop();
      rings.push(ids);
      pieceCell.push(cell);
    }
    cellPieceStart[cell + 1] = rings.length;
  }
  const split = splitAlongParallels(rings, vertices);
  const pieceEdgeStart = new Uint32Array(split.length + 1);
  for (let p = 0; p < split.length; p++) pieceEdgeStart[p + 1] = pieceEdgeStart[p] + split[p].length;
  const edgeCount = pieceEdgeStart[split.length];
  const from = new Uint32Array(edgeCount), to = new Uint32Array(edgeCount), piece = new Uint32Array(edgeCount);
  for (let p = 0; p < split.length; p++) {
    const ids = split[p];
    for (let k = 0; k < ids.length; k++) {
      const e = pieceEdgeStart[p] + k;
      from[e] = ids[k];
      to[e] = ids[(k + 1) % ids.length];
      piece[e] = p;
    }
  }
  const vertexLon = Float64Array.from(vertices.x), vertexLat = Float64Array.from(vertices.y);
  const twin = pairedTwins(from, to, vertices.count);
  for (let e = 0; e < edgeCount; e++) {
    if (twin[e] < 0 && !onBorder(vertexLon, vertexLat, from[e], to[e])) {
      throw new Error(
        `Outlines of ${grid.name} do not fit together: the edge of cell ${pieceCell[piece[e]]} from ` +
          `(${vertexLon[from[e]]}, ${vertexLat[from[e]]}) to (${vertexLon[to[e]]}, ${vertexLat[to[e]]}) has no matching edge in a neighbouring cell.`,
      );
    }
  }
  return {
    cellCount: grid.cellCount, vertexLon, vertexLat, from, to, piece, twin,
    pieceCell: Uint32Array.from(pieceCell), cellPieceStart, pieceEdgeStart,
  };
}

function onBorder(lon: Float64Array, lat: Float64Array, a: number, b: number): boolean {
  const alongCut = Math.abs(lon[a]) > 180 - BORDER_DEG && lon[a] === lon[b];
  const alongPole = Math.abs(lat[a]) > 90 - BORDER_DEG && lat[a] === lat[b];
  return alongCut || alongPole;
}

/**
 * Twin of every half-edge (−1 for none): edges bucketed by their lower-numbered end (a counting
 * sort), then paired within each bucket, which holds only the few edges meeting at one vertex.
 */
function pairedTwins(from: Uint32Array, to: Uint32Array, vertexCount: number): Int32Array {
  const edgeCount = from.length;
  const start = new Uint32Array(vertexCount + 1);
  for (let e = 0; e < edgeCount; e++) start[Math.min(from[e], to[e]) + 1]++;
  for (let v = 0; v < vertexCount; v++) start[v + 1] += start[v];
  const next = start.slice(0, vertexCount);
  const byEnd = new Uint32Array(edgeCount);
  for (let e = 0; e < edgeCount; e++) byEnd[next[Math.min(from[e], to[e])]++] = e;
  const twin = new Int32Array(edgeCount).fill(-1);
  for (let v = 0; v < vertexCount; v++) {
    for (let i = start[v]; i < start[v + 1]; i++) {
      const e = byEnd[i];
      if (twin[e] >= 0) continue;
      for (let j = i + 1; j < start[v + 1]; j++) {
        const f = byEnd[j];
        if (twin[f] < 0 && from[e] === to[f] && to[e] === from[f]) {
          twin[e] = f;
          twin[f] = e;
          break;
        }
      }
    }
  }
  return twin;
}

/**
 * Rings with every edge along a parallel split at the vertices of other rings that lie on it
 * strictly between its ends, in the edge's direction.
 */
function splitAlongParallels(rings: number[][], vertices: SnappedVertices): number[][] {
  const { x, y } = vertices;
  const rowOf = (id: number) => SnappedVertices.rowOf(y[id]);
  // Only the rows holding an edge along a parallel are gathered.
  const onRow = new Map<number, number[]>();
  for (const ids of rings) {
    for (let k = 0; k < ids.length; k++) if (y[ids[k]] === y[ids[(k + 1) % ids.length]]) onRow.set(rowOf(ids[k]), []);
  }
  if (onRow.size === 0) return rings;
  for (let id = 0; id < vertices.count; id++) onRow.get(rowOf(id))?.push(id);
  for (const list of onRow.values()) list.sort((a, b) => x[a] - x[b]);
  return rings.map((ids) => {
    const out: number[] = [];
    for (let k = 0; k < ids.length; k++) {
      const a = ids[k], b = ids[(k + 1) % ids.length];
      out.push(a);
      if (y[a] !== y[b]) continue;
      const line = onRow.get(rowOf(a)) as number[];
      if (line.length <= 2) continue;
      const xa = x[a], xb = x[b];
      const lo = Math.min(xa, xb), hi = Math.max(xa, xb);
      const between: number[] = [];
      for (let i = firstAbove(line, vertices.x, lo); i < line.length && x[line[i]] < hi; i++) {
        if (line[i] !== a && line[i] !== b && y[line[i]] === y[a]) between.push(line[i]);
      }
      if (xa > xb) between.reverse();
      out.push(...between);
    }
    return out;
  });
}

/** Index of the first vertex of a sorted row strictly east of `x`. */
function firstAbove(line: number[], xs: Float64Array, x: number): number {
  let lo = 0, hi = line.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (xs[line[mid]] <= x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
