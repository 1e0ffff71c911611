/** Exports: the command line's files (written by the worker) and the current figures. */
import { css, html, nothing } from 'lit';
import { EXPORT_FILES, GAPS_FILES, type ExportFile } from '../protocol';
import { panelStyles } from './shared-styles';
import { WorkbenchPanel } from './workbench-panel';

export type Figure = 'map' | 'curves' | 'latitude';
export type FigureFormat = 'svg' | 'png';

/** The coverage files, then the curves' own (computed on request with the run's curves settings, or their defaults). */
const FILES: readonly ExportFile[] = [...EXPORT_FILES, 'curves.csv', 'regions.geojson'];

const FIGURE_LABELS: Readonly<Record<Figure, string>> = { map: 'Map', curves: 'Curves', latitude: 'Latitude panel' };

export class DgExportMenu extends WorkbenchPanel {

  static override styles = [panelStyles, css`
    .buttons { display: flex; flex-wrap: wrap; gap: 0.3rem; margin-bottom: 0.4rem; }
    button { font-size: 0.85em; }
  `];

  private figure(figure: Figure, format: FigureFormat): void {
    this.dispatchEvent(new CustomEvent('figure-export', { detail: { figure, format }, bubbles: true, composed: true }));
  }

  override render() {
    if (this.state?.view === undefined) return nothing;
    const disabled = this.state.busy !== undefined;
    // The WebGL maps draw no vectors to write out; the equal-area views do.
    const noMapSvg = this.state.webgl && (this.state.mapView === 'globe' || this.state.mapView === 'flat');
    return html`
      <h2>Export</h2>
      <div class="buttons" role="group" aria-label="Result files">
        ${FILES.map((file) => html`<button ?disabled=${disabled} data-export=${file} @click=${() => void this.actions?.exportFile(file)}>${file}</button>`)}
      </div>
      <div class="buttons" role="group" aria-label="Sampling gaps and latitude belts">
        ${GAPS_FILES.map((file) => html`<button ?disabled=${disabled} data-export=${file} @click=${() => void this.actions?.exportFile(file)}>${file}</button>`)}
      </div>
      <div class="buttons" role="group" aria-label="Figures of the current slice">
        ${Object.entries(FIGURE_LABELS).map(([figure, label]) => html`
          <button data-figure="${figure}-svg" ?disabled=${figure === 'map' && noMapSvg} aria-describedby=${figure === 'map' && noMapSvg ? 'map-svg-why' : nothing}
            @click=${() => this.figure(figure as Figure, 'svg')}>${label} SVG</button>
          <button data-figure="${figure}-png" @click=${() => this.figure(figure as Figure, 'png')}>${label} PNG</button>`)}
      </div>
      ${noMapSvg ? html`<p class="hint" id="map-svg-why">Map SVG comes from the equal-area views: choose Equal Earth or a polar view under Display. The globe and flat map export as PNG.</p>` : nothing}
      <p class="hint">session.json records the settings and the inputs' SHA-256; open it here or pass it to the command line to repeat the run.</p>`;
  }
}

customElements.define('dg-export-menu', DgExportMenu);
declare global { interface HTMLElementTagNameMap { 'dg-export-menu': DgExportMenu } }
