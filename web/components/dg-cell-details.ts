/** The cell under the pointer (or tapped): its counts and, once listed, its taxa. */
import { LitElement, css, html, nothing } from 'lit';
import type { AnalysisView } from '../protocol';
import type { CellFocus } from '../state/app-state';
import { cellCentre, cellCounts, countWords } from '../text';
import { panelStyles } from './shared-styles';

/** Taxa listed before "and N more". */
const LISTED_TAXA = 60;
/** Cells offered in the keyboard picker, most occurrences first. */
const PICKABLE_CELLS = 300;

export class DgCellDetails extends LitElement {
  static override properties = { view: { attribute: false }, slice: { type: Number }, cellFocus: { attribute: false } };
  declare view: AnalysisView | undefined;
  declare slice: number;
  declare cellFocus: CellFocus | undefined;

  constructor() {
    super();
    this.view = undefined;
    this.slice = 0;
    this.cellFocus = undefined;
  }

  static override styles = [panelStyles, css`
    ul { columns: 2; margin: 0.3rem 0 0; padding-left: 1rem; font-size: 0.85em; font-style: italic; }
  `];

  /** The same as pointing at the cell on a map: for keyboards and screen readers. */
  private renderPicker(view: AnalysisView) {
    const from = view.cells.sliceStart[this.slice], to = view.cells.sliceStart[this.slice + 1];
    if (!(to > from)) return nothing;
    const entries = Array.from({ length: to - from }, (_, k) => from + k)
      .sort((a, b) => view.cells.occurrences[b] - view.cells.occurrences[a]).slice(0, PICKABLE_CELLS);
    const chosen = this.cellFocus?.slice === this.slice ? this.cellFocus.entry : -1;
    return html`<label>Cell <select name="cell" @change=${(e: Event) => {
      const entry = Number((e.target as HTMLSelectElement).value);
      const detail = entry < 0 ? null : { slice: this.slice, entry };
      this.dispatchEvent(new CustomEvent('cell-hover', { detail, bubbles: true, composed: true }));
    }}>
      <option value="-1" ?selected=${chosen < 0}>choose (most occurrences first)</option>
      ${entries.map((k) => html`<option value=${k} ?selected=${k === chosen}>${view.cells.cell[k]}: ${countWords(view.cells.occurrences[k], 'occurrence')}</option>`)}
    </select></label>`;
  }

  override render() {
    const { view, cellFocus: focus } = this;
    if (view === undefined) return nothing;
    return html`${this.renderPicker(view)}${focus === undefined
      ? html`<p class="hint">Point at or tap an occupied cell on the map, or choose one above, to see its counts and taxa.</p>`
      : this.renderCell(view, focus)}`;
  }

  private renderCell(view: AnalysisView, focus: CellFocus) {
    const k = focus.entry;
    const shape = view.cells.shape[k];
    const lon = view.shapes.centre[2 * shape], lat = view.shapes.centre[2 * shape + 1];
    const taxa = focus.taxa;
    return html`
      <h2>Cell ${view.cells.cell[k]} <span class="hint">(${view.gridName}, ${cellCentre(lat, lon)})</span></h2>
      <p data-field="cell-counts">${cellCounts(view, k).join(' · ')}</p>
      ${taxa === undefined ? html`<p class="hint">Listing taxa…</p>` : html`
        <ul aria-label="Taxa in this cell">${taxa.slice(0, LISTED_TAXA).map((t) => html`<li>${t}</li>`)}</ul>
        ${taxa.length > LISTED_TAXA ? html`<p class="hint">and ${taxa.length - LISTED_TAXA} more</p>` : nothing}`}`;
  }
}

customElements.define('dg-cell-details', DgCellDetails);
declare global { interface HTMLElementTagNameMap { 'dg-cell-details': DgCellDetails } }
