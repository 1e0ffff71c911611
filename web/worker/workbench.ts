/**
 * The worker's state: the loaded inputs, the last analysis, and what can be asked of them
 * (analyse with settings, a cell's taxa, export files). The same core the command line runs.
 */
import { analyse, type AnalysisResult } from '../../src/analysis';
import { cellsCsv } from '../../src/export/cells-csv';
import { cellsGeoJson } from '../../src/export/cells-geojson';
import { rejectsCsv } from '../../src/export/rejects-csv';
import { sessionJson, sessionSummary, SESSION_FORMAT, SESSION_FORMAT_VERSION, type Session, type SessionInput } from '../../src/export/session';
import { slicesCsv } from '../../src/export/slices-csv';
import { parseGridName, type EqualAreaGrid } from '../../src/grid';
import { excludedLines, excludedRows, type PlateFeature } from '../../src/placement';
import { createRotationModel, type PoleTable, type RotationModel } from '../../src/rotation';
import { oldestAge, type OccurrenceReadResult } from '../../src/table';
import { parseAssignRule, parseBinsOption, type TimeScale } from '../../src/time';
import { TOOL_VERSION } from '../../src/cli/version';
import type { AnalysisView, ExportFile, ExtraRole, FrameSettings } from '../protocol';
import { buildView, type IndicatorAnalysis } from './build-view';
import { rawRecords, type LoadedExtra, type LoadedTable } from './read-inputs';

interface Current {
  readonly settings: FrameSettings;
  readonly scale: TimeScale;
  readonly grid: EqualAreaGrid;
  readonly model: RotationModel | undefined;
  readonly result: AnalysisResult;
}

const encoder = new TextEncoder();

export class Workbench {
  private table: LoadedTable | undefined;
  private readonly extras = new Map<ExtraRole, LoadedExtra>();
  private current: Current | undefined;

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

  analyse(settings: FrameSettings): { view: AnalysisView; transfer: ArrayBuffer[] } {
    const table = this.requireTable();
    const scale = this.scaleFor(settings, table.read);
    const grid = parseGridName(settings.grid);
    const rule = parseAssignRule(settings.assign, settings.seed);
    const poles = this.extraInput('rotation');
    const model = poles === undefined ? undefined : createRotationModel(poles.poles, { beyond: settings.beyondModel });
    const core = { scale, rule, grid, rotation: model, placement: { rotateAt: settings.rotateAt, preferModel: settings.preferModel } };
    const result = analyse(table.read.table, core);
    this.current = { settings, scale, grid, model, result };
    const polygons = this.extraInput('polygons');
    return buildView({
      settings, scale, grid, result, lines: table.read.table.line,
      indicators: this.indicators(core),
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
    const { result, grid, model, settings } = this.requireCurrent();
    const table = this.requireTable();
    switch (file) {
      case 'slices.csv':
        return { bytes: encoder.encode(slicesCsv(result.slices)), mime: 'text/csv' };
      case 'cells.csv':
        return { bytes: cellsCsv(result.cells, grid), mime: 'text/csv' };
      case 'cells.geojson':
        return { bytes: cellsGeoJson(result.cells, grid), mime: 'application/geo+json' };
      case 'rejects.csv': {
        const originals = await rawRecords(table.blob, excludedLines(table.read.table, result.exclusions));
        const excluded = excludedRows(table.read.table, result.exclusions, result.placement, model, settings.rotateAt, originals);
        return { bytes: encoder.encode(rejectsCsv([...table.read.rejects, ...excluded])), mime: 'text/csv' };
      }
      case 'session.json':
        return { bytes: encoder.encode(sessionJson(this.session())), mime: 'application/json' };
    }
  }

  private session(): Session {
    const { result, settings } = this.requireCurrent();
    const table = this.requireTable();
    const input = (name: string, blob: Blob, sha256: string): SessionInput => ({ path: name, sha256, bytes: blob.size });
    const bins = this.extras.get('bins');
    const rotation = this.extras.get('rotation');
    return {
      format: SESSION_FORMAT,
      formatVersion: SESSION_FORMAT_VERSION,
      tool: { name: 'driftgrid', version: TOOL_VERSION },
      inputs: {
        occurrences: input(table.name, table.blob, table.sha256),
        ...(settings.bins === 'file' && bins !== undefined ? { bins: input(bins.summary.name, bins.blob, bins.sha256) } : {}),
        ...(rotation === undefined ? {} : { rotation: input(rotation.summary.name, rotation.blob, rotation.sha256) }),
      },
      settings: {
        bins: settings.bins, assign: settings.assign, seed: settings.seed, grid: settings.grid, map: this.explicitMapping(),
        rotateAt: settings.rotateAt, preferModel: settings.preferModel, beyondModel: settings.beyondModel,
      },
      summary: sessionSummary({ rowsRead: table.read.rowsRead, accepted: table.read.table.count, rejectedOnReading: table.read.rejects.length }, result),
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

  private scaleFor(settings: FrameSettings, read: OccurrenceReadResult): TimeScale {
    if (settings.bins !== 'file') return parseBinsOption(settings.bins, oldestAge(read.table));
    const bins = this.extraInput('bins');
    if (bins === undefined) throw new Error('the time bins are set to "own bins" but no bins table is loaded; load one or choose chart bins');
    return bins.scale;
  }

  private indicators(core: Parameters<typeof analyse>[1]): IndicatorAnalysis | undefined {
    const indicators = this.extraInput('indicators');
    if (indicators === undefined) return undefined;
    const { table } = indicators.read;
    return { result: analyse(table, core), kinds: table.taxon.values, kindOfRow: table.taxon.codes };
  }

  private extraInput<R extends ExtraRole>(role: R): Extract<LoadedExtra['input'], { role: R }> | undefined {
    return this.extras.get(role)?.input as Extract<LoadedExtra['input'], { role: R }> | undefined;
  }

  private requireTable(): LoadedTable {
    if (this.table === undefined) throw new Error('no occurrence table is loaded yet');
    return this.table;
  }

  private requireCurrent(): Current {
    if (this.current === undefined) throw new Error('nothing has been analysed yet');
    return this.current;
  }
}
