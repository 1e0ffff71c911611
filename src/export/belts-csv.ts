/**
 * `belts.csv`: one row per slice and latitude band, oldest slice first, bands south to north.
 * Shares are of the slice's occurrences and occupied cells (empty for a slice with none);
 * `lat_shift_deg` is the slice's earth mover's distance to the slice before it, repeated on
 * each of its rows. One `sites_<kind>` column per indicator kind, as written, in order of
 * first appearance.
 */
import type { LatitudeBelts } from '../gaps';
import type { TimeScale } from '../time';
import { csvLine, DECIMALS, fixed, trimmed } from './csv-text';
import { SHARE_DECIMALS } from './gaps-csv';

export const BELTS_COLUMNS = [
  'slice', 'name', 'lat_south', 'lat_north', 'occurrences', 'occurrence_share', 'occupied_cells', 'occupied_share',
  'available_cells', 'lat_shift_deg',
] as const;

export function beltsCsv(scale: TimeScale, belts: LatitudeBelts): string {
  const { bands, bandDeg, indicators } = belts;
  const kinds = indicators?.kinds ?? [];
  const lines = [csvLine([...BELTS_COLUMNS, ...kinds.map((kind) => `sites_${kind}`)])];
  const share = (v: number) => fixed(v, SHARE_DECIMALS);
  scale.names.forEach((name, s) => {
    for (let b = 0; b < bands; b++) {
      const k = s * bands + b;
      const sites = kinds.map((_, kind) => String(indicators === undefined ? 0 : indicators.sites[(s * kinds.length + kind) * bands + b]));
      lines.push(csvLine([
        String(s + 1), name, trimmed(-90 + b * bandDeg, DECIMALS.degrees), trimmed(Math.min(90, -90 + (b + 1) * bandDeg), DECIMALS.degrees),
        String(belts.occurrences[k]), share(belts.occurrenceShare[k]), String(belts.occupiedCells[k]), share(belts.occupiedShare[k]),
        String(belts.availableCells[k]), fixed(belts.shiftDeg[s], DECIMALS.degrees), ...sites,
      ]));
    }
  });
  return lines.join('');
}
