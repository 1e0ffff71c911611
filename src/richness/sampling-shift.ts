import { firstDifferences, pearson, spearman } from './correlation';

/** A named per-slice series (one value per slice, NaN where undefined). */
export interface NamedSeries {
  readonly name: string;
  readonly values: Float64Array;
}

/** Default threshold on |ln(after / before)|: a change by a factor of 1.25 either way. */
export const DEFAULT_SHIFT_THRESHOLD = Math.log(1.25);

/** Per slice: 0 not flagged, 1 flagged, 2 not assessable (no raw change or no standardised change defined). */
export const SHIFT_STATES = ['not flagged', 'flagged', 'not assessable'] as const;

export interface SamplingShift {
  /** Index into SHIFT_STATES per slice (slice 0 is never assessable). */
  readonly state: Uint8Array;
  /** Bit m set: footprint measure m moved with raw richness; 0 unless flagged. */
  readonly moved: Uint32Array;
}

/** ln(after[s] / before[s]) where both are positive and finite, else NaN. */
export function logRatio(after: Float64Array, before: Float64Array, out = new Float64Array(after.length)): Float64Array {
  for (let s = 0; s < after.length; s++) {
    const a = after[s], b = before[s];
    out[s] = a > 0 && b > 0 && Number.isFinite(a) && Number.isFinite(b) ? Math.log(a / b) : Number.NaN;
  }
  return out;
}

/** ln(x[s] / x[s − 1]) per slice (NaN for s = 0 and where either value is not positive). */
export function logChanges(x: Float64Array): Float64Array {
  const previous = new Float64Array(x.length).fill(Number.NaN);
  previous.set(x.subarray(0, Math.max(0, x.length - 1)), 1);
  return logRatio(x, previous);
}

/**
 * The sampling-shift flag, this project's rule. For slice s and its predecessor, every change is
 * a log ratio ln(value_s / value_{s−1}), defined when both values are positive. A series
 * "moves with" raw richness when its change has the same sign as raw richness's change and a
 * magnitude of at least `threshold`. Slice s is flagged when
 *   1. raw richness changes by at least `threshold`,
 *   2. at least one footprint measure moves with it (the bits of `moved` name which), and
 *   3. at least one standardised change is defined at s and none of them moves with it.
 * Without a raw change or any standardised change the slice is not assessable (state 2). A flag
 * says the raw change coincides with a change in where and how much was sampled and does not
 * survive standardisation; it does not say the raw change is false, nor that an unflagged change
 * is real.
 */
export function samplingShift(
  raw: Float64Array, footprint: readonly NamedSeries[], standardisedChanges: readonly NamedSeries[], threshold = DEFAULT_SHIFT_THRESHOLD,
): SamplingShift {
  const sliceCount = raw.length;
  const rawChange = logChanges(raw);
  const footprintChanges = footprint.map((m) => logChanges(m.values));
  const state = new Uint8Array(sliceCount).fill(2);
  const moved = new Uint32Array(sliceCount);
  for (let s = 1; s < sliceCount; s++) {
    const rho = rawChange[s];
    const defined = standardisedChanges.some((c) => Number.isFinite(c.values[s]));
    if (!Number.isFinite(rho) || !defined) continue;
    state[s] = 0;
    if (Math.abs(rho) < threshold) continue;
    const movesWith = (change: number) => Number.isFinite(change) && Math.sign(change) === Math.sign(rho) && Math.abs(change) >= threshold;
    let mask = 0;
    footprintChanges.forEach((changes, m) => {
      if (movesWith(changes[s])) mask |= 1 << m;
    });
    if (mask !== 0 && !standardisedChanges.some((c) => movesWith(c.values[s]))) {
      state[s] = 1;
      moved[s] = mask;
    }
  }
  return { state, moved };
}

/** Names of the footprint measures in a `moved` mask, joined by ';' (empty for 0). */
export function movedNames(mask: number, footprint: readonly NamedSeries[]): string {
  return footprint.filter((_, m) => (mask & (1 << m)) !== 0).map((m) => m.name).join(';');
}

export interface FootprintCorrelation {
  readonly name: string;
  readonly pearson: number;
  readonly spearman: number;
  /** Pairs used: neighbouring-slice steps where both first differences are defined. */
  readonly pairs: number;
}

/** Pearson and Spearman correlations of first differences between raw richness and each footprint measure. */
export function footprintCorrelations(raw: Float64Array, footprint: readonly NamedSeries[]): FootprintCorrelation[] {
  const rawDiff = firstDifferences(raw);
  return footprint.map((m) => {
    const diff = firstDifferences(m.values);
    const p = pearson(rawDiff, diff);
    return { name: m.name, pearson: p.r, spearman: spearman(rawDiff, diff).r, pairs: p.pairs };
  });
}
