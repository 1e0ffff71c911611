/**
 * Geometry of the latitude panel: for each palaeolatitude band (90°N at the top), the current
 * slice's share of occurrences beside the share over every slice, as horizontal bars, and the
 * slice's indicator sites per kind as dots (area ∝ count, on one scale for the whole analysis).
 */
import type { LatitudeCounts } from '../protocol';
import { INDICATOR_COLOURS, rgbCss } from '../colour/layer-colours';
import { bandEdges, indicatorBandCounts, largestCount, sliceBandShares, totalBandShares } from './band-shares';
import { linearScale } from './linear-scale';
import { markerPath } from './line-path';
import { AXIS, GRID, INK, lineMark, textMark, textWidth, type Mark } from './marks';
import { headingMarks, type FigureHeading } from './figure-heading';
import { formatLatitude, formatNumber, tickFormat } from './number-format';
import { niceAxis } from './ticks';

const MARGIN_LEFT = 46;
const MARGIN_RIGHT = 14;
const PLOT_HEIGHT = 300;
const AXIS_HEIGHT = 38;
const LEGEND_LINE = 18;
/** Share ticks: about one per PX_PER_X_TICK px of bar length, at least 2. */
const PX_PER_X_TICK = 60;
/** Width of one indicator kind's column of dots. */
const KIND_COLUMN = 14;
const MIN_DOT = 2.5;
/** Count labels on the slice's bars when a band is at least this tall, px. */
const LABELS_FROM_PX = 14;
/** Parallels labelled on the latitude axis (every 30°, common practice for global plots). */
const PARALLELS = [90, 60, 30, 0, -30, -60, -90];

export const SLICE_BAR = 'rgb(51, 65, 77)';
export const TOTAL_BAR = 'rgb(188, 196, 204)';

export interface LatitudeInput {
  readonly latitude: LatitudeCounts;
  readonly slice: number;
  readonly sliceName: string;
  /** Indicator kinds to mark (empty for none); index k is kind k of latitude.indicatorsPerSlice. */
  readonly kinds: readonly string[];
  readonly width: number;
  /** Title block of an exported figure; absent on screen. */
  readonly heading?: FigureHeading;
}

export interface LatitudeLayout {
  readonly width: number;
  readonly height: number;
  readonly plotLeft: number;
  readonly plotRight: number;
  /** Each band's top (north) and bottom (south) edge, px. */
  readonly bandTop: Float64Array;
  readonly bandBottom: Float64Array;
  readonly marks: readonly Mark[];
}

export function latitudeLayout(input: LatitudeInput): LatitudeLayout {
  const { latitude, slice, sliceName, kinds, width } = input;
  const { bands, bandDeg } = latitude;
  const own = sliceBandShares(latitude, slice);
  const all = totalBandShares(latitude);
  const marks: Mark[] = [];

  const heading = headingMarks(input.heading, MARGIN_LEFT, width - MARGIN_RIGHT);
  marks.push(...heading.marks);
  const bars = legendMarks([
    { colour: SLICE_BAR, label: `${sliceName} (n = ${formatNumber(own.total)})`, swatch: 'square' },
    { colour: TOTAL_BAR, label: `all slices (n = ${formatNumber(all.total)})`, swatch: 'square' },
  ], heading.bottom + LEGEND_LINE, width);
  marks.push(...bars.marks);
  let legendBottom = bars.bottom;
  if (kinds.length > 0) {
    const sites = legendMarks([
      { colour: INK, label: 'indicator sites:', swatch: 'none' },
      ...kinds.map((kind, k) => ({ colour: kindColour(k), label: kind, swatch: 'dot' as const })),
    ], bars.bottom + LEGEND_LINE, width);
    marks.push(...sites.marks);
    legendBottom = sites.bottom;
  }
  const plotTop = legendBottom + 10;
  const plotBottom = plotTop + PLOT_HEIGHT;
  const plotLeft = MARGIN_LEFT;
  const right = width - MARGIN_RIGHT;
  const barsRight = Math.max(plotLeft + 1, right - (kinds.length > 0 ? kinds.length * KIND_COLUMN + 10 : 0));
  const y = linearScale([90, -90], [plotTop, plotBottom]);

  let largest = 0;
  for (let b = 0; b < bands; b++) largest = Math.max(largest, own.shares[b], all.shares[b]);
  const axis = niceAxis(largest, Math.max(2, Math.floor((barsRight - plotLeft) / PX_PER_X_TICK)));
  const x = linearScale([0, axis.top], [plotLeft, barsRight]);
  const format = tickFormat(axis.step * 100, axis.top * 100);
  for (const t of axis.ticks) {
    const px = Math.round(x(t)) + 0.5;
    marks.push(lineMark(px, plotTop, px, plotBottom, GRID), lineMark(px, plotBottom, px, plotBottom + 4, AXIS));
    marks.push(textMark(px, plotBottom + 15, `${format(t * 100)}%`, 'middle', 10, { fill: INK }));
  }
  for (const lat of PARALLELS) {
    const py = Math.round(y(lat)) + 0.5;
    marks.push(lineMark(plotLeft - 4, py, right, py, lat === 0 ? AXIS : GRID));
    marks.push(textMark(plotLeft - 6, py + 3.5, formatLatitude(lat), 'end', 10, { fill: INK }));
  }

  const bandTop = new Float64Array(bands);
  const bandBottom = new Float64Array(bands);
  const bar = (left: number, value: number, yTop: number, height: number, fill: string): void => {
    if (value > 0) marks.push({ kind: 'rect', x: left, y: yTop, width: Math.max(0.5, x(value) - left), height, fill });
  };
  for (let b = 0; b < bands; b++) {
    const [south, north] = bandEdges(bandDeg, b);
    bandTop[b] = y(north);
    bandBottom[b] = y(south);
    const gap = Math.min(1, (bandBottom[b] - bandTop[b]) / 8);
    const half = (bandBottom[b] - bandTop[b] - 2 * gap) / 2;
    bar(plotLeft, own.shares[b], bandTop[b] + gap, half, SLICE_BAR);
    bar(plotLeft, all.shares[b], bandTop[b] + gap + half, half, TOTAL_BAR);
    if (own.counts[b] > 0 && bandBottom[b] - bandTop[b] >= LABELS_FROM_PX) {
      marks.push(textMark(x(own.shares[b]) + 3, bandTop[b] + gap + half - 1, formatNumber(own.counts[b]), 'start', 9, { fill: INK }));
    }
  }
  marks.push(lineMark(plotLeft + 0.5, plotTop, plotLeft + 0.5, plotBottom, AXIS), lineMark(plotLeft, plotBottom + 0.5, barsRight, plotBottom + 0.5, AXIS));
  marks.push(textMark((plotLeft + barsRight) / 2, plotBottom + 30, 'share of occurrences', 'middle', 11, { fill: INK }));
  // Near the North Pole, where bars are short in most analyses.
  if (own.total === 0) marks.push(textMark(barsRight, plotTop + 16, `no occurrences in ${sliceName}`, 'end', 12, { fill: INK }));

  if (kinds.length > 0) marks.push(...indicatorMarks(input, bandTop, bandBottom, right));
  return { width, height: plotBottom + AXIS_HEIGHT, plotLeft, plotRight: right, bandTop, bandBottom, marks };
}

