import { cellsCsv } from '../export/cells-csv';
import { curvesCsv } from '../export/curves-csv';
import { regionsGeoJson } from '../export/regions-geojson';
import { cellsGeoJson } from '../export/cells-geojson';
import { rejectsCsv } from '../export/rejects-csv';
import { sessionJson } from '../export/session';
import { slicesCsv } from '../export/slices-csv';
import { beltsCsv } from '../export/belts-csv';
import { gapsCsv } from '../export/gaps-csv';
import { gapsGeoJson } from '../export/gaps-geojson';
import { excludedLines, excludedRows } from '../placement';
import type { OccurrenceReadResult } from '../table';
import { buildSession, type SessionInputs } from './build-session';
import { readRawRecords } from './read-records';
import type { Run } from './run-analysis';
import type { CurvesRun } from './run-curves';
import type { GapsRun } from './run-gaps';
import type { TextSource } from './text-source';

/** The files a coverage run writes (README, "Exports"), in the order they are written. */
export const EXPORT_FILES = ['slices.csv', 'cells.csv', 'cells.geojson', 'rejects.csv', 'session.json'] as const;
/** The files a curves run writes. */
export const CURVES_FILES = ['curves.csv', 'regions.geojson', 'rejects.csv', 'session.json'] as const;
/** The files `gaps` writes (README, "Exports"). */
export const GAPS_EXPORT_FILES = ['gaps.csv', 'gaps.geojson', 'belts.csv', 'session.json'] as const;
export type ExportFile = (typeof EXPORT_FILES)[number] | (typeof CURVES_FILES)[number] | (typeof GAPS_EXPORT_FILES)[number];

/** A run with the table it read and where that table's text can be read again. */
export interface ExportSource {
  readonly run: Run;
  readonly read: Pick<OccurrenceReadResult, 'table' | 'rejects' | 'rowsRead'>;
  readonly inputs: SessionInputs;
  /** The occurrence table's text, read again for the original text of excluded rows. */
  readonly tableText: TextSource;
  /** The run's richness curves (runCurves), needed for curves.csv and regions.geojson. */
  readonly curves?: CurvesRun;
  /** The gaps of the run, for gaps.csv, gaps.geojson and belts.csv. */
  readonly gaps?: GapsRun;
}

/**
 * The bytes of one export file, in order, as chunks the consumer keeps: the one description of
 * each file, which the command line streams to disk and the page collects for a download. The
 * cell files come in chunks of about a megabyte, so that no file is ever whole in memory.
 */
export async function* exportFileChunks(source: ExportSource, name: ExportFile): AsyncGenerator<Uint8Array, void, undefined> {
  const { run, read } = source;
  const { result, grid } = run;
  switch (name) {
    case 'slices.csv':
      yield encoder.encode(slicesCsv(result.slices));
      return;
    case 'cells.csv':
      yield* cellsCsv(result.cells, grid);
      return;
    case 'cells.geojson':
      yield* cellsGeoJson(result.cells, grid);
      return;
    case 'rejects.csv': {
      const { exclusions, placement } = result;
      const originals = await readRawRecords(source.tableText, excludedLines(read.table, exclusions));
      const excluded = excludedRows(read.table, exclusions, placement, run.model, run.settings.rotateAt, originals);
      yield encoder.encode(rejectsCsv([...read.rejects, ...excluded]));
      return;
    }
    case 'curves.csv':
      yield encoder.encode(curvesCsv(result.slices, curvesOf(source).curves, curvesOf(source).footprint));
      return;
    case 'regions.geojson': {
      const { curves, settings } = curvesOf(source);
      if (curves.regional === undefined) throw new Error('regions.geojson needs the circular regions of the run');
      yield encoder.encode(regionsGeoJson(result.slices, curves.regional, grid, settings.regionKm));
      return;
    }
    case 'session.json': {
      const counts = { rowsRead: read.rowsRead, accepted: read.table.count, rejectedOnReading: read.rejects.length };
      yield encoder.encode(sessionJson(buildSession(source.inputs, run.settings, counts, result, source.gaps?.summary)));
      return;
    }
    case 'gaps.csv':
      yield encoder.encode(gapsCsv(run.scale, gapsOf(source).gapSummary));
      return;
    case 'gaps.geojson': {
      const gaps = gapsOf(source);
      yield encoder.encode(gapsGeoJson(gaps.gapGrid, run.scale, gaps.slices));
      return;
    }
    case 'belts.csv':
      yield encoder.encode(beltsCsv(run.scale, gapsOf(source).belts));
      return;
  }
}

/** One export file's bytes whole, for a download (the page holds the file once anyway). */
export async function exportFileBytes(source: ExportSource, name: ExportFile): Promise<Uint8Array> {
  const chunks: Uint8Array[] = [];
  let length = 0;
  for await (const chunk of exportFileChunks(source, name)) {
    chunks.push(chunk);
    length += chunk.length;
  }
  if (chunks.length === 1) return chunks[0];
  const bytes = new Uint8Array(length);
  let at = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, at);
    at += chunk.length;
  }
  return bytes;
}

const encoder = new TextEncoder();

function curvesOf(source: ExportSource): CurvesRun {
  if (source.curves === undefined) throw new Error('curves.csv and regions.geojson need the curves of the run (runCurves)');
  return source.curves;
}

function gapsOf(source: ExportSource): GapsRun {
  if (source.gaps === undefined) throw new Error('gaps.csv, gaps.geojson and belts.csv need the gaps of the run (runGaps)');
  return source.gaps;
}
