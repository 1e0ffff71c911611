import { createHash } from 'node:crypto';
import { stat } from 'node:fs/promises';
import { analyse } from '../analysis';
import { cellsCsv } from '../export/cells-csv';
import { cellsGeoJson } from '../export/cells-geojson';
import { rejectsCsv } from '../export/rejects-csv';
import { sessionJson, sessionSummary, SESSION_FORMAT, SESSION_FORMAT_VERSION, type Session } from '../export/session';
import { slicesCsv } from '../export/slices-csv';
import { parseGridName } from '../grid';
import { loneOldestRow } from '../table/lone-oldest-row';
import { oldestAge } from '../table/oldest-age';
import { findChartInterval, parseAssignRule, parseBinsOption } from '../time';
import type { TimeScale } from '../time/time-scale';
import { parseCoverageOptions } from './coverage-options';
import { resolveSession, sessionInput } from './coverage-session';
import { excludedRowsOfFile } from './excluded-rows';
import { fileDigest } from './file-digest';
import { progressReporter } from './progress';
import { readRotationFile } from './read-rotation-file';
import { readBinsFile, readTableFile } from './read-table-file';
import { printSummary } from './summary';
import { TOOL_VERSION } from './version';
import { writeResults } from './write-results';

export const BIN_KEYWORDS = /^(periods|epochs|stages|equal:.*)$/i;
const EQUAL_BINS = /^\s*equal:/i;

/** `driftgrid coverage`: table → slices → positions → cells → measures → files. */
export async function runCoverage(args: readonly string[]): Promise<number> {
  const started = performance.now();
  const options = await resolveSession(parseCoverageOptions(args));
  const input = options.input as string;

  const grid = parseGridName(options.grid);
  const rule = parseAssignRule(options.assign, options.seed);
  const binsFile = BIN_KEYWORDS.test(options.bins) ? undefined : options.bins;
  const userScale = binsFile === undefined ? undefined : await readBinsFile(binsFile);
  const rotationFile = options.rotation;
  const model = rotationFile === undefined ? undefined : await readRotationFile(rotationFile, options.beyondModel);

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
  const loneOldest = EQUAL_BINS.test(options.bins) ? loneOldestRow(read.table, scale.baseMa[0] - scale.topMa[0]) : undefined;
  const placement = { rotateAt: options.rotateAt, preferModel: options.preferModel };
  const result = analyse(read.table, { scale, rule, grid, rotation: model, placement });
  const rejects = [...read.rejects, ...(await excludedRowsOfFile(input, read.table, result.exclusions, result.placement, model, options.rotateAt))];

  const outFolder = options.out;
  const session: Session = {
    format: SESSION_FORMAT,
    formatVersion: SESSION_FORMAT_VERSION,
    tool: { name: 'driftgrid', version: TOOL_VERSION },
    inputs: {
      occurrences: sessionInput(input, digest, outFolder),
      ...(binsFile === undefined ? {} : { bins: sessionInput(binsFile, await fileDigest(binsFile), outFolder) }),
      ...(rotationFile === undefined ? {} : { rotation: sessionInput(rotationFile, await fileDigest(rotationFile), outFolder) }),
    },
    settings: {
      bins: binsFile === undefined ? options.bins : 'file', assign: options.assign, seed: options.seed, grid: grid.name, map: options.map,
      rotateAt: options.rotateAt, preferModel: options.preferModel, beyondModel: options.beyondModel,
    },
    summary: sessionSummary({ rowsRead: read.rowsRead, accepted: read.table.count, rejectedOnReading: read.rejects.length }, result),
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
    [input, ...(binsFile === undefined ? [] : [binsFile]), ...(rotationFile === undefined ? [] : [rotationFile])],
  );
  if (!options.quiet) {
    printSummary({
      rowsRead: read.rowsRead, accepted: read.table.count, rejects: read.rejects, result, model, loneOldest, written,
      elapsedMs: performance.now() - started,
    });
  }
  return 0;
}

/** Size in bytes, or 0 when the file cannot be read (the reader then says why). */
export function fileSize(path: string): Promise<number> {
  return stat(path).then((s) => s.size, () => 0);
}
