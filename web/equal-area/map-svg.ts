/**
 * The map of one slice as a standalone SVG document: what the canvas draws (same layers, order,
 * colours and sizes), as d3-geo path strings rounded to 0.1 px, with the title, the count legend
 * (a linearGradient ramp, ticks, unit), the indicator key and the projection line. All text is
 * escaped.
 */
import { geoGraticule10, geoPath, type GeoProjection } from 'd3-geo';
import { OVERLAY_COLOURS, rgbCss } from '../colour/layer-colours';
import type { AnalysisView, Measure } from '../protocol';
import { measureColumn, type LayerVisibility } from '../state/view-options';
import { mapDescription, sliceTitle } from '../text';
import { escapeXml } from './escape-xml';
import { FIGURE_FONT, TEXT_SIZE, TITLE_SIZE, figureLayout, keyOffsets, type FigureLayout } from './figure-layout';
import { hasSlice } from './has-slice';
import { indicatorColour, mapLegend, type MapLegend } from './map-legend';
import { PROJECTION_CAPTIONS, PROJECTION_NAMES, SPHERE, fittedProjection, type EqualAreaProjection } from './map-projection';
import { MAP_STYLE, treeWidth } from './map-style';
import { projectPointsInto } from './project-points';
import type { ViewGeometry } from './view-geometry';

export interface MapFigure {
  readonly geometry: ViewGeometry | undefined;
  readonly slice: number;
  readonly measure: Measure;
  readonly layers: LayerVisibility;
  readonly projection: EqualAreaProjection;
  /** Figure width and map height, CSS pixels. */
  readonly width: number;
  readonly mapHeight: number;
}

const RAMP_ID = 'count-ramp';

/** A number rounded to 0.1 (what d3's path.digits(1) writes). */
function r1(x: number): number {
  return Math.round(x * 10) / 10;
}

export function mapSvg(figure: MapFigure): string {
  const view = figure.geometry?.view;
  const legend = mapLegend(view, figure.measure, figure.layers.indicators && hasSlice(view, figure.slice));
  const layout = figureLayout(figure.width, figure.mapHeight, legend.indicators.length > 0);
  const { x0, y0, x1, y1 } = layout.map;
  const projection = fittedProjection(figure.projection, x0, y0, x1, y1);
  const title = escapeXml(sliceTitle(view?.slices[figure.slice]));
  const out: string[] = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" width="${layout.width}" height="${layout.height}" viewBox="0 0 ${layout.width} ${layout.height}" font-family="${FIGURE_FONT}">`,
    `<title>${title}</title>`,
    `<desc>${escapeXml(mapDescription(view, figure.slice, figure.measure, PROJECTION_NAMES[figure.projection]))}</desc>`,
    `<defs><linearGradient id="${RAMP_ID}" x1="0" y1="0" x2="1" y2="0">`,
    ...legend.stops.map((s) => `<stop offset="${r1(s.offset * 100)}%" stop-color="${s.colour}"/>`),
    '</linearGradient></defs>',
    `<rect width="${layout.width}" height="${layout.height}" fill="rgb(255, 255, 255)"/>`,
    `<text x="${x0}" y="${layout.titleY}" font-size="${TITLE_SIZE}" font-weight="600">${title}</text>`,
  ];
  mapLayers(out, figure, projection, legend);
  legendSvg(out, layout, legend);
  out.push(`<text x="${x0}" y="${layout.captionY}" font-size="${TEXT_SIZE}" fill="rgb(60, 66, 72)">${escapeXml(PROJECTION_CAPTIONS[figure.projection])}</text>`, '</svg>', '');
  return out.join('\n');
}

function mapLayers(out: string[], figure: MapFigure, projection: GeoProjection, legend: MapLegend): void {
  const path = geoPath(projection).digits(1);
  out.push('<g id="map" stroke-linejoin="round">',
    `<path id="sphere" d="${path(SPHERE) ?? ''}" fill="${rgbCss(OVERLAY_COLOURS.ocean)}"/>`,
    `<path id="graticule" d="${path(geoGraticule10()) ?? ''}" fill="none" stroke="${rgbCss(OVERLAY_COLOURS.graticule)}" stroke-width="${MAP_STYLE.graticuleWidth}"/>`);
  const { geometry, slice, layers } = figure;
  if (geometry !== undefined && hasSlice(geometry.view, slice)) {
    const view = geometry.view;
    const polygons = layers.polygons ? geometry.polygons(slice) : undefined;
    const edges = layers.polygons ? geometry.polygonEdges(slice) : undefined;
    if (polygons !== undefined && edges !== undefined) {
      out.push(`<g id="base-polygons" fill="${rgbCss(OVERLAY_COLOURS.polygons)}">`);
      for (const feature of polygons.features) {
        const d = path(feature);
        if (d !== null) out.push(`<path d="${d}"/>`);
      }
      const outline = path(edges);
      if (outline !== null) out.push(`<path d="${outline}" fill="none" stroke="${rgbCss(OVERLAY_COLOURS.polygonEdge)}" stroke-width="${MAP_STYLE.polygonEdgeWidth}"/>`);
      out.push('</g>');
    }
    if (layers.cells) {
      const { sliceStart, cell, shape } = view.cells;
      const counts = measureColumn(view, figure.measure);
      out.push(`<g id="cells" stroke-width="${MAP_STYLE.seamWidth}">`);
      for (let e = sliceStart[slice]; e < sliceStart[slice + 1]; e++) {
        const d = path(geometry.cell(shape[e]));
        const colour = legend.scale.css(counts[e]);
        if (d !== null) out.push(`<path data-cell="${cell[e]}" data-count="${counts[e]}" fill="${colour}" stroke="${colour}" d="${d}"/>`);
      }
      out.push('</g>');
    }
    const line = (id: string, d: string | null, colour: readonly number[], width: number) => {
      if (d !== null) out.push(`<path id="${id}" d="${d}" fill="none" stroke="${rgbCss(colour)}" stroke-width="${width}" stroke-linecap="round"/>`);
    };
    if (layers.spanningTree) {
      const edges = view.spanningTrees.sliceStart[slice + 1] - view.spanningTrees.sliceStart[slice];
      line('spanning-tree', path(geometry.spanningTree(slice)), OVERLAY_COLOURS.spanningTree, treeWidth(edges, 1));
    }
    if (layers.hull) line('hull', path(geometry.hull(slice)), OVERLAY_COLOURS.hull, MAP_STYLE.hullWidth);
    if (layers.points) out.push(`<path id="places" fill="${MAP_STYLE.placeFill}" d="${placesPath(projection, view, slice)}"/>`);
    if (layers.indicators) indicatorsSvg(out, projection, view, slice);
  }
  out.push(`<path id="outline" d="${path(SPHERE) ?? ''}" fill="none" stroke="${MAP_STYLE.outline}" stroke-width="${MAP_STYLE.outlineWidth}"/>`, '</g>');
}

