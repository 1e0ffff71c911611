import type { CellTallies } from '../footprint/cell-tallies';
import type { EqualAreaGrid } from '../grid/equal-area-grid';
import { AsciiWriter } from './ascii-writer';
import { csvField, csvLine, DECIMALS, fixed } from './csv-text';

export const CELLS_COLUMNS = ['slice', 'grid', 'cell', 'cell_lat', 'cell_lon', 'occurrences', 'collections', 'taxa'] as const;

/**
 * `cells.csv`: one row per occupied (slice, cell), by slice (from 1, oldest) then cell number.
 * Written as ASCII bytes, in chunks of about CHUNK_BYTES (the consumer's to keep); the grid, cell
 * and centre fields are formatted once per cell, however many slices occupy it.
 */
export function* cellsCsv(cells: CellTallies, grid: EqualAreaGrid): Generator<Uint8Array, void, undefined> {
  const out = new AsciiWriter();
  out.bytes(AsciiWriter.encode(csvLine(CELLS_COLUMNS)));
  const cellFields = new Map<number, Uint8Array>();
  const centre = new Float64Array(2);
  const gridField = csvField(grid.name);
  const comma = AsciiWriter.encode(',');
  const newline = AsciiWriter.encode('\n');
  for (let k = 0; k < cells.count; k++) {
    const cell = cells.cell[k];
    let fields = cellFields.get(cell);
    if (fields === undefined) {
      grid.cellCentreInto(cell, centre);
      fields = AsciiWriter.encode(`,${gridField},${cell},${fixed(centre[0], DECIMALS.degrees)},${fixed(centre[1], DECIMALS.degrees)},`);
      cellFields.set(cell, fields);
    }
    out.unsigned(cells.slice[k] + 1).bytes(fields);
    out.unsigned(cells.occurrences[k]).bytes(comma).unsigned(cells.collections[k]).bytes(comma).unsigned(cells.taxa[k]).bytes(newline);
    if (out.full) yield out.take();
  }
  yield out.take();
}
