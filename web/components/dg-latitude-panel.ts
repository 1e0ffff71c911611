/**
 * Occurrences per palaeolatitude band: the current slice's shares beside the whole range's, as
 * horizontal bars with 90°N at the top, plus the slice's climate-indicator sites per kind.
 * Shares (not counts) so that a small slice and the whole range compare; counts are in the
 * labels and the readout.
 */
import { LitElement, css, html, svg, unsafeCSS } from 'lit';
import { guard } from 'lit/directives/guard.js';
import type { AnalysisView } from '../protocol';
import {
  CHART_FONT, bandReadout, clampSlice, dataIndex, latitudeDescription, latitudeFigure, latitudeLayout, memoLast,
  renderMarks, sliceBandShares, svgToPngBlob, viewIndicatorKinds, type LatitudeLayout,
} from '../charts';
import { RovingFocusController, SizeController } from '../controllers';
import { countWords, sliceTitle } from '../text';

export class DgLatitudePanel extends LitElement {
  static override properties = {
    view: { attribute: false },
    slice: { type: Number },
    pointed: { state: true },
  };

  declare view: AnalysisView | undefined;
  declare slice: number;
  /** Band under the pointer. */
  declare private pointed: number | undefined;
  /** The panel's own width sets the chart's; its height follows from the chart. */
  private readonly size = new SizeController(this, () => this, { width: 360, height: 1 });
  /** Up goes north (bands count from the South Pole); Home and End go to the northernmost and southernmost band. */
  private readonly roving = new RovingFocusController(this, {
    container: () => this.renderRoot.querySelector('.hits'),
    attribute: 'data-band',
    range: () => {
      const bands = this.view?.latitude.bands ?? 0;
      return bands === 0 ? undefined : [0, bands - 1];
    },
    keys: { ArrowUp: 1, ArrowDown: -1, Home: 'high', End: 'low' },
  });

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
    const summary = `${sliceTitle(view.slices[slice])}: ${countWords(total, 'occurrence')} placed. Point at a band for its counts.`;
    return { readouts, summary, description: latitudeDescription(view.latitude, slice, name, kinds) };
  });

  constructor() {
    super();
    this.view = undefined;
    this.slice = 0;
    this.pointed = undefined;
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
    const north = view.latitude.bands - 1;
    const shown = this.pointed ?? this.roving.focused;
    return html`<div class="chart" style="width:${width}px;height:${height}px">
        <svg class="drawing" role="img" aria-label=${text.description} width=${width} height=${height} viewBox="0 0 ${width} ${height}" font-family=${CHART_FONT}>
          ${guard([layout], () => renderMarks(layout.marks))}
        </svg>
        <svg class="hits" role="list" aria-label="Latitude bands (arrow keys move)" width=${width} height=${height}
          @keydown=${this.roving.onKeyDown} @pointerover=${this.onPointer} @pointerleave=${this.onLeave} @focusin=${this.roving.onFocusIn} @focusout=${this.roving.onFocusOut}>
          ${text.readouts.map((readout, b) => svg`<rect role="listitem" data-band=${b} x=${plotLeft} y=${bandTop[b]} width=${plotRight - plotLeft}
            height=${bandBottom[b] - bandTop[b]} tabindex=${this.roving.tabIndex(b, north)} aria-label=${readout}></rect>`)}
        </svg>
      </div>
      <p class="readout">${shown === undefined ? text.summary : text.readouts[shown]}</p>`;
  }

  private readonly onPointer = (event: PointerEvent): void => {
    this.pointed = dataIndex(event, 'data-band');
  };

  private readonly onLeave = (): void => {
    this.pointed = undefined;
  };
}

customElements.define('dg-latitude-panel', DgLatitudePanel);

declare global {
  interface HTMLElementTagNameMap {
    'dg-latitude-panel': DgLatitudePanel;
  }
}
