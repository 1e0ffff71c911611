/**
 * The frame of the analysis: time bins, assignment rule, grid, and how the rotation model is
 * used. Every change recomputes in the worker; the current slice is kept.
 */
import { css, html, nothing } from 'lit';
import type { FrameSettings } from '../protocol';
import { panelStyles } from './shared-styles';
import { WorkbenchPanel } from './workbench-panel';

const CHART_BINS = [['stages', 'Chart stages'], ['epochs', 'Chart epochs'], ['periods', 'Chart periods']] as const;
const NSIDES = [4, 8, 16, 32, 64, 128, 256];

export class DgFrameControls extends WorkbenchPanel {

  static override styles = [panelStyles, css`
    .pair { display: flex; gap: 0.4rem; align-items: center; flex-wrap: wrap; }
    input[type='number'] { width: 5rem; }
  `];

  private change(patch: Partial<FrameSettings>): void {
    void this.actions?.changeSettings(patch);
  }

  override render() {
    const state = this.state;
    if (state === undefined) return nothing;
    const s = state.settings;
    const binsKind = s.bins.startsWith('equal:') ? 'equal' : s.bins;
    const assignKind = s.assign.startsWith('overlap:') ? 'overlap' : s.assign;
    const gridKind = s.grid.startsWith('bands:') ? 'bands' : 'healpix';
    const gridValue = Number(s.grid.split(':')[1]);
    const hasModel = state.extras.rotation !== undefined;
    const disabled = state.busy !== undefined;
    return html`
      <h2>Frame</h2>
      <div class="pair">
        <label for="bins">Time bins</label>
        <select id="bins" ?disabled=${disabled} @change=${(e: Event) => {
          const v = (e.target as HTMLSelectElement).value;
          this.change({ bins: v === 'equal' ? 'equal:10' : v });
        }}>
          ${CHART_BINS.map(([value, label]) => html`<option value=${value} ?selected=${binsKind === value}>${label}</option>`)}
          <option value="equal" ?selected=${binsKind === 'equal'}>Equal bins</option>
          <option value="file" ?selected=${binsKind === 'file'} ?disabled=${state.extras.bins === undefined}>Own bins (loaded table)</option>
        </select>
        ${binsKind !== 'equal' ? nothing : html`<label>width, Myr
          <input type="number" min="0.1" step="any" .value=${s.bins.slice(6)} @change=${(e: Event) => this.change({ bins: `equal:${(e.target as HTMLInputElement).value}` })}></label>`}
      </div>
      <div class="pair">
        <label for="assign">Assign by</label>
        <select id="assign" ?disabled=${disabled} @change=${(e: Event) => {
          const v = (e.target as HTMLSelectElement).value;
          this.change({ assign: v === 'overlap' ? 'overlap:0.5' : v });
        }}>
          <option value="midpoint" ?selected=${assignKind === 'midpoint'}>Mid-age of the range</option>
          <option value="within" ?selected=${assignKind === 'within'}>Range within one slice</option>
          <option value="overlap" ?selected=${assignKind === 'overlap'}>Largest overlap, at least…</option>
          <option value="random" ?selected=${assignKind === 'random'}>Random age in the range</option>
        </select>
        ${assignKind !== 'overlap' ? nothing : html`<label>share
          <input type="number" min="0.01" max="1" step="0.05" .value=${s.assign.slice(8)} @change=${(e: Event) => this.change({ assign: `overlap:${(e.target as HTMLInputElement).value}` })}></label>`}
        ${assignKind !== 'random' ? nothing : html`<label>seed
          <input type="number" min="0" step="1" .value=${String(s.seed)} @change=${(e: Event) => this.change({ seed: Number((e.target as HTMLInputElement).value) })}></label>`}
      </div>
      <div class="pair">
        <label for="grid">Grid</label>
        <select id="grid" ?disabled=${disabled} @change=${(e: Event) => {
          const v = (e.target as HTMLSelectElement).value;
          this.change({ grid: v === 'bands' ? 'bands:5' : 'healpix:32' });
        }}>
          <option value="healpix" ?selected=${gridKind === 'healpix'}>HEALPix</option>
          <option value="bands" ?selected=${gridKind === 'bands'}>Equal-area latitude bands</option>
        </select>
        ${gridKind === 'healpix'
          ? html`<label>nside <select @change=${(e: Event) => this.change({ grid: `healpix:${(e.target as HTMLSelectElement).value}` })}>
              ${NSIDES.map((n) => html`<option value=${n} ?selected=${n === gridValue}>${n}</option>`)}</select></label>`
          : html`<label>band height, ° <input type="number" min="0.5" max="90" step="any" .value=${String(gridValue)}
              @change=${(e: Event) => this.change({ grid: `bands:${(e.target as HTMLInputElement).value}` })}></label>`}
      </div>
      ${!hasModel ? nothing : html`
        <div class="pair">
          <label for="rotate-at">Rotate rows to</label>
          <select id="rotate-at" @change=${(e: Event) => this.change({ rotateAt: (e.target as HTMLSelectElement).value as FrameSettings['rotateAt'] })}>
            <option value="slice" ?selected=${s.rotateAt === 'slice'}>their slice's mid-age</option>
            <option value="occurrence" ?selected=${s.rotateAt === 'occurrence'}>their own mid-age</option>
          </select>
        </div>
        <label><input type="checkbox" .checked=${s.preferModel} @change=${(e: Event) => this.change({ preferModel: (e.target as HTMLInputElement).checked })}>
          Use the model even where the table gives palaeocoordinates</label>
        <div class="pair">
          <label for="beyond">Beyond the model's reach</label>
          <select id="beyond" @change=${(e: Event) => this.change({ beyondModel: (e.target as HTMLSelectElement).value as FrameSettings['beyondModel'] })}>
            <option value="reject" ?selected=${s.beyondModel === 'reject'}>leave the row out</option>
            <option value="clamp" ?selected=${s.beyondModel === 'clamp'}>use the oldest rotation</option>
          </select>
        </div>`}`;
  }
}

customElements.define('dg-frame-controls', DgFrameControls);
declare global { interface HTMLElementTagNameMap { 'dg-frame-controls': DgFrameControls } }
