// The record reader both front ends feed (file chunks in the CLI, Blob chunks in the worker):
// small named-column tables and the raw text of rejected records. Expected records are worked
// by hand from RFC 4180 (quoted fields may hold line breaks and doubled quotes; CRLF ends a record).
import { describe, expect, it } from 'vitest';
import { readRawRecords, readRecords, type TextSource } from '../../src/run';

/** The text pushed in the given pieces, as a file or a Blob would arrive. */
const chunks = (...pieces: string[]): TextSource => async (push) => {
  for (const piece of pieces) push(piece);
};

/** The text cut into every possible pair of chunks: the result must not depend on the cut. */
const everyCut = (text: string): TextSource[] => Array.from({ length: text.length + 1 }, (_, k) => chunks(text.slice(0, k), text.slice(k)));

describe('reading a small table', () => {
  it('skips and counts empty lines after the header, wherever the chunks are cut', async () => {
    const text = 'name,base_ma,top_ma\n\nA,10,5\n\n\nB,5,0\n';
    for (const source of everyCut(text)) {
      expect(await readRecords(source)).toEqual({
        header: ['name', 'base_ma', 'top_ma'],
        records: [{ line: 3, fields: ['A', '10', '5'] }, { line: 6, fields: ['B', '5', '0'] }],
        blankLines: 3,
      });
    }
  });

  it('keeps a line of spaces or a quoted empty field as a record, as the occurrence reader does', async () => {
    const { records, blankLines } = await readRecords(chunks('name\n  \n""\n'));
    expect(records).toEqual([{ line: 2, fields: ['  '] }, { line: 3, fields: [''] }]);
    expect(blankLines).toBe(0);
  });

  it('refuses a blank first line, as the occurrence reader does, and an empty file', async () => {
    await expect(readRecords(chunks('\nname,base_ma\n'))).rejects.toThrow('line 1, header "": expected the header naming the columns on the first line (line 1 is blank)');
    await expect(readRecords(chunks(''))).rejects.toThrow('line 1, header "": expected a header line naming the columns (the file is empty)');
  });

  it('reads CRLF line endings and quoted line breaks, numbering records by their first line', async () => {
    const text = 'name,note\r\n"A, the first","two\r\nlines"\r\n\r\nB,"say ""hi"""\r\n';
    for (const source of everyCut(text)) {
      const { records, blankLines } = await readRecords(source);
      expect(records).toEqual([{ line: 2, fields: ['A, the first', 'two\r\nlines'] }, { line: 5, fields: ['B', 'say "hi"'] }]);
      expect(blankLines).toBe(1);
    }
  });

  it('refuses malformed quoting with its line', async () => {
    await expect(readRecords(chunks('name,note\nA,"x"y\nB,2\n'))).rejects.toThrow(/^line 2, row "A,\"x\"y": expected well-formed quoting/);
  });
});

describe('reading rejected records again', () => {
  it('gives their text as written, without the line ending, quoted line breaks kept', async () => {
    const text = 'taxon,lat\r\nA,1\r\n\r\n"B\r\nb",2\r\nC,3\r\n';
    for (const source of everyCut(text)) {
      const raw = await readRawRecords(source, new Set([2, 4, 6, 99]));
      expect([...raw.entries()]).toEqual([[2, 'A,1'], [4, '"B\r\nb",2'], [6, 'C,3']]);
    }
  });

  it('reads nothing when no line is asked for', async () => {
    let pushed = false;
    expect((await readRawRecords(async () => { pushed = true; }, new Set())).size).toBe(0);
    expect(pushed).toBe(false);
  });
});
