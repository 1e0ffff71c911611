/**
 * Per slice: indicator sites counted by kind and latitude band, and each kind's latitude range.
 * Kinds are the codes of a dictionary of kinds as written; each is matched to a common kind
 * where it names one (commonIndicatorKind).
 */
import { latitudeHistogram } from '../footprint/latitude-histogram';
import { type CommonIndicatorKind, commonIndicatorKind } from './indicator-kinds';

export interface IndicatorSummary {
  readonly sliceCount: number;
  readonly bandDeg: number;
  readonly bands: number;
  /** The kinds as written, by code, and the common kind each names (undefined for others). */
  readonly kinds: readonly string[];
  readonly common: ReadonlyArray<CommonIndicatorKind | undefined>;
  /** Sites per (slice, kind, band) at (slice · kinds + kind) · bands + band. */
  readonly sites: Uint32Array;
  /** Southernmost and northernmost site per (slice, kind) at slice · kinds + kind, degrees; NaN with no site. */
  readonly latMin: Float64Array;
  readonly latMax: Float64Array;
}

/**
 * `sliceOf[i]` is site i's slice (−1: not counted), `latDeg[i]` its palaeolatitude, `kindOf[i]`
 * its code in `kinds`. Band b covers [−90 + b·bandDeg, −90 + (b + 1)·bandDeg), as in
 * latitudeHistogram.
 */
export function summariseIndicators(
  sliceOf: Int32Array, latDeg: Float64Array, kindOf: Uint32Array, kinds: readonly string[], sliceCount: number, bandDeg: number,
): IndicatorSummary {
  const kindCount = kinds.length;
  const histogram = latitudeHistogram(sliceOf, latDeg, sliceCount, bandDeg, { of: kindOf, count: kindCount });
  const latMin = new Float64Array(sliceCount * kindCount).fill(NaN);
  const latMax = new Float64Array(sliceCount * kindCount).fill(NaN);
  for (let i = 0; i < sliceOf.length; i++) {
    if (sliceOf[i] < 0) continue;
    const k = sliceOf[i] * kindCount + kindOf[i];
    // NaN fails every comparison, so a first site sets both ends.
    if (!(latDeg[i] >= latMin[k])) latMin[k] = latDeg[i];
    if (!(latDeg[i] <= latMax[k])) latMax[k] = latDeg[i];
  }
  return {
    sliceCount, bandDeg, bands: histogram.bands, kinds, common: kinds.map(commonIndicatorKind),
    sites: histogram.perSlice, latMin, latMax,
  };
}
