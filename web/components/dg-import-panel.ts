/**
 * Bringing data: the occurrence table (with a mapping step that shows the detected columns and
 * the first rows), the optional inputs, and session files. All names from files are shown as text.
 */
import { css, html, nothing } from 'lit';
import { POLE_TABLE_COLUMNS } from '../../src/rotation';
import { BIN_COLUMNS } from '../../src/time';
import type { ExtraRole } from '../protocol';
import type { AppState } from '../state/app-state';
import { countWords } from '../text';
import { panelStyles } from './shared-styles';
import { WorkbenchPanel } from './workbench-panel';

const EXTRA_INPUTS: ReadonlyArray<{ role: ExtraRole; label: string; accept: string; hint: string }> = [
  { role: 'rotation', label: 'Pole table (rotation model)', accept: '.csv,.tsv,.txt', hint: POLE_TABLE_COLUMNS.join(', ') },
  { role: 'polygons', label: 'Base polygons', accept: '.geojson,.json', hint: 'GeoJSON polygons with a plate_id property' },
  { role: 'indicators', label: 'Climate indicators', accept: '.csv,.tsv,.txt', hint: 'a table like the occurrence table with a kind column' },
  { role: 'bins', label: 'Own time bins', accept: '.csv,.tsv,.txt', hint: BIN_COLUMNS.join(', ') },
];

export class DgImportPanel extends WorkbenchPanel {
  static override properties = { mapping: { state: true } };
  /** The user's column choices in the mapping step: field → header ('' = none). */
  declare mapping: Record<string, string>;
  /** The preview the mapping belongs to. */
  private mappingFor: unknown;

  constructor() {
    super();
    this.mapping = {};
  }

  static override styles = [panelStyles, css`
    /* The mapping step needs the page's width (a real table has dozens of columns): an overlay
       over the whole page, out of the narrow column it is started from. */
    .overlay { position: fixed; inset: 0; z-index: 10; background: rgba(20, 50, 74, 0.35); display: flex; justify-content: center; align-items: start; padding: 3vh 2vw; }
    .mapping { width: min(96vw, 90rem); max-height: 94vh; box-sizing: border-box; display: flex; flex-direction: column; gap: 0.4rem;
      padding: 0.8rem 1rem; border: 1px solid #9aa5b0; border-radius: 6px; background: #fff; box-shadow: 0 6px 24px rgba(0, 0, 0, 0.25); overflow: auto; }
    .mapping p { margin: 0; }
    .mapping h2 { text-transform: none; letter-spacing: normal; font-size: 1rem; color: inherit; } /* a file name is shown as written */
    .fields { display: grid; grid-template-columns: repeat(auto-fill, minmax(9rem, max-content) minmax(11rem, 1fr)); gap: 0.25rem 0.6rem; align-items: center; }
    .fields label { margin: 0; text-align: right; }
    .fields select { width: 100%; }
    /* Every column's first rows, by scrolling both ways; the header stays in view. */
    .scroll { overflow: auto; min-height: 8rem; flex: 1 1 auto; border: 1px solid #dde3e8; }
    .scroll th { position: sticky; top: 0; }
    .scroll td, .scroll th { white-space: nowrap; max-width: 24rem; overflow: hidden; text-overflow: ellipsis; }
    .buttons { display: flex; gap: 0.5rem; align-items: center; }
    input[type='file'] { max-width: 100%; font-size: 0.85em; }
    .loaded { font-size: 0.85em; color: #2b4a2b; overflow-wrap: anywhere; }
  `];

  override willUpdate(): void {
    const preview = this.state?.pendingImport?.preview;
    if (preview !== undefined && preview !== this.mappingFor) {
      this.mappingFor = preview;
      this.mapping = { ...preview.detected };
    }
  }

  private picked(event: Event, use: (file: File) => void): void {
    const input = event.target as HTMLInputElement;
    const file = input.files?.[0];
    if (file !== undefined) use(file);
    input.value = ''; // picking the same file again must work
  }

  private confirm(): void {
    // Only the user's changes are explicit: columns found by name are found again by the reader.
    const detected = this.state?.pendingImport?.preview.detected ?? {};
    const chosen = Object.fromEntries(Object.entries(this.mapping).filter(([field, header]) => header !== '' && detected[field] !== header));
    void this.actions?.confirmImport(chosen);
  }

