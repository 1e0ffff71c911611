/**
 * The workbench page: owns the store and the worker, lays out the panels, passes state down as
 * properties and turns the panels' events into actions. Left/Right step slices from anywhere
 * on the page unless a text field has focus; Home/End go to the first/last slice.
 */
import { LitElement, css, html, nothing } from 'lit';
import { createRef, ref, type Ref } from 'lit/directives/ref.js';
import { INITIAL_STATE, type AppState, type CurveSeries } from '../state/app-state';
import { download } from '../state/download';
import { shownSlices } from '../state/slice-range';
import { Store, StoreController } from '../state/store';
import { WorkbenchActions } from '../state/workbench-actions';
import { WorkerClient } from '../state/worker-client';
import type { Figure, FigureFormat } from './dg-export-menu';
import { panelStyles } from './shared-styles';
import './dg-cell-details';
import './dg-curves-panel';
import './dg-display-controls';
import './dg-equal-area-view';
import './dg-export-menu';
import './dg-frame-controls';
import './dg-globe-view';
import './dg-import-panel';
import './dg-latitude-panel';
import './dg-rejects-panel';
import './dg-slice-summary';
import './dg-time-strip';
import type { DgCurvesPanel } from './dg-curves-panel';
import type { DgEqualAreaView } from './dg-equal-area-view';
import type { DgGlobeView } from './dg-globe-view';
import type { DgLatitudePanel } from './dg-latitude-panel';

/** Elements whose own keys (arrows, Home/End) must not move the slice. */
function isTextEntry(target: EventTarget | undefined): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable || target instanceof HTMLTextAreaElement || target instanceof HTMLSelectElement) return true;
  return target instanceof HTMLInputElement && !['checkbox', 'radio', 'button', 'submit', 'reset', 'file', 'range', 'color'].includes(target.type);
}

export class DgApp extends LitElement {
  private readonly store = new Store<AppState>(INITIAL_STATE);
  private readonly controller = new StoreController(this, this.store);
  private readonly worker = new Worker(new URL('../worker/analysis-worker.ts', import.meta.url), { type: 'module' });
  private readonly actions = new WorkbenchActions(this.store, new WorkerClient(this.worker));
  private readonly globe: Ref<DgGlobeView> = createRef();
  private readonly equalArea: Ref<DgEqualAreaView> = createRef();
  private readonly curves: Ref<DgCurvesPanel> = createRef();
  private readonly latitude: Ref<DgLatitudePanel> = createRef();

  private readonly onKey = (event: KeyboardEvent): void => {
    if (event.defaultPrevented || event.altKey || event.ctrlKey || event.metaKey) return;
    if (isTextEntry(event.composedPath()[0])) return;
    if (event.key === 'ArrowLeft') this.actions.stepSlice(-1);
    else if (event.key === 'ArrowRight') this.actions.stepSlice(1);
    else if (event.key === 'Home') this.actions.slicesEnd(-1);
    else if (event.key === 'End') this.actions.slicesEnd(1);
    else return;
    event.preventDefault();
  };

