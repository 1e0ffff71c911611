/**
 * Draws one slice of the map onto a 2D canvas context, back to front: sphere, graticule, base
 * polygons, occupied cells, spanning tree, hull, places, indicator sites, the hull lever's ring,
 * sphere outline. The projected pieces come from a ProjectedView; the frame places them on the
 * canvas. Line widths and dot sizes are in CSS pixels whatever the frame's scale.
 */
import { OVERLAY_COLOURS, rgbCss } from '../colour/layer-colours';
import type { CountScale } from '../colour/measure-scale';
import type { AnalysisView, Measure } from '../protocol';
import type { LayerVisibility } from '../state/view-options';
import type { DotRaster } from './dot-raster';
import { indicatorColour } from './map-legend';
import type { MapFrame } from './map-frame';
import { MAP_STYLE, treeWidth } from './map-style';
import { hasSlice } from './has-slice';
import { projectPointsInto } from './project-points';
import type { ProjectedView } from './projected-view';

/** More places than this in a slice are drawn as pixels (see drawPlaces). */
const DOT_RASTER_FROM = 10_000;

export type Canvas2D = CanvasRenderingContext2D | OffscreenCanvasRenderingContext2D;

export interface MapPicture {
  readonly slice: number;
  readonly measure: Measure;
  readonly layers: LayerVisibility;
  readonly scale: CountScale;
}

/** `dots` draws the places; keep one per canvas, it holds a pixel buffer of the canvas's size. */
export function drawMap(ctx: Canvas2D, projected: ProjectedView, picture: MapPicture, frame: MapFrame, pixelRatio: number, dots: DotRaster): void {
  const unit = 1 / frame.k; // one CSS pixel in reference pixels
  ctx.save();
  ctx.setTransform(pixelRatio * frame.k, 0, 0, pixelRatio * frame.k, pixelRatio * frame.tx, pixelRatio * frame.ty);
  ctx.lineJoin = 'round';
  ctx.fillStyle = rgbCss(OVERLAY_COLOURS.ocean);
  ctx.fill(projected.sphere);
  ctx.strokeStyle = rgbCss(OVERLAY_COLOURS.graticule);
  ctx.lineWidth = MAP_STYLE.graticuleWidth * unit;
  ctx.stroke(projected.graticule);
  const geometry = projected.geometry;
  const { slice, layers } = picture;
  if (geometry !== undefined && hasSlice(geometry.view, slice)) {
    const view = geometry.view;
    const polygons = layers.polygons ? projected.polygons(slice) : undefined;
    if (polygons !== undefined) {
      ctx.fillStyle = rgbCss(OVERLAY_COLOURS.polygons);
      ctx.fill(polygons.fill);
      strokePath(ctx, polygons.edges, rgbCss(OVERLAY_COLOURS.polygonEdge), MAP_STYLE.polygonEdgeWidth * unit);
    }
    if (layers.cells) drawCells(ctx, projected, picture, unit);
    ctx.lineCap = 'round';
    if (layers.spanningTree) {
      const width = treeWidth(view.spanningTrees.sliceStart[slice + 1] - view.spanningTrees.sliceStart[slice], pixelRatio);
      strokePath(ctx, projected.spanningTree(slice), rgbCss(OVERLAY_COLOURS.spanningTree), width * unit);
    }
    if (layers.hull) strokePath(ctx, projected.hull(slice), rgbCss(OVERLAY_COLOURS.hull), MAP_STYLE.hullWidth * unit);
    ctx.setTransform(1, 0, 0, 1, 0, 0);
    if (layers.points) drawPlaces(ctx, projected, view, slice, frame, pixelRatio, dots);
    if (layers.indicators) drawIndicators(ctx, projected, view, slice, frame, pixelRatio);
    if (layers.hull) drawLever(ctx, projected, view, slice, frame, pixelRatio);
    ctx.setTransform(pixelRatio * frame.k, 0, 0, pixelRatio * frame.k, pixelRatio * frame.tx, pixelRatio * frame.ty);
  }
  strokePath(ctx, projected.sphere, MAP_STYLE.outline, MAP_STYLE.outlineWidth * unit);
  ctx.restore();
}

function strokePath(ctx: Canvas2D, path: Path2D, colour: string, width: number): void {
  ctx.strokeStyle = colour;
  ctx.lineWidth = width;
  ctx.stroke(path);
}

/**
 * Occupied cells, one fill per colour, outlined in the same colour a hair wide so that
 * anti-aliased edges between cells of different colours leave no light seams.
 */
