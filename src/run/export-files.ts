import { cellsCsv } from '../export/cells-csv';
import { cellsGeoJson } from '../export/cells-geojson';
import { rejectsCsv } from '../export/rejects-csv';
import { sessionJson } from '../export/session';
import { slicesCsv } from '../export/slices-csv';
import { excludedLines, excludedRows } from '../placement';
import type { OccurrenceReadResult } from '../table';
import { buildSession, type SessionInputs } from './build-session';
import { readRawRecords } from './read-records';
import type { Run } from './run-analysis';
import type { TextSource } from './text-source';

/** The files a run writes (README, "Exports"), in the order they are written. */
export const EXPORT_FILES = ['slices.csv', 'cells.csv', 'cells.geojson', 'rejects.csv', 'session.json'] as const;
export type ExportFile = (typeof EXPORT_FILES)[number];

/** A run with the table it read and where that table's text can be read again. */
export interface ExportSource {
  readonly run: Run;
  readonly read: Pick<OccurrenceReadResult, 'table' | 'rejects' | 'rowsRead'>;
  readonly inputs: SessionInputs;
  /** The occurrence table's text, read again for the original text of excluded rows. */
  readonly tableText: TextSource;
}

/** The export files named (all by default), name → contents; the command line writes them, the page downloads one. */
export async function exportFiles<N extends ExportFile>(
  source: ExportSource, names: readonly N[] = EXPORT_FILES as readonly ExportFile[] as readonly N[],
): Promise<Record<N, string | Uint8Array>> {
  const files: Partial<Record<ExportFile, string | Uint8Array>> = {};
  for (const name of names) files[name] = await exportFile(source, name);
  return files as Record<N, string | Uint8Array>;
}

async function exportFile(source: ExportSource, name: ExportFile): Promise<string | Uint8Array> {
  const { run, read } = source;
  const { result, grid } = run;
  switch (name) {
    case 'slices.csv':
      return slicesCsv(result.slices);
    case 'cells.csv':
      return cellsCsv(result.cells, grid);
    case 'cells.geojson':
      return cellsGeoJson(result.cells, grid);
    case 'rejects.csv': {
      const { exclusions, placement } = result;
      const originals = await readRawRecords(source.tableText, excludedLines(read.table, exclusions));
      const excluded = excludedRows(read.table, exclusions, placement, run.model, run.settings.rotateAt, originals);
      return rejectsCsv([...read.rejects, ...excluded]);
    }
    case 'session.json': {
      const counts = { rowsRead: read.rowsRead, accepted: read.table.count, rejectedOnReading: read.rejects.length };
      return sessionJson(buildSession(source.inputs, run.settings, counts, result));
    }
  }
}
