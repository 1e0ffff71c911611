import { createHash } from 'node:crypto';
import { stat } from 'node:fs/promises';
import { fixedPolygonsOf, runAnalysis, type Run, type SessionInputs } from '../run';
import type { RotationModel } from '../rotation';
import type { OccurrenceReadResult } from '../table';
import { findChartInterval } from '../time';
import type { CoverageOptions } from './coverage-options';
import { sessionInput } from './coverage-session';
import { fileDigest } from './file-digest';
import { progressReporter } from './progress';
import { readGeoJsonFile } from './read-geojson-file';
import { readRotationFile } from './read-rotation-file';
import { readBinsFile, readTableFile } from './read-table-file';

/** A run read from the files the options name, with what the session and the summary record of them. */
export interface ReadRun {
  readonly run: Run;
  readonly read: OccurrenceReadResult;
  readonly model: RotationModel | undefined;
  readonly inputs: SessionInputs;
  /** The input paths, never to be written over. */
  readonly inputPaths: readonly string[];
}

/** Reads the table (hashing it on the way), the bins, the rotation model and the fixed region, and runs the analysis;
 * the session records every input the options name (gaps' area and indicators too). */
export async function readRun(options: CoverageOptions): Promise<ReadRun> {
  const { settings, binsFile, rotation: rotationFile, withinFile, out: outFolder } = options;
  const input = options.input as string;

  const bins = binsFile === undefined ? undefined : await readBinsFile(binsFile);
  const model = rotationFile === undefined ? undefined : await readRotationFile(rotationFile, settings.beyondModel);
  const within = withinFile === undefined ? undefined : fixedPolygonsOf(await readGeoJsonFile(withinFile), withinFile);

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

  const run = runAnalysis(read.table, settings, { bins, model, within });
  const recorded = async <K extends string>(key: K, path: string | undefined) =>
    (path === undefined ? {} : ({ [key]: sessionInput(path, await fileDigest(path), outFolder) } as Record<K, SessionInputs['occurrences']>));
  const inputs: SessionInputs = {
    occurrences: sessionInput(input, digest, outFolder),
    ...(await recorded('bins', binsFile)),
    ...(await recorded('rotation', rotationFile)),
    ...(await recorded('within', withinFile)),
    ...(await recorded('area', options.areaFile)),
    ...(await recorded('indicators', options.indicators)),
  };
  const inputPaths = [input, binsFile, rotationFile, withinFile, options.areaFile, options.indicators].filter((p): p is string => p !== undefined);
  return { run, read, model, inputs, inputPaths };
}

/** Size in bytes, or 0 when the file cannot be read (the reader then says why). */
export function fileSize(path: string): Promise<number> {
  return stat(path).then((s) => s.size, () => 0);
}
