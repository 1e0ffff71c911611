import { describe, expect, it } from 'vitest';
import { geoArea } from 'd3-geo';
import { booleanValid, polygon } from '@turf/turf';
import type { FeatureCollection, Polygon, Position } from 'geojson';
import { cellsGeoJson } from '../../src/export/cells-geojson';
import { geometryText } from '../../src/export/rotated-geojson';
import type { CellTallies } from '../../src/footprint/cell-tallies';
import { parseGridName } from '../../src/grid';
import { plateFeaturesOf, reconstructFeaturesAt } from '../../src/placement';
import {
  createQuaternion, createRotationModel, poleTableFromRecords, quaternionFromPole, reconstructGeometry,
} from '../../src/rotation';
import { parseBinsOption } from '../../src/time';
import { demoText } from '../demo/demo-files';
import { d3Area, geometryProblems, ringProblems, type Written } from './polygon-checks';

function everyCell(cellCount: number): CellTallies {
  const cell = Uint32Array.from({ length: cellCount }, (_, i) => i);
  const ones = new Uint32Array(cellCount).fill(1);
  return { count: cellCount, slice: new Uint32Array(cellCount), cell, occurrences: ones, collections: ones, taxa: ones };
}

describe('the explicit checks', () => {
  it('find a repeated position, a −180/180 edge and a pole run, and pass a pole-line edge', () => {
    expect(ringProblems([[0, 0], [1, 0], [1, 0], [1, 1], [0, 0]])).toEqual(['position 1 repeated: [1, 0]']);
    expect(ringProblems([[170, 0], [180, 0], [-180, 0], [170, 5], [170, 0]])).toEqual(['zero-length edge 1 across the antimeridian at latitude 0']);
    expect(ringProblems([[0, 80], [90, 80], [90, 90], [45, 90], [0, 90], [0, 80]])).toEqual(['more than one pole-line edge in a row at position 4']);
    expect(ringProblems([[0, 80], [90, 80], [90, 90], [0, 90], [0, 80]])).toEqual([]);
  });

  it('agree with turf that a repeated position is not a valid polygon', () => {
    expect(booleanValid(polygon([[[0, 0], [1, 0], [1, 0], [1, 1], [0, 0]]]))).toBe(false);
  });
});

describe.each(['healpix:1', 'healpix:2', 'healpix:4', 'healpix:8', 'healpix:16', 'healpix:32', 'bands:10', 'bands:30'])(
  'cells.geojson for every cell of %s', (name) => {
    const grid = parseGridName(name);
    const written = JSON.parse(Buffer.concat([...cellsGeoJson(everyCell(grid.cellCount), grid)]).toString('utf8')) as FeatureCollection<Written>;

    it('holds only polygons valid to turf, with no repeated position or zero-length edge', () => {
      const invalid = written.features.flatMap((f) => geometryProblems(f.geometry).map((p) => `cell ${f.properties?.cell}: ${p}`));
      expect(invalid).toEqual([]);
    });

    it('gives every cell the area of its unsplit outline (d3-geo geoArea), so the cut changed no area', () => {
      // The cut adds points on straight lon/lat edges that d3 reads as great circles: a relative
      // 1e-6 bounds that here, far below the 2e-3 cell-area check of cells-geojson.test.ts.
      for (const f of written.features) {
        const ring = grid.cellRing(f.properties?.cell as number);
        const whole = geoArea({ type: 'Polygon', coordinates: [[...ring].reverse()] });
        expect(Math.abs(d3Area(f.geometry) / whole - 1)).toBeLessThan(1e-6);
      }
    });
  },
);

/** The reconstructed geometry as the rotate command writes it, read back. */
const writtenReconstruction = (g: Written): Written => JSON.parse(geometryText(g)) as Written;

describe('reconstructed base polygons as written', () => {
  it('are valid for the demo land at every stage slice, as `rotate --bins stages` writes them', () => {
    const [header, ...lines] = demoText('poles.csv').trimEnd().split('\n');
    const model = createRotationModel(poleTableFromRecords(header.split(','), lines.map((l, i) => ({ line: i + 2, fields: l.split(',') })), 'poles.csv'));
    const { features } = plateFeaturesOf(JSON.parse(demoText('land.geojson')), 'land.geojson');
    const scale = parseBinsOption('stages');
    const invalid: string[] = [];
    let count = 0;
    for (let s = 0; s < scale.names.length; s++) {
      const target = { slice: s + 1, name: scale.names[s], ageMa: 0.5 * (scale.baseMa[s] + scale.topMa[s]) };
      for (const r of reconstructFeaturesAt(features, model, target).features) {
        count++;
        invalid.push(...geometryProblems(writtenReconstruction(r.geometry)).map((p) => `slice ${s + 1}, ${JSON.stringify(r.feature.properties)}: ${p}`));
      }
    }
    expect(count).toBeGreaterThan(0);
    expect(invalid).toEqual([]);
  });

  const identity = createQuaternion();
  it.each<[string, Position[], ArrayLike<number>]>([
    ['an edge along 180°', [[170, -10], [180, -10], [180, 10], [170, 10], [170, -10]], identity],
    ['an edge along −180°', [[-180, -10], [-170, -10], [-170, 10], [-180, 10], [-180, -10]], identity],
    ['a vertex on the antimeridian', [[175, -10], [180, 0], [175, 10], [170, 0], [175, -10]], identity],
    ['a vertex 1e-7° west of the antimeridian', [[175, -10], [179.9999999, 0], [-175, 10], [170, 0], [175, -10]], identity],
    ['a vertex 1e-7° east of the antimeridian', [[175, -10], [-179.9999999, 0], [-175, 10], [170, 0], [175, -10]], identity],
    ['a repeated vertex', [[10, -10], [20, -10], [20, -10], [20, 10], [10, -10]], identity],
    ['a pole line carried off the pole', [[0, 80], [90, 80], [90, 90], [0, 90], [0, 80]], quaternionFromPole(0, 0, 20)],
    ['a pole line left on the pole', [[0, 80], [90, 80], [90, 90], [0, 90], [0, 80]], identity],
    ['a south pole line', [[0, -80], [0, -90], [90, -90], [90, -80], [0, -80]], identity],
    ['a vertex on the pole', [[0, 80], [90, 80], [0, 90], [0, 80]], identity],
    ['a ring around the pole whose seam is −180/180', [[-180, 70], [-90, 70], [0, 70], [90, 70], [180, 70], [-180, 70]], identity],
  ])('are valid for an outline with %s, keeping its area (d3-geo geoArea)', (_what, ring, q) => {
    const outline: Polygon = { type: 'Polygon', coordinates: [ring] };
    const written = writtenReconstruction(reconstructGeometry(outline, q));
    expect(geometryProblems(written)).toEqual([]);
    // Positions are written to 1e-6°: the area agrees to a relative 1e-6.
    expect(Math.abs(d3Area(written) / d3Area(outline) - 1)).toBeLessThan(1e-6);
  });
});
