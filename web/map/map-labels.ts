/** Words the WebGL map shows or announces: tooltip lines, accessible names, legend ticks. */
import type { CountScale } from '../colour/measure-scale';
import type { AnalysisView, Measure } from '../protocol';
import { MEASURE_UNITS } from '../state/view-options';

const format = (n: number): string => n.toLocaleString('en');
const plural = (n: number, one: string, many: string): string => `${format(n)} ${n === 1 ? one : many}`;

/** The counts of one cell entry, one line each (plain text: it is rendered as text). */
export function cellTooltipLines(view: AnalysisView, entry: number): string[] {
  const { cells } = view;
  return [
    plural(cells.occurrences[entry], 'occurrence', 'occurrences'),
    view.collectionsArePositions
      ? plural(cells.collections[entry], 'distinct place', 'distinct places')
      : plural(cells.collections[entry], 'collection', 'collections'),
    plural(cells.taxa[entry], 'taxon', 'taxa'),
  ];
}

/** Accessible name of the map region: what, which slice, coloured by what. */
export function mapRegionLabel(view: AnalysisView | undefined, slice: number, measure: Measure, projection: 'globe' | 'flat'): string {
  const kind = projection === 'globe' ? 'Globe' : 'Flat map (Web Mercator)';
  const metrics = view?.slices[slice];
  if (!metrics) return `${kind}: no analysis to show`;
  return `${kind} of slice ${metrics.name} (${metrics.baseMa}–${metrics.topMa} Ma): ${plural(metrics.cells, 'occupied cell', 'occupied cells')} coloured by ${MEASURE_UNITS[measure]}`;
}

export interface LegendTick {
  readonly label: string;
  /** Position along the gradient, percent. */
  readonly percent: number;
}

/** The scale's ticks, placed where countScale puts them on its log axis. */
export function legendTicks(scale: CountScale): LegendTick[] {
  return scale.ticks.map((t) => ({ label: format(t), percent: scale.position(t) * 100 }));
}