/** One column of dots per kind at the right; dot area ∝ sites, the largest (slice, kind, band) count of the analysis filling a band. */
function indicatorMarks(input: LatitudeInput, bandTop: Float64Array, bandBottom: Float64Array, right: number): Mark[] {
  const { latitude, slice, kinds } = input;
  const largest = Math.max(1, largestCount(latitude.indicatorsPerSlice ?? []));
  const rowHeight = bandBottom.length === 0 ? 0 : bandBottom[0] - bandTop[0];
  const maxRadius = Math.max(MIN_DOT, Math.min(KIND_COLUMN, rowHeight) / 2 - 0.5);
  const marks: Mark[] = [];
  kinds.forEach((_, k) => {
    const cx = right - (kinds.length - k - 0.5) * KIND_COLUMN;
    const counts = indicatorBandCounts(latitude, kinds.length, slice, k);
    const colour = kindColour(k);
    // A faint guide in the kind's colour ties the column to its legend entry.
    marks.push(lineMark(cx, bandTop[bandTop.length - 1], cx, bandBottom[0], kindColour(k, 0.3)));
    const parts: string[] = [];
    counts.forEach((count, b) => {
      if (count === 0) return;
      const r = Math.max(MIN_DOT, maxRadius * Math.sqrt(count / largest));
      parts.push(markerPath([cx], [(bandTop[b] + bandBottom[b]) / 2], r, true));
    });
    if (parts.length > 0) marks.push({ kind: 'path', d: parts.join(''), stroke: 'none', strokeWidth: 0, fill: colour });
  });
  return marks;
}

/** Colour of indicator kind k (the palette repeats past its end). */
function kindColour(k: number, alpha = 1): string {
  return rgbCss(INDICATOR_COLOURS[k % INDICATOR_COLOURS.length], alpha);
}

interface LegendItem {
  readonly colour: string;
  readonly label: string;
  readonly swatch: 'square' | 'dot' | 'none';
}

/** Legend items left to right from baseline y, wrapped to the width; `bottom` is the last baseline. */
function legendMarks(items: readonly LegendItem[], y: number, width: number): { marks: Mark[]; bottom: number } {
  const marks: Mark[] = [];
  let x = MARGIN_LEFT;
  for (const item of items) {
    const indent = item.swatch === 'none' ? 0 : 15;
    const itemWidth = indent + textWidth(item.label, 11) + 12;
    if (x + itemWidth > width - MARGIN_RIGHT && x > MARGIN_LEFT) {
      x = MARGIN_LEFT;
      y += LEGEND_LINE;
    }
    if (item.swatch === 'dot') marks.push({ kind: 'path', d: markerPath([x + 5], [y - 4], 4, true), stroke: 'none', strokeWidth: 0, fill: item.colour });
    if (item.swatch === 'square') marks.push({ kind: 'rect', x, y: y - 9, width: 10, height: 10, fill: item.colour });
    marks.push(textMark(x + indent, y, item.label, 'start', 11, { fill: INK }));
    x += itemWidth;
  }
  return { marks, bottom: y };
}
