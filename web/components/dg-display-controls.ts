/** How the slice is shown: measure, map view and layers (changes the picture, not the numbers). */
import { html, nothing } from 'lit';
import { MEASURES, type Measure } from '../protocol';
import { LAYER_LABELS, MAP_VIEW_LABELS, MAP_VIEWS, type LayerVisibility, type MapView } from '../state/view-options';
import { panelStyles } from './shared-styles';
import { WorkbenchPanel } from './workbench-panel';

const MEASURE_LABELS: Readonly<Record<Measure, string>> = { occurrences: 'Occurrences', collections: 'Collections', taxa: 'Taxa' };

export class DgDisplayControls extends WorkbenchPanel {

  static override styles = panelStyles;

  override render() {
    const state = this.state;
    if (state === undefined) return nothing;
    const layerKeys = Object.keys(LAYER_LABELS) as (keyof LayerVisibility)[];
    return html`
      <h2>Display</h2>
      <label>Colour cells by
        <select name="measure" @change=${(e: Event) => this.actions?.setMeasure((e.target as HTMLSelectElement).value as Measure)}>
          ${MEASURES.map((m) => html`<option value=${m} ?selected=${m === state.measure}>${MEASURE_LABELS[m]}</option>`)}
        </select>
      </label>
      <label>Map
        <select name="map-view" @change=${(e: Event) => this.actions?.setMapView((e.target as HTMLSelectElement).value as MapView)}>
          ${MAP_VIEWS.map((v) => html`<option value=${v} ?selected=${v === state.mapView} ?disabled=${!state.webgl && (v === 'globe' || v === 'flat')}>${MAP_VIEW_LABELS[v]}</option>`)}
        </select>
      </label>
      <fieldset>
        <legend>Layers</legend>
        ${layerKeys.map((k) => html`<label><input type="checkbox" name="layer-${k}" .checked=${state.layers[k]}
          @change=${(e: Event) => this.actions?.setLayers({ ...state.layers, [k]: (e.target as HTMLInputElement).checked })}> ${LAYER_LABELS[k]}</label>`)}
        <label><input type="checkbox" name="all-points" .checked=${state.showAllPoints}
          @change=${(e: Event) => this.actions?.setShowAllPoints((e.target as HTMLInputElement).checked)}> All places on the WebGL map, however many</label>
      </fieldset>`;
  }
}

customElements.define('dg-display-controls', DgDisplayControls);
declare global { interface HTMLElementTagNameMap { 'dg-display-controls': DgDisplayControls } }
