/** The present-day landmass outlines as a GeoJSON FeatureCollection, one feature per line. */
import { COORDINATE_DECIMALS } from './csv-format';
import type { Landmass } from './landmasses';

function rounded(x: number): number {
  const r = Number(x.toFixed(COORDINATE_DECIMALS));
  return r === 0 ? 0 : r;
}

export function landGeoJson(lands: readonly Landmass[]): string {
  const features = lands.map((l) => JSON.stringify({
    type: 'Feature',
    properties: { plate_id: l.plateId, name: l.name },
    geometry: { type: 'Polygon', coordinates: [l.ring.map(([lon, lat]) => [rounded(lon), rounded(lat)])] },
  }));
  return `{"type":"FeatureCollection","features":[\n${features.join(',\n')}\n]}\n`;
}