function drawCells(ctx: Canvas2D, projected: ProjectedView, picture: MapPicture, unit: number): void {
  ctx.lineWidth = MAP_STYLE.seamWidth * unit;
  for (const { colour, path } of projected.cellGroups(picture.slice, picture.measure, picture.scale)) {
    ctx.fillStyle = colour;
    ctx.strokeStyle = colour;
    ctx.fill(path);
    ctx.stroke(path);
  }
}

/**
 * Places as small squares on whole device pixels. Up to DOT_RASTER_FROM of them go to the canvas
 * as one path of squares (cheap for a GPU-backed canvas, which would otherwise take a texture
 * upload); beyond that they are written as pixels (DotRaster), which a canvas drawn without a
 * GPU needs to keep tens of thousands of them within a frame. Both give the same pixels.
 */
function drawPlaces(ctx: Canvas2D, projected: ProjectedView, view: AnalysisView, slice: number, frame: MapFrame, pixelRatio: number, dots: DotRaster): void {
  const side = Math.max(1, Math.round(MAP_STYLE.placeSide * pixelRatio));
  const k = frame.k * pixelRatio, tx = frame.tx * pixelRatio - side / 2, ty = frame.ty * pixelRatio - side / 2;
  const xy = projected.places(slice);
  const from = view.positions.sliceStart[slice], to = view.positions.sliceStart[slice + 1];
  if (to - from > DOT_RASTER_FROM) {
    dots.draw(ctx, xy, from, to, k, tx, ty, side, OVERLAY_COLOURS.points, MAP_STYLE.placeAlpha);
    return;
  }
  ctx.fillStyle = MAP_STYLE.placeFill;
  ctx.beginPath();
  for (let i = from; i < to; i++) {
    const x = xy[2 * i];
    if (x !== x) continue; // hidden by the clip
    ctx.rect(Math.round(k * x + tx), Math.round(k * xy[2 * i + 1] + ty), side, side);
  }
  ctx.fill();
}

/** A ring around the slice's hull lever, in the hull's colour; nothing when hidden by the clip. */
function drawLever(ctx: Canvas2D, projected: ProjectedView, view: AnalysisView, slice: number, frame: MapFrame, pixelRatio: number): void {
  const { hullLeverLat: lat, hullLeverLon: lon } = view.slices[slice];
  if (Number.isNaN(lat)) return;
  const xy = new Float32Array(2);
  if (projectPointsInto(projected.reference.projection, [lon], [lat], 0, 1, xy) === 0) return;
  const k = frame.k * pixelRatio;
  ctx.beginPath();
  ctx.arc(k * xy[0] + frame.tx * pixelRatio, k * xy[1] + frame.ty * pixelRatio, MAP_STYLE.leverRadius * pixelRatio, 0, 2 * Math.PI);
  ctx.strokeStyle = rgbCss(OVERLAY_COLOURS.hull);
  ctx.lineWidth = MAP_STYLE.leverRingWidth * pixelRatio;
  ctx.stroke();
}

/** Indicator sites as dots ringed in white, one pass per kind so each kind is one path. */
function drawIndicators(ctx: Canvas2D, projected: ProjectedView, view: AnalysisView, slice: number, frame: MapFrame, pixelRatio: number): void {
  const indicators = view.indicators;
  const xy = projected.indicators(slice);
  if (indicators === undefined || xy === undefined) return;
  const r = MAP_STYLE.indicatorRadius * pixelRatio;
  const k = frame.k * pixelRatio, tx = frame.tx * pixelRatio, ty = frame.ty * pixelRatio;
  const from = indicators.sliceStart[slice], to = indicators.sliceStart[slice + 1];
  ctx.strokeStyle = MAP_STYLE.indicatorRing;
  ctx.lineWidth = MAP_STYLE.indicatorRingWidth * pixelRatio;
  for (let kind = 0; kind < indicators.kinds.length; kind++) {
    ctx.beginPath();
    for (let i = from; i < to; i++) {
      if (indicators.kind[i] !== kind || xy[2 * i] !== xy[2 * i]) continue;
      const x = k * xy[2 * i] + tx, y = k * xy[2 * i + 1] + ty;
      ctx.moveTo(x + r, y);
      ctx.arc(x, y, r, 0, 2 * Math.PI);
    }
    ctx.fillStyle = rgbCss(indicatorColour(kind));
    ctx.fill();
    ctx.stroke();
  }
}
