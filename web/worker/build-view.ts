/**
 * Turns one analysis into what the views draw (AnalysisView): every slice's places, occupied
 * cells with their outlines, hull outline and spanning tree as great-circle paths, latitude
 * counts, indicator sites and reconstructed base polygons. Columnar typed arrays throughout,
 * so the whole thing is transferred to the page, not copied.
 */
import type { Feature, FeatureCollection } from 'geojson';
import type { AnalysisResult, PlacedRows } from '../../src/analysis';
import { groupBySlice } from '../../src/footprint/group-by-slice';
import { latitudeHistogram } from '../../src/footprint/latitude-histogram';
import type { EqualAreaGrid } from '../../src/grid';
import { reconstructFeaturesAt, type PlateFeature } from '../../src/placement';
import type { RotationModel } from '../../src/rotation';
import { appendGreatCircleArc, EARTH_RADIUS_KM, samePosition } from '../../src/sphere';
import { chartScale, sliceOfAge, type TimeScale } from '../../src/time';
import type { RunSettings } from '../../src/run';
import type { AnalysisView, CellEntries, CellShapes, IndicatorPoints, LeverRows, PathSet, PointSet } from '../protocol';

/** Longest drawn step along hull and tree edges, degrees. */
const PATH_STEP_DEG = 1;
/** Longest step along cell outlines, degrees (cells are drawn, not measured, from these). */
const CELL_STEP_DEG = 2;
/** Width of the latitude panel's bands, degrees. */
const LATITUDE_BAND_DEG = 10;
/** Indicator kinds are coded in a byte. */
const MAX_INDICATOR_KINDS = 255;

export interface IndicatorAnalysis {
  /** The sites binned and placed as occurrences are (placeRows), not measured. */
  readonly placed: PlacedRows;
  readonly kinds: readonly string[];
  /** Kind code of each indicator row. */
  readonly kindOfRow: Uint32Array;
}

export interface ViewInputs {
  readonly settings: RunSettings;
  readonly scale: TimeScale;
  readonly grid: EqualAreaGrid;
  readonly result: AnalysisResult;
  /** Line in the source file of each table row (OccurrenceTable.line). */
  readonly lines: Uint32Array;
  readonly indicators?: IndicatorAnalysis;
  readonly polygons?: { readonly features: readonly PlateFeature[]; readonly model: RotationModel };
}

export function buildView(inputs: ViewInputs): { view: AnalysisView; transfer: ArrayBuffer[] } {
  const { settings, scale, grid, result } = inputs;
  const sliceCount = scale.names.length;
  const notes: string[] = [];
  const { cells, shapes } = cellEntries(result, grid, sliceCount);
  const indicators = inputs.indicators === undefined ? undefined : indicatorPoints(inputs.indicators, sliceCount);
  const latitude = latitudeHistogram(result.sliceOfRow, result.palaeoLat, sliceCount, LATITUDE_BAND_DEG);
  const indicatorLatitude = inputs.indicators === undefined ? undefined : latitudeHistogram(
    inputs.indicators.placed.sliceOfRow, inputs.indicators.placed.placement.lat, sliceCount, LATITUDE_BAND_DEG,
    { of: inputs.indicators.kindOfRow, count: inputs.indicators.kinds.length },
  );
  const basePolygons = inputs.polygons === undefined ? undefined : reconstructedPolygons(inputs.polygons.features, inputs.polygons.model, scale, notes);
  const view: AnalysisView = {
    settings,
    gridName: grid.name,
    cellAreaKm2: grid.cellAreaSr * EARTH_RADIUS_KM * EARTH_RADIUS_KM,
    slices: result.slices,
    periods: periodsOf(scale),
    collectionsArePositions: result.collectionsArePositions,
    excluded: result.exclusions.rows.length,
    positions: placesBySlice(result.places.lat, result.places.lon),
    cells,
    shapes,
    hulls: hullPaths(result),
    spanningTrees: treePaths(result),
    leverRows: leverRows(result, inputs.lines),
    latitude: {
      ...latitude,
      ...(indicatorLatitude === undefined ? {} : { indicatorsPerSlice: indicatorLatitude.perSlice, indicatorsTotal: indicatorLatitude.total }),
    },
    ...(indicators === undefined ? {} : { indicators }),
    ...(basePolygons === undefined ? {} : { basePolygons }),
    notes,
  };
  return { view, transfer: transferables(view) };
}

