import type { ColumnIndex } from './column-synonyms';
import type { RowValues } from './occurrence-row';
import { ABSENT_CODE, type CodedColumn, type OccurrenceTable } from './occurrence-table';
import type { ScannedRecord } from './scanned-record';
import { StringDictionary } from './string-dictionary';
import { trimmedEnd, trimmedStart } from './text-span';

const INITIAL_CAPACITY = 1024;

/**
 * Appends accepted rows to growable typed arrays (capacity doubles) and string dictionaries.
 * Text values are stored without their surrounding whitespace; a blank optional value is
 * ABSENT_CODE. Only accepted rows reach the dictionaries, so every value is used by a row.
 */
export class OccurrenceTableBuilder {
  private count = 0;
  private capacity = INITIAL_CAPACITY;
  private line = new Uint32Array(INITIAL_CAPACITY);
  private taxon = new Uint32Array(INITIAL_CAPACITY);
  private collection = new Uint32Array(INITIAL_CAPACITY);
  private reference: Uint32Array | undefined;
  private environment: Uint32Array | undefined;
  private group: Uint32Array | undefined;
  private oldestMa = new Float64Array(INITIAL_CAPACITY);
  private youngestMa = new Float64Array(INITIAL_CAPACITY);
  private palaeoLat = new Float64Array(INITIAL_CAPACITY);
  private palaeoLon = new Float64Array(INITIAL_CAPACITY);
  private lat = new Float64Array(INITIAL_CAPACITY);
  private lon = new Float64Array(INITIAL_CAPACITY);
  private plateId = new Int32Array(INITIAL_CAPACITY);
  private readonly dict = {
    taxon: new StringDictionary(),
    collection: new StringDictionary(),
    reference: new StringDictionary(),
    environment: new StringDictionary(),
    group: new StringDictionary(),
  };

  constructor(private readonly index: ColumnIndex) {
    if (index.reference >= 0) this.reference = new Uint32Array(INITIAL_CAPACITY);
    if (index.environment >= 0) this.environment = new Uint32Array(INITIAL_CAPACITY);
    if (index.group >= 0) this.group = new Uint32Array(INITIAL_CAPACITY);
  }

  /** Adds the row read by readRow from `record`. */
  append(record: ScannedRecord, row: RowValues): void {
    if (this.count === this.capacity) this.grow();
    const i = this.count++;
    const d = this.dict;
    const index = this.index;
    this.line[i] = record.line;
    this.taxon[i] = d.taxon.codeOf(record.text, row.taxonStart, row.taxonEnd);
    this.collection[i] = optionalCode(d.collection, record, index.collection);
    if (this.reference) this.reference[i] = optionalCode(d.reference, record, index.reference);
    if (this.environment) this.environment[i] = optionalCode(d.environment, record, index.environment);
    if (this.group) this.group[i] = optionalCode(d.group, record, index.group);
    this.oldestMa[i] = row.oldestMa;
    this.youngestMa[i] = row.youngestMa;
    this.palaeoLat[i] = row.palaeoLat;
    this.palaeoLon[i] = row.palaeoLon;
    this.lat[i] = row.lat;
    this.lon[i] = row.lon;
    this.plateId[i] = row.plateId;
  }

  /** The table, with arrays trimmed to the row count. */
  finish(): OccurrenceTable {
    const n = this.count;
    const d = this.dict;
    const coded = (codes: Uint32Array, dict: StringDictionary): CodedColumn => ({ codes: codes.slice(0, n), values: dict.values });
    return {
      count: n,
      line: this.line.slice(0, n),
      taxon: coded(this.taxon, d.taxon),
      collection: coded(this.collection, d.collection),
      ...(this.reference ? { reference: coded(this.reference, d.reference) } : {}),
      ...(this.environment ? { environment: coded(this.environment, d.environment) } : {}),
      ...(this.group ? { group: coded(this.group, d.group) } : {}),
      oldestMa: this.oldestMa.slice(0, n),
      youngestMa: this.youngestMa.slice(0, n),
      palaeoLat: this.palaeoLat.slice(0, n),
      palaeoLon: this.palaeoLon.slice(0, n),
      lat: this.lat.slice(0, n),
      lon: this.lon.slice(0, n),
      plateId: this.plateId.slice(0, n),
    };
  }

  private grow(): void {
    const size = this.capacity * 2;
    this.capacity = size;
    this.line = grown(this.line, size, Uint32Array);
    this.taxon = grown(this.taxon, size, Uint32Array);
    this.collection = grown(this.collection, size, Uint32Array);
    if (this.reference) this.reference = grown(this.reference, size, Uint32Array);
    if (this.environment) this.environment = grown(this.environment, size, Uint32Array);
    if (this.group) this.group = grown(this.group, size, Uint32Array);
    this.oldestMa = grown(this.oldestMa, size, Float64Array);
    this.youngestMa = grown(this.youngestMa, size, Float64Array);
    this.palaeoLat = grown(this.palaeoLat, size, Float64Array);
    this.palaeoLon = grown(this.palaeoLon, size, Float64Array);
    this.lat = grown(this.lat, size, Float64Array);
    this.lon = grown(this.lon, size, Float64Array);
    this.plateId = grown(this.plateId, size, Int32Array);
  }
}

function optionalCode(dict: StringDictionary, record: ScannedRecord, column: number): number {
  if (column < 0) return ABSENT_CODE;
  const start = trimmedStart(record.text, record.start[column], record.end[column]);
  const end = trimmedEnd(record.text, start, record.end[column]);
  return start === end ? ABSENT_CODE : dict.codeOf(record.text, start, end);
}

function grown<A extends Uint32Array | Int32Array | Float64Array>(a: A, size: number, make: new (n: number) => A): A {
  const b = new make(size);
  b.set(a);
  return b;
}
