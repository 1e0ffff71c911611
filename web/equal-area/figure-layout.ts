/**
 * Where things go on an exported map figure (SVG and PNG share it, in CSS pixels): the title
 * above the map, then the count legend (unit, ramp, ticks), the indicator key when indicators
 * are drawn, and the projection line at the foot.
 */
export const FIGURE_FONT = 'system-ui, sans-serif';
export const FIGURE_PAD = 12;
export const TITLE_SIZE = 15;
export const TEXT_SIZE = 11;
const TITLE_BAND = 32;
const RAMP_WIDTH = 320;
const RAMP_HEIGHT = 10;
const LINE = 18;

export interface FigureLayout {
  readonly width: number;
  readonly height: number;
  readonly titleY: number;
  /** The box the map is fitted into. */
  readonly map: { readonly x0: number; readonly y0: number; readonly x1: number; readonly y1: number };
  readonly unitY: number;
  readonly ramp: { readonly x: number; readonly y: number; readonly width: number; readonly height: number };
  readonly tickLabelY: number;
  /** Baseline of the indicator key, when there is one. */
  readonly keyY: number | undefined;
  readonly captionY: number;
}

export function figureLayout(width: number, mapHeight: number, withKey: boolean): FigureLayout {
  const mapBottom = TITLE_BAND + mapHeight;
  const unitY = mapBottom + LINE;
  const ramp = { x: FIGURE_PAD, y: unitY + 6, width: Math.max(0, Math.min(RAMP_WIDTH, width - 2 * FIGURE_PAD)), height: RAMP_HEIGHT };
  const tickLabelY = ramp.y + RAMP_HEIGHT + 14;
  const keyY = withKey ? tickLabelY + LINE : undefined;
  const captionY = (keyY ?? tickLabelY) + LINE;
  return {
    width,
    height: captionY + FIGURE_PAD,
    titleY: 22,
    map: { x0: FIGURE_PAD, y0: TITLE_BAND, x1: width - FIGURE_PAD, y1: mapBottom },
    unitY,
    ramp,
    tickLabelY,
    keyY,
    captionY,
  };
}

/** Rough advance of one character of the figure font at TEXT_SIZE, px (no text measuring in SVG). */
const CHAR_WIDTH = 0.6 * TEXT_SIZE;

/** Left offsets of the indicator key's entries (swatch, gap, label, space). */
export function keyOffsets(labels: readonly string[]): number[] {
  const offsets: number[] = [];
  let x = 0;
  for (const label of labels) {
    offsets.push(x);
    x += 12 + label.length * CHAR_WIDTH + 16;
  }
  return offsets;
}
