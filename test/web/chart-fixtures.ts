/** Small hand-made analyses for the chart tests. */
import type { SliceMetrics } from '../../src/analysis';
import { DEFAULT_RUN_SETTINGS } from '../../src/run';
import type { AnalysisView, LatitudeCounts } from '../../web/protocol';

/** A slice with the given measures; the footprint fields not given are NaN (no positions). */
export function slice(name: string, baseMa: number, topMa: number, values: Partial<SliceMetrics> = {}): SliceMetrics {
  return {
    name, baseMa, topMa, occurrences: 0, collections: 0, taxa: 0, cells: 0,
    positions: 0, hullKm2: NaN, hullNote: undefined, mstKm: NaN, latMin: NaN, latMax: NaN, latSpan: NaN, centroidLat: NaN, centroidLon: NaN,
    hullLeverLat: NaN, hullLeverLon: NaN, hullWithoutKm2: NaN, spanWithoutDeg: NaN,
    ...values,
  };
}

const emptyPoints = { sliceStart: new Uint32Array(1), lon: new Float32Array(0), lat: new Float32Array(0) };
const emptyPaths = { sliceStart: new Uint32Array(1), pathStart: new Uint32Array(1), coords: new Float32Array(0) };

/** A whole AnalysisView around the slices and latitude counts (the map fields empty). */
export function view(slices: readonly SliceMetrics[], latitude: LatitudeCounts, extra: Partial<AnalysisView> = {}): AnalysisView {
  return {
    settings: DEFAULT_RUN_SETTINGS, gridName: 'healpix:32', cellAreaKm2: 1, slices, periods: slices.map(() => 'Test'),
    collectionsArePositions: false, excluded: 0, positions: emptyPoints,
    cells: { sliceStart: new Uint32Array(slices.length + 1), cell: new Uint32Array(0), shape: new Uint32Array(0), occurrences: new Uint32Array(0), collections: new Uint32Array(0), taxa: new Uint32Array(0) },
    shapes: { ringStart: new Uint32Array(1), coords: new Float32Array(0), centre: new Float32Array(0) },
    hulls: emptyPaths, spanningTrees: emptyPaths, leverRows: { sliceStart: new Uint32Array(slices.length + 1), line: new Uint32Array(0) },
    latitude, notes: [],
    ...extra,
  };
}

/** Five 10-Myr slices from 50 Ma to 0, oldest first. */
export function fiveSlices(): SliceMetrics[] {
  return [
    slice('E1', 50, 40, { occurrences: 10, collections: 4, taxa: 3, cells: 2, hullKm2: 1, mstKm: 100, latSpan: 10 }),
    slice('E2', 40, 30, { occurrences: 20, collections: 5, taxa: 4, cells: 3, hullKm2: 2, mstKm: 200, latSpan: 20 }),
    slice('E3', 30, 20, { occurrences: 40, collections: 1, taxa: 6, cells: 1, hullKm2: NaN, hullNote: 'one place', mstKm: 0, latSpan: 0 }),
    slice('E4', 20, 10, { occurrences: 8, collections: 3, taxa: 3, cells: 2, hullKm2: 4, mstKm: 150, latSpan: 15 }),
    slice('E5', 10, 0, { occurrences: 5, collections: 2, taxa: 2, cells: 2, hullKm2: 5, mstKm: 50, latSpan: 5 }),
  ];
}
