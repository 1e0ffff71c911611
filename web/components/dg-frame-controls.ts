/**
 * The frame of the analysis: time bins, assignment rule, grid, and how the rotation model is
 * used. Every change recomputes in the worker; the current slice is kept.
 */
import { css, html, nothing } from 'lit';
import type { AssignChoice, BinsChoice, GridChoice, RunSettings } from '../../src/run';
import { ROTATE_AT } from '../../src/placement';
import { BEYOND_MODEL } from '../../src/rotation';
import type { ChartScaleRank } from '../../src/time';
import { panelStyles } from './shared-styles';
import { WorkbenchPanel } from './workbench-panel';

const CHART_BINS: ReadonlyArray<readonly [ChartScaleRank, string]> = [['stages', 'Chart stages'], ['epochs', 'Chart epochs'], ['periods', 'Chart periods']];
/** First values when the user switches to a kind that takes a number. */
const EQUAL_BINS: BinsChoice = { kind: 'equal', widthMyr: 10 };
const SHARE: AssignChoice = { kind: 'share', fraction: 0.5 };
const BANDS: GridChoice = { kind: 'bands', degrees: 5 };
const HEALPIX: GridChoice = { kind: 'healpix', nside: 32 };
const ASSIGN_KINDS = ['mid-age', 'whole-range', 'draw'] as const;
const NSIDES = [4, 8, 16, 32, 64, 128, 256];

/** The bins choice a select value names. */
function binsChoice(value: string): BinsChoice {
  if (value === 'equal') return EQUAL_BINS;
  const rank = CHART_BINS.find(([r]) => r === value)?.[0];
  return rank === undefined ? { kind: 'file' } : { kind: 'chart', rank };
}

function assignChoice(value: string): AssignChoice {
  const kind = ASSIGN_KINDS.find((k) => k === value);
  return kind === undefined ? SHARE : { kind };
}

export class DgFrameControls extends WorkbenchPanel {

  static override styles = [panelStyles, css`
    .pair { display: flex; gap: 0.4rem; align-items: center; flex-wrap: wrap; }
    input[type='number'] { width: 5rem; }
  `];

  private change(patch: Partial<RunSettings>): void {
    void this.actions?.changeSettings(patch);
  }

  override render() {
    const state = this.state;
    if (state === undefined) return nothing;
    const s = state.settings;
    const { bins, assign, grid } = s;
    const binsKind = bins.kind === 'chart' ? bins.rank : bins.kind;
    const hasModel = state.extras.rotation !== undefined;
    const disabled = state.busy !== undefined;
    return html`
      <h2>Frame</h2>
      <div class="pair">
        <label for="bins">Time bins</label>
        <select id="bins" ?disabled=${disabled} @change=${(e: Event) => this.change({ bins: binsChoice((e.target as HTMLSelectElement).value) })}>
          ${CHART_BINS.map(([value, label]) => html`<option value=${value} ?selected=${binsKind === value}>${label}</option>`)}
          <option value="equal" ?selected=${binsKind === 'equal'}>Equal bins</option>
          <option value="file" ?selected=${binsKind === 'file'} ?disabled=${state.extras.bins === undefined}>Own bins (loaded table)</option>
        </select>
        ${bins.kind !== 'equal' ? nothing : html`<label>width, Myr
          <input type="number" min="0.1" step="any" .value=${String(bins.widthMyr)} @change=${(e: Event) => this.change({ bins: { kind: 'equal', widthMyr: (e.target as HTMLInputElement).valueAsNumber } })}></label>`}
      </div>
      <div class="pair">
        <label for="assign">Assign by</label>
        <select id="assign" ?disabled=${disabled} @change=${(e: Event) => this.change({ assign: assignChoice((e.target as HTMLSelectElement).value) })}>
          <option value="mid-age" ?selected=${assign.kind === 'mid-age'}>Mid-age of the range</option>
          <option value="whole-range" ?selected=${assign.kind === 'whole-range'}>Whole range in one slice</option>
          <option value="share" ?selected=${assign.kind === 'share'}>Largest share of the range, at least…</option>
          <option value="draw" ?selected=${assign.kind === 'draw'}>Age drawn in the range</option>
        </select>
        ${assign.kind !== 'share' ? nothing : html`<label>share
          <input type="number" min="0.01" max="1" step="0.05" .value=${String(assign.fraction)} @change=${(e: Event) => this.change({ assign: { kind: 'share', fraction: (e.target as HTMLInputElement).valueAsNumber } })}></label>`}
        ${assign.kind !== 'draw' ? nothing : html`<label>seed
          <input type="number" min="0" step="1" .value=${String(s.seed)} @change=${(e: Event) => this.change({ seed: Number((e.target as HTMLInputElement).value) })}></label>`}
      </div>
      <div class="pair">
        <label for="grid">Grid</label>
        <select id="grid" ?disabled=${disabled} @change=${(e: Event) => this.change({ grid: (e.target as HTMLSelectElement).value === 'bands' ? BANDS : HEALPIX })}>
          <option value="healpix" ?selected=${grid.kind === 'healpix'}>HEALPix</option>
          <option value="bands" ?selected=${grid.kind === 'bands'}>Equal-area latitude bands</option>
        </select>
        ${grid.kind === 'healpix'
          ? html`<label>nside <select @change=${(e: Event) => this.change({ grid: { kind: 'healpix', nside: Number((e.target as HTMLSelectElement).value) } })}>
              ${NSIDES.map((n) => html`<option value=${n} ?selected=${n === grid.nside}>${n}</option>`)}</select></label>`
          : html`<label>band height, ° <input type="number" min="0.5" max="90" step="any" .value=${String(grid.degrees)}
              @change=${(e: Event) => this.change({ grid: { kind: 'bands', degrees: (e.target as HTMLInputElement).valueAsNumber } })}></label>`}
      </div>
      ${!hasModel ? nothing : html`
        <div class="pair">
          <label for="rotate-at">Rotate rows to</label>
          <select id="rotate-at" @change=${(e: Event) => this.change({ rotateAt: (e.target as HTMLSelectElement).value === ROTATE_AT.occurrence ? ROTATE_AT.occurrence : ROTATE_AT.slice })}>
            <option value="slice" ?selected=${s.rotateAt === 'slice'}>their slice's mid-age</option>
            <option value="occurrence" ?selected=${s.rotateAt === 'occurrence'}>their own mid-age</option>
          </select>
        </div>
        <label><input type="checkbox" .checked=${s.preferModel} @change=${(e: Event) => this.change({ preferModel: (e.target as HTMLInputElement).checked })}>
          Use the model even where the table gives palaeocoordinates</label>
        <div class="pair">
          <label for="beyond">Beyond the model's reach</label>
          <select id="beyond" @change=${(e: Event) => this.change({ beyondModel: (e.target as HTMLSelectElement).value === BEYOND_MODEL.clamp ? BEYOND_MODEL.clamp : BEYOND_MODEL.reject })}>
            <option value="reject" ?selected=${s.beyondModel === 'reject'}>leave the row out</option>
            <option value="clamp" ?selected=${s.beyondModel === 'clamp'}>use the oldest rotation</option>
          </select>
        </div>`}`;
  }
}

customElements.define('dg-frame-controls', DgFrameControls);
declare global { interface HTMLElementTagNameMap { 'dg-frame-controls': DgFrameControls } }
