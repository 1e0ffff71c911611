/**
 * What the user can do, as actions on the store: each asks the worker where numbers are needed
 * and then updates the state in one step. Components call these; they never talk to the worker.
 * The work is done by one object per job (import, settings and session, time, view); this is
 * the one entry point the components hold.
 */
import type { RunSettings } from '../../src/run';
import type { ExportFile, ExtraRole, Measure } from '../protocol';
import { ActionContext } from './action-context';
import type { AppState, CurveSeries } from './app-state';
import { ImportActions } from './import-actions';
import { SessionActions } from './session-actions';
import { SliceNavigation } from './slice-navigation';
import type { Store } from './store';
import { ViewActions } from './view-actions';
import type { LayerVisibility, MapView } from './view-options';
import type { WorkerClient } from './worker-client';

export class WorkbenchActions {
  private readonly imports: ImportActions;
  private readonly session: SessionActions;
  private readonly time: SliceNavigation;
  private readonly view: ViewActions;

  constructor(store: Store<AppState>, client: WorkerClient) {
    const context = new ActionContext(store, client);
    this.imports = new ImportActions(context);
    this.session = new SessionActions(context);
    this.time = new SliceNavigation(context);
    this.view = new ViewActions(context);
  }

  start(hash: string): Promise<void> { return this.imports.start(hash); }
  pickTable(file: File): Promise<void> { return this.imports.pickTable(file); }
  confirmImport(mapping: Readonly<Record<string, string>>): Promise<void> { return this.imports.confirmImport(mapping); }
  dismissImport(): void { this.imports.dismissImport(); }
  cancel(): void { this.imports.cancel(); }
  loadExtra(role: ExtraRole, file: File): Promise<void> { return this.imports.loadExtra(role, file); }

  /**
   * A file dropped on the page, by its name: GeoJSON is base polygons, JSON a session file,
   * anything else an occurrence table (which goes through the mapping step).
   */
  async dropFile(file: File): Promise<void> {
    const name = file.name.toLowerCase();
    if (name.endsWith('.geojson')) await this.imports.loadExtra('polygons', file);
    else if (name.endsWith('.json')) await this.session.openSession(file);
    else await this.imports.pickTable(file);
  }

  changeSettings(patch: Partial<RunSettings>): Promise<void> { return this.session.changeSettings(patch); }
  openSession(file: File): Promise<void> { return this.session.openSession(file); }
  exportFile(file: ExportFile): Promise<void> { return this.session.exportFile(file); }

  setSlice(slice: number): void { this.time.setSlice(slice); }
  stepSlice(delta: number): void { this.time.stepSlice(delta); }
  slicesEnd(end: -1 | 1): void { this.time.slicesEnd(end); }
  setWholeScale(wholeScale: boolean): void { this.time.setWholeScale(wholeScale); }

  setMeasure(measure: Measure): void { this.view.setMeasure(measure); }
  setMapView(mapView: MapView): void { this.view.setMapView(mapView); }
  setLayers(layers: LayerVisibility): void { this.view.setLayers(layers); }
  setShowAllPoints(showAllPoints: boolean): void { this.view.setShowAllPoints(showAllPoints); }
  setCurves(curveSeries: readonly CurveSeries[], normaliseCurves: boolean): void { this.view.setCurves(curveSeries, normaliseCurves); }
  webglUnavailable(): void { this.view.webglUnavailable(); }
  focusCell(focus: { slice: number; entry: number } | null): Promise<void> { return this.view.focusCell(focus); }
  clearProblem(): void { this.view.clearProblem(); }
}
