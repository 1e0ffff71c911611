/** The title block of an exported figure: a bold title, then details joined by " · " and wrapped. */
import { INK, textMark, wrapPieces, type Mark } from './marks';

export interface FigureHeading {
  readonly title: string;
  /** Short facts about the figure (slice, settings), kept whole when lines wrap. */
  readonly details: readonly string[];
}

const TITLE_SIZE = 14;
const DETAIL_SIZE = 11;
const LINE = 17;

/** Marks of the heading between x = left and right; `bottom` is the last baseline (0 without a heading). */
export function headingMarks(heading: FigureHeading | undefined, left: number, right: number): { marks: Mark[]; bottom: number } {
  if (heading === undefined) return { marks: [], bottom: 0 };
  let y = 18;
  const marks: Mark[] = [textMark(left, y, heading.title, 'start', TITLE_SIZE, { fill: INK, bold: true })];
  for (const line of wrapPieces(heading.details, ' · ', DETAIL_SIZE, right - left)) {
    y += LINE;
    marks.push(textMark(left, y, line, 'start', DETAIL_SIZE, { fill: INK }));
  }
  return { marks, bottom: y };
}
