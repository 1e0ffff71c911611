/**
 * The map's whole style, made on the page: an ocean-coloured background and a graticule from a
 * GeoJSON source built here. No tiles, glyphs, sprites or fonts, so maplibre requests nothing.
 */
import type { Feature, FeatureCollection, LineString } from 'geojson';
import type { StyleSpecification } from 'maplibre-gl';
import { OVERLAY_COLOURS, rgbCss } from '../colour/layer-colours';

/** Degrees between graticule lines. */
export const GRATICULE_STEP_DEG = 30;
/** Degrees between the vertices along a graticule line (short enough to follow the curve). */
export const GRATICULE_VERTEX_STEP_DEG = 2;
/** Id of the graticule layer: the cell layers are drawn beneath it. */
export const GRATICULE_LAYER_ID = 'graticule';

function line(coordinates: Array<[number, number]>): Feature<LineString> {
  return { type: 'Feature', properties: {}, geometry: { type: 'LineString', coordinates } };
}

/** Meridians (pole to pole) and parallels (all round) every `stepDeg`, densified every `vertexStepDeg`. */
export function graticule(stepDeg = GRATICULE_STEP_DEG, vertexStepDeg = GRATICULE_VERTEX_STEP_DEG): FeatureCollection<LineString> {
  const features: Feature<LineString>[] = [];
  for (let lon = -180; lon < 180; lon += stepDeg) {
    const coordinates: Array<[number, number]> = [];
    for (let lat = -90; lat <= 90; lat += vertexStepDeg) coordinates.push([lon, lat]);
    features.push(line(coordinates));
  }
  for (let lat = -90 + stepDeg; lat < 90; lat += stepDeg) {
    const coordinates: Array<[number, number]> = [];
    for (let lon = -180; lon <= 180; lon += vertexStepDeg) coordinates.push([lon, lat]);
    features.push(line(coordinates));
  }
  return { type: 'FeatureCollection', features };
}

export function offlineStyle(): StyleSpecification {
  return {
    version: 8,
    name: 'driftgrid offline',
    sources: { graticule: { type: 'geojson', data: graticule() } },
    layers: [
      { id: 'ocean', type: 'background', paint: { 'background-color': rgbCss(OVERLAY_COLOURS.ocean) } },
      { id: GRATICULE_LAYER_ID, type: 'line', source: 'graticule', paint: { 'line-color': rgbCss(OVERLAY_COLOURS.graticule), 'line-width': 0.75 } },
    ],
  };
}
