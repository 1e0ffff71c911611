/**
 * Occurrences per palaeolatitude band: the current slice's shares beside the whole range's, as
 * horizontal bars with 90°N at the top, plus the slice's climate-indicator sites per kind.
 * Shares (not counts) so that a small slice and the whole range compare; counts are in the
 * labels and the readout.
 */
import { LitElement, css, html, svg, unsafeCSS, type PropertyValues } from 'lit';
import { guard } from 'lit/directives/guard.js';
import type { AnalysisView } from '../protocol';
import {
  CHART_FONT, SizeController, bandReadout, clampSlice, dataIndex, formatNumber, latitudeDescription, latitudeFigure, latitudeLayout, memoLast,
  renderMarks, sliceBandShares, sliceTitle, svgToPngBlob, viewIndicatorKinds, type LatitudeLayout,
} from '../charts';

export class DgLatitudePanel extends LitElement {
  static override properties = {
    view: { attribute: false },
    slice: { type: Number },
    pointed: { state: true },
    focused: { state: true },
  };

  declare view: AnalysisView | undefined;
  declare slice: number;
  /** Band under the pointer. */
  declare private pointed: number | undefined;
  /** Band with keyboard focus. */
  declare private focused: number | undefined;
  private moveFocus = false;
  /** The panel's own width sets the chart's; its height follows from the chart. */
  private readonly size = new SizeController(this, () => this, 360, 1);

  private readonly layoutOf = memoLast((view: AnalysisView, slice: number, width: number): LatitudeLayout =>
    latitudeLayout({ latitude: view.latitude, slice, sliceName: view.slices[slice].name, kinds: viewIndicatorKinds(view), width }),
  );

  /** Each band's readout (also its accessible name), the readout when no band is pointed at, and the chart's summary. */
  private readonly textOf = memoLast((view: AnalysisView, slice: number) => {
    const name = view.slices[slice].name;
    const kinds = viewIndicatorKinds(view);
    const readouts: string[] = [];
    for (let b = 0; b < view.latitude.bands; b++) readouts.push(bandReadout(view.latitude, slice, name, b, kinds));
    const total = sliceBandShares(view.latitude, slice).total;
    const summary = `${sliceTitle(view.slices[slice])}: ${formatNumber(total)} occurrences placed. Point at a band for its counts.`;
    return { readouts, summary, description: latitudeDescription(view.latitude, slice, name, kinds) };
  });

  constructor() {
    super();
    this.view = undefined;
    this.slice = 0;
    this.pointed = undefined;
    this.focused = undefined;
  }

  static override styles = css`
    :host { display: block; font: 13px/1.4 ${unsafeCSS(CHART_FONT)}; color: rgb(29, 35, 40); }
    .chart { position: relative; }
    .chart svg { display: block; }
    .chart svg.hits { position: absolute; top: 0; left: 0; }
    .hits rect { fill: transparent; outline: none; }
    .hits rect:focus-visible { stroke: rgb(0, 114, 178); stroke-width: 2; }
    .readout { margin: 2px 0 0; min-height: 2.8em; font-variant-numeric: tabular-nums; }
    .empty { color: rgb(90, 98, 106); }
  `;

  /** The chart as a standalone SVG document with title, axes and legend. */
  toSvg(): string {
    return latitudeFigure(this.view, this.slice, this.size.width).text;
  }

  /** The chart as a PNG at twice its size. */
  toPngBlob(): Promise<Blob> {
    const { text, width, height } = latitudeFigure(this.view, this.slice, this.size.width);
    return svgToPngBlob(text, width, height, 2);
  }

  override render() {
    const view = this.view;
    if (view === undefined || view.slices.length === 0 || view.latitude.bands === 0) return html`<p class="empty">No latitudes to chart yet.</p>`;
    const slice = clampSlice(view, this.slice);
    const layout = this.layoutOf(view, slice, this.size.width);
    const text = this.textOf(view, slice);
    const { width, height, plotLeft, plotRight, bandTop, bandBottom } = layout;
    const tabStop = this.focused ?? view.latitude.bands - 1;
    const shown = this.pointed ?? this.focused;
    return html`<div class="chart" style="width:${width}px;height:${height}px">
        <svg class="drawing" role="img" aria-label=${text.description} width=${width} height=${height} viewBox="0 0 ${width} ${height}" font-family=${CHART_FONT}>
          ${guard([layout], () => renderMarks(layout.marks))}
        </svg>
        <svg class="hits" role="list" aria-label="Latitude bands (arrow keys move)" width=${width} height=${height}
          @keydown=${this.onKey} @pointerover=${this.onPointer} @pointerleave=${this.onLeave} @focusin=${this.onFocus} @focusout=${this.onBlur}>
          ${text.readouts.map((readout, b) => svg`<rect role="listitem" data-band=${b} x=${plotLeft} y=${bandTop[b]} width=${plotRight - plotLeft}
            height=${bandBottom[b] - bandTop[b]} tabindex=${b === tabStop ? 0 : -1} aria-label=${readout}></rect>`)}
        </svg>
      </div>
      <p class="readout">${shown === undefined ? text.summary : text.readouts[shown]}</p>`;
  }

  protected override updated(changed: PropertyValues): void {
    if (changed.has('focused') && this.moveFocus && this.focused !== undefined) {
      this.moveFocus = false;
      this.renderRoot.querySelector<SVGRectElement>(`.hits rect[data-band="${this.focused}"]`)?.focus();
    }
  }

  /** Up goes north (bands count from the South Pole); Home and End go to the northernmost and southernmost band. */
  private readonly onKey = (event: KeyboardEvent): void => {
    const from = dataIndex(event, 'data-band');
    const bands = this.view?.latitude.bands ?? 0;
    if (from === undefined || bands === 0) return;
    const to = event.key === 'ArrowUp' ? from + 1 : event.key === 'ArrowDown' ? from - 1 : event.key === 'Home' ? bands - 1 : event.key === 'End' ? 0 : undefined;
    if (to === undefined) return;
    this.moveFocus = true;
    this.focused = Math.min(bands - 1, Math.max(0, to));
    // Handled here, so the app's Home/End (first/last slice) do not act as well.
    event.preventDefault();
    event.stopPropagation();
  };

  private readonly onPointer = (event: PointerEvent): void => {
    this.pointed = dataIndex(event, 'data-band');
  };

  private readonly onLeave = (): void => {
    this.pointed = undefined;
  };

  private readonly onFocus = (event: FocusEvent): void => {
    this.focused = dataIndex(event, 'data-band');
  };

  private readonly onBlur = (event: FocusEvent): void => {
    const next = event.relatedTarget;
    if (!(next instanceof Element && next.closest('.hits') !== null)) this.focused = undefined;
  };
}

customElements.define('dg-latitude-panel', DgLatitudePanel);

declare global {
  interface HTMLElementTagNameMap {
    'dg-latitude-panel': DgLatitudePanel;
  }
}
