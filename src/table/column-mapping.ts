import {
  COLUMN_SYNONYMS, OCCURRENCE_FIELDS, matchSynonym, normaliseHeader, type ColumnIndex, type OccurrenceField,
} from './column-synonyms';
import { InputError, type InputProblem } from '../problems';

/** Which column feeds each of our fields. */
export interface ColumnMapping {
  /** The header as read. */
  readonly header: readonly string[];
  readonly index: ColumnIndex;
  /** How each mapped field was found: named by the user, or matched by synonym. */
  readonly how: Readonly<Partial<Record<OccurrenceField, 'explicit' | 'synonym'>>>;
  /** 0-based columns that feed no field. */
  readonly unused: readonly number[];
}

/**
 * Maps a header to our fields. `explicit` pairs (`{ taxon: 'Species name' }`) win; other fields
 * are matched by COLUMN_SYNONYMS, where a column bearing the field's own name wins over other
 * synonyms. Throws InputError, with every problem at once, when a name is duplicated or
 * ambiguous, or when the table lacks a taxon, an age source or a position source.
 */
export function mapColumns(header: readonly string[], explicit: Readonly<Record<string, string>> = {}): ColumnMapping {
  const index = Object.fromEntries(OCCURRENCE_FIELDS.map((f) => [f, -1])) as Record<OccurrenceField, number>;
  const how: Partial<Record<OccurrenceField, 'explicit' | 'synonym'>> = {};
  const used = new Set<number>();
  const problems: InputProblem[] = [];

  for (const [key, column] of Object.entries(explicit)) {
    const field = OCCURRENCE_FIELDS.find((f) => normaliseHeader(f) === normaliseHeader(key));
    const at = field === undefined ? -1 : findColumn(header, key, column, problems);
    const mapping = (expected: string): InputProblem => ({ field: 'mapping', value: `${key}=${column}`, expected });
    if (field === undefined) {
      problems.push(mapping(`a field before "=", one of ${OCCURRENCE_FIELDS.join(', ')} ("${key}" is not a field)`));
    } else if (how[field] !== undefined) {
      problems.push(mapping(`each field mapped once (${field} is mapped twice)`));
    } else if (at >= 0 && used.has(at)) {
      problems.push(mapping(`a column no other field is mapped to (${describe(header, at)} is already mapped to another field)`));
    } else if (at >= 0) {
      index[field] = at;
      how[field] = 'explicit';
      used.add(at);
    }
  }

  const candidates = new Map<OccurrenceField, number[]>();
  header.forEach((name, i) => {
    const match = matchSynonym(name);
    if (match === undefined || used.has(i) || how[match.field] !== undefined) return;
    candidates.set(match.field, [...(candidates.get(match.field) ?? []), i]);
  });
  for (const [field, columns] of candidates) {
    const chosen = chooseCandidate(header, field, columns, problems);
    if (chosen < 0) continue;
    index[field] = chosen;
    how[field] = 'synonym';
    used.add(chosen);
  }

  if (problems.length === 0) requireSources(header, index, problems);
  if (problems.length > 0) throw new InputError(problems);
  const unused = header.map((_, i) => i).filter((i) => !used.has(i));
  return { header, index, how, unused };
}

function describe(header: readonly string[], i: number): string {
  return `column ${i + 1} (${JSON.stringify(header[i])})`;
}

function accepted(field: OccurrenceField): string {
  return `accepted names for ${field}: ${COLUMN_SYNONYMS[field].join(', ')}`;
}

/** The column a user named in a mapping: exact name first, then the normalised name. */
function findColumn(header: readonly string[], key: string, column: string, problems: InputProblem[]): number {
  for (const same of [(h: string) => h === column, (h: string) => normaliseHeader(h) === normaliseHeader(column)]) {
    const hits = header.flatMap((h, i) => (same(h) ? [i] : []));
    if (hits.length === 1) return hits[0];
    if (hits.length > 1) {
      problems.push({
        field: 'mapping', value: `${key}=${column}`,
        expected: `a column name after "=" that one column has (${hits.map((i) => describe(header, i)).join(' and ')} both match; rename one)`,
      });
      return -1;
    }
  }
  problems.push({
    field: 'mapping', value: `${key}=${column}`,
    expected: `a column name after "=" that the header has (no column is named ${JSON.stringify(column)}; columns found: ${headerText(header)})`,
  });
  return -1;
}

function chooseCandidate(header: readonly string[], field: OccurrenceField, columns: number[], problems: InputProblem[]): number {
  if (columns.length === 1) return columns[0];
  const own = columns.filter((i) => matchSynonym(header[i])?.ownName === true);
  if (own.length === 1) return own[0];
  const names = columns.map((i) => normaliseHeader(header[i]));
  const twin = names.findIndex((n, k) => names.indexOf(n) !== k);
  if (twin >= 0) {
    const first = columns[names.indexOf(names[twin])];
    problems.push({
      line: 1, field: 'header', value: header[columns[twin]],
      expected: `one column for ${field} (duplicate column name: ${describe(header, first)} and ${describe(header, columns[twin])} both give ${field}; rename or remove one)`,
    });
    return -1;
  }
  const listed = columns.map((i) => describe(header, i)).join(' and ');
  problems.push({
    line: 1, field: 'header', value: columns.map((i) => header[i]).join(', '),
    expected: `one column for ${field} (${listed} ${columns.length === 2 ? 'both' : 'all'} look like ${field}; choose one with the mapping ${field}=<column name>)`,
  });
  return -1;
}

/** The header as read, each name quoted, in order. */
function headerText(header: readonly string[]): string {
  return header.map((h) => JSON.stringify(h)).join(', ');
}

function requireSources(header: readonly string[], index: Record<OccurrenceField, number>, problems: InputProblem[]): void {
  const missing = (expected: string): void => void problems.push({ line: 1, field: 'header', value: header.join(', '), expected });
  if (OCCURRENCE_FIELDS.every((f) => index[f] < 0)) {
    missing(
      'a first line naming the columns, separated by commas, tabs or semicolons (fields: ' + OCCURRENCE_FIELDS.join(', ') +
        '); no usable header: no column name is a field name or an accepted synonym',
    );
    return;
  }
  const has = (f: OccurrenceField): boolean => index[f] >= 0;
  if (!has('taxon')) missing(`a taxon column (no taxon column; ${accepted('taxon')})`);
  requirePair(has, 'oldest_ma', 'youngest_ma', missing);
  if (!has('oldest_ma') && !has('youngest_ma') && !has('interval')) {
    missing(`age columns: oldest_ma and youngest_ma, or interval (no age columns; ${accepted('oldest_ma')}; ${accepted('youngest_ma')}; ${accepted('interval')})`);
  }
  requirePair(has, 'palaeo_lat', 'palaeo_lon', missing);
  requirePair(has, 'lat', 'lon', missing);
  if (!has('palaeo_lat') && !has('palaeo_lon') && !has('lat') && !has('lon')) {
    missing(
      `position columns: palaeo_lat and palaeo_lon, or lat and lon (+ plate_id) (no position columns; ${accepted('palaeo_lat')}; ` +
        `${accepted('palaeo_lon')}; ${accepted('lat')}; ${accepted('lon')})`,
    );
  }
}

function requirePair(has: (f: OccurrenceField) => boolean, a: OccurrenceField, b: OccurrenceField, missing: (expected: string) => void): void {
  if (has(a) === has(b)) return;
  const [found, absent] = has(a) ? [a, b] : [b, a];
  missing(`a ${absent} column beside the ${found} column (${accepted(absent)})`);
}
