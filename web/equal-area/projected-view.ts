/**
 * Everything the canvas map draws, projected once per (view, projection) into reference pixels
 * and kept: a Path2D per distinct cell outline, per slice for hull, spanning tree and base
 * polygons, and flat [x, y] arrays for places and indicator sites. Each piece is built the first
 * time a slice needs it (or ahead, by prepareSlice), so changing slice afterwards only draws.
 * A resize needs nothing new: the frame (map-frame.ts) places the reference picture.
 */
import { geoGraticule10, geoPath, type GeoContext, type GeoPath, type GeoPermissibleObjects } from 'd3-geo';
import type { CountScale } from '../colour/measure-scale';
import type { Measure, PointSet } from '../protocol';
import { measureColumn } from '../state/view-options';
import { SPHERE, type ReferenceProjection } from './map-projection';
import { projectPointsInto } from './project-points';
import type { ViewGeometry } from './view-geometry';

/** Points of a PointSet projected slice by slice, on demand. */
class ProjectedPoints {
  readonly xy: Float32Array;
  readonly #done: Uint8Array;

  constructor(readonly points: PointSet, private readonly reference: ReferenceProjection) {
    this.xy = new Float32Array(2 * points.lon.length);
    this.#done = new Uint8Array(Math.max(0, points.sliceStart.length - 1));
  }

  ensure(slice: number): Float32Array {
    if (this.#done[slice] === 0) {
      const { sliceStart, lon, lat } = this.points;
      projectPointsInto(this.reference.projection, lon, lat, sliceStart[slice], sliceStart[slice + 1], this.xy);
      this.#done[slice] = 1;
    }
    return this.xy;
  }
}

/** d3's drawing calls forwarded into the Path2D being built (d3 never calls beginPath). */
class Path2DContext implements GeoContext {
  target = new Path2D();
  arc(x: number, y: number, r: number, a0: number, a1: number, ccw?: boolean): void { this.target.arc(x, y, r, a0, a1, ccw); }
  beginPath(): void {}
  closePath(): void { this.target.closePath(); }
  lineTo(x: number, y: number): void { this.target.lineTo(x, y); }
  moveTo(x: number, y: number): void { this.target.moveTo(x, y); }
}

/** Occupied cells of one colour in a slice, as one path. */
export interface CellColourGroup {
  readonly colour: string;
  readonly path: Path2D;
}

/** Base polygons: the area to fill and the outlines to stroke (see polygonEdges). */
export interface PolygonPaths {
  readonly fill: Path2D;
  readonly edges: Path2D;
}

export class ProjectedView {
  readonly reference: ReferenceProjection;
  readonly geometry: ViewGeometry | undefined;
  readonly sphere: Path2D;
  readonly graticule: Path2D;
  readonly #cells: (Path2D | undefined)[] = [];
  readonly #hulls: (Path2D | undefined)[] = [];
  readonly #trees: (Path2D | undefined)[] = [];
  readonly #polygons: (PolygonPaths | null | undefined)[] = [];
  readonly #cellGroups = new Map<Measure, (readonly CellColourGroup[] | undefined)[]>();
  readonly #context = new Path2DContext();
  readonly #render: GeoPath<unknown, GeoPermissibleObjects>;
  #places: ProjectedPoints | undefined;
  #indicators: ProjectedPoints | undefined;

  constructor(reference: ReferenceProjection, geometry: ViewGeometry | undefined) {
    this.reference = reference;
    this.geometry = geometry;
    this.#render = geoPath(reference.projection, this.#context);
    this.sphere = this.#path(SPHERE);
    this.graticule = this.#path(geoGraticule10());
  }

  #path(object: GeoPermissibleObjects): Path2D {
    const path = (this.#context.target = new Path2D());
    this.#render(object);
    return path;
  }

  /** Outline of distinct cell `shape` (an index into view.shapes). */
  cell(shape: number): Path2D {
    return (this.#cells[shape] ??= this.#path(this.#need().cell(shape)));
  }

  /**
   * The slice's occupied cells grouped by the colour of their count, one path per colour: a
   * slice draws in as many fills as it has colours, not cells, and cells of one colour share
   * anti-aliased edges without seams. `scale` must be the view's scale for `measure`.
   */
  cellGroups(slice: number, measure: Measure, scale: CountScale): readonly CellColourGroup[] {
    let bySlice = this.#cellGroups.get(measure);
    if (bySlice === undefined) this.#cellGroups.set(measure, (bySlice = []));
    return (bySlice[slice] ??= this.#groupCells(slice, measure, scale));
  }

  #groupCells(slice: number, measure: Measure, scale: CountScale): CellColourGroup[] {
    const view = this.#need().view;
    const { sliceStart, shape } = view.cells;
    const counts = measureColumn(view, measure);
    const colourOfCount = new Map<number, string>();
    const paths = new Map<string, Path2D>();
    for (let e = sliceStart[slice]; e < sliceStart[slice + 1]; e++) {
      const count = counts[e];
      let colour = colourOfCount.get(count);
      if (colour === undefined) colourOfCount.set(count, (colour = scale.css(count)));
      let path = paths.get(colour);
      if (path === undefined) paths.set(colour, (path = new Path2D()));
      path.addPath(this.cell(shape[e]));
    }
    return Array.from(paths, ([colour, path]) => ({ colour, path }));
  }

  hull(slice: number): Path2D {
    return (this.#hulls[slice] ??= this.#path(this.#need().hull(slice)));
  }

  spanningTree(slice: number): Path2D {
    return (this.#trees[slice] ??= this.#path(this.#need().spanningTree(slice)));
  }

  /** The slice's base polygons, or undefined when the view has none for it. */
  polygons(slice: number): PolygonPaths | undefined {
    let paths = this.#polygons[slice];
    if (paths === undefined) {
      const geometry = this.#need();
      const features = geometry.polygons(slice), edges = geometry.polygonEdges(slice);
      paths = this.#polygons[slice] = features === undefined || edges === undefined ? null : { fill: this.#path(features), edges: this.#path(edges) };
    }
    return paths ?? undefined;
  }

  /** Reference [x, y] of every place (NaN where hidden), with the slice's run filled in. */
  places(slice: number): Float32Array {
    return (this.#places ??= new ProjectedPoints(this.#need().view.positions, this.reference)).ensure(slice);
  }

  /** Reference [x, y] of every indicator site, as places(); undefined when the view has none. */
  indicators(slice: number): Float32Array | undefined {
    const sites = this.#need().view.indicators;
    if (sites === undefined) return undefined;
    return (this.#indicators ??= new ProjectedPoints(sites, this.reference)).ensure(slice);
  }

  /**
   * Builds every piece of a slice now (all of them, whatever is shown, and the cells' colour
   * groups for `measure`), so that drawing it later only draws.
   */
  prepareSlice(slice: number, measure: Measure, scale: CountScale): void {
    this.cellGroups(slice, measure, scale);
    this.hull(slice);
    this.spanningTree(slice);
    this.polygons(slice);
    this.places(slice);
    this.indicators(slice);
  }

  #need(): ViewGeometry {
    if (this.geometry === undefined) throw new Error('This map has no analysis view to draw.');
    return this.geometry;
  }
}
