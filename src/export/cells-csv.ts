import type { CellTallies } from '../footprint/cell-tallies';
import type { EqualAreaGrid } from '../grid/equal-area-grid';
import { csvField, csvLine, DECIMALS, fixed } from './csv-text';

export const CELLS_COLUMNS = ['slice', 'grid', 'cell', 'cell_lat', 'cell_lon', 'occurrences', 'collections', 'taxa'] as const;

/**
 * `cells.csv`: one row per occupied (slice, cell), by slice (from 1, oldest) then cell number.
 * The grid, cell and centre fields are formatted once per cell, however many slices occupy it.
 */
export function cellsCsv(cells: CellTallies, grid: EqualAreaGrid): string {
  const lines = [csvLine(CELLS_COLUMNS)];
  const cellFields = new Map<number, string>();
  const centre = new Float64Array(2);
  const gridField = csvField(grid.name);
  for (let k = 0; k < cells.count; k++) {
    const cell = cells.cell[k];
    let fields = cellFields.get(cell);
    if (fields === undefined) {
      grid.cellCentreInto(cell, centre);
      fields = `${gridField},${cell},${fixed(centre[0], DECIMALS.degrees)},${fixed(centre[1], DECIMALS.degrees)}`;
      cellFields.set(cell, fields);
    }
    lines.push(`${cells.slice[k] + 1},${fields},${cells.occurrences[k]},${cells.collections[k]},${cells.taxa[k]}\n`);
  }
  return lines.join('');
}
