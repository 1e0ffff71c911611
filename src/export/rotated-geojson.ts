/**
 * Reconstructed base polygons as RFC 7946 GeoJSON text, one feature per line: the input
 * feature's `id` and properties, then `slice`, `slice_name` and `placed_at_ma`, and the
 * reconstructed geometry with positions to DECIMALS.degrees.
 */
import type { MultiPolygon, Polygon, Position } from 'geojson';
import { DECIMALS, fixed, trimmed } from './csv-text';

export const FEATURE_COLLECTION_START = '{"type":"FeatureCollection","features":[\n';
export const FEATURE_COLLECTION_END = '\n]}\n';
export const FEATURE_SEPARATOR = ',\n';

/** What rotate adds to a feature's properties. */
export interface SliceProperties {
  /** Slice number from 1 (the oldest). */
  readonly slice: number;
  readonly sliceName: string;
  /** Ma. */
  readonly ageMa: number;
}

function ringText(ring: readonly Position[]): string {
  return `[${ring.map((p) => `[${fixed(p[0], DECIMALS.degrees)},${fixed(p[1], DECIMALS.degrees)}]`).join(',')}]`;
}

function polygonText(rings: readonly Position[][]): string {
  return `[${rings.map(ringText).join(',')}]`;
}

export function geometryText(geometry: Polygon | MultiPolygon): string {
  const coordinates = geometry.type === 'Polygon' ? polygonText(geometry.coordinates) : `[${geometry.coordinates.map(polygonText).join(',')}]`;
  return `{"type":"${geometry.type}","coordinates":${coordinates}}`;
}

/** One Feature, without a separator. */
export function featureText(
  id: string | number | undefined, properties: Readonly<Record<string, unknown>>, added: SliceProperties, geometry: Polygon | MultiPolygon,
): string {
  const all = { ...properties, slice: added.slice, slice_name: added.sliceName, placed_at_ma: Number(trimmed(added.ageMa, DECIMALS.ageMa)) };
  const idText = id === undefined ? '' : `"id":${JSON.stringify(id)},`;
  return `{"type":"Feature",${idText}"properties":${JSON.stringify(all)},"geometry":${geometryText(geometry)}}`;
}
