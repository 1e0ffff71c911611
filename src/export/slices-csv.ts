import type { SliceMetrics } from '../analysis';
import { csvLine, DECIMALS, fixed, trimmed } from './csv-text';

export const SLICES_COLUMNS = [
  'slice', 'name', 'base_ma', 'top_ma', 'occurrences', 'collections', 'taxa', 'cells', 'hull_km2', 'mst_km',
  'lat_min', 'lat_max', 'lat_span', 'centroid_lat', 'centroid_lon',
  'hull_lever_lat', 'hull_lever_lon', 'hull_without_km2', 'span_without_deg',
] as const;

/** `slices.csv`: one row per slice, oldest first; `slice` counts from 1 (the oldest). */
export function slicesCsv(slices: readonly SliceMetrics[]): string {
  const lines = [csvLine(SLICES_COLUMNS)];
  const deg = (v: number) => fixed(v, DECIMALS.degrees);
  slices.forEach((s, i) => {
    lines.push(csvLine([
      String(i + 1), s.name, trimmed(s.baseMa, DECIMALS.ageMa), trimmed(s.topMa, DECIMALS.ageMa),
      String(s.occurrences), String(s.collections), String(s.taxa), String(s.cells),
      fixed(s.hullKm2, DECIMALS.areaKm2), fixed(s.mstKm, DECIMALS.lengthKm),
      deg(s.latMin), deg(s.latMax), deg(s.latSpan), deg(s.centroidLat), deg(s.centroidLon),
      deg(s.hullLeverLat), deg(s.hullLeverLon), fixed(s.hullWithoutKm2, DECIMALS.areaKm2), deg(s.spanWithoutDeg),
    ]));
  });
  return lines.join('');
}
