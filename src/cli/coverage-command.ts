import { createHash } from 'node:crypto';
import { readFile, stat } from 'node:fs/promises';
import { dirname, isAbsolute, relative, resolve } from 'node:path';
import { analyse, EXCLUSION_REASONS, type AnalysisResult } from '../analysis';
import { cellsCsv } from '../export/cells-csv';
import { cellsGeoJson } from '../export/cells-geojson';
import { rejectsCsv } from '../export/rejects-csv';
import { parseSession, sessionJson, SESSION_FORMAT, SESSION_FORMAT_VERSION, type Session, type SessionInput } from '../export/session';
import { slicesCsv } from '../export/slices-csv';
import { parseGridName } from '../grid';
import type { OccurrenceTable, RejectedRow } from '../table/occurrence-table';
import { findChartInterval, parseAssignRule, parseBinsOption } from '../time';
import type { TimeScale } from '../time/time-scale';
import { parseCoverageOptions, type CoverageOptions } from './coverage-options';
import { checkUnchanged, fileDigest } from './file-digest';
import { progressReporter } from './progress';
import { readBinsFile, readRawRecords, readTableFile } from './read-table-file';
import { printSummary } from './summary';
import { TOOL_VERSION } from './version';
import { writeResults } from './write-results';

const BIN_KEYWORDS = /^(periods|epochs|stages|equal:.*)$/i;

/** `driftgrid coverage`: table → slices → cells → measures → files. */
export async function runCoverage(args: readonly string[]): Promise<number> {
  const started = performance.now();
  const options = await resolveSession(parseCoverageOptions(args));
  const input = options.input as string;

  const grid = parseGridName(options.grid);
  const rule = parseAssignRule(options.assign, options.seed);
  const binsFile = BIN_KEYWORDS.test(options.bins) ? undefined : options.bins;
  const userScale = binsFile === undefined ? undefined : await readBinsFile(binsFile);

  const hash = createHash('sha256');
  let bytesRead = 0;
  const progress = progressReporter(await fileSize(input), options.quiet);
  const read = await readTableFile(input, {
    mapping: options.map,
    resolveInterval: findChartInterval,
    onProgress: progress.rows,
    onChunk: (bytes) => {
      hash.update(bytes);
      bytesRead += bytes.length;
    },
  }).catch((error: unknown) => {
    throw new Error(`${input}: ${error instanceof Error ? error.message : String(error)}`);
  });
  progress.done();
  const digest = { sha256: hash.digest('hex'), bytes: bytesRead };

  // Equal bins reach back to the oldest age in the table; chart ranks are always whole.
  const scale: TimeScale = userScale ?? parseBinsOption(options.bins, oldestAge(read.table));
  const result = analyse(read.table, { scale, rule, grid });
  const rejects = [...read.rejects, ...(await excludedRows(input, read.table, result))];

  const outFolder = options.out;
  const session: Session = {
    format: SESSION_FORMAT,
    formatVersion: SESSION_FORMAT_VERSION,
    tool: { name: 'driftgrid', version: TOOL_VERSION },
    inputs: {
      occurrences: sessionInput(input, digest, outFolder),
      ...(binsFile === undefined ? {} : { bins: sessionInput(binsFile, await fileDigest(binsFile), outFolder) }),
    },
    settings: { bins: binsFile === undefined ? options.bins : 'file', assign: options.assign, seed: options.seed, grid: grid.name, map: options.map },
    summary: {
      rowsRead: read.rowsRead,
      accepted: read.table.count,
      rejectedOnReading: read.rejects.length,
      excludedFromSlices: result.exclusions.rows.length,
      slices: result.slices.length,
      collectionsArePositions: result.collectionsArePositions,
    },
  };
  const written = await writeResults(
    outFolder,
    {
      'slices.csv': slicesCsv(result.slices),
      'cells.csv': cellsCsv(result.cells, grid),
      'cells.geojson': cellsGeoJson(result.cells, grid),
      'rejects.csv': rejectsCsv(rejects),
      'session.json': sessionJson(session),
    },
    binsFile === undefined ? [input] : [input, binsFile],
  );
  if (!options.quiet) {
    printSummary({ rowsRead: read.rowsRead, accepted: read.table.count, rejects: read.rejects, result, written, elapsedMs: performance.now() - started });
  }
  return 0;
}

/** With --session: the recorded inputs (checked unchanged) and settings; otherwise the options as given. */
async function resolveSession(options: CoverageOptions): Promise<CoverageOptions> {
  if (options.session === undefined) return options;
  const session = parseSession(await readFile(options.session, 'utf8'), options.session);
  const base = dirname(options.session);
  const occurrences = resolve(base, session.inputs.occurrences.path);
  await checkUnchanged(occurrences, session.inputs.occurrences);
  let bins = session.settings.bins;
  if (session.inputs.bins !== undefined) {
    bins = resolve(base, session.inputs.bins.path);
    await checkUnchanged(bins, session.inputs.bins);
  }
  const { assign, seed, grid, map } = session.settings;
  return { ...options, input: occurrences, bins, assign, seed, grid, map: { ...map } };
}

/** Input paths are recorded relative to the results folder, where session.json is written. */
function sessionInput(path: string, digest: { sha256: string; bytes: number }, outFolder: string): SessionInput {
  const fromOut = relative(resolve(outFolder), resolve(path));
  return { path: isAbsolute(fromOut) ? fromOut : fromOut.split('\\').join('/'), ...digest };
}

/** Rows the analysis could not use, as rejects with their original text (read again from the file). */
async function excludedRows(input: string, table: OccurrenceTable, result: AnalysisResult): Promise<RejectedRow[]> {
  const { rows, reasons } = result.exclusions;
  if (rows.length === 0) return [];
  const lines = new Set<number>();
  for (const row of rows) lines.add(table.line[row]);
  const originals = await readRawRecords(input, lines);
  return Array.from(rows, (row, k) => {
    const reason = EXCLUSION_REASONS[reasons[k]];
    const line = table.line[row];
    return { line, field: reasons[k] === EXCLUSION_REASONS.length - 1 ? 'palaeo_lat' : 'age', reason, original: originals.get(line) ?? '' };
  });
}

/** Oldest max_ma of the accepted rows (0 for an empty table). */
function oldestAge(table: OccurrenceTable): number {
  let oldest = 0;
  for (let i = 0; i < table.count; i++) if (table.maxMa[i] > oldest) oldest = table.maxMa[i];
  return oldest;
}

/** Size in bytes, or 0 when the file cannot be read (the reader then says why). */
function fileSize(path: string): Promise<number> {
  return stat(path).then((s) => s.size, () => 0);
}
