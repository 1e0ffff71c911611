/**
 * What the user can do, as actions on the store: each asks the worker where numbers are needed
 * and then updates the state in one step. Components call these; they never talk to the worker.
 */
import { parseSession } from '../../src/export/session';
import { DEMO_EXTRAS, DEMO_TABLE } from '../demo-sources';
import type { ExportFile, ExtraRole, FrameSettings, Measure, Source } from '../protocol';
import type { AppState, CurveSeries } from './app-state';
import { download } from './download';
import { matchingSlice, sliceNamed } from './slice-matching';
import { shownSlices } from './slice-range';
import type { Store } from './store';
import { decodeUrlState, encodeUrlState } from './url-state';
import type { LayerVisibility, MapView } from './view-options';
import { expectAnswer, type ProgressMessage, type WorkerClient } from './worker-client';

export class WorkbenchActions {
  /** Optional inputs that came with the demo: they go when the user brings a table of their own. */
  private readonly demoExtras = new Set<ExtraRole>();

  constructor(private readonly store: Store<AppState>, private readonly client: WorkerClient) {}

  private get state(): AppState {
    return this.store.state;
  }

  /** Restores the address's view, loads the demo scenario and analyses it. */
  async start(hash: string): Promise<void> {
    const { state: fromUrl, ignored } = decodeUrlState(hash);
    this.store.update({
      settings: fromUrl.settings, measure: fromUrl.measure, layers: fromUrl.layers, normaliseCurves: fromUrl.normaliseCurves, wholeScale: fromUrl.wholeScale,
      ...(fromUrl.mapView === undefined ? {} : { mapView: fromUrl.mapView }),
      ...(fromUrl.curveSeries === undefined ? {} : { curveSeries: fromUrl.curveSeries }),
      ...(ignored.length === 0 ? {} : { problem: `Ignored in the page address: ${ignored.join('; ')}.` }),
    });
    this.store.update({ busy: { label: 'Loading the demo scenario…', fraction: undefined } });
    try {
      await this.loadTable(DEMO_TABLE, {});
      for (const extra of DEMO_EXTRAS) {
        await this.loadExtraSource(extra.role, extra.source);
        this.demoExtras.add(extra.role);
      }
      await this.analyse(fromUrl.settings, fromUrl.sliceName).catch(async (error: unknown) => {
        // Settings from an old or edited address may not apply: say so and fall back.
        this.store.update({ problem: `${errorText(error)} The default settings are used instead.` });
        await this.analyse({ ...this.state.settings, bins: 'stages', assign: 'midpoint', grid: 'healpix:32' });
      });
      this.store.update({ phase: 'ready', busy: undefined });
    } catch (error) {
      this.store.update({ phase: 'error', busy: undefined, problem: errorText(error) });
    }
  }

  /** First step of an import: show the picked table's columns and first rows. */
  async pickTable(file: File): Promise<void> {
    await this.run(`Reading the first rows of ${file.name}…`, async () => {
      const answer = expectAnswer(await this.client.send({ type: 'preview', source: { kind: 'file', file } }).answer, 'preview');
      this.store.update({ pendingImport: { file, preview: answer.preview } });
    });
  }

  /**
   * A file dropped on the page, by its name: GeoJSON is base polygons, JSON a session file,
   * anything else an occurrence table (which goes through the mapping step).
   */
  async dropFile(file: File): Promise<void> {
    const name = file.name.toLowerCase();
    if (name.endsWith('.geojson')) await this.loadExtra('polygons', file);
    else if (name.endsWith('.json')) await this.openSession(file);
    else await this.pickTable(file);
  }

  /** Second step: read the whole table with the confirmed columns, then analyse it. */
  async confirmImport(mapping: Readonly<Record<string, string>>): Promise<void> {
    const pending = this.state.pendingImport;
    if (pending === undefined) return;
    const ok = await this.run(`Reading ${pending.file.name}…`, async () => {
      await this.loadTable({ kind: 'file', file: pending.file }, mapping);
      await this.unloadDemoExtras();
      this.store.update({ pendingImport: undefined });
      await this.analyse(this.state.settings);
    });
    if (ok) this.store.update({ phase: 'ready' });
  }

