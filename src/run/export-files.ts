import { cellsCsv } from '../export/cells-csv';
import { curvesCsv } from '../export/curves-csv';
import { regionsGeoJson } from '../export/regions-geojson';
import { cellsGeoJson } from '../export/cells-geojson';
import { rejectsCsv } from '../export/rejects-csv';
import { sessionJson } from '../export/session';
import { slicesCsv } from '../export/slices-csv';
import { excludedLines, excludedRows } from '../placement';
import type { OccurrenceReadResult } from '../table';
import { buildSession, type SessionInputs } from './build-session';
import { readRawRecords } from './read-records';
import type { Run } from './run-analysis';
import type { CurvesRun } from './run-curves';
import type { TextSource } from './text-source';

/** The files a coverage run writes (README, "Exports"), in the order they are written. */
export const EXPORT_FILES = ['slices.csv', 'cells.csv', 'cells.geojson', 'rejects.csv', 'session.json'] as const;
/** The files a curves run writes. */
export const CURVES_FILES = ['curves.csv', 'regions.geojson', 'rejects.csv', 'session.json'] as const;
export type ExportFile = (typeof EXPORT_FILES)[number] | (typeof CURVES_FILES)[number];

/** A run with the table it read and where that table's text can be read again. */
export interface ExportSource {
  readonly run: Run;
  readonly read: Pick<OccurrenceReadResult, 'table' | 'rejects' | 'rowsRead'>;
  readonly inputs: SessionInputs;
  /** The occurrence table's text, read again for the original text of excluded rows. */
  readonly tableText: TextSource;
  /** The run's richness curves (runCurves), needed for curves.csv and regions.geojson. */
  readonly curves?: CurvesRun;
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
    case 'curves.csv':
      return curvesCsv(result.slices, curvesOf(source).curves, curvesOf(source).footprint);
    case 'regions.geojson': {
      const { curves, settings } = curvesOf(source);
      if (curves.regional === undefined) throw new Error('regions.geojson needs the circular regions of the run');
      return regionsGeoJson(result.slices, curves.regional, grid, settings.regionKm);
    }
    case 'session.json': {
      const counts = { rowsRead: read.rowsRead, accepted: read.table.count, rejectedOnReading: read.rejects.length };
      return sessionJson(buildSession(source.inputs, run.settings, counts, result));
    }
  }
}

function curvesOf(source: ExportSource): CurvesRun {
  if (source.curves === undefined) throw new Error('curves.csv and regions.geojson need the curves of the run (runCurves)');
  return source.curves;
}
