import type { CellTallies } from '../footprint/cell-tallies';
import type { EqualAreaGrid } from '../grid/equal-area-grid';
import { csvLine, DECIMALS, fixed } from './csv-text';

export const CELLS_COLUMNS = ['slice', 'grid', 'cell', 'cell_lat', 'cell_lon', 'occurrences', 'collections', 'taxa'] as const;

/** `cells.csv`: one row per occupied (slice, cell), by slice (from 1, oldest) then cell number. */
export function cellsCsv(cells: CellTallies, grid: EqualAreaGrid): string {
  const lines = [csvLine(CELLS_COLUMNS)];
  const centre = new Float64Array(2);
  for (let k = 0; k < cells.count; k++) {
    grid.cellCentreInto(cells.cell[k], centre);
    lines.push(csvLine([
      String(cells.slice[k] + 1), grid.name, String(cells.cell[k]),
      fixed(centre[0], DECIMALS.degrees), fixed(centre[1], DECIMALS.degrees),
      String(cells.occurrences[k]), String(cells.collections[k]), String(cells.taxa[k]),
    ]));
  }
  return lines.join('');
}
