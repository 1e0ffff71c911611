import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/problems';
import { COLUMN_SYNONYMS, OCCURRENCE_FIELDS, mapColumns, matchSynonym, normaliseHeader } from '../../src/table/index';

function failure(header: string[], explicit?: Record<string, string>): string {
  try {
    mapColumns(header, explicit);
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return (err as Error).message;
  }
  throw new Error('mapColumns accepted the header');
}

describe('the synonym table', () => {
  it('lists each field under its own name first', () => {
    for (const field of OCCURRENCE_FIELDS) expect(COLUMN_SYNONYMS[field][0]).toBe(field);
  });

  it('never gives one header name to two fields', () => {
    const seen = new Map<string, string>();
    for (const field of OCCURRENCE_FIELDS) {
      for (const name of COLUMN_SYNONYMS[field]) {
        const key = normaliseHeader(name);
        expect(seen.get(key), `${name} is listed for ${seen.get(key)} and ${field}`).toBeUndefined();
        seen.set(key, field);
      }
    }
  });

  it('matches names whatever their case and separators', () => {
    expect(matchSynonym('Paleo Lat')?.field).toBe('palaeo_lat');
    expect(matchSynonym('paleolatitude')?.field).toBe('palaeo_lat');
    expect(matchSynonym('PALAEO-LONGITUDE')?.field).toBe('palaeo_lon');
    expect(matchSynonym(' Max.Age ')?.field).toBe('oldest_ma');
    expect(matchSynonym('age_min')?.field).toBe('youngest_ma');
    // The names our own tables used before oldest_ma/youngest_ma still load.
    expect(matchSynonym('max_ma')).toEqual({ field: 'oldest_ma', ownName: false });
    expect(matchSynonym('MIN_MA')).toEqual({ field: 'youngest_ma', ownName: false });
    expect(matchSynonym('lng')?.field).toBe('lon');
    expect(matchSynonym('Plate ID')?.field).toBe('plate_id');
    expect(matchSynonym('latitude (deg)')).toBeUndefined();
  });
});

describe('mapColumns', () => {
  it('maps a header by synonyms and lists the columns it does not use', () => {
    const m = mapColumns(['Taxon Name', 'notes', 'Max Age', 'min_age', 'Latitude', 'Lng', 'plate', 'Locality']);
    expect(m.index).toMatchObject({ taxon: 0, oldest_ma: 2, youngest_ma: 3, lat: 4, lon: 5, plate_id: 6, collection: 7, interval: -1, palaeo_lat: -1 });
    expect(m.unused).toEqual([1]);
    expect(m.how.taxon).toBe('synonym');
  });

  it('prefers a column bearing the field name over another synonym', () => {
    const m = mapColumns(['genus', 'taxon', 'interval', 'lat', 'lon']);
    expect(m.index.taxon).toBe(1);
    expect(m.unused).toEqual([0]);
  });

  it('follows explicit field=column pairs before synonyms', () => {
    const m = mapColumns(['name', 'Stufe', 'y', 'x', 'taxon'], { taxon: 'name', interval: 'Stufe', palaeo_lat: 'y', palaeo_lon: 'X' });
    expect(m.index).toMatchObject({ taxon: 0, interval: 1, palaeo_lat: 2, palaeo_lon: 3 });
    expect(m.how.taxon).toBe('explicit');
    expect(m.unused).toEqual([4]);
  });

  it('refuses a duplicated column name that matters, naming both positions', () => {
    expect(failure(['taxon', 'oldest_ma', 'youngest_ma', 'lat', 'lon', 'Lat'])).toMatch(
      /^line 1, header "Lat": expected one column for lat \(duplicate column name: column 4 \("lat"\) and column 6 \("Lat"\) both give lat; rename or remove one\)$/,
    );
  });

  it('ignores duplicated names of columns it does not use', () => {
    expect(mapColumns(['taxon', 'note', 'interval', 'note', 'lat', 'lon']).unused).toEqual([1, 3]);
  });

  it('refuses two different synonyms for one field and says how to choose', () => {
    expect(failure(['genus', 'species', 'interval', 'lat', 'lon'])).toMatch(
      /^line 1, header "genus, species": expected one column for taxon \(column 1 \("genus"\) and column 2 \("species"\) both look like taxon; choose one with the mapping taxon=<column name>\)$/,
    );
  });

  it('lists the columns found and the names accepted for everything missing, all at once', () => {
    const message = failure(['name', 'age', 'x', 'y']);
    expect(message).toMatch(/no usable header/);
    expect(message).toMatch(/^line 1, header "name, age, x, y": expected a first line naming the columns, separated by commas, tabs or semicolons \(fields: taxon, oldest_ma/);
    const missing = failure(['species', 'lat']);
    expect(missing.split('\n')).toEqual([
      expect.stringMatching(/^line 1, header "species, lat": expected age columns: oldest_ma and youngest_ma, or interval \(no age columns; accepted names for oldest_ma: oldest_ma, oldest_age, max_ma, max_age/),
      expect.stringMatching(/^line 1, header "species, lat": expected a lon column beside the lat column \(accepted names for lon: lon, lng, long, longitude/),
    ]);
  });

  it('requires a taxon, an age source and a position source', () => {
    expect(failure(['oldest_ma', 'youngest_ma', 'lat', 'lon'])).toMatch(/^line 1, header "oldest_ma, youngest_ma, lat, lon": expected a taxon column \(no taxon column; accepted names for taxon: taxon, taxon_name/);
    expect(failure(['taxon', 'oldest_ma', 'lat', 'lon'])).toMatch(/^line 1, header "taxon, oldest_ma, lat, lon": expected a youngest_ma column beside the oldest_ma column/);
    expect(failure(['taxon', 'interval', 'collection'])).toMatch(/^line 1, header "taxon, interval, collection": expected position columns: palaeo_lat and palaeo_lon, or lat and lon/);
    expect(mapColumns(['taxon', 'interval', 'palaeo_lat', 'palaeo_lon']).index.interval).toBe(1);
  });

  it('explains explicit pairs that do not fit', () => {
    expect(failure(['a', 'b'], { taxa: 'a' })).toMatch(/^mapping "taxa=a": expected a field before "=", one of taxon, oldest_ma, .* \("taxa" is not a field\)$/);
    expect(failure(['a', 'b'], { taxon: 'c' })).toMatch(/^mapping "taxon=c": expected a column name after "=" that the header has \(no column is named "c"; columns found: "a", "b"\)$/);
    expect(failure(['a', 'b'], { taxon: 'a', group: 'a' })).toMatch(/^mapping "group=a": expected a column no other field is mapped to \(column 1 \("a"\) is already mapped to another field\)$/);
    expect(failure(['a', 'a'], { taxon: 'a' })).toMatch(/^mapping "taxon=a": expected a column name after "=" that one column has \(column 1 \("a"\) and column 2 \("a"\) both match; rename one\)$/);
  });
});
