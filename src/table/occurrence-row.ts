import type { RowProblem } from '../problems';
import type { ColumnIndex } from './column-synonyms';
import { MAX_PLATE_ID, describeBadNumber, isBlank, parseDecimalSpan, parsePlateIdSpan } from './number-field';
import { EARTH_AGE_MA, WITHIN_EARTH_AGE } from '../time/earth-age';
import { NO_PLATE } from './occurrence-table';
import type { ScannedRecord } from './scanned-record';
import { trimmedEnd, trimmedStart } from './text-span';

/** Age range of a named interval of the time chart, Ma; undefined for an unknown name. */
export type ResolveInterval = (name: string) => { readonly baseMa: number; readonly topMa: number } | undefined;

/** One accepted row's numbers and its taxon span in the record's text, written into a reused object. */
export interface RowValues {
  taxonStart: number;
  taxonEnd: number;
  oldestMa: number;
  youngestMa: number;
  /** NaN where the row has no such pair. */
  palaeoLat: number;
  palaeoLon: number;
  lat: number;
  lon: number;
  plateId: number;
}

export function createRowValues(): RowValues {
  return { taxonStart: 0, taxonEnd: 0, oldestMa: NaN, youngestMa: NaN, palaeoLat: NaN, palaeoLon: NaN, lat: NaN, lon: NaN, plateId: NO_PLATE };
}

const AGE = 'an age in Ma before present, 0 or more';
const LAT_RANGE = 'decimal degrees from -90 to 90';
const LON_RANGE = 'decimal degrees from -180 to 180';

const num = (r: ScannedRecord, i: number): number => (i < 0 ? NaN : parseDecimalSpan(r.text, r.start[i], r.end[i]));
const str = (r: ScannedRecord, i: number): string => (i < 0 ? '' : r.field(i));
const shown = (text: string): string => JSON.stringify(text.trim());
const listed = (names: readonly string[]): string =>
  names.length === 1 ? names[0] : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;

/**
 * Reads and checks one record whose field count matches the header, without cutting strings on
 * the common path. Ages: oldest_ma/youngest_ma when given, the interval when both are blank; none older
 * than the Earth (EARTH_AGE_MA). Returns
 * the first problem found, or undefined with `out` filled.
 */
export function readRow(record: ScannedRecord, index: ColumnIndex, resolve: ResolveInterval, out: RowValues): RowProblem | undefined {
  const t = index.taxon;
  out.taxonStart = trimmedStart(record.text, record.start[t], record.end[t]);
  out.taxonEnd = trimmedEnd(record.text, out.taxonStart, record.end[t]);
  if (out.taxonStart === out.taxonEnd) return { field: 'taxon', reason: 'taxon is blank; every row needs a taxon name' };
  const problem =
    readAge(record, index, resolve, out) ??
    readPair(record, index.palaeo_lat, index.palaeo_lon, true, out) ??
    readPair(record, index.lat, index.lon, false, out);
  if (problem !== undefined) return problem;
  if (Number.isNaN(out.palaeoLat) && Number.isNaN(out.lat)) {
    const names = (['palaeo_lat', 'palaeo_lon', 'lat', 'lon'] as const).filter((f) => index[f] >= 0);
    return { field: names[0], reason: `no position: ${listed(names)} are${names.length > 2 ? ' all' : ''} blank; expected palaeo_lat and palaeo_lon, or lat and lon` };
  }
  out.plateId = NO_PLATE;
  const p = index.plate_id;
  if (p >= 0 && record.end[p] > record.start[p]) {
    out.plateId = parsePlateIdSpan(record.text, record.start[p], record.end[p]);
    if (out.plateId < 0) {
      const text = record.field(p);
      if (isBlank(text)) out.plateId = NO_PLATE;
      else return { field: 'plate_id', reason: `plate_id ${shown(text)} is not a plate id; expected a whole number from 0 to ${MAX_PLATE_ID}` };
    }
  }
  return undefined;
}