  dismissImport(): void {
    this.store.update({ pendingImport: undefined });
  }

  cancel(): void {
    const id = this.state.busy?.cancelId;
    if (id !== undefined) this.client.cancel(id);
  }

  async loadExtra(role: ExtraRole, file: File): Promise<void> {
    await this.run(`Reading ${file.name}…`, async () => {
      await this.loadExtraSource(role, { kind: 'file', file });
      this.demoExtras.delete(role);
      const settings = role === 'bins' ? { ...this.state.settings, bins: 'file' } : this.state.settings;
      await this.analyse(settings);
    });
  }

  async changeSettings(patch: Partial<FrameSettings>): Promise<void> {
    const settings = { ...this.state.settings, ...patch };
    await this.run('Recomputing…', () => this.analyse(settings));
  }

  /** Moves to a slice, kept within the slices shown. */
  setSlice(slice: number): void {
    const view = this.state.view;
    if (view === undefined || view.slices.length === 0) return;
    const { from, to } = shownSlices(view.slices, this.state.wholeScale);
    const next = Math.min(to, Math.max(from, Math.round(slice)));
    if (next === this.state.slice) return;
    this.store.update({ slice: next, cell: undefined });
    this.syncUrl();
  }

  stepSlice(delta: number): void {
    this.setSlice(this.state.slice + delta);
  }

  /** First (−1) or last (+1) slice shown. */
  slicesEnd(end: -1 | 1): void {
    const view = this.state.view;
    if (view === undefined) return;
    const { from, to } = shownSlices(view.slices, this.state.wholeScale);
    this.setSlice(end < 0 ? from : to);
  }

  setWholeScale(wholeScale: boolean): void {
    this.store.update({ wholeScale });
    this.setSlice(this.state.slice);
    this.syncUrl();
  }

  setMeasure(measure: Measure): void {
    this.store.update({ measure });
    this.syncUrl();
  }

  setMapView(mapView: MapView): void {
    this.store.update({ mapView });
    this.syncUrl();
  }

  setLayers(layers: LayerVisibility): void {
    this.store.update({ layers });
    this.syncUrl();
  }

  setShowAllPoints(showAllPoints: boolean): void {
    this.store.update({ showAllPoints });
  }

  setCurves(curveSeries: readonly CurveSeries[], normaliseCurves: boolean): void {
    this.store.update({ curveSeries, normaliseCurves });
    this.syncUrl();
  }

  webglUnavailable(): void {
    if (!this.state.webgl) return;
    const mapView = this.state.mapView === 'globe' || this.state.mapView === 'flat' ? 'equal-earth' : this.state.mapView;
    this.store.update({ webgl: false, mapView });
  }

  /** Shows one cell's counts at once, and its taxa when the worker has listed them. */
  async focusCell(focus: { slice: number; entry: number } | null): Promise<void> {
    const view = this.state.view;
    if (focus === null || view === undefined) {
      this.store.update({ cell: undefined });
      return;
    }
    this.store.update({ cell: focus });
    const cell = view.cells.cell[focus.entry];
    const answer = expectAnswer(await this.client.send({ type: 'cell-taxa', slice: focus.slice, cell }).answer, 'cell-taxa');
    const current = this.state.cell;
    if (current?.entry === focus.entry && current.slice === focus.slice) this.store.update({ cell: { ...focus, taxa: answer.taxa } });
  }

  async exportFile(file: ExportFile): Promise<void> {
    await this.run(`Writing ${file}…`, async () => {
      const answer = expectAnswer(await this.client.send({ type: 'export', file }).answer, 'export');
      download(answer.bytes, file, answer.mime);
    });
  }

