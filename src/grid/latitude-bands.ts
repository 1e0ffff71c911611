import { bandCellCentroidInto, bandCellRing } from './band-cell-geometry';
import type { EqualAreaGrid } from './equal-area-grid';
import { assertBatchLengths, assertCell, invalidPosition, ringStepDeg } from './grid-input';
import { type BandLayout, bandLayout } from './latitude-bands-layout';

/**
 * The `bands:DEG` grid: rows about DEG high, each split into equal columns about DEG wide, row
 * edges adjusted so every cell has area exactly 4π/N (see bandLayout for the construction).
 * Cell = cells in the rows south of it + its column counted eastward from -180°.
 *
 * Boundaries: a position on a row edge belongs to the row north of it (the row whose southern
 * edge it is), one on a column edge to the column east of it (whose western edge it is), so
 * longitude 180° is column 0 like -180°; a pole is taken at longitude 0. The centre of a cell is
 * its spherical centroid. Positions are checked: latitude within [-90, 90] degrees, longitude
 * finite (any value, taken modulo 360°).
 */
export class LatitudeBandsGrid implements EqualAreaGrid {
  readonly name: string;
  readonly layout: BandLayout;
  readonly cellCount: number;
  readonly cellAreaSr: number;
  readonly #rowHeight: number;

  constructor(deg: number) {
    this.layout = bandLayout(deg);
    this.name = `bands:${deg}`;
    this.cellCount = this.layout.cellCount;
    this.cellAreaSr = (4 * Math.PI) / this.cellCount;
    this.#rowHeight = 180 / this.layout.rowCount;
  }

  cellOf(latDeg: number, lonDeg: number): number {
    if (!(latDeg >= -90 && latDeg <= 90 && lonDeg - lonDeg === 0)) throw invalidPosition(latDeg, lonDeg);
    return this.#cell(latDeg, lonDeg);
  }

  cellsOf(latDeg: Float64Array, lonDeg: Float64Array, out: Uint32Array): void {
    assertBatchLengths(latDeg, lonDeg, out);
    for (let i = 0; i < latDeg.length; i++) {
      const lat = latDeg[i];
      const lon = lonDeg[i];
      if (!(lat >= -90 && lat <= 90 && lon - lon === 0)) throw invalidPosition(lat, lon, i);
      out[i] = this.#cell(lat, lon);
    }
  }

  cellCentreInto(cell: number, out: Float64Array): Float64Array {
    assertCell(this.name, this.cellCount, cell);
    const row = this.#rowOfCell(cell);
    return bandCellCentroidInto(
      this.layout.edgeLatDeg[row],
      this.layout.edgeLatDeg[row + 1],
      this.#west(row, cell),
      this.#west(row, cell + 1),
      out,
    );
  }

  cellRing(cell: number, maxStepDeg?: number): Array<[number, number]> {
    assertCell(this.name, this.cellCount, cell);
    const row = this.#rowOfCell(cell);
    return bandCellRing(
      this.layout.edgeLatDeg[row],
      this.layout.edgeLatDeg[row + 1],
      this.#west(row, cell),
      this.#west(row, cell + 1),
      ringStepDeg(maxStepDeg),
    );
  }

  /** The kernel: positions already checked. */
  #cell(latDeg: number, lonDeg: number): number {
    const { rowCount, edgeLatDeg, columns, firstCell } = this.layout;
    // The adjusted edges stay close to the nominal ones: start there and step to the right row.
    let row = Math.floor((latDeg + 90) / this.#rowHeight);
    if (row > rowCount - 1) row = rowCount - 1;
    while (row > 0 && latDeg < edgeLatDeg[row]) row--;
    while (row < rowCount - 1 && latDeg >= edgeLatDeg[row + 1]) row++;
    // Degrees east of -180°, in [0, 360).
    // Floating-point % is a slow library call: only longitudes outside [-540, 180] need it.
    let east = latDeg === 90 || latDeg === -90 ? 180 : lonDeg + 180;
    if (east < -360 || east > 360) east %= 360;
    if (east < 0) east += 360;
    if (east >= 360) east -= 360;
    const n = columns[row];
    const column = Math.floor((east * n) / 360);
    return firstCell[row] + (column < n ? column : n - 1);
  }

  /** Row holding a cell number: the last row whose first cell is not after it. */
  #rowOfCell(cell: number): number {
    const { firstCell } = this.layout;
    let lo = 0;
    let hi = this.layout.rowCount - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (firstCell[mid] <= cell) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  }

  /** Western edge (degrees) of the cell `cell` of `row`; cell + 1 gives the eastern edge. */
  #west(row: number, cell: number): number {
    return -180 + ((cell - this.layout.firstCell[row]) * 360) / this.layout.columns[row];
  }
}
