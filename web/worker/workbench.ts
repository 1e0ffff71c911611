/**
 * The worker's state: the loaded inputs, the last analysis, and what can be asked of them
 * (analyse with settings, a cell's taxa, export files). The same run layer the command line uses.
 */
import { placeRows } from '../../src/analysis';
import type { SessionInput } from '../../src/export/session';
import type { PlateFeature } from '../../src/placement';
import { createRotationModel } from '../../src/rotation';
import {
  exportFileBytes, parseRunSettings, runAnalysis, runCurves, runGaps, settingsText, type CurvesRun, type GapsRun, type Run, type RunSettings,
  type SessionInputs,
} from '../../src/run';
import type { AnalysisView, ExportFile, ExtraRole } from '../protocol';
import { buildView, type IndicatorAnalysis } from './build-view';
import type { LoadedExtra, LoadedTable } from './read-inputs';
import { blobText } from './stream-source';

/** Media type of each export file, for the download. */
const MEDIA_TYPES: Readonly<Record<ExportFile, string>> = {
  'slices.csv': 'text/csv', 'cells.csv': 'text/csv', 'cells.geojson': 'application/geo+json', 'rejects.csv': 'text/csv', 'session.json': 'application/json',
  'curves.csv': 'text/csv', 'regions.geojson': 'application/geo+json',
  'gaps.csv': 'text/csv', 'gaps.geojson': 'application/geo+json', 'belts.csv': 'text/csv',
};

export class Workbench {
  private table: LoadedTable | undefined;
  private readonly extras = new Map<ExtraRole, LoadedExtra>();
  private current: Run | undefined;
  /** The richness curves of the current run, computed when first asked for (with its curves settings, or the defaults). */
  private currentCurves: CurvesRun | undefined;
  /** The gaps of the current run, computed when first asked for. */
  private currentGaps: GapsRun | undefined;

  setTable(table: LoadedTable): void {
    this.table = table;
    this.current = undefined;
  }

  setExtra(extra: LoadedExtra): void {
    this.extras.set(extra.summary.role, extra);
    this.current = undefined;
  }

  unsetExtra(role: ExtraRole): void {
    this.extras.delete(role);
    this.current = undefined;
  }

  /** Analyses with the page's settings, checked as a session file's are; the column map is the table's. */
  analyse(requested: RunSettings): { view: AnalysisView; transfer: ArrayBuffer[] } {
    const table = this.requireTable();
    const checked = parseRunSettings(settingsText(requested), { name: 'the analysis request', naming: 'setting' });
    const settings = { ...checked, map: this.explicitMapping() };
    const poles = this.extraInput('rotation');
    const model = poles === undefined ? undefined : createRotationModel(poles.poles, { beyond: settings.beyondModel });
    const run = runAnalysis(table.read.table, settings, { bins: this.extraInput('bins')?.scale, model });
    this.current = run;
    this.currentCurves = undefined;
    this.currentGaps = undefined;
    const polygons = this.extraInput('polygons');
    return buildView({
      settings: checked, scale: run.scale, grid: run.grid, result: run.result, lines: table.read.table.line,
      indicators: this.indicators(run),
      ...(polygons === undefined || model === undefined ? {} : { polygons: { features: polygons.features as readonly PlateFeature[], model } }),
    });
  }

  /** Names of the distinct taxa in one cell of one slice, sorted. */
  cellTaxa(slice: number, cell: number): string[] {
    const { result, grid } = this.requireCurrent();
    const { table } = this.requireTable().read;
    const { order, start } = result.rowsBySlice;
    const codes = new Set<number>();
    for (let k = start[slice]; k < start[slice + 1]; k++) {
      const row = order[k];
      if (grid.cellOf(result.palaeoLat[row], result.palaeoLon[row]) === cell) codes.add(table.taxon.codes[row]);
    }
    return Array.from(codes, (code) => table.taxon.values[code]).sort((a, b) => a.localeCompare(b));
  }

  async exportFile(file: ExportFile): Promise<{ bytes: Uint8Array; mime: string }> {
    const run = this.requireCurrent();
    const table = this.requireTable();
    const curves = file === 'curves.csv' || file === 'regions.geojson' ? this.curves(run) : undefined;
    const gaps = file === 'gaps.csv' || file === 'gaps.geojson' || file === 'belts.csv' ? this.gaps(run) : undefined;
    const source = {
      run, read: table.read, inputs: this.sessionInputs(), tableText: blobText(table.blob),
      ...(curves === undefined ? {} : { curves }), ...(gaps === undefined ? {} : { gaps }),
    };
    return { bytes: await exportFileBytes(source, file), mime: MEDIA_TYPES[file] };
  }

  private curves(run: Run): CurvesRun {
    this.currentCurves ??= runCurves(run, this.requireTable().read.table);
    return this.currentCurves;
  }

  /** The loaded files as a session records them: by name, since the page knows no paths. */
  private sessionInputs(): SessionInputs {
    const table = this.requireTable();
    const input = (name: string, blob: Blob, sha256: string): SessionInput => ({ path: name, sha256, bytes: blob.size });
    const bins = this.extras.get('bins');
    const rotation = this.extras.get('rotation');
    return {
      occurrences: input(table.name, table.blob, table.sha256),
      ...(bins === undefined ? {} : { bins: input(bins.summary.name, bins.blob, bins.sha256) }),
      ...(rotation === undefined ? {} : { rotation: input(rotation.summary.name, rotation.blob, rotation.sha256) }),
    };
  }

  /** The columns the user chose by hand (field → header), as `--map` would give them. */
  private explicitMapping(): Record<string, string> {
    const { columns } = this.requireTable().read;
    const out: Record<string, string> = {};
    for (const [field, how] of Object.entries(columns.how)) {
      if (how === 'explicit') out[field] = columns.header[columns.index[field as keyof typeof columns.index]];
    }
    return out;
  }

  private indicators(run: Run): IndicatorAnalysis | undefined {
    const indicators = this.extraInput('indicators');
    if (indicators === undefined) return undefined;
    const { table } = indicators.read;
    return { placed: placeRows(table, run.core), kinds: table.taxon.values, kindOfRow: table.taxon.codes };
  }

  /** Gaps and belts of the current run through the run layer, as `driftgrid gaps` makes them; the
   * loaded base polygons are the area when the settings name an area file. */
  private gaps(run: Run): GapsRun {
    if (this.currentGaps !== undefined) return this.currentGaps;
    const polygons = this.extras.get('polygons');
    const features = this.extraInput('polygons')?.features as readonly PlateFeature[] | undefined;
    this.currentGaps = runGaps(run, {
      ...(features === undefined ? {} : { area: { kind: 'plates' as const, features }, areaSource: polygons?.summary.name }),
      indicators: this.extraInput('indicators')?.read.table,
    });
    return this.currentGaps;
  }

  private extraInput<R extends ExtraRole>(role: R): Extract<LoadedExtra['input'], { role: R }> | undefined {
    return this.extras.get(role)?.input as Extract<LoadedExtra['input'], { role: R }> | undefined;
  }

  private requireTable(): LoadedTable {
    if (this.table === undefined) throw new Error('no occurrence table is loaded yet');
    return this.table;
  }

  private requireCurrent(): Run {
    if (this.current === undefined) throw new Error('nothing has been analysed yet');
    return this.current;
  }
}
