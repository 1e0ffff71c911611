/**
 * Hurlbert's (1971, Ecology 52, 577–586, eq. 3) expected number of taxa in a random draw of
 * `n` of the N occurrences without replacement, exactly:
 *
 *   E[S_n] = Σ_i [1 − C(N − N_i, n) / C(N, n)]
 *
 * The ratio of binomial coefficients is the running product Π_{k<n} (N − N_i − k) / (N − k)
 * (zero once N − N_i < n), evaluated once per distinct abundance value, so the cost is
 * O(n · distinct abundances) with no factorials to overflow. `counts` are the occurrences of
 * each taxon (entries from … to − 1). NaN when N < n; n is a positive integer.
 */
export function rarefiedRichness(counts: Uint32Array, from: number, to: number, n: number): number {
  let total = 0;
  let largest = 0;
  for (let e = from; e < to; e++) {
    total += counts[e];
    largest = Math.max(largest, counts[e]);
  }
  if (total < n) return Number.NaN;
  const taxaWith = new Uint32Array(largest + 1);
  for (let e = from; e < to; e++) taxaWith[counts[e]]++;
  let expected = 0;
  for (let abundance = 1; abundance <= largest; abundance++) {
    const taxa = taxaWith[abundance];
    if (taxa === 0) continue;
    let missed = 1;
    const rest = total - abundance;
    for (let k = 0; k < n && missed > 0; k++) missed *= Math.max(0, rest - k) / (total - k);
    expected += taxa * (1 - missed);
  }
  return expected;
}
