import { analyse, type AnalysisResult, type AnalysisSettings } from '../analysis';
import type { SphericalPolygons } from '../gaps';
import type { EqualAreaGrid } from '../grid';
import type { RotationModel } from '../rotation';
import { loneOldestRow, oldestAge, type LoneOldestRow, type OccurrenceTable } from '../table';
import { parseBinsOption, type TimeScale } from '../time';
import { assignRuleOf } from './assign-choice';
import { binsText } from './bins-choice';
import { gridOf } from './grid-choice';
import type { RunSettings } from './run-settings';

/** The optional inputs a run reads besides the occurrence table. */
export interface RunInputs {
  /** The user's own bins (needed when settings.bins is `file`). */
  readonly bins?: TimeScale;
  /** The rotation model, built with settings.beyondModel. */
  readonly model?: RotationModel;
  /** The fixed region (needed when settings.within is true). */
  readonly within?: SphericalPolygons;
}

/** One analysis with what it was made from: enough to write every export file. */
export interface Run {
  readonly settings: RunSettings;
  readonly scale: TimeScale;
  readonly grid: EqualAreaGrid;
  readonly model: RotationModel | undefined;
  /** The core's settings, for analysing another table in the same frame (indicators). */
  readonly core: AnalysisSettings;
  readonly result: AnalysisResult;
  /** Under equal bins, the row that alone stretches them far back, if any (see loneOldestRow). */
  readonly loneOldest: LoneOldestRow | undefined;
}

/** Settings → the core's frame → the analysis. Equal bins reach back to the oldest age in the table. */
export function runAnalysis(table: OccurrenceTable, settings: RunSettings, inputs: RunInputs): Run {
  const scale = scaleOf(settings, table, inputs.bins);
  const grid = gridOf(settings.grid);
  const { model } = inputs;
  if (settings.within && inputs.within === undefined) throw new Error('a fixed region is set but no region is loaded; load a GeoJSON file or clear the region');
  const core: AnalysisSettings = {
    scale, grid, rule: assignRuleOf(settings.assign, settings.seed), rotation: model,
    placement: { rotateAt: settings.rotateAt, preferModel: settings.preferModel },
    ...(settings.within ? { within: inputs.within } : {}),
  };
  const loneOldest = settings.bins.kind === 'equal' ? loneOldestRow(table, settings.bins.widthMyr) : undefined;
  return { settings, scale, grid, model, core, result: analyse(table, core), loneOldest };
}

function scaleOf(settings: RunSettings, table: OccurrenceTable, bins: TimeScale | undefined): TimeScale {
  if (settings.bins.kind !== 'file') return parseBinsOption(binsText(settings.bins), oldestAge(table));
  if (bins === undefined) throw new Error('the time bins are set to "own bins" but no bins table is loaded; load one or choose chart bins');
  return bins;
}
