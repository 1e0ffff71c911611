/** Words about the map: figure title, accessible description, hover text. */
import { formatMa } from '../../src/time';
import type { AnalysisView, Measure } from '../protocol';
import { MEASURE_UNITS } from '../state/view-options';
import { PROJECTION_NAMES, type EqualAreaProjection } from './map-projection';

const COUNT = new Intl.NumberFormat('en-US');

export function hasSlice(view: AnalysisView | undefined, slice: number): view is AnalysisView {
  return view !== undefined && Number.isInteger(slice) && slice >= 0 && slice < view.slices.length;
}

/** "Maastrichtian, 72.1–66 Ma" (plain text: escape it for markup). */
export function sliceTitle(view: AnalysisView | undefined, slice: number): string {
  if (!hasSlice(view, slice)) return 'No slice';
  const s = view.slices[slice];
  return `${s.name}, ${formatMa(s.baseMa)}–${formatMa(s.topMa)} Ma`;
}

/** What the canvas shows, for its aria-label. */
export function mapDescription(view: AnalysisView | undefined, slice: number, measure: Measure, projection: EqualAreaProjection): string {
  const map = `${PROJECTION_NAMES[projection]} map`;
  if (!hasSlice(view, slice)) return `${map}: no analysis to show yet.`;
  const s = view.slices[slice];
  return `${map} of slice ${sliceTitle(view, slice)}: ${COUNT.format(s.cells)} occupied cells coloured by ${MEASURE_UNITS[measure]}, `
    + `${COUNT.format(s.positions)} places, ${COUNT.format(s.occurrences)} occurrences.`;
}

/** Counts of one occupied-cell entry as one line. */
export function cellSummary(view: AnalysisView, entry: number): string {
  const { cells } = view;
  const collections = view.collectionsArePositions ? 'places' : 'collections';
  return `Cell ${cells.cell[entry]} (${view.gridName}): ${COUNT.format(cells.occurrences[entry])} occurrences, `
    + `${COUNT.format(cells.collections[entry])} ${collections}, ${COUNT.format(cells.taxa[entry])} taxa`;
}
