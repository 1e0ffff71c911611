import { DEGREES, RADIANS } from '../sphere/earth';

/** Cell numbers are stored as Uint32, so a bands grid may have at most 2^32 cells. */
export const BANDS_MAX_CELLS = 2 ** 32;

/** Rows, columns and adjusted row edges of a `bands:DEG` grid, south to north. */
export interface BandLayout {
  /** DEG as given. */
  readonly deg: number;
  readonly rowCount: number;
  /** Columns in each row. */
  readonly columns: Float64Array;
  /** Cells in the rows south of each row; entry rowCount is the total. */
  readonly firstCell: Float64Array;
  /** Latitudes of the row edges in degrees, rowCount + 1 values from -90 to 90. */
  readonly edgeLatDeg: Float64Array;
  readonly cellCount: number;
}

/**
 * Layout of `bands:DEG`, 0 < DEG <= 90:
 * 1. rows: nRows = round(180/DEG), nominally 180/nRows degrees high;
 * 2. columns: row i gets max(1, round(cos φ_i · 360/DEG)) equal columns, φ_i the mid-latitude of
 *    nominal row i, so cells are about DEG wide there; N is the sum over the rows;
 * 3. edges: the edge below row k is moved to the latitude φ_k where the cap south of it holds
 *    exactly the share C_k/N of the sphere, C_k the cells of rows 0…k−1. A cap of colatitude c
 *    has area 2π(1 − cos c) (Archimedes' hat-box theorem), hence sin φ_k = −1 + 2C_k/N, computed
 *    as φ_k = −90° + 2·asin(√(C_k/N)) to stay accurate near the pole. Every cell then has area
 *    4π/N exactly. Columns and edges are built from the pole nearest to each row, so the grid is
 *    symmetric about the equator.
 */
export function bandLayout(deg: number): BandLayout {
  if (!(deg > 0 && deg <= 90)) {
    throw new RangeError(`Band size ${deg} is not allowed: expected a number of degrees with 0 < DEG <= 90.`);
  }
  // 4π/DEG² sr is about the cell count; refuse before allocating rows for a hopeless DEG.
  const roughCount = (4 * Math.PI) / (deg * RADIANS) ** 2;
  if (roughCount > 2 * BANDS_MAX_CELLS) throw tooManyCells(deg, roughCount);
  const rowCount = Math.round(180 / deg);
  const rowHeight = 180 / rowCount;
  const columns = new Float64Array(rowCount);
  const firstCell = new Float64Array(rowCount + 1);
  for (let i = 0; i < rowCount; i++) {
    const fromPole = Math.min(i, rowCount - 1 - i);
    const cosMid = Math.sin((fromPole + 0.5) * rowHeight * RADIANS);
    columns[i] = Math.max(1, Math.round((cosMid * 360) / deg));
    firstCell[i + 1] = firstCell[i] + columns[i];
  }
  const cellCount = firstCell[rowCount];
  if (cellCount > BANDS_MAX_CELLS) throw tooManyCells(deg, cellCount);
  const edgeLatDeg = new Float64Array(rowCount + 1);
  edgeLatDeg[0] = -90;
  edgeLatDeg[rowCount] = 90;
  for (let k = 1; 2 * k < rowCount; k++) {
    edgeLatDeg[k] = -90 + 2 * Math.asin(Math.sqrt(firstCell[k] / cellCount)) * DEGREES;
    edgeLatDeg[rowCount - k] = -edgeLatDeg[k];
  }
  return { deg, rowCount, columns, firstCell, edgeLatDeg, cellCount };
}

function tooManyCells(deg: number, count: number): RangeError {
  return new RangeError(
    `Band size ${deg} gives about ${Math.round(count)} cells: cell numbers must fit 32 bits (at most ${BANDS_MAX_CELLS} cells, DEG of about 0.0031 or more).`,
  );
}
