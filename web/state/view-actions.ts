/** How the analysis is shown: measure, map view, layers, curves, the focused cell. None of these recompute. */
import type { Measure } from '../protocol';
import type { ActionContext } from './action-context';
import type { CurveSeries } from './app-state';
import type { LayerVisibility, MapView } from './view-options';
import { expectAnswer } from './worker-client';

export class ViewActions {
  constructor(private readonly context: ActionContext) {}

  setMeasure(measure: Measure): void {
    this.context.store.update({ measure });
    this.context.syncUrl();
  }

  setMapView(mapView: MapView): void {
    this.context.store.update({ mapView });
    this.context.syncUrl();
  }

  setLayers(layers: LayerVisibility): void {
    this.context.store.update({ layers });
    this.context.syncUrl();
  }

  setShowAllPoints(showAllPoints: boolean): void {
    this.context.store.update({ showAllPoints });
  }

  setCurves(curveSeries: readonly CurveSeries[], normaliseCurves: boolean): void {
    this.context.store.update({ curveSeries, normaliseCurves });
    this.context.syncUrl();
  }

  webglUnavailable(): void {
    const { state, store } = this.context;
    if (!state.webgl) return;
    const mapView = state.mapView === 'globe' || state.mapView === 'flat' ? 'equal-earth' : state.mapView;
    store.update({ webgl: false, mapView });
  }

  /** Shows one cell's counts at once, and its taxa when the worker has listed them. */
  async focusCell(focus: { slice: number; entry: number } | null): Promise<void> {
    const { store, client } = this.context;
    const view = this.context.state.view;
    if (focus === null || view === undefined) {
      store.update({ cell: undefined });
      return;
    }
    store.update({ cell: focus });
    const cell = view.cells.cell[focus.entry];
    const answer = expectAnswer(await client.send({ type: 'cell-taxa', slice: focus.slice, cell }).answer, 'cell-taxa');
    const current = this.context.state.cell;
    if (current?.entry === focus.entry && current.slice === focus.slice) store.update({ cell: { ...focus, taxa: answer.taxa } });
  }

  clearProblem(): void {
    this.context.store.update({ problem: undefined });
  }
}
