/** Our occurrence fields, in the order the README lists them. */
export const OCCURRENCE_FIELDS = [
  'taxon', 'oldest_ma', 'youngest_ma', 'interval', 'palaeo_lat', 'palaeo_lon', 'lat', 'lon', 'plate_id',
  'collection', 'reference', 'environment', 'group',
] as const;
export type OccurrenceField = (typeof OCCURRENCE_FIELDS)[number];
/** 0-based column of each field; -1 where the table has none. */
export type ColumnIndex = Readonly<Record<OccurrenceField, number>>;

const PALAEO = ['palaeo', 'paleo'] as const;
const LAT = ['lat', 'latitude'] as const;
const LON = ['lon', 'lng', 'long', 'longitude'] as const;
const PRESENT = ['present', 'modern'] as const;

const prefixed = (prefixes: readonly string[], words: readonly string[]): string[] =>
  prefixes.flatMap((p) => words.map((w) => `${p}_${w}`));

/**
 * Header names accepted for each field, the field's own name first. Matching ignores case and
 * the separators `_`, space, `-` and `.`, so `palaeo_lat` also matches `Palaeo Lat`,
 * `paleo-lat` and `PALAEOLAT`. Generic words only; no set is modelled on any database.
 */
export const COLUMN_SYNONYMS: Readonly<Record<OccurrenceField, readonly string[]>> = {
  taxon: ['taxon', 'taxon_name', 'taxonomic_name', 'scientific_name', 'genus', 'species'],
  oldest_ma: ['oldest_ma', 'oldest_age', 'max_ma', 'max_age', 'age_max', 'max_age_ma', 'maximum_age'],
  youngest_ma: ['youngest_ma', 'youngest_age', 'min_ma', 'min_age', 'age_min', 'min_age_ma', 'minimum_age'],
  interval: ['interval', 'interval_name', 'time_interval', 'stage'],
  palaeo_lat: prefixed(PALAEO, LAT),
  palaeo_lon: prefixed(PALAEO, LON),
  lat: [...LAT, ...prefixed(PRESENT, LAT), 'decimal_latitude'],
  lon: [...LON, ...prefixed(PRESENT, LON), 'decimal_longitude'],
  plate_id: ['plate_id', 'plate', 'plate_code', 'plate_number'],
  collection: ['collection', 'collection_id', 'collection_name', 'locality', 'locality_id', 'site', 'site_id'],
  reference: ['reference', 'reference_id', 'ref', 'source', 'citation'],
  environment: ['environment', 'env', 'depositional_environment', 'palaeoenvironment', 'paleoenvironment'],
  group: ['group', 'taxon_group', 'taxonomic_group', 'higher_taxon', 'clade'],
};

/** A header name reduced for matching: lower case, surrounding space and `_ -.` separators removed. */
export function normaliseHeader(name: string): string {
  return name.trim().toLowerCase().replace(/[_\s.-]+/g, '');
}

/** The field a header name stands for by synonym, and whether it is the field's own name. */
export interface SynonymMatch {
  readonly field: OccurrenceField;
  readonly ownName: boolean;
}

const BY_NAME = new Map<string, SynonymMatch>();
for (const field of OCCURRENCE_FIELDS) {
  COLUMN_SYNONYMS[field].forEach((name, i) => BY_NAME.set(normaliseHeader(name), { field, ownName: i === 0 }));
}

/** The field a header name matches by synonym, or undefined. */
export function matchSynonym(header: string): SynonymMatch | undefined {
  return BY_NAME.get(normaliseHeader(header));
}
