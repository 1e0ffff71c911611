/** Palaeolatitude bands of LatitudeCounts: edges, labels, and counts turned into shares. */
import type { LatitudeCounts } from '../protocol';
import { formatLatitude } from './number-format';

/** Band b's southern and northern edge, degrees (band 0 starts at the South Pole; the last stops at 90°). */
export function bandEdges(bandDeg: number, band: number): [number, number] {
  return [-90 + band * bandDeg, Math.min(90, -90 + (band + 1) * bandDeg)];
}

/** "20°S–10°S", "10°S–0°", "80°N–90°N": a band from south to north. */
export function bandLabel(bandDeg: number, band: number): string {
  const [south, north] = bandEdges(bandDeg, band);
  return `${formatLatitude(south)}–${formatLatitude(north)}`;
}

export interface BandShares {
  /** Count per band. */
  readonly counts: Uint32Array;
  /** Count per band ÷ the sum over bands (all 0 when the sum is 0). */
  readonly shares: Float64Array;
  readonly total: number;
}

/** Shares of `bands` counts starting at `offset` in `counts` (a view, not a copy, of the counts). */
export function bandShares(counts: Uint32Array, offset: number, bands: number): BandShares {
  const own = counts.subarray(offset, offset + bands);
  let total = 0;
  for (let b = 0; b < bands; b++) total += own[b];
  const shares = new Float64Array(bands);
  if (total > 0) for (let b = 0; b < bands; b++) shares[b] = own[b] / total;
  return { counts: own, shares, total };
}

/** Occurrence shares of one slice. */
export function sliceBandShares(latitude: LatitudeCounts, slice: number): BandShares {
  return bandShares(latitude.perSlice, slice * latitude.bands, latitude.bands);
}

/** Occurrence shares over every slice. */
export function totalBandShares(latitude: LatitudeCounts): BandShares {
  return bandShares(latitude.total, 0, latitude.bands);
}

/** Indicator sites of one kind per band in one slice (zeros when the view has no indicators). */
export function indicatorBandCounts(latitude: LatitudeCounts, kinds: number, slice: number, kind: number): Uint32Array {
  const all = latitude.indicatorsPerSlice;
  if (all === undefined) return new Uint32Array(latitude.bands);
  const offset = (slice * kinds + kind) * latitude.bands;
  return all.subarray(offset, offset + latitude.bands);
}

/** Largest count in an array (0 when empty). */
export function largestCount(counts: ArrayLike<number>): number {
  let max = 0;
  for (let i = 0; i < counts.length; i++) if (counts[i] > max) max = counts[i];
  return max;
}

/** The band with the largest share, −1 when every share is 0 (ties go to the southernmost). */
export function peakBand(shares: ArrayLike<number>): number {
  let best = -1;
  for (let b = 0; b < shares.length; b++) if (shares[b] > 0 && (best < 0 || shares[b] > shares[best])) best = b;
  return best;
}
