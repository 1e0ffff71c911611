/** Words about one occupied cell, the same in both maps' tooltips and the cell panel. */
import type { AnalysisView } from '../protocol';
import { collectionNoun, countWords } from './count-words';

/** The cell entry's counts, one phrase each: ["1 occurrence", "2 collections", "1 taxon"]. */
export function cellCounts(view: AnalysisView, entry: number): string[] {
  const { cells } = view;
  return [
    countWords(cells.occurrences[entry], 'occurrence'),
    countWords(cells.collections[entry], collectionNoun(view.collectionsArePositions)),
    countWords(cells.taxa[entry], 'taxon'),
  ];
}

/** "Cell 1234 (healpix:32)". */
export function cellName(view: AnalysisView, entry: number): string {
  return `Cell ${view.cells.cell[entry]} (${view.gridName})`;
}

/** A tooltip's lines: the cell's name, then its counts. */
export function cellTipLines(view: AnalysisView, entry: number): string[] {
  return [cellName(view, entry), ...cellCounts(view, entry)];
}

/** One coordinate to 0.1° with its hemisphere letter; none where it rounds to 0° (or to 180° of longitude). */
function coordinate(deg: number, positive: string, negative: string): string {
  const text = Math.abs(deg).toFixed(1);
  const letter = text === '0.0' || (positive === 'E' && text === '180.0') ? '' : deg > 0 ? ` ${positive}` : ` ${negative}`;
  return `${text}°${letter}`;
}

/** "12.3° N, 45.6° W": latitude first, each with its hemisphere, so neither can be mistaken for the other. */
export function positionWords(latDeg: number, lonDeg: number): string {
  return `${coordinate(latDeg, 'N', 'S')}, ${coordinate(lonDeg, 'E', 'W')}`;
}

/** "centre: latitude 12.3° N, longitude 45.6° W", each number named (a bare pair reads either way). */
export function cellCentre(latDeg: number, lonDeg: number): string {
  return `centre: latitude ${coordinate(latDeg, 'N', 'S')}, longitude ${coordinate(lonDeg, 'E', 'W')}`;
}
