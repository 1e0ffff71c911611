/**
 * The time strip: the chosen bins from old (left) to young (right), each as wide as it is long,
 * tinted by chart period, with the current slice marked. A slider for keyboard and screen
 * readers; drag or click to move; a play button steps through the slices.
 */
import { LitElement, css, html, svg, type SVGTemplateResult } from 'lit';
import type { SliceMetrics } from '../../src/analysis';
import { SizeController } from '../controllers';
import type { SliceRange } from '../state/slice-range';
import { ageRange, slicePosition, sliceTitle } from '../text';
import { panelStyles } from './shared-styles';

/** Muted tints for alternating chart periods (ours; labels carry the names, colour only separates). */
const PERIOD_TINTS = ['#d9e4ec', '#e9e1d2', '#dfe8d8', '#e8dbe4', '#d8e6e4', '#ece6d0'];
const PLAY_STEP_MS = 700;
const HEIGHT = 46;
/** Period labels: 10 px text, a generous average glyph width so that no two can touch, and the least gap between them, CSS px. */
const labelWidth = (name: string): number => name.length * 6.5;
const LABEL_GAP = 6;
/** Least width the strip is drawn at, CSS px. */
const MIN_WIDTH = 100;

export class DgTimeStrip extends LitElement {
  static override properties = { slices: { attribute: false }, periods: { attribute: false }, slice: { type: Number }, range: { attribute: false }, wholeScale: { type: Boolean }, playing: { state: true } };
  declare slices: readonly SliceMetrics[];
  declare periods: readonly string[];
  declare slice: number;
  /** The slices shown (see shownSlices). */
  declare range: SliceRange;
  declare wholeScale: boolean;
  declare playing: boolean;
  /** The strip's drawn size in CSS pixels, so that labels are not stretched. */
  private readonly size = new SizeController(this, () => this.renderRoot.querySelector('.strip'), { width: 1000, height: HEIGHT });
  private timer: ReturnType<typeof setInterval> | undefined;
  private dragging = false;

  constructor() {
    super();
    this.slices = [];
    this.periods = [];
    this.slice = 0;
    this.range = { from: 0, to: 0 };
    this.wholeScale = false;
    this.playing = false;
  }

