/** Rows the reader refused, with the reason for each; the full list (and rows left out of every slice) downloads as rejects.csv. */
import { css, html, nothing } from 'lit';
import { panelStyles } from './shared-styles';
import { WorkbenchPanel } from './workbench-panel';

/** Rows shown in the page; the download has all of them. */
const SHOWN_ROWS = 200;

export class DgRejectsPanel extends WorkbenchPanel {

  static override styles = [panelStyles, css`
    .scroll { max-height: 16rem; overflow: auto; }
    td.reason { min-width: 14rem; }
    td.original { font-family: ui-monospace, monospace; white-space: pre; }
  `];

  override render() {
    const table = this.state?.table;
    if (table === undefined) return nothing;
    const rejects = table.rejects;
    const excluded = this.state?.view?.excluded ?? 0;
    return html`
      <details ?open=${rejects.length > 0 && rejects.length <= 20}>
        <summary><span data-field="rejected-count">${rejects.length.toLocaleString('en')}</span> ${rejects.length === 1 ? 'row' : 'rows'} rejected on reading;
          ${excluded.toLocaleString('en')} accepted ${excluded === 1 ? 'row' : 'rows'} in no slice</summary>
        <p class="hint">Nothing is dropped silently: every row is either in a slice or listed in rejects.csv with the reason.
          <button @click=${() => void this.actions?.exportFile('rejects.csv')}>Download rejects.csv</button></p>
        ${rejects.length === 0 ? nothing : html`
          <div class="scroll">
            <table aria-label="Rejected rows">
              <thead><tr><th scope="col">Line</th><th scope="col">Field</th><th scope="col">Reason</th><th scope="col">Original row</th></tr></thead>
              <tbody>${rejects.slice(0, SHOWN_ROWS).map((r) => html`<tr><td>${r.line}</td><td>${r.field}</td><td class="reason">${r.reason}</td><td class="original">${r.original}</td></tr>`)}</tbody>
            </table>
          </div>
          ${rejects.length > SHOWN_ROWS ? html`<p class="hint">First ${SHOWN_ROWS} shown; the download lists all ${rejects.length.toLocaleString('en')}.</p>` : nothing}`}
      </details>`;
  }
}

customElements.define('dg-rejects-panel', DgRejectsPanel);
declare global { interface HTMLElementTagNameMap { 'dg-rejects-panel': DgRejectsPanel } }