  override render() {
    const state = this.state;
    if (state === undefined) return nothing;
    const table = state.table;
    return html`
      <h2>Data</h2>
      <p class="hint">Pick a file below or drop it anywhere on the page.</p>
      <label>Occurrence table
        <input type="file" name="occurrences" accept=".csv,.tsv,.txt" @change=${(e: Event) => this.picked(e, (f) => void this.actions?.pickTable(f))}>
      </label>
      ${table === undefined ? nothing : html`<div class="loaded" data-field="table-summary">${table.name}: ${countWords(table.rowsRead, 'row')} read,
        ${table.accepted.toLocaleString('en')} accepted, ${table.rejects.length.toLocaleString('en')} rejected</div>`}
      ${state.pendingImport === undefined ? nothing : this.renderMapping(state.pendingImport)}
      <details>
        <summary>Optional inputs</summary>
        ${EXTRA_INPUTS.map((x) => html`
          <label>${x.label}
            <input type="file" name=${x.role} accept=${x.accept} @change=${(e: Event) => this.picked(e, (f) => void this.actions?.loadExtra(x.role, f))}>
          </label>
          <div class="hint">${x.hint}</div>
          ${state.extras[x.role] === undefined ? nothing : html`<div class="loaded">${state.extras[x.role]?.name}: ${state.extras[x.role]?.description}</div>`}`)}
      </details>
      <label>Open a session file
        <input type="file" name="session" accept=".json" @change=${(e: Event) => this.picked(e, (f) => void this.actions?.openSession(f))}>
      </label>`;
  }

  private renderMapping(pending: NonNullable<AppState['pendingImport']>) {
    const { preview } = pending;
    // Two meanings, two words: before reading, close the step; while reading, stop the reading
    // (the header's Cancel, under this overlay) and keep the previous table.
    const reading = this.state?.busy !== undefined;
    const stoppable = this.state?.busy?.cancelId !== undefined;
    return html`<div class="overlay">
      <section class="mapping" role="dialog" aria-modal="true" aria-labelledby="mapping-title" aria-label="Columns of ${preview.name}">
        <h2 id="mapping-title">Columns of ${preview.name}</h2>
        <p class="hint">Check which column feeds each field. Columns found by their name are read unless you pick another column for that field.</p>
        ${preview.problem === undefined ? nothing : html`<p class="problem" role="alert">${preview.problem}</p>`}
        <div class="fields">
          ${preview.fields.map((field) => html`
            <label for="map-${field}">${field}</label>
            <select id="map-${field}" name="map-${field}" @change=${(e: Event) => (this.mapping = { ...this.mapping, [field]: (e.target as HTMLSelectElement).value })}>
              <option value="" ?selected=${(this.mapping[field] ?? '') === ''}>none</option>
              ${preview.header.map((h) => html`<option value=${h} ?selected=${this.mapping[field] === h}>${h}</option>`)}
            </select>`)}
        </div>
        <p class="hint">First rows, all ${preview.header.length} columns (scroll sideways for more):</p>
        <div class="scroll" tabindex="0" aria-label="First rows of ${preview.name}, scrollable">
          <table aria-label="First rows of ${preview.name}">
            <thead><tr>${preview.header.map((h) => html`<th scope="col" title=${h}>${h}</th>`)}</tr></thead>
            <tbody>${preview.rows.map((row) => html`<tr>${row.map((cell) => html`<td title=${cell}>${cell}</td>`)}</tr>`)}</tbody>
          </table>
        </div>
        <div class="buttons">
          <button @click=${this.confirm} ?disabled=${reading}>Read the table</button>
          ${reading
            ? html`<button @click=${() => this.actions?.cancel()} ?disabled=${!stoppable}>Cancel reading</button>
                <span class="hint" role="status">${this.state?.busy?.label}</span>`
            : html`<button @click=${() => this.actions?.dismissImport()}>Close without reading</button>`}
        </div>
      </section>
    </div>`;
  }
}

customElements.define('dg-import-panel', DgImportPanel);
declare global { interface HTMLElementTagNameMap { 'dg-import-panel': DgImportPanel } }