function transferables(view: AnalysisView): ArrayBuffer[] {
  const arrays: ArrayBufferView[] = [
    view.positions.sliceStart, view.positions.lon, view.positions.lat,
    ...Object.values(view.cells), ...Object.values(view.shapes),
    ...Object.values(view.hulls), ...Object.values(view.spanningTrees), view.leverRows.sliceStart, view.leverRows.line,
    view.latitude.perSlice, view.latitude.total,
  ];
  if (view.latitude.indicatorsPerSlice !== undefined) arrays.push(view.latitude.indicatorsPerSlice);
  if (view.latitude.indicatorsTotal !== undefined) arrays.push(view.latitude.indicatorsTotal);
  if (view.indicators !== undefined) arrays.push(view.indicators.sliceStart, view.indicators.lon, view.indicators.lat, view.indicators.kind);
  return [...new Set(arrays.map((a) => a.buffer as ArrayBuffer))];
}

/** Chart period holding each slice's mid-age (for colouring the time strip). */
function periodsOf(scale: TimeScale): string[] {
  const periods = chartScale('periods');
  return scale.names.map((_, s) => {
    const p = sliceOfAge(periods.baseMa, periods.topMa, 0.5 * (scale.baseMa[s] + scale.topMa[s]));
    return p < 0 ? '' : periods.names[p];
  });
}

function placesBySlice(lat: readonly Float64Array[], lon: readonly Float64Array[]): PointSet {
  const sliceStart = new Uint32Array(lat.length + 1);
  for (let s = 0; s < lat.length; s++) sliceStart[s + 1] = sliceStart[s] + lat[s].length;
  const outLat = new Float32Array(sliceStart[lat.length]);
  const outLon = new Float32Array(sliceStart[lat.length]);
  for (let s = 0; s < lat.length; s++) {
    outLat.set(lat[s], sliceStart[s]);
    outLon.set(lon[s], sliceStart[s]);
  }
  return { sliceStart, lat: outLat, lon: outLon };
}

function cellEntries(result: AnalysisResult, grid: EqualAreaGrid, sliceCount: number): { cells: CellEntries; shapes: CellShapes } {
  const tallies = result.cells;
  const sliceStart = new Uint32Array(sliceCount + 1);
  for (let k = 0; k < tallies.count; k++) sliceStart[tallies.slice[k] + 1]++;
  for (let s = 0; s < sliceCount; s++) sliceStart[s + 1] += sliceStart[s];
  const shapeOfCell = new Map<number, number>();
  const shape = new Uint32Array(tallies.count);
  const ringStart: number[] = [0];
  const coords: number[] = [];
  const centre: number[] = [];
  const latLon = new Float64Array(2);
  for (let k = 0; k < tallies.count; k++) {
    const cell = tallies.cell[k];
    let index = shapeOfCell.get(cell);
    if (index === undefined) {
      index = shapeOfCell.size;
      shapeOfCell.set(cell, index);
      for (const [lon, lat] of grid.cellRing(cell, CELL_STEP_DEG)) coords.push(lon, lat);
      ringStart.push(coords.length / 2);
      grid.cellCentreInto(cell, latLon);
      centre.push(latLon[1], latLon[0]);
    }
    shape[k] = index;
  }
  return {
    cells: {
      sliceStart, cell: tallies.cell.slice(), shape,
      occurrences: tallies.occurrences.slice(), collections: tallies.collections.slice(), taxa: tallies.taxa.slice(),
    },
    shapes: { ringStart: Uint32Array.from(ringStart), coords: Float32Array.from(coords), centre: Float32Array.from(centre) },
  };
}

/** Collects paths slice by slice into a PathSet. */
class PathCollector {
  private readonly sliceStart: number[] = [0];
  private readonly pathStart: number[] = [0];
  private readonly coords: number[] = [];

