/**
 * Pearson's product-moment correlation of the pairs (x[k], y[k]) for which both are finite,
 * with the number of such pairs. NaN with fewer than three pairs or when either side is
 * constant.
 */
export function pearson(x: Float64Array, y: Float64Array): { readonly r: number; readonly pairs: number } {
  let n = 0, sx = 0, sy = 0;
  for (let k = 0; k < x.length; k++) {
    if (!Number.isFinite(x[k]) || !Number.isFinite(y[k])) continue;
    n++;
    sx += x[k];
    sy += y[k];
  }
  if (n < 3) return { r: Number.NaN, pairs: n };
  const mx = sx / n, my = sy / n;
  let sxx = 0, syy = 0, sxy = 0;
  for (let k = 0; k < x.length; k++) {
    if (!Number.isFinite(x[k]) || !Number.isFinite(y[k])) continue;
    const dx = x[k] - mx, dy = y[k] - my;
    sxx += dx * dx;
    syy += dy * dy;
    sxy += dx * dy;
  }
  return { r: sxx > 0 && syy > 0 ? sxy / Math.sqrt(sxx * syy) : Number.NaN, pairs: n };
}

/**
 * Spearman's rank correlation: Pearson's r of the ranks of the complete pairs, tied values
 * sharing their mean rank (the tie-corrected form).
 */
export function spearman(x: Float64Array, y: Float64Array): { readonly r: number; readonly pairs: number } {
  const keep: number[] = [];
  for (let k = 0; k < x.length; k++) if (Number.isFinite(x[k]) && Number.isFinite(y[k])) keep.push(k);
  return pearson(ranks(Float64Array.from(keep, (k) => x[k])), ranks(Float64Array.from(keep, (k) => y[k])));
}

/** Ranks 1 … n of the values, ties given the mean of the ranks they span. */
export function ranks(values: Float64Array): Float64Array {
  const order = Array.from(values.keys()).sort((a, b) => values[a] - values[b]);
  const out = new Float64Array(values.length);
  for (let i = 0; i < order.length;) {
    let j = i + 1;
    while (j < order.length && values[order[j]] === values[order[i]]) j++;
    const rank = (i + 1 + j) / 2;
    for (let k = i; k < j; k++) out[order[k]] = rank;
    i = j;
  }
  return out;
}

/** First differences x[s] − x[s − 1] (NaN for s = 0 or where either value is NaN). */
export function firstDifferences(x: Float64Array): Float64Array {
  const out = new Float64Array(x.length).fill(Number.NaN);
  for (let s = 1; s < x.length; s++) out[s] = x[s] - x[s - 1];
  return out;
}
