// A run from settings to files: the session it records and the export files both front ends
// write from it. Counts are worked by hand from the four-row table below.
import { describe, expect, it } from 'vitest';
import { SESSION_FORMAT, SESSION_FORMAT_VERSION } from '../../src/export/session';
import { DEFAULT_RUN_SETTINGS, EXPORT_FILES, buildSession, exportFileBytes, exportFileChunks, parseRunSettings, type ExportSource, runAnalysis, type TextSource } from '../../src/run';
import { createOccurrenceReader } from '../../src/table';
import { equalBins, findChartInterval } from '../../src/time';
import { TOOL_VERSION } from '../../src/version';

// Line 3 is older than the chart's oldest stage (538.8 Ma, ICS 2023/09): no slice holds it.
// Its quoted name runs over two lines, so line 5 has a blank taxon: refused on reading. Lines 2 and 6
// are placed from their palaeocoordinates.
const TABLE = 'taxon,palaeo_lat,palaeo_lon,oldest_ma,youngest_ma\r\nAlpha,10,20,70,68\r\n"Beta\r\nprime",11,21,900,899\r\n,12,22,70,68\r\nGamma,-30,40,100,95\r\n';
const text: TextSource = async (push) => push(TABLE);
const INPUTS = { occurrences: { path: 'o.csv', sha256: 'a'.repeat(64), bytes: TABLE.length }, bins: { path: 'b.csv', sha256: 'b'.repeat(64), bytes: 9 } };

function readTable() {
  const reader = createOccurrenceReader({ resolveInterval: findChartInterval });
  reader.push(TABLE);
  return reader.end();
}

describe('a run', () => {
  it('records its inputs, settings as text and what it found in the session', () => {
    const read = readTable();
    const settings = parseRunSettings({ grid: 'bands:10', map: ['taxon=taxon'] }, { naming: 'option' });
    const { result } = runAnalysis(read.table, settings, {});
    const session = buildSession(INPUTS, settings, { rowsRead: 4, accepted: 3, rejectedOnReading: 1 }, result);
    expect(session.format).toBe(SESSION_FORMAT);
    expect(session.formatVersion).toBe(SESSION_FORMAT_VERSION);
    expect(session.tool).toEqual({ name: 'driftgrid', version: TOOL_VERSION });
    expect(session.inputs).toEqual({ occurrences: INPUTS.occurrences }); // chart bins: the bins file is not an input
    expect(session.settings).toEqual({
      bins: 'stages', assign: 'mid-age', seed: 1, grid: 'bands:10', map: { taxon: 'taxon' }, rotateAt: 'slice', preferModel: false, beyondModel: 'reject',
    });
    expect(session.summary).toMatchObject({ rowsRead: 4, accepted: 3, rejectedOnReading: 1, excludedFromSlices: 1, placedFromTable: 2 });
  });

  it('records the bins table only when the run used it', () => {
    const read = readTable();
    const settings = { ...DEFAULT_RUN_SETTINGS, bins: { kind: 'file' } } as const;
    const { result } = runAnalysis(read.table, settings, { bins: equalBins(50, 1000) });
    expect(buildSession(INPUTS, settings, { rowsRead: 4, accepted: 3, rejectedOnReading: 1 }, result).inputs.bins).toEqual(INPUTS.bins);
    expect(() => runAnalysis(read.table, settings, {})).toThrow('no bins table is loaded');
  });

  it('writes every export file, the rejects with their original text read again from the source', async () => {
    const read = readTable();
    const run = runAnalysis(read.table, DEFAULT_RUN_SETTINGS, {});
    const files = await allFiles({ run, read, inputs: INPUTS, tableText: text });
    expect(Object.keys(files)).toEqual([...EXPORT_FILES]);
    const rejects = files['rejects.csv'].split('\n');
    expect(rejects[0]).toBe('line,field,reason,original');
    expect(rejects[1]).toMatch(/^3,/);
    expect(files['rejects.csv']).toContain('"""Beta\r\nprime"",11,21,900,899"');
    expect(rejects.some((line) => line.startsWith('5,taxon,'))).toBe(true);
    const slices = files['slices.csv'].trim().split('\n');
    expect(slices).toHaveLength(1 + run.scale.names.length);
    expect(JSON.parse(files['session.json']).summary.slices).toBe(run.scale.names.length);
  });

  it('writes one file alone as the same bytes as in the full set, reading the table again only for the rejects', async () => {
    const read = readTable();
    const run = runAnalysis(read.table, DEFAULT_RUN_SETTINGS, {});
    const all = await allFiles({ run, read, inputs: INPUTS, tableText: text });
    let reread = 0;
    const counted: TextSource = async (push) => {
      reread++;
      push(TABLE);
    };
    const one = await exportFileBytes({ run, read, inputs: INPUTS, tableText: counted }, 'cells.csv');
    expect(new TextDecoder().decode(one)).toBe(all['cells.csv']);
    expect(reread).toBe(0);
  });

  it('hands out the cell files in chunks the consumer keeps: gathered later, they are the whole file', async () => {
    // Nearly every cell of healpix:16 occupied in two slices: megabytes of GeoJSON, several chunks.
    const rows = ['taxon,palaeo_lat,palaeo_lon,max_ma,min_ma'];
    for (let lat = -89; lat < 90; lat += 2) for (let lon = -179; lon < 180; lon += 2) rows.push(`T,${lat},${lon},70,68`, `T,${lat},${lon},100,95`);
    const reader = createOccurrenceReader({ resolveInterval: findChartInterval });
    reader.push(`${rows.join('\n')}\n`);
    const read = reader.end();
    const source: ExportSource = { run: runAnalysis(read.table, { ...DEFAULT_RUN_SETTINGS, grid: { kind: 'healpix', nside: 16 } }, {}), read, inputs: INPUTS, tableText: text };
    const chunks: Uint8Array[] = [];
    for await (const chunk of exportFileChunks(source, 'cells.geojson')) chunks.push(chunk);
    expect(chunks.length).toBeGreaterThan(2);
    const geojson = JSON.parse(Buffer.concat(chunks).toString('utf8')) as { features: Array<{ properties: { cell: number; slice: number } }> };
    const csv = new TextDecoder().decode(await exportFileBytes(source, 'cells.csv')).trim().split('\n').slice(1);
    expect(geojson.features.map((f) => `${f.properties.slice},${f.properties.cell}`)).toEqual(csv.map((line) => line.split(',').filter((_, i) => i === 0 || i === 2).join(',')));
  });
});

/** Every export file of `source`, decoded, by name. */
async function allFiles(source: ExportSource): Promise<Record<string, string>> {
  const files: Record<string, string> = {};
  for (const name of EXPORT_FILES) files[name] = new TextDecoder().decode(await exportFileBytes(source, name));
  return files;
}
