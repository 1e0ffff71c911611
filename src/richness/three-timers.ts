import type { SliceAbundances } from './slice-abundances';

/**
 * Alroy's (2008, PNAS 105 suppl. 1, 11536–11542) three-timer counts per slice: `threeTimers`
 * are taxa sampled in the slice before, this one and the one after; `partTimers` are taxa
 * sampled before and after but not in this one; `completeness` is 3T / (3T + PT), the share of
 * taxa known to be present that this slice samples. The first and last slice have no
 * neighbour on one side, and a slice with 3T + PT = 0 has no estimate: NaN.
 */
export interface ThreeTimers {
  readonly threeTimers: Float64Array;
  readonly partTimers: Float64Array;
  readonly completeness: Float64Array;
}

export function threeTimers(abundances: SliceAbundances, taxonCount: number): ThreeTimers {
  const { first, taxon } = abundances;
  const sliceCount = first.length - 1;
  const out = {
    threeTimers: new Float64Array(sliceCount).fill(Number.NaN),
    partTimers: new Float64Array(sliceCount).fill(Number.NaN),
    completeness: new Float64Array(sliceCount).fill(Number.NaN),
  };
  // inBefore[t] === s: t is sampled in slice s − 1; inThis[t] === s: t is sampled in slice s.
  const inBefore = new Int32Array(taxonCount).fill(-1);
  const inThis = new Int32Array(taxonCount).fill(-1);
  for (let s = 1; s + 1 < sliceCount; s++) {
    for (let e = first[s - 1]; e < first[s]; e++) inBefore[taxon[e]] = s;
    for (let e = first[s]; e < first[s + 1]; e++) inThis[taxon[e]] = s;
    let three = 0;
    let part = 0;
    for (let e = first[s + 1]; e < first[s + 2]; e++) {
      const t = taxon[e];
      if (inBefore[t] !== s) continue;
      if (inThis[t] === s) three++;
      else part++;
    }
    out.threeTimers[s] = three;
    out.partTimers[s] = part;
    out.completeness[s] = three + part > 0 ? three / (three + part) : Number.NaN;
  }
  return out;
}
