/** Sizes (CSS pixels) and the few colours of the equal-area map not set by the palettes. */
import { OVERLAY_COLOURS, rgbCss } from '../colour/layer-colours';

const PLACE_ALPHA = 0.75;

export const MAP_STYLE = {
  graticuleWidth: 0.5,
  polygonEdgeWidth: 0.75,
  /** Same-colour outline on each cell, covering anti-aliasing seams between neighbours. */
  seamWidth: 0.5,
  hullWidth: 2,
  /** Ring around the hull lever, the place whose removal shrinks the hull most. */
  leverRadius: 7,
  leverRingWidth: 2,
  treeWidth: 1.25,
  /** Trees with more edges than this are drawn one device pixel wide (see treeWidth). */
  thinTreeEdges: 2000,
  outlineWidth: 1,
  outline: 'rgb(110, 118, 126)',
  /** Side of the square drawn for each place. */
  placeSide: 2,
  placeAlpha: PLACE_ALPHA,
  placeFill: rgbCss(OVERLAY_COLOURS.points, PLACE_ALPHA),
  indicatorRadius: 3.5,
  indicatorRing: 'rgb(255, 255, 255)',
  indicatorRingWidth: 1,
} as const;

/**
 * Width of the spanning tree, CSS px. A tree of tens of thousands of edges is a dense web
 * where thin lines read better, and strokes up to one device pixel wide are drawn by canvas
 * engines as hairlines, far cheaper than wider ones in Chromium's software rasteriser, which is
 * what a browser without a GPU (this view's audience) uses.
 */
export function treeWidth(edges: number, pixelRatio: number): number {
  return edges > MAP_STYLE.thinTreeEdges ? 1 / pixelRatio : MAP_STYLE.treeWidth;
}
