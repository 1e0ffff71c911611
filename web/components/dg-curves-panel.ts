/**
 * Per-slice measures through time: occurrences, collections, taxa, occupied cells, hull area,
 * spanning-tree length and latitude span, old on the left as on the time strip. One row per
 * series with its own axis, or all series divided by their maxima on one axis. Geometry is
 * computed once per (view, series, normalise, size); a slice change only moves the highlight.
 */
import { LitElement, css, html, svg, unsafeCSS } from 'lit';
import { guard } from 'lit/directives/guard.js';
import type { AnalysisView } from '../protocol';
import type { SliceRange } from '../state/slice-range';
import { rgbCss } from '../colour/layer-colours';
import {
  CHART_FONT, HIGHLIGHT, SERIES, SERIES_KEYS, clampSlice, curvesDescription, curvesFigure, curvesLayout, curvesReadout,
  dataIndex, memoLast, renderMarks, seriesLabel, svgToPngBlob, visibleSeries, type CurvesLayout,
} from '../charts';
import { RovingFocusController, SizeController } from '../controllers';

export class DgCurvesPanel extends LitElement {
  static override properties = {
    view: { attribute: false },
    slice: { type: Number },
    normalise: { type: Boolean },
    series: { attribute: false },
    range: { attribute: false },
    pointed: { state: true },
  };

  declare view: AnalysisView | undefined;
  declare slice: number;
  declare normalise: boolean;
  /** Keys of the visible series (SERIES_KEYS); others are ignored. */
  declare series: readonly string[];
  /** The slices charted (the time strip's); every slice when undefined. */
  declare range: SliceRange | undefined;
  /** Slice under the pointer. */
  declare private pointed: number | undefined;
  /** The scrolling chart area: its size comes from the host, never from the chart inside it (flex-basis 0, overflow auto), so fitting rows to it cannot loop. */
  private readonly size = new SizeController(this, () => this.renderRoot.querySelector('.scroller'), { width: 640, height: 240 });
  /** Arrows and Home/End move the focus between the charted slices (older to the left); Enter or Space selects. */
  private readonly roving = new RovingFocusController(this, {
    container: () => this.renderRoot.querySelector('.hits'),
    attribute: 'data-slice',
    range: () => {
      if (this.view === undefined || this.view.slices.length === 0) return undefined;
      const { from, to } = this.bounds(this.view);
      return [from, to];
    },
    keys: { ArrowLeft: -1, ArrowRight: 1, Home: 'low', End: 'high' },
    onActivate: (slice) => this.select(slice),
  });

  private readonly layoutOf = memoLast((view: AnalysisView, seriesKey: string, normalise: boolean, width: number, height: number, from: number, to: number): CurvesLayout =>
    curvesLayout({ slices: view.slices.slice(from, to + 1), collectionsArePositions: view.collectionsArePositions, series: visibleSeries(seriesKey.split(',')), normalise, width, height }),
  );

  /** Each slice's readout (also its mark's accessible name) and the chart's summary. */
  private readonly textOf = memoLast((view: AnalysisView, seriesKey: string, normalise: boolean) => {
    const series = visibleSeries(seriesKey.split(','));
    return {
      readouts: view.slices.map((s) => curvesReadout(s, series, view.collectionsArePositions)),
      description: curvesDescription(view.slices, series, normalise, view.collectionsArePositions),
    };
  });

  constructor() {
    super();
    this.view = undefined;
    this.slice = 0;
    this.normalise = false;
    this.series = SERIES_KEYS;
    this.range = undefined;
    this.pointed = undefined;
  }

  static override styles = css`
    /* A column: controls, the chart area taking the height left (it scrolls when the rows need more), the readout. */
    :host { display: flex; flex-direction: column; font: 13px/1.4 ${unsafeCSS(CHART_FONT)}; color: rgb(29, 35, 40); }
    fieldset { display: flex; flex-wrap: wrap; gap: 0 12px; align-items: center; border: 0; margin: 0 0 2px; padding: 0; font-size: 12px; }
    legend { float: left; font-weight: 600; margin-right: 8px; padding: 0; }
    label { display: inline-flex; align-items: center; gap: 4px; cursor: pointer; white-space: nowrap; }
    label.normalise { margin-left: auto; }
    .swatch { width: 20px; height: 8px; }
    .scroller { flex: 1 1 0; min-height: 8rem; overflow: auto; }
    .chart { position: relative; }
    .chart svg { display: block; position: absolute; top: 0; left: 0; }
    .chart svg.drawing { position: static; }
    /* The time axis stays in view while the rows scroll. */
    svg.axis { display: block; position: sticky; bottom: 0; background: var(--dg-panel-background, white); }
    .hits rect { fill: transparent; cursor: pointer; outline: none; }
    .hits rect:focus-visible { stroke: rgb(0, 114, 178); stroke-width: 2; }
    .readout { margin: 2px 0 0; min-height: 2.8em; font-variant-numeric: tabular-nums; }
    .empty { color: rgb(90, 98, 106); }
  `;

  /** The chart as a standalone SVG document, with title, axes and legend (no current-slice highlight). */
  toSvg(): string {
    return curvesFigure(this.view, this.series, this.normalise, this.size.width, this.range).text;
  }

  /** The chart as a PNG at twice its size. */
  toPngBlob(): Promise<Blob> {
    const { text, width, height } = curvesFigure(this.view, this.series, this.normalise, this.size.width, this.range);
    return svgToPngBlob(text, width, height, 2);
  }