  static override styles = [panelStyles, css`
    :host { display: grid; height: 100vh; grid-template-rows: auto 1fr; }
    header { display: flex; align-items: center; gap: 1rem; padding: 0.4rem 0.8rem; background: #14324a; color: #fff; }
    header h1 { font-size: 1.05rem; margin: 0; font-weight: 600; letter-spacing: 0.02em; }
    header .tagline { color: #cfe0ee; font-size: 0.85em; }
    header .busy { display: flex; align-items: center; gap: 0.5rem; font-size: 0.85em; }
    header progress { width: 12rem; }
    header button { background: #fff; color: #14324a; }
    /* minmax(0, …) columns: a wide table (the rejects' original rows) scrolls in its own box
       instead of widening the column past the window. */
    .layout { display: grid; grid-template-columns: 19rem minmax(0, 1fr) 22rem; min-height: 0; }
    aside, .side { overflow: auto; scrollbar-gutter: stable; padding: 0.6rem 0.8rem; display: flex; flex-direction: column; gap: 0.9rem; background: #fbfcfd; border-right: 1px solid #dde3e8; }
    .side { border-right: none; border-left: 1px solid #dde3e8; }
    main { display: grid; grid-template-columns: minmax(0, 1fr); grid-template-rows: auto auto minmax(max(20rem, 50vh), 1fr) auto auto; min-width: 0; min-height: 0; overflow: auto; }
    main > * { min-width: 0; }
    /* Narrow windows: the page scrolls as a whole, the current slice's panels go below the map. */
    @media (max-width: 1199px) {
      :host { height: auto; min-height: 100vh; }
      .layout { grid-template-columns: 17rem minmax(0, 1fr); }
      /* The page's height is its content's: the map gets a fixed share of the window, not what the left column's length leaves. */
      main { overflow: visible; align-self: start; grid-template-rows: auto auto max(20rem, 55vh) auto auto; }
      .side { grid-column: 1 / -1; display: grid; grid-template-columns: repeat(auto-fit, minmax(16rem, 1fr)); align-items: start; overflow: visible; border-left: none; border-top: 1px solid #dde3e8; }
    }
    /* Fixed rows: the message bar comes and goes without moving the others. */
    .problem-bar { grid-row: 1; } .strip { grid-row: 2; } .map { grid-row: 3; } dg-curves-panel { grid-row: 4; } .below { grid-row: 5; }
    .strip { padding: 0.4rem 0.8rem; border-bottom: 1px solid #dde3e8; background: #fff; }
    .map { position: relative; min-height: 18rem; }
    .map > * { position: absolute; inset: 0; }
    .problem-bar { display: flex; gap: 0.5rem; align-items: start; padding: 0.4rem 0.8rem; background: #fff4e5; border-bottom: 1px solid #e8c28a; }
    .problem-bar p { margin: 0; flex: 1; white-space: pre-wrap; }
    dg-curves-panel { height: 22rem; border-top: 1px solid #dde3e8; }
    .below { padding: 0.4rem 0.8rem; border-top: 1px solid #dde3e8; background: #fff; }
  `];

  private readonly onDragOver = (event: DragEvent): void => {
    if (event.dataTransfer?.types.includes('Files') === true) event.preventDefault(); // allows the drop
  };

  private readonly onDrop = (event: DragEvent): void => {
    const file = event.dataTransfer?.files[0];
    if (file === undefined) return;
    event.preventDefault(); // the browser would otherwise open the file in place of the page
    void this.actions.dropFile(file);
  };

  override connectedCallback(): void {
    super.connectedCallback();
    window.addEventListener('keydown', this.onKey);
    window.addEventListener('dragover', this.onDragOver);
    window.addEventListener('drop', this.onDrop);
    void this.actions.start(location.hash);
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    window.removeEventListener('keydown', this.onKey);
    window.removeEventListener('dragover', this.onDragOver);
    window.removeEventListener('drop', this.onDrop);
    this.worker.terminate();
  }

  override updated(): void {
    // What tests and scripts wait for: loading → ready (or error).
    this.dataset.state = this.controller.state.busy !== undefined && this.controller.state.phase === 'ready' ? 'busy' : this.controller.state.phase;
  }

  private async exportFigure(figure: Figure, format: FigureFormat): Promise<void> {
    const s = this.store.state;
    const name = `${s.view?.slices[s.slice]?.name ?? 'slice'}-${figure}.${format}`.replace(/[^\w.-]+/g, '_');
    const target = figure === 'curves' ? this.curves.value : figure === 'latitude' ? this.latitude.value : this.equalArea.value;
    try {
      if (figure === 'map' && target === undefined) {
        // The WebGL map exports what it shows as PNG; its SVG button is disabled, with the reason.
        if (format === 'png' && this.globe.value !== undefined) download(await this.globe.value.snapshotPng(), name, 'image/png');
        return;
      }
      if (target === undefined) return;
      if (format === 'svg') download(target.toSvg(), name, 'image/svg+xml');
      else download(await target.toPngBlob(), name, 'image/png');
    } catch (error) {
      this.store.update({ problem: `Could not export the ${figure}: ${error instanceof Error ? error.message : String(error)}` });
    }
  }

