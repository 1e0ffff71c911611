/**
 * The map figure drawn on a canvas (for PNG export): the same layout, map, legend and caption
 * as the SVG figure (map-svg.ts), at any pixel ratio.
 */
import { PROJECTION_CAPTIONS, type EqualAreaProjection } from './map-projection';
import { DotRaster } from './dot-raster';
import { drawMap, type Canvas2D, type MapPicture } from './draw-map';
import { FIGURE_FONT, TEXT_SIZE, TITLE_SIZE, keyOffsets, type FigureLayout } from './figure-layout';
import { fitFrame } from './map-frame';
import type { MapLegend } from './map-legend';
import { MAP_STYLE } from './map-style';
import type { ProjectedView } from './projected-view';

export interface FigureDrawing {
  readonly layout: FigureLayout;
  readonly legend: MapLegend;
  readonly title: string;
  readonly projection: EqualAreaProjection;
  readonly picture: MapPicture;
}

export function drawFigure(ctx: Canvas2D, projected: ProjectedView, figure: FigureDrawing, pixelRatio: number): void {
  drawFigureFrame(ctx, { ...figure, caption: PROJECTION_CAPTIONS[figure.projection] }, pixelRatio);
  const { x0, y0, x1, y1 } = figure.layout.map;
  drawMap(ctx, projected, figure.picture, fitFrame(projected.reference, x0, y0, x1, y1), pixelRatio, new DotRaster());
}

/** What surrounds any map in a figure: the title, the count legend and the caption at the foot. */
export interface FigureFrame {
  readonly layout: FigureLayout;
  readonly legend: MapLegend;
  readonly title: string;
  readonly caption: string;
}

/** Draws a figure's background, title, legend and caption, leaving layout.map for the map. */
export function drawFigureFrame(ctx: Canvas2D, figure: FigureFrame, pixelRatio: number): void {
  const { layout, legend } = figure;
  ctx.save();
  ctx.setTransform(pixelRatio, 0, 0, pixelRatio, 0, 0);
  ctx.fillStyle = 'rgb(255, 255, 255)';
  ctx.fillRect(0, 0, layout.width, layout.height);
  ctx.fillStyle = 'rgb(29, 35, 40)';
  ctx.font = `600 ${TITLE_SIZE}px ${FIGURE_FONT}`;
  ctx.fillText(figure.title, layout.map.x0, layout.titleY);
  ctx.font = `${TEXT_SIZE}px ${FIGURE_FONT}`;
  ctx.fillStyle = 'rgb(29, 35, 40)';
  const { ramp } = layout;
  ctx.fillText(legend.title, ramp.x, layout.unitY);
  const gradient = ctx.createLinearGradient(ramp.x, 0, ramp.x + ramp.width, 0);
  for (const stop of legend.stops) gradient.addColorStop(stop.offset, stop.colour);
  ctx.fillStyle = gradient;
  ctx.fillRect(ramp.x, ramp.y, ramp.width, ramp.height);
  ctx.strokeStyle = 'rgb(110, 118, 126)';
  ctx.lineWidth = 0.5;
  ctx.strokeRect(ramp.x, ramp.y, ramp.width, ramp.height);
  ctx.fillStyle = 'rgb(29, 35, 40)';
  ctx.strokeStyle = 'rgb(29, 35, 40)';
  ctx.lineWidth = 0.75;
  ctx.textAlign = 'center';
  for (const tick of legend.ticks) {
    const x = ramp.x + tick.position * ramp.width;
    ctx.beginPath();
    ctx.moveTo(x, ramp.y + ramp.height);
    ctx.lineTo(x, ramp.y + ramp.height + 3);
    ctx.stroke();
    ctx.fillText(tick.label, x, layout.tickLabelY);
  }
  ctx.textAlign = 'start';
  const keyY = layout.keyY;
  if (keyY !== undefined) {
    const offsets = keyOffsets(legend.indicators.map((k) => k.label));
    legend.indicators.forEach((key, k) => {
      const x = ramp.x + offsets[k];
      ctx.fillStyle = key.colour;
      ctx.beginPath();
      ctx.arc(x + 4, keyY - 4, MAP_STYLE.indicatorRadius, 0, 2 * Math.PI);
      ctx.fill();
      ctx.fillStyle = 'rgb(29, 35, 40)';
      ctx.fillText(key.label, x + 12, keyY);
    });
  }
  ctx.fillStyle = 'rgb(60, 66, 72)';
  ctx.fillText(figure.caption, layout.map.x0, layout.captionY);
  ctx.restore();
}
