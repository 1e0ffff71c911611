import { CURVES_FILES, DEFAULT_CURVES_SETTINGS, runCurves } from '../run';
import { parseCoverageOptions } from './coverage-options';
import { resolveSession } from './coverage-session';
import { curvesLines } from './curves-summary';
import { readRun } from './read-run';
import { fileText } from './read-table-file';
import { printSummary } from './summary';
import { writeExports } from './write-results';

/** `driftgrid curves`: the coverage run, then richness slice by slice, raw and standardised, beside the footprint. */
export async function runCurvesCommand(args: readonly string[]): Promise<number> {
  const started = performance.now();
  const given = await resolveSession(parseCoverageOptions(args, 'curves'));
  // A curves run always records its curves settings, defaults included (a coverage session gives none).
  const options = { ...given, settings: { ...given.settings, curves: given.settings.curves ?? DEFAULT_CURVES_SETTINGS } };
  const { run, read, model, inputs, inputPaths } = await readRun(options);
  const curves = runCurves(run, read.table);
  const written = await writeExports(options.out, { run, read, inputs, tableText: fileText(options.input as string), curves }, inputPaths, CURVES_FILES);
  if (!options.quiet) {
    printSummary({
      rowsRead: read.rowsRead, accepted: read.table.count, rejects: read.rejects, result: run.result, model, loneOldest: run.loneOldest, written,
      elapsedMs: performance.now() - started, details: curvesLines(run.result.slices, curves),
    });
  }
  return 0;
}
