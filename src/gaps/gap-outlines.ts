/**
 * Outlines of a slice's gaps as GeoJSON geometry (RFC 7946): the edges of the planar mesh
 * between a gap cell and a cell that is not in a gap, or on the border of the plane, walked
 * into rings. Shared cell edges thus drop out, holes stay, and the cut at the antimeridian and
 * the pole lines come from the cell pieces themselves, so every ring lies within
 * [−180°, 180°] and no two consecutive positions are alike (vertices are snapped, see
 * SnappedVertices). The gap is on the left of every ring: exteriors run anticlockwise, holes
 * clockwise (RFC 7946 §3.1.6).
 *
 * Where two cells of a gap meet only at a corner (a pinch), the walk keeps to the cell it came
 * along (it takes the first boundary edge met turning clockwise from the way back) and the
 * corner is drawn PINCH_CLIP_DEG inside that cell, so that no ring passes a point twice and no
 * two rings of a polygon touch: turf's kinks counts even a touch at one point, and OGC's rules
 * forbid a ring that touches itself. The corner cut off is a triangle of about PINCH_CLIP_DEG²
 * square degrees, far below what the positions' six decimals resolve in area.
 */
import type { MultiPolygon, Polygon, Position } from 'geojson';
import type { GapGrid } from './gap-grid';
import type { SliceGaps } from './slice-gaps';

const TWO_PI = 2 * Math.PI;
/** How far a pinched corner is drawn inside its cell, degrees: ten units of the last decimal written. */
const PINCH_CLIP_DEG = 1e-5;

/** One geometry per gap, in the order of `gaps`: a Polygon, or a MultiPolygon where the cut or a
 * pole line divides the gap into parts in the plane. */
