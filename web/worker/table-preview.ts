/** The first rows of a table and the columns the reader would use: the import's mapping step. */
import { InputError } from '../../src/problems';
import { createCsvScanner, mapColumns, OCCURRENCE_FIELDS, recordFields, sniffBytes } from '../../src/table';
import { PREVIEW_ROWS, type TablePreview } from '../protocol';

/** Bytes looked at: enough for a header and the preview rows of any sane table. */
const PREVIEW_BYTES = 256 * 1024;

export async function tablePreview(blob: Blob, name: string): Promise<TablePreview> {
  const head = new Uint8Array(await blob.slice(0, PREVIEW_BYTES).arrayBuffer());
  const refused = sniffBytes(head);
  if (refused !== undefined) throw new InputError([refused]);
  // The slice may end inside a character or a record: decode leniently and scan whole lines only.
  let text = new TextDecoder('utf-8').decode(head);
  if (blob.size > PREVIEW_BYTES) text = text.slice(0, Math.max(0, text.lastIndexOf('\n')));
  const records: string[][] = [];
  const scanner = createCsvScanner({
    onRecord: (r) => {
      if (records.length <= PREVIEW_ROWS && !(r.count === 1 && r.raw.length === 0)) records.push(recordFields(r));
    },
  });
  scanner.push(text);
  try {
    scanner.end();
  } catch {
    // A quote left open at the cut is the full read's business, not the preview's.
  }
  const [header = [], ...rows] = records;
  let detected: Record<string, string> = {};
  let problem: string | undefined;
  try {
    const mapping = mapColumns(header);
    detected = Object.fromEntries(OCCURRENCE_FIELDS.filter((f) => mapping.index[f] >= 0).map((f) => [f, header[mapping.index[f]]]));
  } catch (error) {
    problem = error instanceof Error ? error.message : String(error);
  }
  return { name, bytes: blob.size, header, rows, detected, fields: OCCURRENCE_FIELDS, ...(problem === undefined ? {} : { problem }) };
}
