/** How the views show a slice: choices that change the picture, not the numbers. */
import type { AnalysisView, Measure } from '../protocol';

export interface LayerVisibility {
  readonly cells: boolean;
  readonly points: boolean;
  readonly hull: boolean;
  readonly spanningTree: boolean;
  readonly polygons: boolean;
  readonly indicators: boolean;
}

export const DEFAULT_LAYERS: LayerVisibility = { cells: true, points: true, hull: true, spanningTree: false, polygons: true, indicators: false };

export const LAYER_LABELS: Readonly<Record<keyof LayerVisibility, string>> = {
  cells: 'Occupied cells', points: 'Occurrence places', hull: 'Convex hull', spanningTree: 'Spanning tree',
  polygons: 'Base polygons', indicators: 'Climate indicators',
};

/** Map views: the WebGL globe and flat map, and the equal-area canvas projections. */
export const MAP_VIEWS = ['globe', 'flat', 'equal-earth', 'polar-north', 'polar-south'] as const;
export type MapView = (typeof MAP_VIEWS)[number];

export const MAP_VIEW_LABELS: Readonly<Record<MapView, string>> = {
  globe: 'Globe', flat: 'Flat (WebGL)', 'equal-earth': 'Equal Earth', 'polar-north': 'North polar equal-area', 'polar-south': 'South polar equal-area',
};

/** More distinct places than this in one slice and the WebGL map draws cells only, unless asked. */
export const POINT_BUDGET = 20_000;

/** The count column of a measure. */
export function measureColumn(view: AnalysisView, measure: Measure): Uint32Array {
  return view.cells[measure];
}

/** Largest count of a measure over every slice, so colours mean the same in every slice. */
export function measureMax(view: AnalysisView, measure: Measure): number {
  const column = measureColumn(view, measure);
  let max = 0;
  for (let k = 0; k < column.length; k++) if (column[k] > max) max = column[k];
  return max;
}

/** Unit wording for legends: what one cell's number counts. */
export const MEASURE_UNITS: Readonly<Record<Measure, string>> = {
  occurrences: 'occurrences per cell',
  collections: 'distinct collections per cell',
  taxa: 'distinct taxa per cell',
};
