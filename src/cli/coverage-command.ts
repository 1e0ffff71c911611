import { parseCoverageOptions } from './coverage-options';
import { resolveSession } from './coverage-session';
import { readRun } from './read-run';
import { fileText } from './read-table-file';
import { printSummary } from './summary';
import { writeExports } from './write-results';

/** `driftgrid coverage`: table → slices → positions → cells → measures → files. */
export async function runCoverage(args: readonly string[]): Promise<number> {
  const started = performance.now();
  const options = await resolveSession(parseCoverageOptions(args));
  const { run, read, inputs, inputPaths } = await readRun(options);
  const written = await writeExports(options.out, { run, read, inputs, tableText: fileText(options.input as string) }, inputPaths);
  if (!options.quiet) {
    printSummary({
      rowsRead: read.rowsRead, accepted: read.table.count, rejects: read.rejects, result: run.result, model: run.model, loneOldest: run.loneOldest, within: options.withinFile, written,
      elapsedMs: performance.now() - started,
    });
  }
  return 0;
}
