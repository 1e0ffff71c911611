/** How a time slice is named in titles, labels and readouts. */
import type { SliceMetrics } from '../../src/analysis';
import { formatMa } from '../../src/time';

type SliceName = Pick<SliceMetrics, 'name' | 'baseMa' | 'topMa'>;

/** "298.9–293.5 Ma". */
export function ageRange(slice: Pick<SliceMetrics, 'baseMa' | 'topMa'>): string {
  return `${formatMa(slice.baseMa)}–${formatMa(slice.topMa)} Ma`;
}

/**
 * "Asselian, 298.9–293.5 Ma"; just the range when the slice is named by it (equal bins: "5–0 Ma");
 * "No slice" when there is none (plain text: escape it for markup).
 */
export function sliceTitle(slice: SliceName | undefined): string {
  if (slice === undefined) return 'No slice';
  const range = ageRange(slice);
  return slice.name === range ? range : `${slice.name}, ${range}`;
}
