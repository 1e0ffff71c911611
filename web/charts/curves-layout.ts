/**
 * Geometry of the curves panel: per-slice measures on a shared time axis, either one row per
 * series with its own axis and unit (small multiples), or every series divided by its maximum
 * on one 0…1 axis. Pure: the component and the figure export draw the marks it returns.
 */
import type { SliceMetrics } from '../../src/analysis';
import { linePath, markerPath } from './line-path';
import { AXIS, GRID, INK, lineMark, textMark, textWidth, type Mark } from './marks';
import { tickFormat } from './number-format';
import { finiteMax, normalised, seriesAxisLabel, seriesLabel, seriesValues, type SeriesSpec } from './series';
import { niceAxis, type NiceAxis } from './ticks';
import { linearScale } from './linear-scale';
import { headingMarks, type FigureHeading } from './figure-heading';
import { sliceEdges, timeAxisMarks, timeScale } from './time-axis';
import { rgbCss } from '../colour/layer-colours';

const MARGIN_LEFT = 52;
const MARGIN_RIGHT = 16;
/** One small-multiple row (label on top, then the plot) in figures, and its limits on screen. */
const ROW_HEIGHT = 72;
const MIN_ROW_HEIGHT = 48;
const MAX_ROW_HEIGHT = 120;
const ROW_LABEL = 18;
const ROW_GAP = 6;
const NORMALISED_HEIGHT = 220;
const MIN_NORMALISED_HEIGHT = 120;
/** Room under the last row for tick labels and the axis title. */
const AXIS_HEIGHT = 38;
/** Value ticks: about one per PX_PER_Y_TICK px of a row's plot, at most MAX_Y_TICKS. */
const PX_PER_Y_TICK = 16;
const MAX_Y_TICKS = 4;
const NORMALISED_TICKS = 4;
const LINE_WIDTH = 1.5;
/** Dots on every point when slices are at least this wide on screen; otherwise only lone points get one. */
const DOTS_FROM_PX = 8;
const DOT_RADIUS = 2.25;
const LEGEND_LINE = 18;

export interface CurvesInput {
  readonly slices: readonly SliceMetrics[];
  readonly collectionsArePositions: boolean;
  /** Visible series, in drawing order. */
  readonly series: readonly SeriesSpec[];
  readonly normalise: boolean;
  readonly width: number;
  /**
   * Height to fill, px: rows stretch or shrink to it within limits (a taller chart then scrolls).
   * Absent in figures, which use fixed row heights.
   */
  readonly height?: number;
  /** Title block of an exported figure, which then also gets a legend; absent on screen. */
  readonly heading?: FigureHeading;
}

export interface CurvesLayout {
  readonly width: number;
  readonly height: number;
  /** Vertical extent of the rows: the current slice's band spans it. */
  readonly plotTop: number;
  readonly plotBottom: number;
  /** Each slice's left (base) and right (top) edge, px. */
  readonly sliceLeft: Float64Array;
  readonly sliceRight: Float64Array;
  /** Everything above plotBottom: heading, legend, grid, rows. */
  readonly marks: readonly Mark[];
  /** The time axis below plotBottom (kept apart so a scrolling panel can pin it in view). */
  readonly axisMarks: readonly Mark[];
}

