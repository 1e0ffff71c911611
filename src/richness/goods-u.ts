import type { SliceAbundances } from './slice-abundances';
import { ABSENT_CODE } from '../table/occurrence-table';

/**
 * Good's (1953, Biometrika 40, 237–264) estimate of sample coverage, u = 1 − f1 / N: the share
 * of the population's individuals belonging to taxa already in the sample, from f1 singletons
 * among N occurrences. NaN for an empty sample; in [0, 1] otherwise.
 */
export function goodsU(singletons: number, occurrences: number): number {
  return occurrences > 0 ? 1 - singletons / occurrences : Number.NaN;
}

/** Taxa with exactly one occurrence in each slice (f1). */
export function occurrenceSingletons(abundances: SliceAbundances): Float64Array {
  const { first, occurrences } = abundances;
  const out = new Float64Array(first.length - 1);
  for (let s = 0; s < out.length; s++) {
    let f1 = 0;
    for (let e = first[s]; e < first[s + 1]; e++) if (occurrences[e] === 1) f1++;
    out[s] = f1;
  }
  return out;
}

/**
 * Taxa of each slice found in exactly one reference, the singleton count Alroy (2010, Science
 * 329, 1191–1194) used so that one publication listing a taxon many times still marks it as
 * rare. A row naming no reference counts as a reference of its own.
 */
export function referenceSingletons(abundances: SliceAbundances, reference: Uint32Array): Float64Array {
  const { first, entryOfRow } = abundances;
  const entries = abundances.taxon.length;
  const onlyReference = new Uint32Array(entries);
  // 0: none yet, 1: one reference (onlyReference), 2: two or more.
  const referenceCount = new Uint8Array(entries);
  for (let r = 0; r < entryOfRow.length; r++) {
    const e = entryOfRow[r];
    const ref = reference[r];
    if (referenceCount[e] === 2) continue;
    if (referenceCount[e] === 1 && ref !== ABSENT_CODE && onlyReference[e] === ref) continue;
    referenceCount[e]++;
    onlyReference[e] = ref; // ABSENT_CODE here matches no later row: that row's reference is its own
  }
  const out = new Float64Array(first.length - 1);
  for (let s = 0; s < out.length; s++) {
    let f1 = 0;
    for (let e = first[s]; e < first[s + 1]; e++) if (referenceCount[e] === 1) f1++;
    out[s] = f1;
  }
  return out;
}
