/**
 * A small occurrence file with realistic faults, for showing rejected rows: clean rows taken
 * evenly from occurrences.csv, with fifteen of them spoiled in the ways real compilations
 * are. Line numbers count the header as line 1 and are fixed, so the README can list them.
 */
import { OCCURRENCE_HEADER } from './occurrences';

const PROBLEM_FILE_ROWS = 200;

/** Column positions in OCCURRENCE_HEADER. */
const F = { taxon: 0, oldestMa: 1, youngestMa: 2, palaeoLat: 3, palaeoLon: 4, lat: 5, lon: 6, plateId: 7 } as const;

export interface Problem {
  readonly line: number;
  /** The field at fault, or `row` for the whole record. */
  readonly field: string;
  readonly what: string;
  readonly spoil: (fields: readonly string[]) => string;
}

/** The record with some fields replaced, as a CSV line. */
function replaced(fields: readonly string[], changes: ReadonlyArray<readonly [number, string]>): string {
  const copy = [...fields];
  for (const [at, value] of changes) copy[at] = value;
  return copy.join(',');
}

export const PROBLEMS: readonly Problem[] = [
  { line: 5, field: 'taxon', what: 'taxon is empty', spoil: (f) => replaced(f, [[F.taxon, '']]) },
  { line: 18, field: 'lat', what: 'latitude 95, beyond the pole', spoil: (f) => replaced(f, [[F.lat, '95']]) },
  { line: 30, field: 'oldest_ma', what: 'ages reversed (oldest_ma younger than youngest_ma)', spoil: (f) => replaced(f, [[F.oldestMa, f[F.youngestMa]], [F.youngestMa, f[F.oldestMa]]]) },
  { line: 43, field: 'palaeo_lat', what: 'decimal comma in a quoted number', spoil: (f) => replaced(f, [[F.palaeoLat, `"${f[F.palaeoLat].replace('.', ',')}"`]]) },
  { line: 57, field: 'lon', what: 'longitude -191.2, beyond -180', spoil: (f) => replaced(f, [[F.lon, '-191.2']]) },
  { line: 70, field: 'oldest_ma', what: 'age "~245" is not a number', spoil: (f) => replaced(f, [[F.oldestMa, '~245']]) },
  { line: 84, field: 'youngest_ma', what: 'negative age -3', spoil: (f) => replaced(f, [[F.youngestMa, '-3']]) },
  { line: 97, field: 'palaeo_lat', what: 'no position at all (all four coordinates empty)', spoil: (f) => replaced(f, [[F.palaeoLat, ''], [F.palaeoLon, ''], [F.lat, ''], [F.lon, '']]) },
  { line: 110, field: 'plate_id', what: 'no palaeoposition and plate id "n/a", so it cannot be reconstructed', spoil: (f) => replaced(f, [[F.palaeoLat, ''], [F.palaeoLon, ''], [F.plateId, 'n/a']]) },
  { line: 124, field: 'row', what: 'record cut short after 7 fields', spoil: (f) => f.slice(0, 7).join(',') },
  { line: 137, field: 'row', what: 'unquoted decimal comma in lat splits the record into 12 fields', spoil: (f) => replaced(f, [[F.lat, f[F.lat].includes('.') ? f[F.lat].replace('.', ',') : `${f[F.lat]},5`]]) },
  { line: 150, field: 'lat', what: 'latitude "NaN"', spoil: (f) => replaced(f, [[F.lat, 'NaN']]) },
  { line: 163, field: 'palaeo_lon', what: 'palaeo_lat without palaeo_lon, and no present-day position', spoil: (f) => replaced(f, [[F.palaeoLon, ''], [F.lat, ''], [F.lon, '']]) },
  { line: 176, field: 'row', what: 'header repeated inside the file (two files pasted together)', spoil: () => OCCURRENCE_HEADER },
  { line: 190, field: 'lat', what: 'latitude in degrees and minutes, 23°30\'S', spoil: (f) => replaced(f, [[F.lat, "23°30'S"]]) },
];

/** The file's lines (no header): rows evenly spaced through `cleanLines`, some spoiled. */
export function problemLines(cleanLines: readonly string[]): string[] {
  const stride = Math.floor(cleanLines.length / PROBLEM_FILE_ROWS);
  const byLine = new Map(PROBLEMS.map((p) => [p.line, p]));
  return Array.from({ length: PROBLEM_FILE_ROWS }, (_, i) => {
    const clean = cleanLines[i * stride];
    const problem = byLine.get(i + 2);
    return problem === undefined ? clean : problem.spoil(clean.split(','));
  });
}
