// Summaries of a sample of values held in part of a Float64Array: quantile, mean, standard deviation.

/**
 * The p-quantile of ascending values sorted[from … to − 1] by linear interpolation between
 * order statistics, Hyndman & Fan's (1996, American Statistician 50, 361–365) definition 7:
 * h = (m − 1) p, Q = x⌊h⌋ + (h − ⌊h⌋)(x⌊h⌋+1 − x⌊h⌋). NaN for no values.
 */
export function sortedQuantile(sorted: Float64Array, from: number, to: number, p: number): number {
  const m = to - from;
  if (m <= 0) return Number.NaN;
  const h = (m - 1) * p;
  const below = Math.floor(h);
  const lower = sorted[from + below];
  return below + 1 < m ? lower + (h - below) * (sorted[from + below + 1] - lower) : lower;
}

/** Mean of values[from … to − 1]; NaN for none. */
export function mean(values: Float64Array, from: number, to: number): number {
  if (to <= from) return Number.NaN;
  let sum = 0;
  for (let k = from; k < to; k++) sum += values[k];
  return sum / (to - from);
}

/** Sample standard deviation (divisor m − 1) of values[from … to − 1]; NaN for fewer than two. */
export function sampleSd(values: Float64Array, from: number, to: number): number {
  if (to - from < 2) return Number.NaN;
  const centre = mean(values, from, to);
  let sum = 0;
  for (let k = from; k < to; k++) sum += (values[k] - centre) ** 2;
  return Math.sqrt(sum / (to - from - 1));
}
