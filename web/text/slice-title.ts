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

/**
 * Where the slice is among those shown, 0-based `slice` within `range` of `total`: "slice 8 of
 * 20", and when the strip shows part of the scale "slice 8 of 20 shown (58 of 102 in the scale)".
 */
export function slicePosition(slice: number, range: { readonly from: number; readonly to: number }, total: number): string {
  const shown = range.to - range.from + 1;
  const own = `slice ${slice - range.from + 1} of ${shown}`;
  return shown === total ? own : `${own} shown (${slice + 1} of ${total} in the scale)`;
}
