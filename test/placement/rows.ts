// Small in-memory occurrence tables and rotation models for placement tests.
import { createRotationModel, poleTableFromRecords, type BeyondModel, type RotationModel } from '../../src/rotation';
import { NO_PLATE, type OccurrenceTable } from '../../src/table';

export interface Row {
  readonly oldestMa: number;
  readonly youngestMa: number;
  readonly palaeo?: readonly [number, number];
  readonly present?: readonly [number, number];
  readonly plateId?: number;
}

/** The table the reader would build from these rows (line k + 2 for row k). */
export function tableOf(rows: readonly Row[]): OccurrenceTable {
  const n = rows.length;
  const none = { codes: new Uint32Array(n), values: ['Alpha'] };
  return {
    count: n,
    line: Uint32Array.from(rows, (_, k) => k + 2),
    taxon: none,
    collection: { codes: new Uint32Array(n).fill(0xffffffff), values: [] },
    oldestMa: Float64Array.from(rows, (r) => r.oldestMa),
    youngestMa: Float64Array.from(rows, (r) => r.youngestMa),
    palaeoLat: Float64Array.from(rows, (r) => r.palaeo?.[0] ?? Number.NaN),
    palaeoLon: Float64Array.from(rows, (r) => r.palaeo?.[1] ?? Number.NaN),
    lat: Float64Array.from(rows, (r) => r.present?.[0] ?? Number.NaN),
    lon: Float64Array.from(rows, (r) => r.present?.[1] ?? Number.NaN),
    plateId: Int32Array.from(rows, (r) => r.plateId ?? NO_PLATE),
  };
}

/**
 * Plate 1 turns about the pole (0°N, 0°E) — the x axis — by 30° at 100 Ma relative to the fixed
 * plate 0, so by 0.3° per Myr in between (slerp about one axis turns the angle linearly); plate 2
 * turns about the north pole by 10° at 50 Ma relative to plate 1, and its poles end there.
 */
export const POLES = [
  'plate_id,age_ma,pole_lat,pole_lon,angle_deg,relative_to',
  '1,0,90,0,0,0',
  '1,100,0,0,30,0',
  '2,0,90,0,0,1',
  '2,50,90,0,10,1',
].join('\n');

export function modelOf(text: string, beyond?: BeyondModel, source = 'poles.csv'): RotationModel {
  const [header, ...lines] = text.trim().split('\n');
  const records = lines.map((l, i) => ({ line: i + 2, fields: l.split(',') }));
  return createRotationModel(poleTableFromRecords(header.split(','), records, source), beyond === undefined ? {} : { beyond });
}
