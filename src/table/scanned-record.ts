/**
 * One record as the scanner sees it. Field i is `text.slice(start[i], end[i])`: for a record
 * without quotes `text` is the scanner's buffer, so numbers and dictionary codes can be read
 * from the spans without cutting strings; for a quoted record it holds the unescaped values.
 * The scanner reuses this object and its arrays: read or copy what you need in the callback.
 */
export interface ScannedRecord {
  readonly count: number;
  readonly text: string;
  readonly start: Int32Array;
  readonly end: Int32Array;
  /** Line on which the record starts, counting from 1 (line breaks inside quotes count). */
  readonly line: number;
  /** The record as it stands in the input, without its line ending (cut on demand). */
  readonly raw: string;
  /** Why the record's quoting is malformed, when it is; the fields are then only a best reading. */
  readonly problem: string | undefined;
  /** Field i as a string. */
  field(i: number): string;
}

/** All fields of a record as strings (allocates; for headers, tests and rare paths). */
export function recordFields(record: ScannedRecord): string[] {
  return Array.from({ length: record.count }, (_, i) => record.field(i));
}

/** The record object a scanner fills and hands to its callback. */
export class RecordView implements ScannedRecord {
  count = 0;
  text = '';
  start = new Int32Array(32);
  end = new Int32Array(32);
  line = 0;
  problem: string | undefined = undefined;
  constructor(private readonly rawText: () => string) {}
  get raw(): string {
    return this.rawText();
  }
  field(i: number): string {
    return this.text.slice(this.start[i], this.end[i]);
  }
  /** Makes room for field k. */
  reserve(k: number): void {
    if (k < this.start.length) return;
    const start = new Int32Array(2 * this.start.length);
    const end = new Int32Array(2 * this.end.length);
    start.set(this.start);
    end.set(this.end);
    this.start = start;
    this.end = end;
  }
}
