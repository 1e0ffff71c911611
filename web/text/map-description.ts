/** What a map shows, in one sentence: the accessible name of both maps and the SVG figure's description. */
import type { AnalysisView, Measure } from '../protocol';
import { MEASURE_UNITS } from '../state/view-options';
import { countWords } from './count-words';
import { sliceTitle } from './slice-title';

/** `map` names the kind of map ("Globe", "Equal Earth map"). */
export function mapDescription(view: AnalysisView | undefined, slice: number, measure: Measure, map: string): string {
  const s = view?.slices[slice];
  if (s === undefined) return `${map}: no analysis to show yet.`;
  return `${map} of slice ${sliceTitle(s)}: ${countWords(s.cells, 'cell')} coloured by ${MEASURE_UNITS[measure]}, `
    + `${countWords(s.positions, 'place')}, ${countWords(s.occurrences, 'occurrence')}.`;
}