export function curvesLayout(input: CurvesInput): CurvesLayout {
  const { slices, series, normalise, width } = input;
  const heading = figureTop(input);
  const plotTop = heading.height + 4;
  const rowHeight = fitted(input.height, plotTop, Math.max(1, series.length), ROW_HEIGHT, MIN_ROW_HEIGHT, MAX_ROW_HEIGHT);
  const rowsHeight = normalise ? fitted(input.height, plotTop, 1, NORMALISED_HEIGHT, MIN_NORMALISED_HEIGHT, Infinity) : Math.max(1, series.length) * rowHeight;
  const plotBottom = plotTop + rowsHeight;
  const left = MARGIN_LEFT;
  const right = Math.max(left + 1, width - MARGIN_RIGHT);
  const x = timeScale(slices, left, right);
  const edges = sliceEdges(slices, x);
  const time = timeAxisMarks(x, plotTop, plotBottom);
  const marks: Mark[] = [...heading.marks, ...time.grid];

  const dotsEverywhere = slices.length > 0 && (right - left) / slices.length >= DOTS_FROM_PX;
  const plot = (values: Float64Array, spec: SeriesSpec, top: number, bottom: number, max: number, dash: string): void => {
    const y = linearScale([0, max], [bottom, top]);
    const ys = values.map(y);
    const colour = rgbCss(spec.colour);
    marks.push({ kind: 'path', d: linePath(edges.mid, ys), stroke: colour, strokeWidth: LINE_WIDTH, dash });
    const dots = markerPath(edges.mid, ys, DOT_RADIUS, dotsEverywhere);
    if (dots !== '') marks.push({ kind: 'path', d: dots, stroke: 'none', strokeWidth: 0, fill: colour });
  };

  if (series.length === 0) {
    marks.push(textMark((left + right) / 2, (plotTop + plotBottom) / 2, 'No series selected', 'middle', 12, { fill: INK }));
  } else if (normalise) {
    const top = plotTop + ROW_LABEL;
    marks.push(...valueAxis(niceAxis(1, NORMALISED_TICKS), top, plotBottom, left, right));
    marks.push(textMark(left, plotTop + 12, 'each series ÷ its largest value', 'start', 11, { fill: INK }));
    for (const spec of series) plot(normalised(seriesValues(slices, spec.key)), spec, top, plotBottom, 1, spec.dash);
  } else {
    series.forEach((spec, r) => {
      const rowTop = plotTop + r * rowHeight;
      const top = rowTop + ROW_LABEL;
      const bottom = rowTop + rowHeight - ROW_GAP;
      const values = seriesValues(slices, spec.key);
      const axis = niceAxis(finiteMax(values), Math.max(1, Math.min(MAX_Y_TICKS, Math.floor((bottom - top) / PX_PER_Y_TICK))));
      marks.push(...valueAxis(axis, top, bottom, left, right));
      marks.push(lineMark(left, rowTop + 8, left + 14, rowTop + 8, rgbCss(spec.colour), 2.5));
      marks.push(textMark(left + 19, rowTop + 12, seriesAxisLabel(spec, input.collectionsArePositions), 'start', 11, { fill: INK, bold: true }));
      if (!values.some(Number.isFinite)) marks.push(textMark((left + right) / 2, (top + bottom) / 2 + 4, 'no values', 'middle', 11, { fill: AXIS }));
      plot(values, spec, top, bottom, axis.top, '');
    });
  }
  return { width, height: plotBottom + AXIS_HEIGHT, plotTop, plotBottom, sliceLeft: edges.left, sliceRight: edges.right, marks, axisMarks: time.axis };
}

/** Height of each of `rows` rows filling `height` below `plotTop` (leaving room for the time axis), within [min, max]; `preset` without a height. */
function fitted(height: number | undefined, plotTop: number, rows: number, preset: number, min: number, max: number): number {
  if (height === undefined) return preset;
  return Math.min(max, Math.max(min, Math.floor((height - plotTop - AXIS_HEIGHT) / rows)));
}

/** Axis line, horizontal grid lines and labels of a value axis, between pixel rows `bottom` (0) and `top`. */
function valueAxis(axis: NiceAxis, top: number, bottom: number, left: number, right: number): Mark[] {
  const y = linearScale([0, axis.top], [bottom, top]);
  const format = tickFormat(axis.step, axis.top);
  const marks: Mark[] = [lineMark(left, top, left, bottom, AXIS)];
  for (const t of axis.ticks) {
    const py = Math.round(y(t)) + 0.5;
    marks.push(lineMark(left, py, right, py, t === 0 ? AXIS : GRID));
    marks.push(textMark(left - 5, py + 3.5, format(t), 'end', 10, { fill: INK }));
  }
  return marks;
}

/** In a figure: the heading, then a legend of the visible series when they share one axis (wrapped to the width). */
function figureTop(input: CurvesInput): { marks: Mark[]; height: number } {
  if (input.heading === undefined) return { marks: [], height: 0 };
  const right = input.width - MARGIN_RIGHT;
  const heading = headingMarks(input.heading, MARGIN_LEFT, right);
  const marks = heading.marks;
  let y = heading.bottom;
  if (input.normalise && input.series.length > 0) {
    y += LEGEND_LINE + 2;
    let x = MARGIN_LEFT;
    for (const spec of input.series) {
      const label = seriesLabel(spec, input.collectionsArePositions);
      const itemWidth = 26 + textWidth(label, 11) + 16;
      if (x + itemWidth > right && x > MARGIN_LEFT) {
        x = MARGIN_LEFT;
        y += LEGEND_LINE;
      }
      marks.push({ ...lineMark(x, y - 4, x + 22, y - 4, rgbCss(spec.colour), 2), dash: spec.dash });
      marks.push(textMark(x + 26, y, label, 'start', 11, { fill: INK }));
      x += itemWidth;
    }
  }
  return { marks, height: y + 6 };
}
