/**
 * `gaps.geojson`: every slice's gaps as one RFC 7946 FeatureCollection, one feature per line,
 * slices oldest first and gaps in their order within the slice (gapOutlines). Properties:
 * slice, name, gap (from 1), cells, area_km2, centre_lat, centre_lon (null where the centre is
 * undefined).
 */
import { gapOutlines, type GapGrid, type SliceGaps } from '../gaps';
import type { TimeScale } from '../time';
import { DECIMALS, fixed } from './csv-text';
import { FEATURE_COLLECTION_END, FEATURE_COLLECTION_START, FEATURE_SEPARATOR, geometryText } from './rotated-geojson';

const number = (value: number, decimals: number): string => (Number.isNaN(value) ? 'null' : fixed(value, decimals));

export function gapsGeoJson(g: GapGrid, scale: TimeScale, slices: readonly SliceGaps[]): string {
  const features: string[] = [];
  slices.forEach((gaps, s) => {
    gapOutlines(g, gaps).forEach((geometry, gap) => {
      const properties = [
        `"slice":${s + 1}`, `"name":${JSON.stringify(scale.names[s])}`, `"gap":${gap + 1}`,
        `"cells":${gaps.cellStart[gap + 1] - gaps.cellStart[gap]}`, `"area_km2":${number(gaps.areaKm2[gap], DECIMALS.areaKm2)}`,
        `"centre_lat":${number(gaps.centreLat[gap], DECIMALS.degrees)}`, `"centre_lon":${number(gaps.centreLon[gap], DECIMALS.degrees)}`,
      ];
      features.push(`{"type":"Feature","properties":{${properties.join(',')}},"geometry":${geometryText(geometry)}}`);
    });
  });
  return features.length === 0 ? '{"type":"FeatureCollection","features":[]}\n' : FEATURE_COLLECTION_START + features.join(FEATURE_SEPARATOR) + FEATURE_COLLECTION_END;
}
