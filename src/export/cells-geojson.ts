import type { CellTallies } from '../footprint/cell-tallies';
import type { EqualAreaGrid } from '../grid/equal-area-grid';
import { fixed, DECIMALS } from './csv-text';
import { splitAtAntimeridian } from './split-antimeridian';

/** Longest step, in degrees, between vertices of an exported cell outline. */
export const CELL_EDGE_STEP_DEG = 1;

/**
 * `cells.geojson`: an RFC 7946 FeatureCollection with one Polygon (or MultiPolygon where the cell
 * crosses the antimeridian) per occupied (slice, cell), carrying the cells.csv columns as properties.
 * Written as text with each cell's geometry formatted once, however many slices occupy it.
 */
export function cellsGeoJson(cells: CellTallies, grid: EqualAreaGrid): string {
  const geometries = new Map<number, string>();
  const centre = new Float64Array(2);
  const parts: string[] = ['{"type":"FeatureCollection","features":[\n'];
  for (let k = 0; k < cells.count; k++) {
    const cell = cells.cell[k];
    let geometry = geometries.get(cell);
    if (geometry === undefined) {
      geometry = cellGeometry(grid, cell);
      geometries.set(cell, geometry);
    }
    grid.cellCentreInto(cell, centre);
    const properties =
      `{"slice":${cells.slice[k] + 1},"grid":${JSON.stringify(grid.name)},"cell":${cell},` +
      `"cell_lat":${fixed(centre[0], DECIMALS.degrees)},"cell_lon":${fixed(centre[1], DECIMALS.degrees)},` +
      `"occurrences":${cells.occurrences[k]},"collections":${cells.collections[k]},"taxa":${cells.taxa[k]}}`;
    parts.push(`${k > 0 ? ',\n' : ''}{"type":"Feature","properties":${properties},"geometry":${geometry}}`);
  }
  parts.push('\n]}\n');
  return parts.join('');
}

function cellGeometry(grid: EqualAreaGrid, cell: number): string {
  const rings = splitAtAntimeridian(grid.cellRing(cell, CELL_EDGE_STEP_DEG));
  const polygons = rings.map((ring) => `[[${ring.map(([lon, lat]) => `[${fixed(lon, DECIMALS.degrees)},${fixed(lat, DECIMALS.degrees)}]`).join(',')}]]`);
  return polygons.length === 1
    ? `{"type":"Polygon","coordinates":${polygons[0]}}`
    : `{"type":"MultiPolygon","coordinates":[${polygons.join(',')}]}`;
}
