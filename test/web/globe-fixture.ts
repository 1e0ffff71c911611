// A tiny made-up AnalysisView for the WebGL map helpers: real HEALPix nside-4 cells and outlines
// from src/grid, hand-picked counts, two hand-written paths and a few places and indicator sites.
// Nothing here is real data.
import type { FeatureCollection } from 'geojson';
import { HealpixGrid } from '../../src/grid';
import { DEFAULT_RUN_SETTINGS } from '../../src/run';
import type { AnalysisView } from '../../web/protocol';

export const FIXTURE_GRID = new HealpixGrid(4);

/** Slice 0: cells 5, 17, 40 (17 twice across slices); slice 1: cells 17, 176 (176 touches the south pole). */
export const FIXTURE_CELLS = [[5, 17, 40], [17, 176]] as const;
export const FIXTURE_OCCURRENCES = [1, 9, 120, 3, 40] as const;

export function fixtureView(): AnalysisView {
  const shapeOf = new Map<number, number>();
  const ringStart = [0];
  const coords: number[] = [];
  const centre: number[] = [];
  const cell: number[] = [];
  const shape: number[] = [];
  const c = new Float64Array(2);
  for (const slice of FIXTURE_CELLS) {
    for (const id of slice) {
      let s = shapeOf.get(id);
      if (s === undefined) {
        s = shapeOf.size;
        shapeOf.set(id, s);
        for (const [lon, lat] of FIXTURE_GRID.cellRing(id, 5)) coords.push(lon, lat);
        ringStart.push(coords.length / 2);
        FIXTURE_GRID.cellCentreInto(id, c);
        centre.push(c[1], c[0]);
      }
      cell.push(id);
      shape.push(s);
    }
  }
  const occurrences = Uint32Array.from(FIXTURE_OCCURRENCES);
  const polygons: FeatureCollection = { type: 'FeatureCollection', features: [] };
  const metrics = (name: string, cells: number) => ({
    name, baseMa: 10, topMa: 5, occurrences: 1, collections: 1, taxa: 1, cells, positions: 1, hullKm2: Number.NaN,
    hullNote: 'made up', mstKm: 0, latMin: 0, latMax: 0, latSpan: 0, centroidLat: 0, centroidLon: 0,
    hullLeverLat: Number.NaN, hullLeverLon: Number.NaN, hullWithoutKm2: Number.NaN, spanWithoutDeg: Number.NaN,
  });
  return {
    settings: DEFAULT_RUN_SETTINGS, gridName: FIXTURE_GRID.name, cellAreaKm2: 1, slices: [metrics('A', 3), metrics('B', 2)],
    periods: ['P', 'P'], collectionsArePositions: false, excluded: 0,
    positions: { sliceStart: Uint32Array.of(0, 3, 4), lon: Float32Array.of(10, 20, 30, -170), lat: Float32Array.of(1, 2, 3, -80) },
    cells: {
      sliceStart: Uint32Array.of(0, 3, 5), cell: Uint32Array.from(cell), shape: Uint32Array.from(shape), occurrences,
      collections: Uint32Array.of(1, 2, 3, 4, 5), taxa: Uint32Array.of(1, 1, 7, 1, 2),
    },
    shapes: { ringStart: Uint32Array.from(ringStart), coords: Float32Array.from(coords), centre: Float32Array.from(centre) },
    // Slice 0: one closed triangle path; slice 1: two open paths.
    hulls: { sliceStart: Uint32Array.of(0, 1, 3), pathStart: Uint32Array.of(0, 4, 6, 9), coords: Float32Array.of(0, 0, 10, 0, 5, 5, 0, 0, 1, 1, 2, 2, 3, 3, 4, 4, 5, 5) },
    spanningTrees: { sliceStart: Uint32Array.of(0, 0, 1), pathStart: Uint32Array.of(0, 2), coords: Float32Array.of(7, 7, 8, 8) },
    leverRows: { sliceStart: Uint32Array.of(0, 0, 0), line: new Uint32Array(0) },
    latitude: { bandDeg: 90, bands: 2, perSlice: new Uint32Array(4), total: new Uint32Array(2) },
    indicators: { sliceStart: Uint32Array.of(0, 2, 3), lon: Float32Array.of(1, 2, 3), lat: Float32Array.of(4, 5, 6), kinds: ['coal', 'reef'], kind: Uint8Array.of(1, 0, 1) },
    basePolygons: [polygons, polygons],
    notes: [],
  };
}
