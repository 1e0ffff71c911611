/** poles.csv: the pole table as written, and read back by the generator itself. */
import { createRotationModel, poleTableFromRecords, type RotationModel } from '../../src/rotation';
import { formatNumber } from './csv-format';
import { POLE_DECIMALS } from './plate-motion';
import { POLE_TABLE_HEADER, type PoleRow } from './rotation-table';

export function poleTableCsv(rows: readonly PoleRow[]): string {
  const lines = rows.map((r) => [
    r.plateId, r.relativeTo, r.ageMa, formatNumber(r.poleLat, POLE_DECIMALS), formatNumber(r.poleLon, POLE_DECIMALS),
    formatNumber(r.angleDeg, POLE_DECIMALS),
  ].join(','));
  return `${POLE_TABLE_HEADER}\n${lines.join('\n')}\n`;
}

/**
 * The rotation model a user of the demo gets: poles.csv as written, read by the production
 * reader and model (src/rotation), so that sites are placed with exactly those rotations.
 * The file holds no quotes, so splitting at commas reads it as a CSV scanner would.
 */
export function poleTableModel(csv: string): RotationModel {
  const [header, ...lines] = csv.trimEnd().split('\n');
  const records = lines.map((line, i) => ({ line: i + 2, fields: line.split(',') }));
  return createRotationModel(poleTableFromRecords(header.split(','), records, 'poles.csv'));
}
