import type { GapSummary } from '../gaps';
import type { TimeScale } from '../time';
import { csvLine, DECIMALS, fixed, trimmed } from './csv-text';

export const GAPS_COLUMNS = [
  'slice', 'name', 'base_ma', 'top_ma', 'available_km2', 'sampled_km2', 'unsampled_km2', 'unsampled_share',
  'gaps', 'largest_gap_km2', 'largest_gap_lat', 'largest_gap_lon',
] as const;

/** Decimals of a share (0–1). */
export const SHARE_DECIMALS = 6;

/** `gaps.csv`: one row per slice, oldest first; empty fields where a measure does not exist. */
export function gapsCsv(scale: TimeScale, summary: GapSummary): string {
  const lines = [csvLine(GAPS_COLUMNS)];
  const km2 = (v: number) => fixed(v, DECIMALS.areaKm2);
  const deg = (v: number) => fixed(v, DECIMALS.degrees);
  scale.names.forEach((name, s) => {
    lines.push(csvLine([
      String(s + 1), name, trimmed(scale.baseMa[s], DECIMALS.ageMa), trimmed(scale.topMa[s], DECIMALS.ageMa),
      km2(summary.availableKm2[s]), km2(summary.sampledKm2[s]), km2(summary.unsampledKm2[s]), fixed(summary.unsampledShare[s], SHARE_DECIMALS),
      String(summary.gaps[s]), km2(summary.largestGapKm2[s]), deg(summary.largestGapLat[s]), deg(summary.largestGapLon[s]),
    ]));
  });
  return lines.join('');
}
