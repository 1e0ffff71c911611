export { ABSENT_CODE, NO_PLATE } from './occurrence-table';
export type { CodedColumn, OccurrenceTable, RejectedRow } from './occurrence-table';
export { DELIMITERS, detectDelimiter } from './delimiter-detection';
export type { Delimiter } from './delimiter-detection';
export { MAX_RECORD_CHARS, createCsvScanner } from './csv-scanner';
export type { CsvScanner, CsvScannerOptions } from './csv-scanner';
export { recordFields } from './scanned-record';
export type { ScannedRecord } from './scanned-record';
export { isTrimmable, trimmedEnd, trimmedStart } from './text-span';
export { StringDictionary, detach } from './string-dictionary';
export { SNIFF_BYTES, sniffBytes } from './sniff-bytes';
export { continuationPrefix, findInvalidUtf8, invalidUtf8Offset } from './utf8-check';
export { InvalidUtf8Error, LineCounter, StrictTextDecoder } from './strict-text-decoder';
export { COLUMN_SYNONYMS, OCCURRENCE_FIELDS, matchSynonym, normaliseHeader } from './column-synonyms';
export type { ColumnIndex, OccurrenceField, SynonymMatch } from './column-synonyms';
export { mapColumns } from './column-mapping';
export type { ColumnMapping } from './column-mapping';
export {
  MAX_PLATE_ID, describeBadNumber, isBlank, parseDecimal, parseDecimalSpan, parsePlateId, parsePlateIdSpan,
} from './number-field';
export type { ResolveInterval } from './occurrence-row';
export { createOccurrenceReader } from './occurrence-reader';
export type { OccurrenceReader, OccurrenceReaderOptions, OccurrenceReadResult } from './occurrence-reader';
export { oldestAge } from './oldest-age';
export { LONE_STRETCH_SHARE, loneOldestRow } from './lone-oldest-row';
export type { LoneOldestRow } from './lone-oldest-row';
export { OTHER_COLUMNS, fieldCountProblem, namedColumns } from './named-columns';
export type { NamedColumns, OtherColumns, TableRecord } from './named-columns';
export { emptyTableError, excerpt, malformedQuotingProblem } from './table-problems';
