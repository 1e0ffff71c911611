/**
 * deck.gl layers of one slice from its prepared binary data. Ids carry the cache generation and
 * the slice, so a slice shown before keeps its layers (and their GPU buffers) while hidden.
 */
import type { Color, Layer } from '@deck.gl/core';
import { GeoJsonLayer, PathLayer, ScatterplotLayer, SolidPolygonLayer } from '@deck.gl/layers';
import { OVERLAY_COLOURS } from '../colour/layer-colours';
import type { LayerVisibility } from '../state/view-options';
import { HORIZON_CULL } from './horizon-cull';
import { GRATICULE_LAYER_ID } from './offline-style';
import type { SliceLayerData } from './slice-layer-data';

/** Lets a layer name the maplibre style layer it is drawn beneath (see @deck.gl/maplibre). */
interface BeneathProps { beforeId?: string }

export interface SliceLayerOptions {
  readonly generation: number;
  /** True for the slice on screen; false keeps the layers loaded but undrawn. */
  readonly current: boolean;
  readonly layers: LayerVisibility;
  /** Whether the places layer exists at all (see pointDecision): false frees its buffers. */
  readonly includePoints: boolean;
}

/** Prefix of the cell layers' ids (the ones picked for hover). */
export const CELL_LAYER_PREFIX = 'cells';

const CELL_OPACITY = 0.85;
/**
 * Depth-test against maplibre's globe (it hides the far side) but write no depth: deck's layers
 * sit at different lifts (see globe-lift.ts) and must stack in drawing order, not by altitude.
 */
const PARAMETERS = { depthWriteEnabled: false, depthCompare: 'less-equal' } as const;
/** Discs facing the camera are culled at the horizon instead (see horizon-cull.ts). */
const BILLBOARD_PARAMETERS = { depthWriteEnabled: false, depthCompare: 'always' } as const;
const HIGHLIGHT: number[] = [255, 255, 255, 110];
const HULL: Color = [...OVERLAY_COLOURS.hull];
const TREE: Color = [...OVERLAY_COLOURS.spanningTree];
const POINTS: Color = [...OVERLAY_COLOURS.points];
const POLYGON_FILL: Color = [...OVERLAY_COLOURS.polygons, 160];
const POLYGON_EDGE: Color = [...OVERLAY_COLOURS.polygonEdge];
const SITE_EDGE: Color = [255, 255, 255];
const POINT_RADIUS_PX = 1.8;
const SITE_RADIUS_PX = 4;
const SITE_EDGE_PX = 1;
const LEVER_RADIUS_PX = 7;
const LEVER_RING_PX = 2;

export function cellLayerId(generation: number, slice: number): string {
  return `${CELL_LAYER_PREFIX}-g${generation}-s${slice}`;
}

/** Layers in drawing order: base polygons and cells beneath the graticule, then the overlays. */
export function sliceLayers(data: SliceLayerData, options: SliceLayerOptions): Layer[] {
  const { generation, current, layers: on } = options;
  const tag = `g${generation}-s${data.slice}`;
  const out: Layer[] = [];
  if (data.polygons) {
    out.push(new GeoJsonLayer<unknown, BeneathProps>({
      id: `polygons-${tag}`, beforeId: GRATICULE_LAYER_ID, data: data.polygons, visible: current && on.polygons,
      modelMatrix: data.lifts.polygons, parameters: PARAMETERS,
      stroked: true, filled: true, getFillColor: POLYGON_FILL, getLineColor: POLYGON_EDGE, lineWidthUnits: 'pixels', getLineWidth: 1,
    }));
  }
  out.push(new SolidPolygonLayer<null, BeneathProps>({
    id: cellLayerId(generation, data.slice), beforeId: GRATICULE_LAYER_ID, data: data.cells, visible: current && on.cells,
    modelMatrix: data.lifts.cells, parameters: PARAMETERS,
    _normalize: false, _windingOrder: 'CCW', opacity: CELL_OPACITY, pickable: true, autoHighlight: true, highlightColor: HIGHLIGHT,
  }));
  out.push(new PathLayer<null>({
    id: `hull-${tag}`, data: data.hull, visible: current && on.hull, modelMatrix: data.lifts.hull, parameters: PARAMETERS,
    getColor: HULL, widthUnits: 'pixels', getWidth: 2.5, jointRounded: true, capRounded: true,
  }));
  out.push(new PathLayer<null>({
    id: `tree-${tag}`, data: data.spanningTree, visible: current && on.spanningTree, modelMatrix: data.lifts.spanningTree, parameters: PARAMETERS,
    getColor: TREE, widthUnits: 'pixels', getWidth: 2, capRounded: true,
  }));
  out.push(new ScatterplotLayer<null>({
    id: `lever-${tag}`, data: data.lever, visible: current && on.hull, parameters: BILLBOARD_PARAMETERS, extensions: [HORIZON_CULL],
    radiusUnits: 'pixels', getRadius: LEVER_RADIUS_PX, filled: false, stroked: true, getLineColor: HULL, lineWidthUnits: 'pixels', getLineWidth: LEVER_RING_PX,
  }));
  if (data.indicators) {
    out.push(new ScatterplotLayer<null>({
      id: `indicators-${tag}`, data: data.indicators, visible: current && on.indicators, parameters: BILLBOARD_PARAMETERS, extensions: [HORIZON_CULL],
      radiusUnits: 'pixels', getRadius: SITE_RADIUS_PX, stroked: true, getLineColor: SITE_EDGE, lineWidthUnits: 'pixels', getLineWidth: SITE_EDGE_PX,
    }));
  }
  if (options.includePoints) {
    out.push(new ScatterplotLayer<null>({
      id: `points-${tag}`, data: data.points, visible: current && on.points, parameters: BILLBOARD_PARAMETERS, extensions: [HORIZON_CULL],
      radiusUnits: 'pixels', getRadius: POINT_RADIUS_PX, getFillColor: POINTS,
    }));
  }
  return out;
}
