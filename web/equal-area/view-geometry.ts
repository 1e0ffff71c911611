/**
 * One analysis view's geometry as d3 reads it, built on demand and kept per view: base polygons
 * rewound per slice and their outlines (cached; the view's own collections are never touched),
 * cell outlines, hull and spanning-tree paths.
 */
import type { FeatureCollection, MultiLineString, Polygon } from 'geojson';
import type { AnalysisView } from '../protocol';
import { cellPolygon, polygonEdges, rewindForD3, slicePaths } from './d3-geometry';

export class ViewGeometry {
  readonly view: AnalysisView;
  readonly #polygons: (FeatureCollection | undefined)[] = [];
  readonly #edges: (MultiLineString | undefined)[] = [];

  constructor(view: AnalysisView) {
    this.view = view;
  }

  /** The slice's base polygons, rewound for d3; undefined when the view has none. */
  polygons(slice: number): FeatureCollection | undefined {
    const source = this.view.basePolygons?.[slice];
    if (source === undefined) return undefined;
    return (this.#polygons[slice] ??= rewindForD3(source));
  }

  /** The outlines of the slice's base polygons, without reconstruction's cut edges. */
  polygonEdges(slice: number): MultiLineString | undefined {
    const source = this.view.basePolygons?.[slice];
    if (source === undefined) return undefined;
    return (this.#edges[slice] ??= polygonEdges(source));
  }

  cell(shape: number): Polygon {
    return cellPolygon(this.view.shapes, shape);
  }

  hull(slice: number): MultiLineString {
    return slicePaths(this.view.hulls, slice);
  }

  spanningTree(slice: number): MultiLineString {
    return slicePaths(this.view.spanningTrees, slice);
  }
}
