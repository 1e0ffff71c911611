/** poles.csv: the pole table as written, and read back by the generator itself. */
import { formatNumber } from './csv-format';
import { POLE_DECIMALS } from './plate-motion';
import { POLE_TABLE_HEADER, type PoleRow } from './rotation-table';

export function poleTableCsv(rows: readonly PoleRow[]): string {
  const lines = rows.map((r) => [
    r.plateId, r.ageMa, formatNumber(r.poleLat, POLE_DECIMALS), formatNumber(r.poleLon, POLE_DECIMALS),
    formatNumber(r.angleDeg, POLE_DECIMALS), r.relativeTo,
  ].join(','));
  return `${POLE_TABLE_HEADER}\n${lines.join('\n')}\n`;
}
