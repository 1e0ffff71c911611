/**
 * Everything the WebGL map draws for one slice, prepared once per (view, slice, measure) in the
 * binary shapes deck.gl takes: `{ length, startIndices?, attributes }` with typed arrays, never
 * an object per item. Deck writes into `attributes` (it records derived buffers there), so each
 * object here belongs to one layer and is not shared.
 */
import type { FeatureCollection } from 'geojson';
import type { CountScale } from '../colour/measure-scale';
import { INDICATOR_COLOURS } from '../colour/layer-colours';
import type { AnalysisView, Measure } from '../protocol';
import { measureColumn } from '../state/view-options';
import { buildCellPolygons } from './cell-polygons';
import { liftForCapMetres, liftMatrix } from './globe-lift';
import { slicePaths } from './slice-paths';
import { sliceKindColours, slicePointCount, slicePositions } from './slice-points';

export interface BinaryBuffer {
  readonly value: Float32Array | Uint8Array | Uint32Array;
  readonly size: number;
}

/** deck.gl binary data: `length` items, optional per-item vertex ranges, typed-array attributes. */
export interface BinaryData {
  readonly length: number;
  readonly startIndices?: Uint32Array;
  readonly attributes: Record<string, BinaryBuffer>;
}

/** deck's globe cuts polygons it tessellates itself along a 10° grid (GlobeViewport.resolution). */
const DECK_GLOBE_CUT_DEG = 10;

/** Lifts (deck modelMatrix) that keep each layer's flat pieces above the globe's surface. */
export interface SliceLifts {
  readonly cells: Float64Array;
  readonly hull: Float64Array;
  readonly spanningTree: Float64Array;
  /** Base polygons, tessellated by deck within 10° squares: a cap of half the square's diagonal. */
  readonly polygons: Float64Array;
}

export interface SliceLayerData {
  readonly slice: number;
  readonly lifts: SliceLifts;
  /** Entry (index into the view's cell columns) of cell polygon 0 (picked index i → firstEntry + i). */
  readonly firstEntry: number;
  /** Polygons with getPolygon, getFillColor and triangle `indices` (deck then skips tessellation). */
  readonly cells: BinaryData;
  /** Distinct places with getPosition; `length` is the slice's number of places. */
  readonly points: BinaryData;
  /** Paths with getPath. */
  readonly hull: BinaryData;
  readonly spanningTree: BinaryData;
  /** The slice's hull lever (none or one place) with getPosition. */
  readonly lever: BinaryData;
  /** Sites with getPosition and getFillColor, when the view has indicators. */
  readonly indicators: BinaryData | undefined;
  /** Base polygons reconstructed to the slice, when the view has them. */
  readonly polygons: FeatureCollection | undefined;
}

function pathData(paths: AnalysisView['hulls'], slice: number): { data: BinaryData; lift: Float64Array } {
  const { length, startIndices, positions, maxStepDeg } = slicePaths(paths, slice);
  // A chord of angle s lies within the cap of radius s/2 about its midpoint.
  return { data: { length, startIndices, attributes: { getPath: { value: positions, size: 2 } } }, lift: liftMatrix(liftForCapMetres(maxStepDeg / 2)) };
}

function leverData(view: AnalysisView, slice: number): BinaryData {
  const { hullLeverLat: lat, hullLeverLon: lon } = view.slices[slice];
  const position = Number.isNaN(lat) ? new Float32Array(0) : Float32Array.of(lon, lat);
  return { length: position.length / 2, attributes: { getPosition: { value: position, size: 2 } } };
}

export function prepareSliceLayerData(view: AnalysisView, slice: number, measure: Measure, scale: CountScale): SliceLayerData {
  const cells = buildCellPolygons(view.cells, view.shapes, slice, measureColumn(view, measure), scale);
  const points: BinaryData = {
    length: slicePointCount(view.positions, slice),
    attributes: { getPosition: { value: slicePositions(view.positions, slice), size: 2 } },
  };
  const { indicators: sites } = view;
  const indicators: BinaryData | undefined = sites && {
    length: slicePointCount(sites, slice),
    attributes: {
      getPosition: { value: slicePositions(sites, slice), size: 2 },
      getFillColor: { value: sliceKindColours(sites, slice, INDICATOR_COLOURS), size: 3 },
    },
  };
  const hull = pathData(view.hulls, slice);
  const spanningTree = pathData(view.spanningTrees, slice);
  return {
    slice,
    lifts: {
      cells: liftMatrix(liftForCapMetres(cells.reachDeg)),
      hull: hull.lift,
      spanningTree: spanningTree.lift,
      polygons: liftMatrix(liftForCapMetres(DECK_GLOBE_CUT_DEG / Math.SQRT2)),
    },
    firstEntry: cells.firstEntry,
    cells: {
      length: cells.length,
      startIndices: cells.startIndices,
      attributes: {
        getPolygon: { value: cells.positions, size: 2 },
        getFillColor: { value: cells.colours, size: 3 },
        indices: { value: cells.indices, size: 1 },
      },
    },
    points,
    hull: hull.data,
    spanningTree: spanningTree.data,
    lever: leverData(view, slice),
    indicators,
    polygons: view.basePolygons?.[slice],
  };
}
