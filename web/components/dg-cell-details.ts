/** The cell under the pointer (or tapped): its counts and, once listed, its taxa. */
import { LitElement, css, html, nothing } from 'lit';
import type { AnalysisView } from '../protocol';
import type { CellFocus } from '../state/app-state';
import { panelStyles } from './shared-styles';

/** Taxa listed before "and N more". */
const LISTED_TAXA = 60;

export class DgCellDetails extends LitElement {
  static override properties = { view: { attribute: false }, cellFocus: { attribute: false } };
  declare view: AnalysisView | undefined;
  declare cellFocus: CellFocus | undefined;

  constructor() {
    super();
    this.view = undefined;
    this.cellFocus = undefined;
  }

  static override styles = [panelStyles, css`
    ul { columns: 2; margin: 0.3rem 0 0; padding-left: 1rem; font-size: 0.85em; font-style: italic; }
  `];

  override render() {
    const { view, cellFocus: focus } = this;
    if (view === undefined || focus === undefined) return html`<p class="hint">Point at or tap an occupied cell to see its counts and taxa.</p>`;
    const k = focus.entry;
    const shape = view.cells.shape[k];
    const lon = view.shapes.centre[2 * shape], lat = view.shapes.centre[2 * shape + 1];
    const taxa = focus.taxa;
    return html`
      <h2>Cell ${view.cells.cell[k]} <span class="hint">(${view.gridName}, centre ${lat.toFixed(1)}°, ${lon.toFixed(1)}°)</span></h2>
      <p data-field="cell-counts">${view.cells.occurrences[k]} occurrences · ${view.cells.collections[k]} ${view.collectionsArePositions ? 'places' : 'collections'} · ${view.cells.taxa[k]} taxa</p>
      ${taxa === undefined ? html`<p class="hint">Listing taxa…</p>` : html`
        <ul aria-label="Taxa in this cell">${taxa.slice(0, LISTED_TAXA).map((t) => html`<li>${t}</li>`)}</ul>
        ${taxa.length > LISTED_TAXA ? html`<p class="hint">and ${taxa.length - LISTED_TAXA} more</p>` : nothing}`}`;
  }
}

customElements.define('dg-cell-details', DgCellDetails);
declare global { interface HTMLElementTagNameMap { 'dg-cell-details': DgCellDetails } }