  /** Applies a session file's settings; says so when it was made from other input files. */
  async openSession(file: File): Promise<void> {
    await this.run(`Opening ${file.name}…`, async () => {
      const session = parseSession(await file.text(), file.name);
      const s = session.settings;
      const table = this.state.table;
      const recorded = session.inputs.occurrences;
      const warning = table !== undefined && table.sha256 !== recorded.sha256
        ? `The session ${file.name} was made from ${recorded.path} (${recorded.bytes} bytes, SHA-256 ${recorded.sha256.slice(0, 12)}…), not the loaded table ${table.name}: its settings are applied to the loaded table; load ${recorded.path} to reproduce its numbers.`
        : undefined;
      await this.analyse({
        bins: s.bins, assign: s.assign, seed: s.seed, grid: s.grid,
        rotateAt: s.rotateAt === 'occurrence' ? 'occurrence' : 'slice',
        preferModel: s.preferModel ?? false,
        beyondModel: s.beyondModel === 'clamp' ? 'clamp' : 'reject',
      });
      if (warning !== undefined) this.store.update({ problem: warning });
    });
  }

  clearProblem(): void {
    this.store.update({ problem: undefined });
  }

  private async loadTable(source: Source, mapping: Readonly<Record<string, string>>): Promise<void> {
    const onProgress = (p: ProgressMessage): void => {
      this.store.update({ busy: { label: `Reading ${source.kind === 'file' ? source.file.name : source.name}: ${p.rowsRead.toLocaleString('en')} rows`, fraction: p.totalBytes > 0 ? p.bytesRead / p.totalBytes : undefined, cancelId: p.id } });
    };
    const { answer } = this.client.send({ type: 'load-table', source, mapping }, onProgress);
    const loaded = expectAnswer(await answer, 'table-loaded');
    this.store.update({ table: loaded.summary });
  }

  /** The demo's poles, polygons and indicators do not belong with the user's own table. */
  private async unloadDemoExtras(): Promise<void> {
    const extras = { ...this.state.extras };
    for (const role of this.demoExtras) {
      expectAnswer(await this.client.send({ type: 'unload-extra', role }).answer, 'extra-unloaded');
      delete extras[role];
    }
    this.demoExtras.clear();
    this.store.update({ extras });
  }

  private async loadExtraSource(role: ExtraRole, source: Source): Promise<void> {
    const loaded = expectAnswer(await this.client.send({ type: 'load-extra', role, source }).answer, 'extra-loaded');
    this.store.update({ extras: { ...this.state.extras, [role]: loaded.summary } });
  }

  /** Analyses with new settings and keeps the user's place in time (or goes to `sliceName`). */
  private async analyse(settings: FrameSettings, sliceName?: string): Promise<void> {
    const previous = this.state.view?.slices[this.state.slice];
    const answer = expectAnswer(await this.client.send({ type: 'analyse', settings }).answer, 'analysis');
    const { view } = answer;
    const named = sliceName === undefined ? undefined : sliceNamed(view.slices, sliceName);
    const wanted = named ?? (previous === undefined ? 0 : matchingSlice(view.slices, previous));
    const { from, to } = shownSlices(view.slices, this.state.wholeScale);
    this.store.update({ view, settings, slice: Math.min(to, Math.max(from, wanted)), cell: undefined });
    this.syncUrl();
  }

  /** Runs one piece of work with a busy notice; a failure becomes the problem shown. True when it succeeded. */
  private async run(label: string, work: () => Promise<void>): Promise<boolean> {
    this.store.update({ busy: { label, fraction: undefined }, problem: undefined });
    try {
      await work();
      return true;
    } catch (error) {
      this.store.update({ problem: error instanceof Error && error.name === 'CancelledError' ? 'Import cancelled; the previous table is still loaded.' : errorText(error) });
      return false;
    } finally {
      this.store.update({ busy: undefined });
    }
  }

  private syncUrl(): void {
    const s = this.state;
    const hash = encodeUrlState({
      settings: s.settings, measure: s.measure, sliceName: s.view?.slices[s.slice]?.name, mapView: s.mapView,
      layers: s.layers, curveSeries: s.curveSeries, normaliseCurves: s.normaliseCurves, wholeScale: s.wholeScale,
    });
    history.replaceState(null, '', `#${hash}`);
  }
}

function errorText(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
