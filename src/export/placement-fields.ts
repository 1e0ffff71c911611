import { DECIMALS, fixed, trimmed } from './csv-text';

/** Columns rotate appends to a table, in this order. */
export const PLACEMENT_COLUMNS = ['palaeo_lat', 'palaeo_lon', 'placed_at_ma'] as const;

/**
 * The appended fields of one row, each preceded by `delimiter`: palaeoposition in degrees
 * (DECIMALS.degrees) and the age it is for in Ma; three empty fields where the row has none.
 */
export function placementFields(lat: number, lon: number, ageMa: number, delimiter: string): string {
  if (Number.isNaN(lat)) return delimiter.repeat(PLACEMENT_COLUMNS.length);
  return `${delimiter}${fixed(lat, DECIMALS.degrees)}${delimiter}${fixed(lon, DECIMALS.degrees)}${delimiter}${trimmed(ageMa, DECIMALS.ageMa)}`;
}
