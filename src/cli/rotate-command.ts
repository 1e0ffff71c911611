import { stat } from 'node:fs/promises';
import type { RotationModel } from '../rotation';
import { binsText } from '../run';
import { parseBinsOption } from '../time';
import type { TimeScale } from '../time/time-scale';
import { readRotationFile } from './read-rotation-file';
import { readBinsFile } from './read-table-file';
import { ROTATE_INPUT, parseRotateOptions, type RotateOptions } from './rotate-options';
import { rotateGeoJson } from './rotate-geojson';
import { rotateTable } from './rotate-table';

/** What both kinds of input need besides the options. */
export interface RotateContext {
  readonly options: RotateOptions;
  readonly model: RotationModel;
  /** The slices for an oldest age (equal bins reach back to it; chart ranks and bin files ignore it). */
  readonly scaleFor: (oldestMa: number) => TimeScale;
  /** Every file read, which no output may replace. */
  readonly inputs: readonly string[];
  readonly started: number;
}

/** `driftgrid rotate`: a table or base polygons carried back to each slice's age. */
export async function runRotate(args: readonly string[]): Promise<number> {
  const started = performance.now();
  const options = parseRotateOptions(args);
  await stat(options.input).catch((error: unknown) => {
    throw new Error(`${options.input}: cannot read it: ${error instanceof Error ? error.message : String(error)}`);
  });
  const { binsFile, settings } = options;
  const userScale = binsFile === undefined ? undefined : await readBinsFile(binsFile);
  const model = await readRotationFile(options.rotation, settings.beyondModel);
  const context: RotateContext = {
    options,
    model,
    scaleFor: (oldestMa) => userScale ?? parseBinsOption(binsText(settings.bins), oldestMa),
    inputs: [options.input, options.rotation, ...(binsFile === undefined ? [] : [binsFile])],
    started,
  };
  if (options.kind === ROTATE_INPUT.geojson) await rotateGeoJson(context);
  else await rotateTable(context);
  return 0;
}
