/**
 * Earth mover's distance between two distributions of latitude, each an equal-weight sample
 * (Rubner, Tomasi & Guibas 2000, Int. J. Computer Vision 40(2):99, for the measure). On a line
 * it has a closed form, the L1 distance between the two cumulative distribution functions,
 *   EMD = ∫ |F₁(φ) − F₂(φ)| dφ
 * (Vallender 1974, Theory Probab. Appl. 18(4):784; cited from memory), which a merge of the two
 * sorted samples evaluates exactly: between consecutive values both F are constant.
 */

/** Distance in the samples' unit (degrees) between the sorted samples `a` and `b`; NaN when either is empty. */
export function earthMoversDistanceSorted(a: Float64Array, b: Float64Array): number {
  if (a.length === 0 || b.length === 0) return NaN;
  let i = 0, j = 0, x = Math.min(a[0], b[0]), total = 0;
  while (i < a.length || j < b.length) {
    // Advance past every value equal to the next smallest one; F jumps there.
    const next = Math.min(i < a.length ? a[i] : Infinity, j < b.length ? b[j] : Infinity);
    total += Math.abs(i / a.length - j / b.length) * (next - x);
    x = next;
    while (i < a.length && a[i] === next) i++;
    while (j < b.length && b[j] === next) j++;
  }
  return total;
}
