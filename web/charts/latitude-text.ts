/** Words for the latitude panel: a band's readout (and accessible name) and the chart summary. */
import type { LatitudeCounts } from '../protocol';
import { bandLabel, indicatorBandCounts, peakBand, sliceBandShares, totalBandShares } from './band-shares';
import { countWords } from '../text';
import { formatNumber, formatPercent } from './number-format';

/** Names of the indicator kinds, when the view has per-slice indicator counts. */
export function indicatorKinds(latitude: LatitudeCounts, kinds: readonly string[] | undefined): readonly string[] {
  return latitude.indicatorsPerSlice === undefined || kinds === undefined ? [] : kinds;
}

/** "20°S–10°S: Asselian 123 of 1,234 (10.0%); all slices 4,567 of 49,906 (9.2%); indicator sites: coal 3, reef 1". */
export function bandReadout(latitude: LatitudeCounts, slice: number, sliceName: string, band: number, kinds: readonly string[]): string {
  const own = sliceBandShares(latitude, slice);
  const all = totalBandShares(latitude);
  const parts = [
    `${sliceName} ${formatNumber(own.counts[band])} of ${formatNumber(own.total)} (${formatPercent(own.shares[band])})`,
    `all slices ${formatNumber(all.counts[band])} of ${formatNumber(all.total)} (${formatPercent(all.shares[band])})`,
  ];
  const sites = kinds.map((kind, k) => ({ kind, count: indicatorBandCounts(latitude, kinds.length, slice, k)[band] })).filter((s) => s.count > 0);
  if (sites.length > 0) parts.push(`indicator sites: ${sites.map((s) => `${s.kind} ${formatNumber(s.count)}`).join(', ')}`);
  return `${bandLabel(latitude.bandDeg, band)}: ${parts.join('; ')}`;
}

/** One or two sentences for screen readers and the figure's description. */
export function latitudeDescription(latitude: LatitudeCounts, slice: number, sliceName: string, kinds: readonly string[]): string {
  const own = sliceBandShares(latitude, slice);
  const all = totalBandShares(latitude);
  const peak = (shares: Float64Array): string => {
    const b = peakBand(shares);
    return b < 0 ? 'none' : `${bandLabel(latitude.bandDeg, b)} (${formatPercent(shares[b])})`;
  };
  let text = `Share of occurrences per ${latitude.bandDeg}° palaeolatitude band, north at the top: ${sliceName} (${countWords(own.total, 'occurrence')}) against all slices (${formatNumber(all.total)}). Largest share: ${sliceName} ${peak(own.shares)}, all slices ${peak(all.shares)}.`;
  if (kinds.length > 0) {
    const totals = kinds.map((kind, k) => `${kind} ${formatNumber(indicatorBandCounts(latitude, kinds.length, slice, k).reduce((a, c) => a + c, 0))}`);
    text += ` Indicator sites in ${sliceName}: ${totals.join(', ')}.`;
  }
  return text;
}