  override render() {
    const s = this.controller.state;
    const a = this.actions;
    const range = shownSlices(s.view?.slices ?? [], s.wholeScale);
    const webglView = s.webgl && (s.mapView === 'globe' || s.mapView === 'flat');
    return html`
      <header>
        <h1>driftgrid</h1>
        <span class="tagline">fossil occurrences on the palaeoglobe, slice by slice</span>
        ${s.busy === undefined ? nothing : html`
          <span class="busy" role="status">
            ${s.busy.label}
            ${s.busy.fraction === undefined ? html`<progress aria-label="Working"></progress>` : html`<progress max="1" .value=${s.busy.fraction} aria-label="Progress"></progress>`}
            ${s.busy.cancelId === undefined ? nothing : html`<button @click=${() => a.cancel()}>Cancel</button>`}
          </span>`}
      </header>
      <div class="layout" @cell-hover=${(e: CustomEvent<{ slice: number; entry: number } | null>) => void a.focusCell(e.detail)}>
        <aside aria-label="Data and settings">
          <dg-import-panel .state=${s} .actions=${a}></dg-import-panel>
          <dg-frame-controls .state=${s} .actions=${a}></dg-frame-controls>
          <dg-display-controls .state=${s} .actions=${a}></dg-display-controls>
          <dg-export-menu .state=${s} .actions=${a} @figure-export=${(e: CustomEvent<{ figure: Figure; format: FigureFormat }>) => void this.exportFigure(e.detail.figure, e.detail.format)}></dg-export-menu>
        </aside>
        <main @slice-select=${(e: CustomEvent<{ slice: number }>) => a.setSlice(e.detail.slice)}>
          ${s.problem === undefined ? nothing : html`<div class="problem-bar" role="alert"><p>${s.problem}</p><button @click=${() => a.clearProblem()} aria-label="Dismiss message">×</button></div>`}
          <div class="strip"><dg-time-strip .slices=${s.view?.slices ?? []} .periods=${s.view?.periods ?? []} .slice=${s.slice}
            .range=${range} .wholeScale=${s.wholeScale} @whole-scale=${(e: CustomEvent<{ wholeScale: boolean }>) => a.setWholeScale(e.detail.wholeScale)}></dg-time-strip></div>
          <div class="map">
            ${webglView
              ? html`<dg-globe-view ${ref(this.globe)} .view=${s.view} .slice=${s.slice} .measure=${s.measure} .layers=${s.layers}
                  .projection=${s.mapView === 'flat' ? 'flat' : 'globe'} .showAllPoints=${s.showAllPoints} @webgl-unavailable=${() => a.webglUnavailable()}></dg-globe-view>`
              : html`<dg-equal-area-view ${ref(this.equalArea)} .view=${s.view} .slice=${s.slice} .measure=${s.measure} .layers=${s.layers}
                  .projection=${s.mapView === 'globe' || s.mapView === 'flat' ? 'equal-earth' : s.mapView}
                  .notice=${s.webgl ? '' : 'This browser gives no WebGL, so the map is drawn on an equal-area canvas instead of the globe.'}></dg-equal-area-view>`}
          </div>
          <dg-curves-panel ${ref(this.curves)} .view=${s.view} .slice=${s.slice} .range=${range} .series=${s.curveSeries} .normalise=${s.normaliseCurves}
            @curves-change=${(e: CustomEvent<{ series: readonly CurveSeries[]; normalise: boolean }>) => a.setCurves(e.detail.series, e.detail.normalise)}></dg-curves-panel>
          <div class="below"><dg-rejects-panel .state=${s} .actions=${a}></dg-rejects-panel></div>
        </main>
        <div class="side" role="complementary" aria-label="Current slice">
          <dg-slice-summary .view=${s.view} .slice=${s.slice} .range=${range}></dg-slice-summary>
          <dg-latitude-panel ${ref(this.latitude)} .view=${s.view} .slice=${s.slice}></dg-latitude-panel>
          <!-- Last: what it lists changes as the pointer moves, and nothing else may move with it. -->
          <dg-cell-details .view=${s.view} .slice=${s.slice} .cellFocus=${s.cell}></dg-cell-details>
        </div>
      </div>`;
  }
}

customElements.define('dg-app', DgApp);
declare global { interface HTMLElementTagNameMap { 'dg-app': DgApp } }
