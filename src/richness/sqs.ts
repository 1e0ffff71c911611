import type { SliceAbundances } from './slice-abundances';
import type { SliceCollections } from './slice-collections';
import { sliceRandom, uniformBelow } from './slice-seed';
import { mean, sortedQuantile } from './sample-summaries';

/** Why a slice has no SQS value (index 0: it has one). */
export const SQS_REASONS = ['subsampled', 'no occurrences', 'coverage below the quorum'] as const;
export type SqsReasonCode = 0 | 1 | 2;

export interface SqsSettings {
  /** Target coverage, 0 < quorum ≤ 1. */
  readonly quorum: number;
  /** Subsampling trials per slice, a positive integer. */
  readonly trials: number;
  readonly seed: number;
}

/** Per slice: mean and 2.5 / 97.5 % quantiles of subsampled richness, mean collections drawn. */
export interface SqsSeries {
  readonly mean: Float64Array;
  readonly lo: Float64Array;
  readonly hi: Float64Array;
  readonly draws: Float64Array;
  /** Index into SQS_REASONS per slice. */
  readonly reason: Uint8Array;
}

// The quorum test compares integer occurrence sums with a real target; a relative slack of this
// size keeps a quorum equal to the coverage reachable despite rounding in q · N / u.
const QUORUM_SLACK = 1e-12;

/**
 * Shareholder quorum subsampling (Alroy 2010, Science 329, 1191–1194), this variant exactly:
 * - each taxon's frequency is its share of the slice's occurrences;
 * - collections are drawn at random without replacement; each taxon counts once, at its
 *   frequency, when first drawn; drawing stops after the first collection that brings the
 *   summed frequencies of the taxa drawn to at least quorum / u, where u is the slice's Good's
 *   coverage (so that u × the summed frequencies, the estimated coverage of the subsample,
 *   reaches the quorum); that collection counts in full;
 * - no dominant-taxon exclusion: the most frequent taxon counts like any other;
 * - singletons for u are whatever the caller passes: occurrence singletons, or taxa found in
 *   one reference (Alroy's single-reference rule) when the table has references;
 * - a slice with u < quorum cannot reach the quorum and has NaN values (reason 2); an empty
 *   slice has reason 1.
 * Each slice has its own generator (sliceRandom), so its values depend only on its rows, the
 * seed and its index. Quantiles follow Hyndman & Fan's definition 7; lo ≤ hi always, but the
 * mean can fall outside [lo, hi] when fewer than 2.5 % of the trials lie far out. Single-threaded.
 */
export function shareholderQuorumSubsampling(
  abundances: SliceAbundances, collections: SliceCollections, coverage: Float64Array, settings: SqsSettings,
): SqsSeries {
  const { first, occurrences, entryOfRow } = abundances;
  const { collectionFirst, begin, end, rows } = collections;
  const sliceCount = first.length - 1;
  const out: SqsSeries = {
    mean: new Float64Array(sliceCount).fill(Number.NaN),
    lo: new Float64Array(sliceCount).fill(Number.NaN),
    hi: new Float64Array(sliceCount).fill(Number.NaN),
    draws: new Float64Array(sliceCount).fill(Number.NaN),
    reason: new Uint8Array(sliceCount),
  };
  let mostTaxa = 0;
  let mostCollections = 0;
  let mostRows = 0;
  for (let s = 0; s < sliceCount; s++) {
    mostTaxa = Math.max(mostTaxa, first[s + 1] - first[s]);
    mostCollections = Math.max(mostCollections, collectionFirst[s + 1] - collectionFirst[s]);
    let rowCount = 0;
    for (let c = collectionFirst[s]; c < collectionFirst[s + 1]; c++) rowCount += end[c] - begin[c];
    mostRows = Math.max(mostRows, rowCount);
  }
  // Per slice, the taxa of each collection (slice-local numbers, each once per collection) laid
  // out contiguously, so a trial reads memory in order.
  const memberStart = new Uint32Array(mostCollections + 1);
  const member = new Uint32Array(mostRows);
  const seen = new Uint32Array(mostTaxa);
  const order = new Uint32Array(mostCollections);
  const richness = new Float64Array(settings.trials);
  let stamp = 0;
  for (let s = 0; s < sliceCount; s++) {
    const u = coverage[s];
    const taxonBase = first[s];
    const weight = occurrences.subarray(taxonBase, first[s + 1]);
    let total = 0;
    for (let t = 0; t < weight.length; t++) total += weight[t];
    if (total === 0) {
      out.reason[s] = 1;
      continue;
    }
    if (!(u >= settings.quorum)) {
      out.reason[s] = 2;
      continue;
    }
    const target = ((settings.quorum * total) / u) * (1 - QUORUM_SLACK);
    const collectionBase = collectionFirst[s];
    const collectionCount = collectionFirst[s + 1] - collectionBase;
    let members = 0;
    for (let c = 0; c < collectionCount; c++) {
      memberStart[c] = members;
      stamp = nextStamp(seen, stamp);
      for (let p = begin[collectionBase + c]; p < end[collectionBase + c]; p++) {
        const local = entryOfRow[rows[p]] - taxonBase;
        if (seen[local] !== stamp) {
          seen[local] = stamp;
          member[members++] = local;
        }
      }
      order[c] = c;
    }
    memberStart[collectionCount] = members;
    const random = sliceRandom(settings.seed, s);
    let drawn = 0;
    for (let trial = 0; trial < settings.trials; trial++) {
      stamp = nextStamp(seen, stamp);
      let sum = 0;
      let taxa = 0;
      let k = 0;
      // A partial Fisher–Yates shuffle continued from the last trial's order: any starting order
      // gives a uniform draw, so the order need not be reset.
      while (sum < target && k < collectionCount) {
        const j = k + uniformBelow(random, collectionCount - k);
        const picked = order[j];
        order[j] = order[k];
        order[k++] = picked;
        for (let p = memberStart[picked]; p < memberStart[picked + 1]; p++) {
          const t = member[p];
          if (seen[t] !== stamp) {
            seen[t] = stamp;
            sum += weight[t];
            taxa++;
          }
        }
      }
      richness[trial] = taxa;
      drawn += k;
    }
    richness.sort();
    out.mean[s] = mean(richness, 0, settings.trials);
    out.lo[s] = sortedQuantile(richness, 0, settings.trials, 0.025);
    out.hi[s] = sortedQuantile(richness, 0, settings.trials, 0.975);
    out.draws[s] = drawn / settings.trials;
  }
  return out;
}

/** The next stamp for a `seen` array, clearing it when the 32-bit stamps run out. */
function nextStamp(seen: Uint32Array, stamp: number): number {
  if (stamp < 0xffffffff) return stamp + 1;
  seen.fill(0);
  return 1;
}
