import { areaPolygonsOf, GAPS_EXPORT_FILES, runGaps } from '../run';
import { findChartInterval } from '../time';
import { resolveSession } from './coverage-session';
import { parseGapsOptions } from './gaps-options';
import { readRun } from './read-run';
import { readGeoJsonFile } from './read-geojson-file';
import { fileText, readTableFile } from './read-table-file';
import { printSummary } from './summary';
import { writeExports } from './write-results';

/** The column an indicator table names its kind in: read where an occurrence table has its taxon. */
export const INDICATOR_KIND_COLUMN = 'kind';

/** `driftgrid gaps`: the run of coverage, then per slice the unsampled part of the available area and the latitude belts. */
export async function runGapsCommand(args: readonly string[]): Promise<number> {
  const started = performance.now();
  const options = await resolveSession(parseGapsOptions(args));
  const { run, read, inputs, inputPaths } = await readRun(options);
  const input = options.input as string;
  const { areaFile, indicators: indicatorsFile } = options;
  const area = areaFile === undefined ? undefined : areaPolygonsOf(await readGeoJsonFile(areaFile), areaFile);
  // The same reader as occurrences, with the kind in the taxon's place.
  const indicators = indicatorsFile === undefined ? undefined : await readTableFile(indicatorsFile, {
    mapping: { taxon: INDICATOR_KIND_COLUMN }, resolveInterval: findChartInterval,
  }).catch((error: unknown) => {
    throw new Error(`${indicatorsFile}: ${error instanceof Error ? error.message : String(error)}`);
  });
  if (indicators !== undefined && indicators.rejects.length > 0) {
    // An indicator table has no rejects file: a row that cannot be read stops the run rather than vanish.
    const listed = indicators.rejects.slice(0, 5).map((r) => `line ${r.line}, ${r.field === 'taxon' ? INDICATOR_KIND_COLUMN : r.field}: ${r.reason.replaceAll('taxon', INDICATOR_KIND_COLUMN)}`);
    throw new Error(`${indicatorsFile}: ${indicators.rejects.length} row(s) cannot be used:\n  ${listed.join('\n  ')}`);
  }
  const gaps = runGaps(run, {
    area, areaSource: areaFile, indicators: indicators?.table,
    indicatorsRead: indicators === undefined ? undefined : { rowsRead: indicators.rowsRead, rejectedOnReading: indicators.rejects.length },
  });
  const written = await writeExports(options.out, { run, read, inputs, tableText: fileText(input), gaps }, inputPaths, GAPS_EXPORT_FILES);
  if (!options.quiet) {
    printSummary({
      rowsRead: read.rowsRead, accepted: read.table.count, rejects: read.rejects, result: run.result, model: run.model, loneOldest: run.loneOldest, within: options.withinFile, written,
      elapsedMs: performance.now() - started,
    });
  }
  return 0;
}
