/**
 * The current slice's numbers (the same as its row of slices.csv), the cautions the core decides
 * for them (src/footprint/slice-cautions.ts) worded for the page, and the hull lever: the place
 * whose removal shrinks the hull most, with the lines of its rows.
 */
import { LitElement, css, html, nothing } from 'lit';
import type { AnalysisView } from '../protocol';
import { SLICE_CAUTION, sliceCautions, type SliceCaution } from '../../src/footprint';
import type { SliceRange } from '../state/slice-range';
import { positionWords, slicePosition } from '../text';
import { panelStyles } from './shared-styles';

/** Lines of the lever's rows listed by number; the rest are counted. */
const LISTED_LINES = 8;

const number = (v: number, decimals = 0): string =>
  Number.isFinite(v) ? v.toLocaleString('en', { minimumFractionDigits: decimals, maximumFractionDigits: decimals }) : '—';

export class DgSliceSummary extends LitElement {
  static override properties = { view: { attribute: false }, slice: { type: Number }, range: { attribute: false } };
  declare view: AnalysisView | undefined;
  declare slice: number;
  /** The slices the strip shows, which the heading counts in. */
  declare range: SliceRange | undefined;

  constructor() {
    super();
    this.view = undefined;
    this.slice = 0;
    this.range = undefined;
  }

  static override styles = [panelStyles, css`
    dl { display: grid; grid-template-columns: auto auto; gap: 0.1rem 0.8rem; margin: 0; }
    dt { color: #4a5560; }
    dd { margin: 0; text-align: right; font-variant-numeric: tabular-nums; }
    ul { margin: 0.4rem 0 0; padding-left: 1.1rem; font-size: 0.85em; color: #6b3a00; }
  `];

  /** The hull lever (ringed on the maps) and the lines of its rows, when the slice has a hull. */
  private renderLever() {
    const s = this.view?.slices[this.slice];
    if (this.view === undefined || s === undefined || Number.isNaN(s.hullLeverLat)) return nothing;
    const { sliceStart, line } = this.view.leverRows;
    const lines = Array.from(line.subarray(sliceStart[this.slice], sliceStart[this.slice + 1]));
    const listed = lines.slice(0, LISTED_LINES).join(', ') + (lines.length > LISTED_LINES ? ` and ${lines.length - LISTED_LINES} more` : '');
    return html`<p class="hint" data-field="hull_lever">
      Hull lever (ringed on the map): ${positionWords(s.hullLeverLat, s.hullLeverLon)}${lines.length === 0 ? '' : html`, ${lines.length === 1 ? 'line' : 'lines'} <span data-field="hull_lever_lines">${listed}</span>`}
    </p>`;
  }

  override render() {
    const s = this.view?.slices[this.slice];
    if (this.view === undefined || s === undefined) return nothing;
    const collections = this.view.collectionsArePositions ? 'Distinct places' : 'Collections';
    const cautions = sliceCautions(s).map(cautionText);
    return html`
      <h2>${slicePosition(this.slice, this.range ?? { from: 0, to: this.view.slices.length - 1 }, this.view.slices.length)}</h2>
      <p><strong data-field="name">${s.name}</strong> <span class="hint">${s.baseMa}–${s.topMa} Ma</span></p>
      <dl>
        <dt>Occurrences</dt><dd data-field="occurrences">${number(s.occurrences)}</dd>
        <dt>${collections}</dt><dd data-field="collections">${number(s.collections)}</dd>
        <dt>Taxa</dt><dd data-field="taxa">${number(s.taxa)}</dd>
        <dt>Occupied cells</dt><dd data-field="cells">${number(s.cells)}</dd>
        <dt>Hull area (km²)</dt><dd data-field="hull_km2">${number(s.hullKm2)}</dd>
        <dt>Spanning-tree length (km)</dt><dd data-field="mst_km">${number(s.mstKm)}</dd>
        <dt>Latitude span (°)</dt><dd data-field="lat_span">${number(s.latSpan, 1)}</dd>
        <dt>Hull without its lever (km²)</dt><dd data-field="hull_without_km2">${number(s.hullWithoutKm2)}</dd>
        <dt>Span without one place (°)</dt><dd data-field="span_without_deg">${number(s.spanWithoutDeg, 1)}</dd>
      </dl>
      ${this.renderLever()}
      ${cautions.length === 0 ? nothing : html`<ul aria-label="Cautions">${cautions.map((c) => html`<li>${c}</li>`)}</ul>`}`;
  }
}

/** The page's wording of a caution. */
function cautionText(caution: SliceCaution): string {
  switch (caution.code) {
    case SLICE_CAUTION.noOccurrences: return 'No occurrences in this slice.';
    case SLICE_CAUTION.fewPlaces: return `Only ${caution.places} distinct places: every footprint measure is noisy here.`;
    case SLICE_CAUTION.noHull: return `No convex hull: ${caution.reason}.`;
    case SLICE_CAUTION.wideHull: return 'The hull covers much of a hemisphere: a few outlying sites govern its area; compare with cells and spanning-tree length.';
  }
}

customElements.define('dg-slice-summary', DgSliceSummary);
declare global { interface HTMLElementTagNameMap { 'dg-slice-summary': DgSliceSummary } }
