/**
 * Polygons a run reads from GeoJSON (RFC 7946): the available area of `gaps` and the fixed
 * region of `--within`. A FeatureCollection (or one Feature) of Polygon or MultiPolygon
 * features; an area whose features carry `plate_id` is moved with the plates, slice by slice.
 */
import type { MultiPolygon, Polygon } from 'geojson';
import { prepareSphericalPolygons, type SphericalPolygons } from '../gaps';
import { plateFeaturesOf, type PlateFeature } from '../placement';
import { ProblemList } from '../problems';

export type AreaPolygons =
  | { readonly kind: 'fixed'; readonly polygons: SphericalPolygons }
  | { readonly kind: 'plates'; readonly features: readonly PlateFeature[] };

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

const FEATURES_EXPECTED = 'a FeatureCollection of Polygon or MultiPolygon features';

function featuresOf(root: unknown, problems: ProblemList): unknown[] {
  if (isObject(root) && root.type === 'FeatureCollection' && Array.isArray(root.features)) {
    if (root.features.length === 0) problems.add({ field: 'features', value: '[]', expected: `${FEATURES_EXPECTED} (the FeatureCollection has none)` });
    return root.features;
  }
  if (isObject(root) && root.type === 'Feature') return [root];
  problems.add({ field: 'type', value: isObject(root) ? String(root.type) : JSON.stringify(root), expected: FEATURES_EXPECTED });
  return [];
}

/** A coordinate array shaped as `depth` levels of arrays around [lon, lat] pairs of finite numbers. */
function isCoordinates(value: unknown, depth: number): boolean {
  if (!Array.isArray(value)) return false;
  if (depth === 0) return value.length >= 2 && value.every((n) => typeof n === 'number' && Number.isFinite(n));
  return value.every((v) => isCoordinates(v, depth - 1));
}

/** Each feature's geometry, as given; every problem is named by feature. Throws InputError naming `source`. */
export function polygonGeometriesOf(root: unknown, source: string): Array<Polygon | MultiPolygon> {
  const problems = new ProblemList();
  const geometries: Array<Polygon | MultiPolygon> = [];
  featuresOf(root, problems).forEach((feature, k) => {
    const where = `feature ${k + 1}`;
    const geometry = isObject(feature) ? feature.geometry : undefined;
    if (!isObject(geometry) || (geometry.type !== 'Polygon' && geometry.type !== 'MultiPolygon')) {
      problems.add({ field: `${where} geometry.type`, value: isObject(geometry) ? String(geometry.type) : String(geometry), expected: 'Polygon or MultiPolygon' });
      return;
    }
    if (!isCoordinates(geometry.coordinates, geometry.type === 'Polygon' ? 2 : 3)) {
      problems.add({ field: `${where} geometry.coordinates`, value: JSON.stringify(geometry.coordinates).slice(0, 60), expected: `${geometry.type} coordinates of [lon, lat] numbers` });
      return;
    }
    geometries.push(geometry as unknown as Polygon | MultiPolygon);
  });
  problems.throwIfAny(source);
  return geometries;
}

/** Polygons prepared for point-in-polygon tests; a ring that cannot be read is named by feature. */
export function fixedPolygonsOf(root: unknown, source: string): SphericalPolygons {
  return preparedOrError(polygonGeometriesOf(root, source), source);
}

export function preparedOrError(geometries: ReadonlyArray<Polygon | MultiPolygon>, source: string): SphericalPolygons {
  try {
    return prepareSphericalPolygons(geometries, source);
  } catch (error) {
    if (error instanceof RangeError) throw new Error(error.message.replace(', geometry ', ', feature '));
    throw error;
  }
}

/** An area file: moved with the plates when any feature carries `plate_id`, otherwise used as given. */
export function areaPolygonsOf(root: unknown, source: string): AreaPolygons {
  const carriesPlates = featuresOf(root, new ProblemList()).some((f) => isObject(f) && isObject(f.properties) && f.properties.plate_id !== undefined);
  return carriesPlates ? { kind: 'plates', features: plateFeaturesOf(root, source).features } : { kind: 'fixed', polygons: fixedPolygonsOf(root, source) };
}
