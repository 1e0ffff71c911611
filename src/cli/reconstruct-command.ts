import { stat } from 'node:fs/promises';
import type { RotationModel } from '../rotation';
import { binsText } from '../run';
import { parseBinsOption } from '../time';
import type { TimeScale } from '../time/time-scale';
import { readRotationFile } from './read-rotation-file';
import { readBinsFile } from './read-table-file';
import { RECONSTRUCT_INPUT, parseReconstructOptions, type ReconstructOptions } from './reconstruct-options';
import { reconstructGeoJson } from './reconstruct-geojson';
import { reconstructTable } from './reconstruct-table';

/** What both kinds of input need besides the options. */
export interface ReconstructContext {
  readonly options: ReconstructOptions;
  readonly model: RotationModel;
  /** The slices for an oldest age (equal bins reach back to it; chart ranks and bin files ignore it). */
  readonly scaleFor: (oldestMa: number) => TimeScale;
  /** Every file read, which no output may replace. */
  readonly inputs: readonly string[];
  readonly started: number;
}

/** `driftgrid reconstruct`: a table or base polygons carried back to each slice's age. */
export async function runReconstruct(args: readonly string[]): Promise<number> {
  const started = performance.now();
  const options = parseReconstructOptions(args);
  await stat(options.input).catch((error: unknown) => {
    throw new Error(`${options.input}: cannot read it: ${error instanceof Error ? error.message : String(error)}`);
  });
  const { binsFile, settings } = options;
  const userScale = binsFile === undefined ? undefined : await readBinsFile(binsFile);
  const model = await readRotationFile(options.rotation, settings.beyondModel);
  const context: ReconstructContext = {
    options,
    model,
    scaleFor: (oldestMa) => userScale ?? parseBinsOption(binsText(settings.bins), oldestMa),
    inputs: [options.input, options.rotation, ...(binsFile === undefined ? [] : [binsFile])],
    started,
  };
  if (options.kind === RECONSTRUCT_INPUT.geojson) await reconstructGeoJson(context);
  else await reconstructTable(context);
  return 0;
}