function readAge(record: ScannedRecord, index: ColumnIndex, resolve: ResolveInterval, out: RowValues): RowProblem | undefined {
  const oldest = num(record, index.oldest_ma);
  const youngest = num(record, index.youngest_ma);
  out.oldestMa = oldest;
  out.youngestMa = youngest;
  if (oldest >= youngest && youngest >= 0 && oldest <= EARTH_AGE_MA) return undefined; // the common case; NaN fails these tests
  const oldestText = str(record, index.oldest_ma);
  const youngestText = str(record, index.youngest_ma);
  const oldestBlank = isBlank(oldestText);
  const youngestBlank = isBlank(youngestText);
  if (oldestBlank && youngestBlank) return readInterval(record, index, resolve, out);
  if (oldestBlank || youngestBlank) {
    const [missing, present, text] = oldestBlank ? ['oldest_ma', 'youngest_ma', youngestText] : ['youngest_ma', 'oldest_ma', oldestText];
    const alternative = index.interval >= 0 ? ', or leave both blank to use the interval' : '';
    return { field: missing, reason: `${missing} is blank but ${present} is ${shown(text)}; give both${alternative}` };
  }
  const problem = checkAge('oldest_ma', oldestText, oldest) ?? checkAge('youngest_ma', youngestText, youngest);
  if (problem !== undefined) return problem;
  return {
    field: 'oldest_ma',
    reason: `oldest_ma ${shown(oldestText)} is less than youngest_ma ${shown(youngestText)}; oldest_ma is the older end of the age range (expected oldest_ma >= youngest_ma)`,
  };
}

function checkAge(field: string, text: string, v: number): RowProblem | undefined {
  if (Number.isNaN(v)) return { field, reason: describeBadNumber(field, text, AGE) };
  if (v < 0) return { field, reason: `${field} ${shown(text)} is negative; expected ${AGE}` };
  if (v > EARTH_AGE_MA) return { field, reason: `${field} ${shown(text)} is older than the Earth; expected ${WITHIN_EARTH_AGE}` };
  return undefined;
}

function readInterval(record: ScannedRecord, index: ColumnIndex, resolve: ResolveInterval, out: RowValues): RowProblem | undefined {
  const name = str(record, index.interval).trim();
  if (name.length === 0) {
    const names = (['oldest_ma', 'youngest_ma', 'interval'] as const).filter((f) => index[f] >= 0);
    return {
      field: index.interval >= 0 ? 'interval' : 'oldest_ma',
      reason: `no age: ${listed(names)} ${names.length > 1 ? 'are' : 'is'} blank; expected oldest_ma and youngest_ma in Ma, or an interval name`,
    };
  }
  const unit = resolve(name);
  if (unit === undefined) {
    return { field: 'interval', reason: `interval ${JSON.stringify(name)} is not a known interval; expected a name from the built-in time chart` };
  }
  if (unit.baseMa > EARTH_AGE_MA) {
    return { field: 'interval', reason: `interval ${JSON.stringify(name)} has its base at ${unit.baseMa} Ma, older than the Earth; expected ${WITHIN_EARTH_AGE}` };
  }
  out.oldestMa = unit.baseMa;
  out.youngestMa = unit.topMa;
  return undefined;
}

/** Reads a latitude/longitude pair; both blank leaves NaN. */
function readPair(record: ScannedRecord, iLat: number, iLon: number, palaeo: boolean, out: RowValues): RowProblem | undefined {
  let lat = num(record, iLat);
  let lon = num(record, iLon);
  if (!(lat >= -90 && lat <= 90 && lon >= -180 && lon <= 180)) {
    const problem = checkPair(str(record, iLat), str(record, iLon), lat, lon, palaeo);
    if (problem !== undefined) return problem;
    lat = NaN;
    lon = NaN;
  }
  if (palaeo) {
    out.palaeoLat = lat;
    out.palaeoLon = lon;
  } else {
    out.lat = lat;
    out.lon = lon;
  }
  return undefined;
}

/** The problem with a pair that is not two in-range numbers; undefined when both are blank. */
function checkPair(latText: string, lonText: string, lat: number, lon: number, palaeo: boolean): RowProblem | undefined {
  const latName = palaeo ? 'palaeo_lat' : 'lat';
  const lonName = palaeo ? 'palaeo_lon' : 'lon';
  const latBlank = isBlank(latText);
  const lonBlank = isBlank(lonText);
  if (latBlank && lonBlank) return undefined;
  if (latBlank || lonBlank) {
    const [missing, present, text] = latBlank ? [latName, lonName, lonText] : [lonName, latName, latText];
    return { field: missing, reason: `${missing} is blank but ${present} is ${shown(text)}; give both ${latName} and ${lonName}, or neither` };
  }
  if (Number.isNaN(lat)) return { field: latName, reason: describeBadNumber(latName, latText, LAT_RANGE) };
  if (lat < -90 || lat > 90) return { field: latName, reason: `${latName} ${shown(latText)} is out of range; expected ${LAT_RANGE}` };
  if (Number.isNaN(lon)) return { field: lonName, reason: describeBadNumber(lonName, lonText, LON_RANGE) };
  const hint = lon <= 360 && lon > 180 ? ' (longitudes from 0 to 360 must be converted first)' : '';
  return { field: lonName, reason: `${lonName} ${shown(lonText)} is out of range; expected ${LON_RANGE}${hint}` };
}