  /** Adds the great-circle path through the positions (indices into lat/lon), closed when asked. */
  addPath(lat: Float64Array, lon: Float64Array, vertices: ArrayLike<number>, closed: boolean): void {
    const n = vertices.length;
    if (n < 2) return;
    let previousLon = lon[vertices[0]];
    this.coords.push(previousLon, lat[vertices[0]]);
    const last = closed ? n : n - 1;
    for (let k = 0; k < last; k++) {
      const a = vertices[k], b = vertices[(k + 1) % n];
      previousLon = appendGreatCircleArc(lat[a], lon[a], lat[b], lon[b], PATH_STEP_DEG, previousLon, this.coords);
    }
    this.pathStart.push(this.coords.length / 2);
  }

  endSlice(): void {
    this.sliceStart.push(this.pathStart.length - 1);
  }

  finish(): PathSet {
    return { sliceStart: Uint32Array.from(this.sliceStart), pathStart: Uint32Array.from(this.pathStart), coords: Float32Array.from(this.coords) };
  }
}

/** The hulls the analysis measured, as closed great-circle paths. */
function hullPaths({ places: { lat, lon }, shapes }: AnalysisResult): PathSet {
  const paths = new PathCollector();
  for (let s = 0; s < lat.length; s++) {
    const ring = shapes[s].hullRing;
    if (ring !== undefined) paths.addPath(lat[s], lon[s], ring, true);
    paths.endSlice();
  }
  return paths.finish();
}

/** The spanning trees the analysis measured, one path per edge. */
function treePaths({ places: { lat, lon }, shapes }: AnalysisResult): PathSet {
  const paths = new PathCollector();
  for (let s = 0; s < lat.length; s++) {
    const edges = shapes[s].treeEdges;
    for (let k = 0; k < edges.length; k += 2) paths.addPath(lat[s], lon[s], edges.subarray(k, k + 2), false);
    paths.endSlice();
  }
  return paths.finish();
}

/** The lines of the rows placed at each slice's hull lever (the place itself is in slices[s]). */
function leverRows(result: AnalysisResult, lines: Uint32Array): LeverRows {
  const { order, start } = result.rowsBySlice;
  const sliceStart = new Uint32Array(result.slices.length + 1);
  const found: number[] = [];
  result.slices.forEach((metrics, s) => {
    const { hullLeverLat: lat, hullLeverLon: lon } = metrics;
    if (!Number.isNaN(lat)) {
      for (let k = start[s]; k < start[s + 1]; k++) {
        const row = order[k];
        if (samePosition(result.palaeoLat[row], result.palaeoLon[row], lat, lon)) found.push(lines[row]);
      }
    }
    sliceStart[s + 1] = found.length;
  });
  return { sliceStart, line: Uint32Array.from(found) };
}

function indicatorPoints(indicators: IndicatorAnalysis, sliceCount: number): IndicatorPoints {
  const { placed, kinds, kindOfRow } = indicators;
  if (kinds.length > MAX_INDICATOR_KINDS) {
    throw new Error(`the indicator table names ${kinds.length} kinds; at most ${MAX_INDICATOR_KINDS} can be shown`);
  }
  const { order, start } = groupBySlice(placed.sliceOfRow, sliceCount);
  const lat = new Float32Array(order.length), lon = new Float32Array(order.length), kind = new Uint8Array(order.length);
  for (let k = 0; k < order.length; k++) {
    const row = order[k];
    lat[k] = placed.placement.lat[row];
    lon[k] = placed.placement.lon[row];
    kind[k] = kindOfRow[row];
  }
  return { sliceStart: start.slice(0, sliceCount + 1), lat, lon, kind, kinds };
}

function reconstructedPolygons(features: readonly PlateFeature[], model: RotationModel, scale: TimeScale, notes: string[]): FeatureCollection[] {
  const out: FeatureCollection[] = [];
  let leftOut = 0;
  for (let s = 0; s < scale.names.length; s++) {
    const target = { slice: s + 1, name: scale.names[s], ageMa: 0.5 * (scale.baseMa[s] + scale.topMa[s]) };
    const result = reconstructFeaturesAt(features, model, target);
    leftOut += features.length - result.features.length;
    out.push({
      type: 'FeatureCollection',
      features: result.features.map((f): Feature => ({ type: 'Feature', properties: { plate_id: f.feature.plateId }, geometry: f.geometry })),
    });
  }
  if (leftOut > 0) notes.push(`${leftOut} base-polygon placements were left out: the rotation model does not reach their plate at that slice's age.`);
  return out;
}
