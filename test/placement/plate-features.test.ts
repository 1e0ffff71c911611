import { describe, expect, it } from 'vitest';
import { booleanClockwise } from '@turf/turf';
import type { Feature, Polygon } from 'geojson';
import { plateFeaturesOf } from '../../src/placement';
import { InputError } from '../../src/problems';
import { sliceFileName } from '../../src/export/slice-file-name';
import { demoText } from '../demo/demo-files';

// Reference for ring orientation: @turf/turf's booleanClockwise (planar shoelace on lon/lat, the
// reading RFC 7946 §3.1.6 asks of exteriors: anticlockwise).

const square = (clockwise: boolean): number[][] => {
  const ring = [[0, 0], [10, 0], [10, 10], [0, 10], [0, 0]];
  return clockwise ? ring.reverse() : ring;
};
const feature = (properties: Record<string, unknown> | null, geometry: unknown): unknown => ({ type: 'Feature', properties, geometry });
const collection = (...features: unknown[]) => ({ type: 'FeatureCollection', features });

describe('reading base polygons for reconstruction', () => {
  it('accepts the demo land polygons as they are', () => {
    const { features, notes } = plateFeaturesOf(JSON.parse(demoText('land.geojson')), 'land.geojson');
    expect(features.map((f) => f.plateId)).toEqual([101, 201, 301, 401, 501, 601]);
    expect(notes).toEqual([]);
  });

  it('turns a clockwise exterior into RFC 7946 order and says so', () => {
    const input = collection(feature({ plate_id: 1 }, { type: 'Polygon', coordinates: [square(true)] }));
    expect(booleanClockwise(square(true))).toBe(true);
    const { features, notes } = plateFeaturesOf(input, 'x.geojson');
    expect(booleanClockwise((features[0].geometry as Polygon).coordinates[0])).toBe(false);
    expect(notes).toEqual([{ feature: 1, plateId: 1, note: 'feature 1, ring 1: exterior ring is clockwise; read as the area it outlines on a lon/lat map and written in RFC 7946 order' }]);
  });

  it('keeps the id, the properties and a plate_id written as text', () => {
    const input = collection({ ...(feature({ plate_id: '7', name: 'A' }, { type: 'Polygon', coordinates: [square(false)] }) as Feature), id: 'f1' });
    const [f] = plateFeaturesOf(input, 'x.geojson').features;
    expect([f.plateId, f.id, f.properties]).toEqual([7, 'f1', { plate_id: '7', name: 'A' }]);
  });

  it.each([
    ['a point feature', collection(feature({ plate_id: 1 }, { type: 'Point', coordinates: [0, 0] })), 'x.geojson, feature 1 geometry type "Point": expected Polygon or MultiPolygon (points belong in a table)'],
    ['a missing plate_id', collection(feature({ name: 'A' }, { type: 'Polygon', coordinates: [square(false)] })), 'x.geojson, feature 1 plate_id "": expected a property plate_id, a whole number from 0 to 2147483647 (plate_id is missing)'],
    ['a fractional plate_id', collection(feature({ plate_id: 1.5 }, { type: 'Polygon', coordinates: [square(false)] })), 'x.geojson, feature 1 plate_id "1.5": expected a property plate_id, a whole number from 0 to 2147483647'],
    ['an unclosed ring', collection(feature({ plate_id: 1 }, { type: 'Polygon', coordinates: [square(false).slice(0, 4).concat([[0, 1]])] })), 'x.geojson, feature 1, ring 1, position 5 "[0,1]": expected a closed ring: the last position equal to the first, [0,0]'],
    ['a longitude beyond 180', collection(feature({ plate_id: 1 }, { type: 'Polygon', coordinates: [[[0, 0], [190, 0], [0, 10], [0, 0]]] })), 'x.geojson, feature 1, ring 1, position 2 "[190,0]": expected [longitude, latitude] in degrees, longitude from -180 to 180, latitude from -90 to 90'],
    ['a ring across the antimeridian', collection(feature({ plate_id: 1 }, { type: 'Polygon', coordinates: [[[170, 0], [-170, 0], [-170, 10], [170, 10], [170, 0]]] })), 'x.geojson, feature 1, ring 1, position 2 "[-170,0]": expected rings cut at the antimeridian into parts (RFC 7946 §3.1.9): the edge from [170,0] to here crosses it'],
    ['a property rotate adds', collection(feature({ plate_id: 1, slice: 3 }, { type: 'Polygon', coordinates: [square(false)] })), 'x.geojson, feature 1 property slice "3": expected no property "slice": rotate adds it to every feature it writes, so rename it'],
    ['a ring without area', collection(feature({ plate_id: 1 }, { type: 'Polygon', coordinates: [[[0, 0], [1, 1], [2, 2], [0, 0]]] })), 'x.geojson, feature 1, ring 1 "[[0,0],[1,1],[2,2],[0,0]]": expected a ring around an area (this ring encloses no area)'],
    ['a bare geometry', { type: 'Polygon', coordinates: [square(false)] }, 'x.geojson, type "Polygon": expected a FeatureCollection of Polygon or MultiPolygon features with a plate_id property'],
    ['an empty collection', collection(), 'x.geojson, features "[]": expected at least one feature (the FeatureCollection has none)'],
  ])('refuses %s, naming the feature and what was expected', (_what, input, message) => {
    expect(() => plateFeaturesOf(input, 'x.geojson')).toThrow(message);
  });

  it('lists every problem, not only the first', () => {
    const input = collection(
      feature({ plate_id: 1 }, { type: 'Point', coordinates: [0, 0] }),
      feature({ plate_id: 2 }, { type: 'Polygon', coordinates: [square(false)] }),
      feature({}, { type: 'LineString', coordinates: [[0, 0], [1, 1]] }),
    );
    expect(() => plateFeaturesOf(input, 'x.geojson')).toThrow(new InputError([
      { field: 'feature 1 geometry type', value: 'Point', expected: 'Polygon or MultiPolygon (points belong in a table)' },
      { field: 'feature 3 plate_id', value: '', expected: 'a property plate_id, a whole number from 0 to 2147483647 (plate_id is missing)' },
      { field: 'feature 3 geometry type', value: 'LineString', expected: 'Polygon or MultiPolygon (points belong in a table)' },
    ], { source: 'x.geojson' }));
    try {
      plateFeaturesOf(input, 'x.geojson');
    } catch (error) {
      expect(error).toBeInstanceOf(InputError);
      expect((error as InputError).problems.map((p) => [p.field, p.value])).toEqual([
        ['feature 1 geometry type', 'Point'], ['feature 3 plate_id', ''], ['feature 3 geometry type', 'LineString'],
      ]);
    }
  });
});

describe('slice file names', () => {
  it('number the slices so that names sort in slice order and keep only safe characters', () => {
    expect(sliceFileName(1, 102, 'Asselian', 'geojson')).toBe('slice-001-asselian.geojson');
    expect(sliceFileName(12, 5, 'Stage 2', 'geojson')).toBe('slice-012-stage-2.geojson');
    expect(sliceFileName(3, 10, '300–290 Ma', 'geojson')).toBe('slice-003-300-290-ma.geojson');
    expect(sliceFileName(4, 1000, 'Émile / late', 'geojson')).toBe('slice-0004-emile-late.geojson');
    expect(sliceFileName(5, 9, '—', 'geojson')).toBe('slice-005.geojson');
  });
});