  override render() {
    const view = this.view;
    const ready = view !== undefined && view.slices.length > 0;
    const text = ready ? this.textOf(view, this.seriesKey(), this.normalise) : undefined;
    return html`${this.renderControls(view)}
      <div class="scroller">${ready && text !== undefined ? this.renderChart(view, text) : html`<p class="empty">No time slices to chart yet.</p>`}</div>
      <p class="readout">${ready && text !== undefined ? text.readouts[this.pointed ?? this.roving.focused ?? clampSlice(view, this.slice)] : ''}</p>`;
  }

  private renderControls(view: AnalysisView | undefined) {
    const visible = new Set(visibleSeries(this.series).map((s) => s.key));
    const positions = view?.collectionsArePositions ?? false;
    return html`<fieldset>
      <legend>Series</legend>
      ${SERIES.map((spec) => html`<label>
        <input type="checkbox" data-key=${spec.key} .checked=${visible.has(spec.key)} @change=${this.onSeriesChange}>
        <svg class="swatch" viewBox="0 0 20 8" aria-hidden="true"><path d="M1,4L19,4" stroke=${rgbCss(spec.colour)} stroke-width="2.5"
          stroke-dasharray=${this.normalise ? spec.dash : ''}></path></svg>
        ${seriesLabel(spec, positions)}
      </label>`)}
      <label class="normalise" title="Divide each series by its largest value, so all share one 0–1 axis"><input type="checkbox"
        .checked=${this.normalise} @change=${this.onNormaliseChange}>normalise (÷ maximum)</label>
    </fieldset>`;
  }

  private renderChart(view: AnalysisView, text: { readonly readouts: readonly string[]; readonly description: string }) {
    const { from, to } = this.bounds(view);
    const layout = this.layoutOf(view, this.seriesKey(), this.normalise, this.size.width, this.size.height, from, to);
    const current = clampSlice(view, this.slice);
    const shown = current - from; // the highlight's column, when the current slice is charted
    const { width, height, plotTop, plotBottom, sliceLeft, sliceRight } = layout;
    const label = `${text.description} Current slice: ${view.slices[current].name}.`;
    return html`<div class="chart" style="width:${width}px;height:${plotBottom}px">
        <svg class="drawing" role="img" aria-label=${label} width=${width} height=${plotBottom} viewBox="0 0 ${width} ${plotBottom}" font-family=${CHART_FONT}>
          ${current < from || current > to ? null : svg`<rect class="highlight" x=${sliceLeft[shown]} y=${plotTop} width=${Math.max(1, sliceRight[shown] - sliceLeft[shown])} height=${plotBottom - plotTop} fill=${HIGHLIGHT}></rect>`}
          ${guard([layout], () => renderMarks(layout.marks))}
        </svg>
        <svg class="hits" role="listbox" aria-label="Time slices (arrow keys move, Enter selects)" aria-orientation="horizontal"
          width=${width} height=${plotBottom} @click=${this.onHitClick} @keydown=${this.roving.onKeyDown} @pointerover=${this.onHitPointer}
          @pointerleave=${this.onHitLeave} @focusin=${this.roving.onFocusIn} @focusout=${this.roving.onFocusOut}>
          ${Array.from(sliceLeft, (left, k) => {
            const s = from + k;
            return svg`<rect role="option" data-slice=${s} x=${left} y=${plotTop} width=${Math.max(1, sliceRight[k] - left)}
            height=${plotBottom - plotTop} tabindex=${this.roving.tabIndex(s, current)} aria-selected=${s === current ? 'true' : 'false'} aria-label=${text.readouts[s]}></rect>`;
          })}
        </svg>
      </div>
      <svg class="axis" aria-hidden="true" width=${width} height=${height - plotBottom} viewBox="0 ${plotBottom} ${width} ${height - plotBottom}" font-family=${CHART_FONT}>
        ${guard([layout], () => renderMarks(layout.axisMarks))}
      </svg>`;
  }

  /** First and last slice charted. */
  private bounds(view: AnalysisView): SliceRange {
    const last = view.slices.length - 1;
    return this.range === undefined ? { from: 0, to: last } : { from: Math.max(0, this.range.from), to: Math.min(last, this.range.to) };
  }

  /** The visible series as one string, so the memos compare by value, not by array identity. */
  private seriesKey(): string {
    return visibleSeries(this.series).map((s) => s.key).join(',');
  }

  private select(slice: number): void {
    this.dispatchEvent(new CustomEvent('slice-select', { detail: { slice }, bubbles: true, composed: true }));
  }

  private readonly onHitClick = (event: MouseEvent): void => {
    const slice = dataIndex(event, 'data-slice');
    if (slice !== undefined) this.select(slice);
  };

  private readonly onHitPointer = (event: PointerEvent): void => {
    this.pointed = dataIndex(event, 'data-slice');
  };

  private readonly onHitLeave = (): void => {
    this.pointed = undefined;
  };

  private readonly onSeriesChange = (): void => {
    const boxes = this.renderRoot.querySelectorAll<HTMLInputElement>('input[data-key]');
    const chosen = new Set(Array.from(boxes).filter((b) => b.checked).map((b) => b.dataset.key));
    this.series = SERIES_KEYS.filter((key) => chosen.has(key));
    this.announce();
  };

  private readonly onNormaliseChange = (event: Event): void => {
    if (event.target instanceof HTMLInputElement) this.normalise = event.target.checked;
    this.announce();
  };

  /** The app keeps these choices (in the address); the panel has already applied them. */
  private announce(): void {
    this.dispatchEvent(new CustomEvent('curves-change', { detail: { series: this.series, normalise: this.normalise }, bubbles: true, composed: true }));
  }
}

customElements.define('dg-curves-panel', DgCurvesPanel);

declare global {
  interface HTMLElementTagNameMap {
    'dg-curves-panel': DgCurvesPanel;
  }
}
