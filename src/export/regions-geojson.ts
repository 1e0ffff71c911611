import type { SliceMetrics } from '../analysis';
import type { EqualAreaGrid } from '../grid/equal-area-grid';
import type { RegionalSeries } from '../richness';
import { circleOutline, EARTH_RADIUS_KM } from '../sphere';
import { DECIMALS, fixed } from './csv-text';

/**
 * `regions.geojson`: an RFC 7946 FeatureCollection with one feature per kept circular region,
 * slice by slice (oldest first): the circle of `radiusKm` round its centre cell's centre as a
 * Polygon (a MultiPolygon where the antimeridian cuts it), with the slice, the centre cell, the
 * occupied cells within the radius and the region's mean subsampled richness.
 */
export function regionsGeoJson(slices: readonly SliceMetrics[], regional: RegionalSeries, grid: EqualAreaGrid, radiusKm: number): string {
  const centre = new Float64Array(2);
  const angle = radiusKm / EARTH_RADIUS_KM;
  const deg = (v: number) => fixed(v, DECIMALS.degrees);
  const features: string[] = [];
  slices.forEach((slice, s) => {
    for (let r = regional.regionFirst[s]; r < regional.regionFirst[s + 1]; r++) {
      const cell = regional.centreCell[r];
      grid.cellCentreInto(cell, centre);
      const parts = circleOutline(centre[0], centre[1], angle)
        .map((ring) => `[[${ring.map(([lon, lat]) => `[${deg(lon)},${deg(lat)}]`).join(',')}]]`);
      const geometry = parts.length === 1 ? `{"type":"Polygon","coordinates":${parts[0]}}` : `{"type":"MultiPolygon","coordinates":[${parts.join(',')}]}`;
      const properties = [
        `"slice":${s + 1}`, `"name":${JSON.stringify(slice.name)}`, `"grid":${JSON.stringify(grid.name)}`, `"cell":${cell}`,
        `"centre_lat":${deg(centre[0])}`, `"centre_lon":${deg(centre[1])}`, `"radius_km":${radiusKm}`,
        `"cells":${regional.cellCount[r]}`, `"richness":${fixed(regional.richness[r], DECIMALS.richness)}`,
      ];
      features.push(`{"type":"Feature","properties":{${properties.join(',')}},"geometry":${geometry}}`);
    }
  });
  return `{"type":"FeatureCollection","features":[\n${features.join(',\n')}\n]}\n`;
}
