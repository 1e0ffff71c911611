import type { SliceAbundances } from './slice-abundances';

/**
 * Per-slice counts of taxa by how their observed range (first to last slice sampled) meets the
 * slice, after Foote (2000, Paleobiology 26(S4), 74–102, Table 1): `singletons` N_FL (first and
 * last in the slice), `bottomOnly` N_bL (ranging in from an older slice, last seen here),
 * `topOnly` N_Ft (first seen here, ranging on), `both` N_bt (ranging through from older to
 * younger). Their sum is `rangeThrough`: every taxon whose range spans the slice, sampled in it
 * or not.
 */
export interface BoundaryCrossers {
  readonly singletons: Float64Array;
  readonly bottomOnly: Float64Array;
  readonly topOnly: Float64Array;
  readonly both: Float64Array;
  readonly rangeThrough: Float64Array;
}

/** Oldest and youngest slice in which each taxon is sampled (−1 for a taxon never sampled). */
export function taxonRanges(abundances: SliceAbundances, taxonCount: number): { readonly firstSlice: Int32Array; readonly lastSlice: Int32Array } {
  const firstSlice = new Int32Array(taxonCount).fill(-1);
  const lastSlice = new Int32Array(taxonCount).fill(-1);
  const { first, taxon } = abundances;
  for (let s = 0; s + 1 < first.length; s++) {
    for (let e = first[s]; e < first[s + 1]; e++) {
      const t = taxon[e];
      if (firstSlice[t] < 0) firstSlice[t] = s;
      lastSlice[t] = s;
    }
  }
  return { firstSlice, lastSlice };
}

/**
 * Foote's four range classes per slice (slices indexed oldest first). A taxon ranging from slice
 * a to slice b adds to N_FL of a when a = b, otherwise to N_Ft of a, N_bt of a + 1 … b − 1 and
 * N_bL of b; the through-ranging part is added with a difference array, so the cost is
 * O(taxa + slices).
 */
export function boundaryCrossers(abundances: SliceAbundances, taxonCount: number): BoundaryCrossers {
  const sliceCount = abundances.first.length - 1;
  const { firstSlice, lastSlice } = taxonRanges(abundances, taxonCount);
  const singletons = new Float64Array(sliceCount);
  const bottomOnly = new Float64Array(sliceCount);
  const topOnly = new Float64Array(sliceCount);
  const throughDelta = new Float64Array(sliceCount + 1);
  for (let t = 0; t < taxonCount; t++) {
    const a = firstSlice[t];
    const b = lastSlice[t];
    if (a < 0) continue;
    if (a === b) {
      singletons[a]++;
      continue;
    }
    topOnly[a]++;
    bottomOnly[b]++;
    throughDelta[a + 1]++;
    throughDelta[b]--;
  }
  const both = new Float64Array(sliceCount);
  const rangeThrough = new Float64Array(sliceCount);
  let running = 0;
  for (let s = 0; s < sliceCount; s++) {
    running += throughDelta[s];
    both[s] = running;
    rangeThrough[s] = singletons[s] + bottomOnly[s] + topOnly[s] + running;
  }
  return { singletons, bottomOnly, topOnly, both, rangeThrough };
}
