/** The slices the time strip and curves show: the data's own range, or the whole scale. */
import type { SliceMetrics } from '../../src/analysis';

export interface SliceRange {
  /** First and last slice shown (inclusive). */
  readonly from: number;
  readonly to: number;
}

/**
 * From the oldest to the youngest slice holding occurrences (chart scales run over the whole
 * Phanerozoic, most of it empty for a typical table), or every slice when `wholeScale` or when
 * no slice holds any.
 */
export function shownSlices(slices: readonly SliceMetrics[], wholeScale: boolean): SliceRange {
  const all = { from: 0, to: Math.max(0, slices.length - 1) };
  if (wholeScale) return all;
  const from = slices.findIndex((s) => s.occurrences > 0);
  if (from < 0) return all;
  let to = slices.length - 1;
  while (slices[to].occurrences === 0) to--;
  return { from, to };
}
