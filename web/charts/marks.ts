/**
 * What a chart is drawn from: a flat list of primitive marks in pixels. The same list is
 * rendered live by Lit (lit-marks.ts) and written as a standalone SVG document (svg-document.ts),
 * so the screen and the exported figure cannot drift apart.
 */
export type Mark = PathMark | RectMark | TextMark;

export interface PathMark {
  readonly kind: 'path';
  readonly d: string;
  readonly stroke: string;
  readonly strokeWidth: number;
  /** Fill colour; none when absent. */
  readonly fill?: string;
  /** stroke-dasharray; solid when absent or ''. */
  readonly dash?: string;
}

export interface RectMark {
  readonly kind: 'rect';
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
  readonly fill: string;
  readonly stroke?: string;
}

export interface TextMark {
  readonly kind: 'text';
  readonly x: number;
  /** Baseline. */
  readonly y: number;
  readonly text: string;
  readonly anchor: 'start' | 'middle' | 'end';
  /** Font size, px. */
  readonly size: number;
  readonly fill?: string;
  readonly bold?: boolean;
}

/** Text colour of labels and axes. */
export const INK = 'rgb(29, 35, 40)';
/** Axis lines and ticks. */
export const AXIS = 'rgb(120, 128, 136)';
/** Grid lines. */
export const GRID = 'rgb(226, 230, 234)';
/** The current slice's band: a subtle grey. */
export const HIGHLIGHT = 'rgba(0, 0, 0, 0.08)';

/** A horizontal or vertical line as a path mark. */
export function lineMark(x1: number, y1: number, x2: number, y2: number, stroke: string, strokeWidth = 1): PathMark {
  return { kind: 'path', d: `M${x1},${y1}L${x2},${y2}`, stroke, strokeWidth };
}

export function textMark(x: number, y: number, text: string, anchor: TextMark['anchor'] = 'start', size = 11, extra: Partial<Pick<TextMark, 'fill' | 'bold'>> = {}): TextMark {
  return { kind: 'text', x, y, text, anchor, size, ...extra };
}

/** Average glyph width as a share of font size, for laying out text without measuring it (a rule of thumb for sans-serif faces). */
const GLYPH_WIDTH = 0.6;

/** Estimated width of a line of text, px. */
export function textWidth(text: string, size: number): number {
  return text.length * size * GLYPH_WIDTH;
}

/** Joins pieces with `separator` into lines whose estimated width stays within `maxWidth`; a piece is never split. */
export function wrapPieces(pieces: readonly string[], separator: string, size: number, maxWidth: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const piece of pieces) {
    const joined = line === '' ? piece : `${line}${separator}${piece}`;
    if (line !== '' && textWidth(joined, size) > maxWidth) {
      lines.push(line);
      line = piece;
    } else {
      line = joined;
    }
  }
  if (line !== '') lines.push(line);
  return lines;
}