export function gapOutlines(g: GapGrid, gaps: SliceGaps): Array<Polygon | MultiPolygon> {
  const { from, to, twin, piece, pieceCell, cellPieceStart, pieceEdgeStart, vertexLon, vertexLat } = g.mesh;
  const gapOf = new Int32Array(g.grid.cellCount).fill(-1);
  for (let gap = 0; gap < gaps.gapCount; gap++) {
    for (let k = gaps.cellStart[gap]; k < gaps.cellStart[gap + 1]; k++) gapOf[gaps.cells[k]] = gap;
  }
  // Boundary half-edges, and for each vertex the list of those leaving it.
  const boundary: number[] = [];
  for (let k = 0; k < gaps.cells.length; k++) {
    const cell = gaps.cells[k];
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
  /** Boundary edges of the ring being walked, in order, and the drawn corners of pinches where they start. */
  const order: number[] = [];
  const pinched = new Map<number, Position>();
  /** Per gap, its rings as found: exteriors and holes, each with the piece of its first edge. */
  const ringsOf = Array.from({ length: gaps.gapCount }, () => ({ exteriors: [] as Found[], holes: [] as Found[] }));
  for (let b0 = 0; b0 < boundary.length; b0++) {
    if (seen[b0] !== 0) continue;
    const ring: Position[] = [];
    let twiceArea = 0;
    for (let b = b0; seen[b] === 0; ) {
      seen[b] = 1;
      order.push(b);
      const e = boundary[b];
      ring.push([vertexLon[from[e]], vertexLat[from[e]]]);
      twiceArea += vertexLon[from[e]] * vertexLat[to[e]] - vertexLon[to[e]] * vertexLat[from[e]];
      const first = firstOut[to[e]];
      b = nextOut[first] < 0 ? first : pinchedNext(e, first);
      if (nextOut[first] >= 0) {
        // A pinch: the corner at to[e] is drawn inside the cell (the next position, or the first when closing).
        const corner = clippedCorner(from[e], to[e], to[boundary[b]]);
        if (b === b0) ring[0] = corner;
        else pinched.set(b, corner);
      }
    }
    for (let k = 1; k < ring.length; k++) {
      const corner = pinched.get(order[k]);
      if (corner !== undefined) ring[k] = corner;
    }
    order.length = 0;
    pinched.clear();
    const closed = withoutPoleRuns(ring);
    closed.push([closed[0][0], closed[0][1]]);
    const e0 = boundary[b0];
    const found = ringsOf[gapOf[pieceCell[piece[e0]]]];
    (twiceArea > 0 ? found.exteriors : found.holes).push({ ring: closed, piece: piece[e0] });
  }
  return ringsOf.map(({ exteriors, holes }, gap) => {
    if (exteriors.length === 1) return { type: 'Polygon', coordinates: [exteriors[0].ring, ...holes.map((h) => h.ring)] };
    // Several parts in the plane (cut at the antimeridian or along a pole line): each hole goes
    // with the exterior of the part its piece is joined to.
    const partOf = planarParts(g, gaps, gap, gapOf);
    const coordinates = exteriors.map((exterior) => [exterior.ring]);
    const slot = new Map(exteriors.map((exterior, k) => [partOf[exterior.piece], k]));
    for (const hole of holes) {
      const k = slot.get(partOf[hole.piece]);
      if (k === undefined) throw new Error(`Gap ${gap + 1}: a hole of its outline lies in no part with an exterior.`);
      coordinates[k].push(hole.ring);
    }
    return { type: 'MultiPolygon', coordinates };
  });

  /** Of several boundary edges leaving the end of edge e, the first met turning clockwise
   * from the way back, which keeps to the cell e belongs to. */
  function pinchedNext(e: number, first: number): number {
    const v = to[e];
    const back = Math.atan2(vertexLat[from[e]] - vertexLat[v], vertexLon[from[e]] - vertexLon[v]);
    let best = first, bestTurn = Infinity;
    for (let b = first; b >= 0; b = nextOut[b]) {
      const w = to[boundary[b]];
      let turn = back - Math.atan2(vertexLat[w] - vertexLat[v], vertexLon[w] - vertexLon[v]);
      turn -= TWO_PI * Math.floor(turn / TWO_PI);
      if (turn === 0) turn = TWO_PI;
      if (turn < bestTurn) {
        best = b;
        bestTurn = turn;
      }
    }
    return best;
  }

  /** Corner v between edges u → v and v → w moved PINCH_CLIP_DEG into the angle they make. */
  function clippedCorner(u: number, v: number, w: number): Position {
    const x = vertexLon[v], y = vertexLat[v];
    const ux = vertexLon[u] - x, uy = vertexLat[u] - y, wx = vertexLon[w] - x, wy = vertexLat[w] - y;
    const lu = Math.hypot(ux, uy), lw = Math.hypot(wx, wy);
    let bx = ux / lu + wx / lw, by = uy / lu + wy / lw;
    // Edges in one line (a straight angle): into the cell is to the left of the way in.
    if (Math.hypot(bx, by) < 1e-9) [bx, by] = [uy / lu, -ux / lu];
    const lb = Math.hypot(bx, by);
    return [x + (PINCH_CLIP_DEG * bx) / lb, y + (PINCH_CLIP_DEG * by) / lb];
  }
}

/**
 * The ring (open, not repeating its first position) without the inner positions of runs along a
 * pole line: several cells' pole lines in a row make one, which a planar reader needs once and
 * a reader on the sphere not at all (s2 reads a run of positions on a pole as a chain of
 * near-zero edges; see test/export/polygon-checks.ts).
 */
function withoutPoleRuns(ring: Position[]): Position[] {
  const n = ring.length;
  const onPoleLine = (i: number) => {
    const lat = ring[(i + n) % n][1];
    return Math.abs(lat) === 90 && ring[(i + n - 1) % n][1] === lat && ring[(i + 1) % n][1] === lat;
  };
  const kept = ring.filter((_, i) => !onPoleLine(i));
  return kept.length >= 3 ? kept : ring;
}

interface Found {
  readonly ring: Position[];
  readonly piece: number;
}

/** Label of each piece of gap `gap` by planar part: its pieces joined through twin edges. */
function planarParts(g: GapGrid, gaps: SliceGaps, gap: number, gapOf: Int32Array): Int32Array {
  const { twin, piece, pieceCell, cellPieceStart, pieceEdgeStart } = g.mesh;
  const label = new Int32Array(pieceCell.length).fill(-1);
  const queue: number[] = [];
  let parts = 0;
  for (let k = gaps.cellStart[gap]; k < gaps.cellStart[gap + 1]; k++) {
    const cell = gaps.cells[k];
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
