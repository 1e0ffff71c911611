/**
 * Which occupied-cell entry of a slice holds a position: the grid names the cell (exactly, by the
 * same cellOf the analysis used), and a per-slice map from cell id to entry, built on first use,
 * finds the entry. No point-in-polygon test, so no edge or winding ambiguity.
 */
import { parseGridName, type EqualAreaGrid } from '../../src/grid';
import type { CellEntries } from '../protocol';

export class CellLookup {
  readonly #grid: EqualAreaGrid;
  readonly #cells: CellEntries;
  readonly #bySlice: (Map<number, number> | undefined)[] = [];

  constructor(gridName: string, cells: CellEntries) {
    this.#grid = parseGridName(gridName);
    this.#cells = cells;
  }

  /** Entry index (into the CellEntries columns) of the occupied cell at the position, or −1. */
  entryAt(slice: number, latDeg: number, lonDeg: number): number {
    if (!(slice >= 0 && slice + 1 < this.#cells.sliceStart.length)) return -1;
    if (!(latDeg >= -90 && latDeg <= 90 && Number.isFinite(lonDeg))) return -1;
    return this.#entries(slice).get(this.#grid.cellOf(latDeg, lonDeg)) ?? -1;
  }

  #entries(slice: number): Map<number, number> {
    let entries = this.#bySlice[slice];
    if (entries === undefined) {
      entries = new Map();
      const { sliceStart, cell } = this.#cells;
      for (let e = sliceStart[slice]; e < sliceStart[slice + 1]; e++) entries.set(cell[e], e);
      this.#bySlice[slice] = entries;
    }
    return entries;
  }
}
