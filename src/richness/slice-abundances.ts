import type { RichnessInput } from './richness-input';

/**
 * Occurrences of each taxon in each slice, columnar: entries of slice s are
 * first[s] … first[s + 1] − 1, in the order the taxa first appear in the slice's rows.
 */
export interface SliceAbundances {
  /** sliceCount + 1 offsets into `taxon` and `occurrences`. */
  readonly first: Uint32Array;
  readonly taxon: Uint32Array;
  readonly occurrences: Uint32Array;
  /** Entry of each row (an index into `taxon`), so per-row work can reach its taxon's tally. */
  readonly entryOfRow: Uint32Array;
}

/** Tallies occurrences per (slice, taxon) in one pass over the rows. */
export function sliceAbundances(input: Pick<RichnessInput, 'start' | 'taxon' | 'taxonCount'>): SliceAbundances {
  const { start, taxon } = input;
  const rows = taxon.length;
  const entryOf = new Int32Array(input.taxonCount).fill(-1);
  const owner = new Int32Array(input.taxonCount).fill(-1);
  const first = new Uint32Array(start.length);
  const taxa = new Uint32Array(rows);
  const occurrences = new Uint32Array(rows);
  const entryOfRow = new Uint32Array(rows);
  let count = 0;
  for (let s = 0; s + 1 < start.length; s++) {
    first[s] = count;
    for (let r = start[s]; r < start[s + 1]; r++) {
      const t = taxon[r];
      if (owner[t] !== s) {
        owner[t] = s;
        entryOf[t] = count;
        taxa[count++] = t;
      }
      const entry = entryOf[t];
      occurrences[entry]++;
      entryOfRow[r] = entry;
    }
  }
  first[start.length - 1] = count;
  return { first, taxon: taxa.slice(0, count), occurrences: occurrences.slice(0, count), entryOfRow };
}

/** Distinct taxa of each slice (a new Float64Array, one value per slice). */
export function taxaPerSlice(abundances: SliceAbundances): Float64Array {
  const { first } = abundances;
  const out = new Float64Array(first.length - 1);
  for (let s = 0; s < out.length; s++) out[s] = first[s + 1] - first[s];
  return out;
}