/** One small square per visible place, as the canvas draws them. */
function placesPath(projection: GeoProjection, view: AnalysisView, slice: number): string {
  const { sliceStart, lon, lat } = view.positions;
  const from = sliceStart[slice], n = sliceStart[slice + 1] - from;
  const xy = new Float32Array(2 * n);
  projectPointsInto(projection, lon, lat, from, from + n, xy, 0);
  const side = MAP_STYLE.placeSide, half = side / 2;
  const parts: string[] = [];
  for (let i = 0; i < n; i++) {
    if (xy[2 * i] !== xy[2 * i]) continue;
    parts.push(`M${r1(xy[2 * i] - half)} ${r1(xy[2 * i + 1] - half)}h${side}v${side}h${-side}z`);
  }
  return parts.join('');
}

function indicatorsSvg(out: string[], projection: GeoProjection, view: AnalysisView, slice: number): void {
  const indicators = view.indicators;
  if (indicators === undefined) return;
  const from = indicators.sliceStart[slice], n = indicators.sliceStart[slice + 1] - from;
  const xy = new Float32Array(2 * n);
  projectPointsInto(projection, indicators.lon, indicators.lat, from, from + n, xy, 0);
  const r = MAP_STYLE.indicatorRadius;
  out.push(`<g id="indicators" stroke="${MAP_STYLE.indicatorRing}" stroke-width="${MAP_STYLE.indicatorRingWidth}">`);
  for (let kind = 0; kind < indicators.kinds.length; kind++) {
    const parts: string[] = [];
    for (let i = 0; i < n; i++) {
      if (indicators.kind[from + i] !== kind || xy[2 * i] !== xy[2 * i]) continue;
      parts.push(`M${r1(xy[2 * i] + r)} ${r1(xy[2 * i + 1])}a${r} ${r} 0 1 1 ${-2 * r} 0a${r} ${r} 0 1 1 ${2 * r} 0z`);
    }
    if (parts.length > 0) out.push(`<path data-kind="${escapeXml(indicators.kinds[kind])}" fill="${rgbCss(indicatorColour(kind))}" d="${parts.join('')}"/>`);
  }
  out.push('</g>');
}

function legendSvg(out: string[], layout: FigureLayout, legend: MapLegend): void {
  const { ramp } = layout;
  out.push(`<g id="legend" font-size="${TEXT_SIZE}" fill="rgb(29, 35, 40)">`,
    `<text x="${ramp.x}" y="${layout.unitY}">${escapeXml(legend.title)}</text>`,
    `<rect x="${ramp.x}" y="${ramp.y}" width="${ramp.width}" height="${ramp.height}" fill="url(#${RAMP_ID})" stroke="rgb(110, 118, 126)" stroke-width="0.5"/>`);
  for (const tick of legend.ticks) {
    const x = r1(ramp.x + tick.position * ramp.width);
    out.push(`<line x1="${x}" y1="${ramp.y + ramp.height}" x2="${x}" y2="${ramp.y + ramp.height + 3}" stroke="rgb(29, 35, 40)" stroke-width="0.75"/>`,
      `<text x="${x}" y="${layout.tickLabelY}" text-anchor="middle">${escapeXml(tick.label)}</text>`);
  }
  const keyY = layout.keyY;
  if (keyY !== undefined) {
    const offsets = keyOffsets(legend.indicators.map((k) => k.label));
    legend.indicators.forEach((key, k) => {
      const x = ramp.x + offsets[k];
      out.push(`<circle cx="${x + 4}" cy="${keyY - 4}" r="${MAP_STYLE.indicatorRadius}" fill="${key.colour}"/>`,
        `<text x="${x + 12}" y="${keyY}">${escapeXml(key.label)}</text>`);
    });
  }
  out.push('</g>');
}
