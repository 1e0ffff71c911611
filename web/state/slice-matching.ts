/** Keeping the user's place in time when the bins change. */
import type { SliceMetrics } from '../../src/analysis';

/** The slice of `slices` holding the mid-age of `previous` (or the nearest one), else 0. */
export function matchingSlice(slices: readonly SliceMetrics[], previous: SliceMetrics | undefined): number {
  if (previous === undefined || slices.length === 0) return 0;
  const mid = 0.5 * (previous.baseMa + previous.topMa);
  let best = 0;
  let bestGap = Infinity;
  slices.forEach((s, k) => {
    const gap = mid > s.baseMa ? mid - s.baseMa : mid < s.topMa ? s.topMa - mid : 0;
    if (gap < bestGap) {
      best = k;
      bestGap = gap;
    }
  });
  return best;
}

/** The slice named `name`, or undefined. */
export function sliceNamed(slices: readonly SliceMetrics[], name: string): number | undefined {
  const k = slices.findIndex((s) => s.name === name);
  return k < 0 ? undefined : k;
}
