// A small, made-up AnalysisView for the map tests and the browser check: places scattered
// around a few centres per slice (seeded), real cells and outlines from src/grid, hull and
// spanning tree from src/sphere, one box polygon and one polar cap per slice in RFC 7946 order,
// and a few indicator sites. Nothing here is real data.
import type { Feature, FeatureCollection, Position } from 'geojson';
import type { SliceMetrics } from '../../src/analysis';
import { measureFootprintWithShapes } from '../../src/footprint/slice-footprint';
import { parseGridName } from '../../src/grid';
import { appendGreatCircleArc, convexHull, degreesToUnitVectors, minimumSpanningTree } from '../../src/sphere';
import { createSeededRandom } from '../../src/time';
import { parseRunSettings } from '../../src/run';
import type { AnalysisView, PathSet } from '../../web/protocol';

export interface SliceSpec {
  readonly name: string;
  readonly baseMa: number;
  readonly topMa: number;
  /** [lat, lon] degrees of each cluster of places. */
  readonly centres: readonly (readonly [number, number])[];
}

export interface SmallViewSpec {
  readonly gridName?: string;
  readonly slices?: readonly SliceSpec[];
  readonly placesPerCentre?: number;
  readonly spreadDeg?: number;
  readonly seed?: number;
  /** Longest step along cell outlines, degrees. */
  readonly cellStepDeg?: number;
  /** Whether to compute hull and spanning tree (slow for very many places). */
  readonly withPaths?: boolean;
}

export const DEFAULT_SLICES: readonly SliceSpec[] = [
  { name: 'Slice one', baseMa: 110, topMa: 100, centres: [[40, 20], [10, -30], [55, 60]] },
  { name: 'Slice two', baseMa: 100, topMa: 90, centres: [[60, 175], [30, -160], [45, 150]] },
  { name: 'Slice three', baseMa: 90, topMa: 80, centres: [[-75, 45], [-60, -60], [-50, 120]] },
  { name: 'Slice four', baseMa: 80, topMa: 70.5, centres: [[40, 20], [-30, 140], [10, -100]] },
];

export const INDICATOR_KINDS = ['coal', 'evaporite', 'reef'] as const;

/** The polar cap polygon's edge latitude, degrees (south cap; see capPolygon). */
export const CAP_EDGE_LAT = -70;

export function smallView(spec: SmallViewSpec = {}): AnalysisView {
  const grid = parseGridName(spec.gridName ?? 'healpix:8');
  const slices = spec.slices ?? DEFAULT_SLICES;
  const random = createSeededRandom(spec.seed ?? 7);
  const perCentre = spec.placesPerCentre ?? 60;
  const spread = spec.spreadDeg ?? 12;

  const placeLat: number[] = [], placeLon: number[] = [], placeStart = [0];
  const entries: { slice: number; cell: number; occurrences: number; collections: number; taxa: number }[] = [];
  const metrics: SliceMetrics[] = [];
  const hulls = new PathBuilder(), trees = new PathBuilder();
  slices.forEach((s, slice) => {
    const lat = new Float64Array(s.centres.length * perCentre), lon = new Float64Array(lat.length);
    let k = 0;
    for (const [cLat, cLon] of s.centres) {
      for (let p = 0; p < perCentre; p++, k++) {
        lat[k] = Math.max(-89.5, Math.min(89.5, cLat + spread * (2 * random.nextUniform() - 1)));
        lon[k] = wrap(cLon + (spread * (2 * random.nextUniform() - 1)) / Math.max(0.2, Math.cos((cLat * Math.PI) / 180)));
      }
    }
    const byCell = new Map<number, { occurrences: number; collections: number; taxa: number }>();
    let occurrences = 0;
    for (let i = 0; i < lat.length; i++) {
      const occ = 1 + Math.floor(random.nextUniform() * 6);
      occurrences += occ;
      const tally = byCell.get(grid.cellOf(lat[i], lon[i])) ?? { occurrences: 0, collections: 0, taxa: 0 };
      tally.occurrences += occ;
      tally.collections += 1;
      tally.taxa = Math.min(tally.occurrences, tally.taxa + 1 + Math.floor(random.nextUniform() * 3));
      byCell.set(grid.cellOf(lat[i], lon[i]), tally);
    }
    for (const cell of [...byCell.keys()].sort((a, b) => a - b)) entries.push({ slice, cell, ...byCell.get(cell)! });
    for (let i = 0; i < lat.length; i++) {
      placeLat.push(lat[i]);
      placeLon.push(lon[i]);
    }
    placeStart.push(placeLat.length);
    if (spec.withPaths ?? true) {
      const hull = convexHull(degreesToUnitVectors(lat, lon));
      if (hull.kind === 'hull') hulls.add(lat, lon, hull.ring, true);
      const { edges } = minimumSpanningTree(degreesToUnitVectors(lat, lon));
      for (let e = 0; e < edges.length; e += 2) trees.add(lat, lon, [edges[e], edges[e + 1]], false);
    }
    hulls.endSlice();
    trees.endSlice();
    const measured = measureFootprintWithShapes(lat, lon);
    metrics.push({
      name: s.name, baseMa: s.baseMa, topMa: s.topMa, occurrences, collections: lat.length,
      taxa: Math.round(occurrences / 2), cells: byCell.size, ...measured.footprint, ...measured.levers,
    });
  });

  const shapeOfCell = new Map<number, number>();
  const ringStart = [0], coords: number[] = [], centre: number[] = [];
  const latLon = new Float64Array(2);
  const shape = entries.map(({ cell }) => {
    let index = shapeOfCell.get(cell);
    if (index === undefined) {
      index = shapeOfCell.size;
      shapeOfCell.set(cell, index);
      for (const [lon, lat] of grid.cellRing(cell, spec.cellStepDeg ?? 2)) coords.push(lon, lat);
      ringStart.push(coords.length / 2);
      grid.cellCentreInto(cell, latLon);
      centre.push(latLon[1], latLon[0]);
    }
    return index;
  });
  const cellSliceStart = new Uint32Array(slices.length + 1);
  for (const e of entries) cellSliceStart[e.slice + 1]++;
  for (let s = 0; s < slices.length; s++) cellSliceStart[s + 1] += cellSliceStart[s];

  const indicatorLat: number[] = [], indicatorLon: number[] = [], indicatorKind: number[] = [], indicatorStart = [0];
  slices.forEach((s) => {
    s.centres.forEach(([cLat, cLon], c) => {
      indicatorLat.push(Math.max(-89, Math.min(89, cLat + 3)));
      indicatorLon.push(wrap(cLon - 4));
      indicatorKind.push(c % INDICATOR_KINDS.length);
    });
    indicatorStart.push(indicatorLat.length);
  });

  const bands = 18;
  return {
    settings: parseRunSettings({ grid: grid.name }, { naming: 'option' }),
    gridName: grid.name,
    cellAreaKm2: grid.cellAreaSr * 6371.0088 ** 2,
    slices: metrics,
    periods: slices.map(() => 'Cretaceous'),
    collectionsArePositions: true,
    excluded: 0,
    positions: { sliceStart: Uint32Array.from(placeStart), lat: Float32Array.from(placeLat), lon: Float32Array.from(placeLon) },
    cells: {
      sliceStart: cellSliceStart,
      cell: Uint32Array.from(entries, (e) => e.cell),
      shape: Uint32Array.from(shape),
      occurrences: Uint32Array.from(entries, (e) => e.occurrences),
      collections: Uint32Array.from(entries, (e) => e.collections),
      taxa: Uint32Array.from(entries, (e) => e.taxa),
    },
    shapes: { ringStart: Uint32Array.from(ringStart), coords: Float32Array.from(coords), centre: Float32Array.from(centre) },
    hulls: hulls.finish(),
    spanningTrees: trees.finish(),
    leverRows: { sliceStart: new Uint32Array(metrics.length + 1), line: new Uint32Array(0) },
    latitude: { bandDeg: 10, bands, perSlice: new Uint32Array(slices.length * bands), total: new Uint32Array(bands) },
    indicators: {
      sliceStart: Uint32Array.from(indicatorStart), lat: Float32Array.from(indicatorLat), lon: Float32Array.from(indicatorLon),
      kind: Uint8Array.from(indicatorKind), kinds: INDICATOR_KINDS,
    },
    basePolygons: slices.map((_, s) => polygons(s)),
    notes: [],
  };
}

