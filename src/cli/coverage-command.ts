import { createHash } from 'node:crypto';
import { stat } from 'node:fs/promises';
import { runAnalysis } from '../run';
import { findChartInterval } from '../time';
import { parseCoverageOptions } from './coverage-options';
import { resolveSession, sessionInput } from './coverage-session';
import { fileDigest } from './file-digest';
import { progressReporter } from './progress';
import { readRotationFile } from './read-rotation-file';
import { fileText, readBinsFile, readTableFile } from './read-table-file';
import { printSummary } from './summary';
import { writeExports } from './write-results';

/** `driftgrid coverage`: table → slices → positions → cells → measures → files. */
export async function runCoverage(args: readonly string[]): Promise<number> {
  const started = performance.now();
  const options = await resolveSession(parseCoverageOptions(args));
  const { settings, binsFile, rotation: rotationFile, out: outFolder } = options;
  const input = options.input as string;

  const bins = binsFile === undefined ? undefined : await readBinsFile(binsFile);
  const model = rotationFile === undefined ? undefined : await readRotationFile(rotationFile, settings.beyondModel);

  const hash = createHash('sha256');
  let bytesRead = 0;
  const progress = progressReporter(await fileSize(input), options.quiet);
  const read = await readTableFile(input, {
    mapping: settings.map,
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

  const run = runAnalysis(read.table, settings, { bins, model });
  const inputs = {
    occurrences: sessionInput(input, digest, outFolder),
    ...(binsFile === undefined ? {} : { bins: sessionInput(binsFile, await fileDigest(binsFile), outFolder) }),
    ...(rotationFile === undefined ? {} : { rotation: sessionInput(rotationFile, await fileDigest(rotationFile), outFolder) }),
  };
  const written = await writeExports(outFolder, { run, read, inputs, tableText: fileText(input) }, [input, ...(binsFile === undefined ? [] : [binsFile]), ...(rotationFile === undefined ? [] : [rotationFile])]);
  if (!options.quiet) {
    printSummary({
      rowsRead: read.rowsRead, accepted: read.table.count, rejects: read.rejects, result: run.result, model, loneOldest: run.loneOldest, written,
      elapsedMs: performance.now() - started,
    });
  }
  return 0;
}

/** Size in bytes, or 0 when the file cannot be read (the reader then says why). */
export function fileSize(path: string): Promise<number> {
  return stat(path).then((s) => s.size, () => 0);
}
