import { createSeededRandom } from '../time/seeded-random';
import { sliceOfAge } from '../time/slice-lookup';
import type { TimeScale } from '../time/time-scale';
import { sortedQuantile } from './sample-summaries';

/** Rows whose ages are redrawn: any rows (not in slice order), with their age ranges. */
export interface AgeRangeRows {
  readonly taxon: Uint32Array;
  readonly taxonCount: number;
  /** Older end of each row's age range, Ma. */
  readonly oldestMa: Float64Array;
  /** Younger end, Ma. */
  readonly youngestMa: Float64Array;
}

/** Per slice: median and 2.5 / 97.5 % quantiles of raw richness over the age draws. */
export interface AgeRichness {
  readonly median: Float64Array;
  readonly lo: Float64Array;
  readonly hi: Float64Array;
}

/**
 * Raw richness under age uncertainty: `trials` times, every row's age is drawn uniformly in
 * [youngestMa, oldestMa] (Mulberry32 seeded once, draws in order of taxon then row) and placed in the
 * slice holding it (sliceOfAge, the rule slice assignment uses); a draw outside the scale or in a
 * gap counts in no slice. Each trial counts the distinct taxa per slice; quantiles over trials
 * follow Hyndman & Fan's definition 7. Rows are grouped by taxon so that one stamp per taxon
 * counts its slices: O(trials · rows · log slices).
 */
export function ageResampledRichness(rows: AgeRangeRows, scale: Pick<TimeScale, 'baseMa' | 'topMa'>, trials: number, seed: number): AgeRichness {
  const sliceCount = scale.baseMa.length;
  const byTaxon = groupByTaxon(rows.taxon, rows.taxonCount);
  const random = createSeededRandom(seed);
  // counts[s * trials + trial]: richness of slice s in that trial.
  const counts = new Float64Array(sliceCount * trials);
  const lastTaxon = new Int32Array(sliceCount);
  const { oldestMa, youngestMa } = rows;
  for (let trial = 0; trial < trials; trial++) {
    lastTaxon.fill(-1);
    for (let t = 0; t < rows.taxonCount; t++) {
      for (let k = byTaxon.first[t]; k < byTaxon.first[t + 1]; k++) {
        const r = byTaxon.rows[k];
        const age = Math.min(oldestMa[r], youngestMa[r] + random.nextUniform() * (oldestMa[r] - youngestMa[r]));
        const s = sliceOfAge(scale.baseMa, scale.topMa, age);
        if (s >= 0 && lastTaxon[s] !== t) {
          lastTaxon[s] = t;
          counts[s * trials + trial]++;
        }
      }
    }
  }
  const out: AgeRichness = { median: new Float64Array(sliceCount), lo: new Float64Array(sliceCount), hi: new Float64Array(sliceCount) };
  for (let s = 0; s < sliceCount; s++) {
    const from = s * trials;
    counts.subarray(from, from + trials).sort();
    out.median[s] = sortedQuantile(counts, from, from + trials, 0.5);
    out.lo[s] = sortedQuantile(counts, from, from + trials, 0.025);
    out.hi[s] = sortedQuantile(counts, from, from + trials, 0.975);
  }
  return out;
}

function groupByTaxon(taxon: Uint32Array, taxonCount: number): { readonly first: Uint32Array; readonly rows: Uint32Array } {
  const first = new Uint32Array(taxonCount + 1);
  for (let r = 0; r < taxon.length; r++) first[taxon[r] + 1]++;
  for (let t = 0; t < taxonCount; t++) first[t + 1] += first[t];
  const next = first.slice(0, taxonCount);
  const rows = new Uint32Array(taxon.length);
  for (let r = 0; r < taxon.length; r++) rows[next[taxon[r]]++] = r;
  return { first, rows };
}