function wrap(lon: number): number {
  return ((((lon + 180) % 360) + 360) % 360) - 180;
}

/** A lon/lat box (RFC 7946: counter-clockwise), edges densified along parallels and meridians. */
export function boxRing(west: number, south: number, east: number, north: number): Position[] {
  const ring: Position[] = [];
  for (let lon = west; lon < east; lon++) ring.push([lon, south]);
  for (let lat = south; lat < north; lat++) ring.push([east, lat]);
  for (let lon = east; lon > west; lon--) ring.push([lon, north]);
  for (let lat = north; lat > south; lat--) ring.push([west, lat]);
  ring.push([west, south]);
  return ring;
}

/**
 * The cap south of CAP_EDGE_LAT as one ring with continuous longitudes (the form reconstructed
 * polygons take): east along the South Pole line, up, west along the edge parallel, down.
 */
export function capRing(): Position[] {
  const ring: Position[] = [];
  for (let lon = -180; lon < 180; lon++) ring.push([lon, -90]);
  ring.push([180, -90], [180, CAP_EDGE_LAT]);
  for (let lon = 179; lon > -180; lon--) ring.push([lon, CAP_EDGE_LAT]);
  ring.push([-180, CAP_EDGE_LAT], [-180, -90]);
  return ring;
}

function polygons(slice: number): FeatureCollection {
  const feature = (coordinates: Position[][]): Feature => ({ type: 'Feature', properties: { plate_id: 101 + slice }, geometry: { type: 'Polygon', coordinates } });
  return { type: 'FeatureCollection', features: [feature([boxRing(-20 + 10 * slice, 25, 30 + 10 * slice, 55)]), feature([capRing()])] };
}

class PathBuilder {
  readonly #sliceStart = [0];
  readonly #pathStart = [0];
  readonly #coords: number[] = [];

  add(lat: Float64Array, lon: Float64Array, vertices: ArrayLike<number>, closed: boolean): void {
    let previous = lon[vertices[0]];
    this.#coords.push(previous, lat[vertices[0]]);
    const n = vertices.length;
    for (let k = 0; k < (closed ? n : n - 1); k++) {
      const a = vertices[k], b = vertices[(k + 1) % n];
      previous = appendGreatCircleArc(lat[a], lon[a], lat[b], lon[b], 1, previous, this.#coords);
    }
    this.#pathStart.push(this.#coords.length / 2);
  }

  endSlice(): void {
    this.#sliceStart.push(this.#pathStart.length - 1);
  }

  finish(): PathSet {
    return { sliceStart: Uint32Array.from(this.#sliceStart), pathStart: Uint32Array.from(this.#pathStart), coords: Float32Array.from(this.#coords) };
  }
}
