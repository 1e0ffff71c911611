import type { InputProblem } from '../problems';

/** How many leading bytes sniffBytes looks at. */
export const SNIFF_BYTES = 64 * 1024;

/**
 * Why the first bytes of a file do not look like UTF-8 text, or undefined when they might.
 * Catches UTF-16/UTF-32 (with or without a byte-order mark), ZIP archives (a spreadsheet
 * workbook is one), gzip and other binary data (NUL bytes), before any decoding is tried.
 */
export function sniffBytes(bytes: Uint8Array): InputProblem | undefined {
  const n = Math.min(bytes.length, SNIFF_BYTES);
  const b0 = bytes[0];
  const b1 = bytes[1];
  if (n >= 4 && b0 === 0xff && b1 === 0xfe && bytes[2] === 0 && bytes[3] === 0) return utf('UTF-32');
  if (n >= 4 && b0 === 0 && b1 === 0 && bytes[2] === 0xfe && bytes[3] === 0xff) return utf('UTF-32');
  if (n >= 2 && ((b0 === 0xff && b1 === 0xfe) || (b0 === 0xfe && b1 === 0xff))) return utf('UTF-16');
  if (n >= 4 && b0 === 0x50 && b1 === 0x4b && bytes[2] === 3 && bytes[3] === 4) {
    return { field: 'file', value: 'a ZIP archive (a spreadsheet workbook is one)', expected: 'a CSV or TSV text file; save the sheet as CSV or TSV' };
  }
  if (n >= 2 && b0 === 0x1f && b1 === 0x8b) return { field: 'file', value: 'gzip-compressed data', expected: 'a CSV or TSV text file; decompress it first' };
  let evenNul = 0;
  let oddNul = 0;
  let firstNul = -1;
  for (let i = 0; i < n; i++) {
    if (bytes[i] !== 0) continue;
    if (firstNul < 0) firstNul = i;
    if (i & 1) oddNul++;
    else evenNul++;
  }
  if (firstNul < 0) return undefined;
  // ASCII text in UTF-16 has a NUL in every other byte, on one side only (common practice).
  const half = n / 2;
  if (Math.max(evenNul, oddNul) > 0.4 * half && Math.min(evenNul, oddNul) < 0.05 * half) return utf('UTF-16');
  return { field: 'file', value: `binary data (a NUL byte at offset ${firstNul})`, expected: 'a CSV or TSV text file' };
}

function utf(kind: string): InputProblem {
  return { field: 'encoding', value: `${kind} text`, expected: 'UTF-8 text; save the file as UTF-8' };
}