  static override styles = [panelStyles, css`
    /* Wraps rather than squeezing the strip to nothing in a narrow column. */
    .row { display: flex; flex-wrap: wrap; gap: 0.5rem; align-items: center; }
    .strip { flex: 1 1 12rem; min-width: 12rem; height: ${HEIGHT}px; touch-action: none; cursor: pointer; border-radius: 3px; }
    svg { width: 100%; height: 100%; display: block; }
    .current { font-weight: 600; min-width: 16rem; }
    text { font-size: 10px; fill: #3a444d; pointer-events: none; }
  `];

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    this.stop();
  }

  private get span(): { old: number; young: number } {
    const first = this.slices[this.range.from], last = this.slices[this.range.to];
    return first === undefined || last === undefined ? { old: 1, young: 0 } : { old: first.baseMa, young: last.topMa };
  }

  private get shown(): readonly SliceMetrics[] {
    return this.slices.slice(this.range.from, this.range.to + 1);
  }

  private select(slice: number): void {
    const next = Math.min(this.range.to, Math.max(this.range.from, slice));
    if (this.slices.length === 0 || next === this.slice) return;
    this.dispatchEvent(new CustomEvent('slice-select', { detail: { slice: next }, bubbles: true, composed: true }));
  }

  /** The slice under a pointer's x, or the nearest one where bins leave gaps. */
  private sliceAt(event: PointerEvent): number {
    const box = (event.currentTarget as HTMLElement).getBoundingClientRect();
    const { old, young } = this.span;
    const age = old - ((event.clientX - box.left) / box.width) * (old - young);
    let best = this.range.from, gap = Infinity;
    this.shown.forEach((s, k) => {
      const d = age > s.baseMa ? age - s.baseMa : age < s.topMa ? s.topMa - age : 0;
      if (d < gap) { gap = d; best = this.range.from + k; }
    });
    return best;
  }

  private onKey(event: KeyboardEvent): void {
    const moves: Record<string, number> = { ArrowLeft: -1, ArrowDown: -1, ArrowRight: 1, ArrowUp: 1, PageDown: -5, PageUp: 5 };
    if (event.key === 'Home') this.select(this.range.from);
    else if (event.key === 'End') this.select(this.range.to);
    else if (event.key in moves) this.select(this.slice + moves[event.key]);
    else return;
    event.preventDefault();
    event.stopPropagation(); // the page's own Left/Right handler would step twice
  }

  private togglePlay(): void {
    if (this.playing) this.stop();
    else {
      if (this.slice >= this.range.to) this.select(this.range.from);
      this.playing = true;
      this.timer = setInterval(() => {
        if (this.slice >= this.range.to) this.stop();
        else this.select(this.slice + 1);
      }, PLAY_STEP_MS);
    }
  }

  private stop(): void {
    clearInterval(this.timer);
    this.timer = undefined;
    this.playing = false;
  }

  override render() {
    const n = this.slices.length;
    const { from } = this.range;
    const current = this.slices[this.slice];
    const { old, young } = this.span;
    const w = Math.max(MIN_WIDTH, this.size.width);
    const x = (ma: number) => ((old - ma) / (old - young || 1)) * w;
    const periodIndex = new Map<string, number>();
    for (const p of this.periods) if (!periodIndex.has(p)) periodIndex.set(p, periodIndex.size);
    const valueText = current === undefined ? 'no slices' : `${sliceTitle(current)}, ${slicePosition(this.slice, this.range, n)}`;
    return html`
      <div class="row">
        <button @click=${this.togglePlay} aria-label=${this.playing ? 'Stop stepping through slices' : 'Play: step through slices'}>${this.playing ? '■ Stop' : '▶ Play'}</button>
        <div class="strip" role="slider" tabindex="0" aria-label="Time slice" aria-valuemin=${from + 1} aria-valuemax=${this.range.to + 1} aria-valuenow=${this.slice + 1}
          aria-valuetext=${valueText} @keydown=${this.onKey}
          @pointerdown=${(e: PointerEvent) => { this.dragging = true; (e.currentTarget as HTMLElement).setPointerCapture(e.pointerId); this.select(this.sliceAt(e)); }}
          @pointermove=${(e: PointerEvent) => { if (this.dragging) this.select(this.sliceAt(e)); }}
          @pointerup=${() => (this.dragging = false)}>
          <svg viewBox="0 0 ${w} ${HEIGHT}" aria-hidden="true">
            ${this.shown.map((s, k) => svg`<rect x=${x(s.baseMa)} y="14" width=${Math.max(0.5, x(s.topMa) - x(s.baseMa))} height=${HEIGHT - 14}
              fill=${PERIOD_TINTS[(periodIndex.get(this.periods[from + k]) ?? 0) % PERIOD_TINTS.length]} stroke="#ffffff" stroke-width="0.6"></rect>`)}
            ${this.periodLabels(x)}
            ${current === undefined ? null : svg`<rect x=${x(current.baseMa) - 1} y="12" width=${Math.max(3, x(current.topMa) - x(current.baseMa)) + 2} height=${HEIGHT - 12}
              fill="none" stroke="#0b2a45" stroke-width="2.5" vector-effect="non-scaling-stroke"></rect>`}
          </svg>
        </div>
        <span class="current" aria-live="polite">${current === undefined ? '' : html`${current.name} <span class="hint">${ageRange(current)}</span>`}</span>
        <label class="hint"><input type="checkbox" name="whole-scale" .checked=${this.wholeScale} @change=${(e: Event) => this.dispatchEvent(new CustomEvent('whole-scale',
          { detail: { wholeScale: (e.target as HTMLInputElement).checked }, bubbles: true, composed: true }))}> whole scale</label>
      </div>`;
  }

  /** One label per run of slices in the same period, above the strip. */
  private periodLabels(x: (ma: number) => number) {
    const labels: SVGTemplateResult[] = [];
    if (this.slices.length === 0) return labels;
    let clearFrom = 0;
    for (let k = this.range.from; k <= this.range.to;) {
      let end = k;
      while (end + 1 <= this.range.to && this.periods[end + 1] === this.periods[k]) end++;
      const from = x(this.slices[k].baseMa), to = x(this.slices[end].topMa);
      const name = this.periods[k], centre = (from + to) / 2, half = labelWidth(name) / 2;
      // Only where the name fits over its own period and clear of the label before it.
      if (name !== '' && to - from >= 2 * half && centre - half >= clearFrom) {
        labels.push(svg`<text x=${centre} y="10" text-anchor="middle">${name}</text>`);
        clearFrom = centre + half + LABEL_GAP;
      }
      k = end + 1;
    }
    return labels;
  }
}

customElements.define('dg-time-strip', DgTimeStrip);
declare global { interface HTMLElementTagNameMap { 'dg-time-strip': DgTimeStrip } }
