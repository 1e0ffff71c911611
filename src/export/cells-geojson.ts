import type { CellTallies } from '../footprint/cell-tallies';
import type { EqualAreaGrid } from '../grid/equal-area-grid';
import { AsciiWriter } from './ascii-writer';
import { fixed, DECIMALS } from './csv-text';
import { splitAtAntimeridian } from '../sphere';

/** Longest step, in degrees, between vertices of an exported cell outline. */
export const CELL_EDGE_STEP_DEG = 1;

const piece = AsciiWriter.encode;

/**
 * `cells.geojson`: an RFC 7946 FeatureCollection with one Polygon (or MultiPolygon where the cell
 * crosses the antimeridian) per occupied (slice, cell), carrying the cells.csv columns as
 * properties. Written as ASCII bytes, in chunks of about CHUNK_BYTES (the consumer's to keep);
 * each cell's fields and geometry are formatted once, however many slices occupy it.
 */
export function* cellsGeoJson(cells: CellTallies, grid: EqualAreaGrid): Generator<Uint8Array, void, undefined> {
  const perCell = new Map<number, { head: Uint8Array; tail: Uint8Array }>();
  const centre = new Float64Array(2);
  const gridName = JSON.stringify(grid.name);
  // Fixed text joined into as few pieces as possible: each piece is one copy per feature.
  const firstFeature = piece('{"type":"Feature","properties":{"slice":');
  const nextFeature = piece(',\n{"type":"Feature","properties":{"slice":');
  const collections = piece(',"collections":');
  const taxa = piece(',"taxa":');
  const out = new AsciiWriter();
  out.bytes(piece('{"type":"FeatureCollection","features":[\n'));
  for (let k = 0; k < cells.count; k++) {
    const cell = cells.cell[k];
    let shared = perCell.get(cell);
    if (shared === undefined) {
      grid.cellCentreInto(cell, centre);
      shared = {
        head: piece(`,"grid":${gridName},"cell":${cell},"cell_lat":${fixed(centre[0], DECIMALS.degrees)},"cell_lon":${fixed(centre[1], DECIMALS.degrees)},"occurrences":`),
        tail: piece(`},"geometry":${cellGeometry(grid, cell)}}`),
      };
      perCell.set(cell, shared);
    }
    out.bytes(k === 0 ? firstFeature : nextFeature).unsigned(cells.slice[k] + 1).bytes(shared.head).unsigned(cells.occurrences[k]);
    out.bytes(collections).unsigned(cells.collections[k]);
    out.bytes(taxa).unsigned(cells.taxa[k]);
    out.bytes(shared.tail);
    if (out.full) yield out.take();
  }
  yield out.bytes(piece('\n]}\n')).take();
}

function cellGeometry(grid: EqualAreaGrid, cell: number): string {
  const rings = splitAtAntimeridian(grid.cellRing(cell, CELL_EDGE_STEP_DEG));
  const polygons = rings.map((ring) => `[[${ring.map(([lon, lat]) => `[${fixed(lon, DECIMALS.degrees)},${fixed(lat, DECIMALS.degrees)}]`).join(',')}]]`);
  return polygons.length === 1
    ? `{"type":"Polygon","coordinates":${polygons[0]}}`
    : `{"type":"MultiPolygon","coordinates":[${polygons.join(',')}]}`;
}
