/**
 * The equal-area map of one slice, drawn with d3-geo on a canvas: the WebGL-free fallback and
 * the source of the map figures (toSvg, toPngBlob). Projected geometry is kept per
 * (view, projection) in reference pixels (web/equal-area/projected-view.ts) and prepared in idle
 * time, so a slice change only draws; a resize only changes the frame.
 */
import { SliceMapElement } from './slice-map-element';
import { css, html, nothing, type PropertyValues } from 'lit';
import { styleMap } from 'lit/directives/style-map.js';
import { scaleGradientCss } from '../colour/measure-scale';
import { IdleWorkController, SizeController } from '../controllers';
import {
  CellLookup, DotRaster, FIGURE_PAD, PROJECTION_CAPTIONS, PROJECTION_NAMES, ProjectedView, ViewGeometry, drawMap, entryAtMapPoint,
  figureLayout, figurePng, fitFrame, hasSlice, mapLegend, mapSvg, referenceProjection,
  type EqualAreaProjection, type MapFrame, type MapLegend, type MapPicture,
} from '../equal-area';
import type { AnalysisView, Measure } from '../protocol';
import { cellTipLines, mapDescription, sliceTitle } from '../text';

/** Figure width when the map has not been laid out, and the least one, CSS px. */
const FIGURE_WIDTH: Readonly<Record<EqualAreaProjection, number>> = { 'equal-earth': 960, 'polar-north': 720, 'polar-south': 720 };
const MIN_FIGURE_WIDTH = 480;
/** Space between the globe's outline and the canvas edge, CSS px. */
const MAP_PAD = 6;
/** The PNG figure's pixels per CSS pixel. */
const PNG_RATIO = 2;

interface Tip { readonly x: number; readonly y: number; readonly lines: readonly string[] }

export class DgEqualAreaView extends SliceMapElement {
  static override properties = {
    projection: { type: String },
    notice: { type: String },
    tip: { state: true },
  };
  declare projection: EqualAreaProjection;
  /** Shown above the map, e.g. why the WebGL views are unavailable. */
  declare notice: string;
  declare private tip: Tip | undefined;

  #geometry: ViewGeometry | undefined;
  #lookup: CellLookup | undefined;
  #projected = new Map<EqualAreaProjection, ProjectedView>();
  #legend: { view: AnalysisView | undefined; measure: Measure; indicators: boolean; legend: MapLegend } | undefined;
  /** The map area's size; a change asks for an update, which draws. */
  readonly #size = new SizeController(this, () => this.renderRoot.querySelector('.map'), { width: 0, height: 0 });
  #hoverEntry = -1;
  readonly #prepare = new IdleWorkController(this);
  readonly #scratch = new Float64Array(2);
  readonly #dots = new DotRaster();

  constructor() {
    super();
    this.projection = 'equal-earth';
    this.notice = '';
    this.tip = undefined;
  }

  static override styles = css`
    :host { display: flex; flex-direction: column; height: 100%; min-height: 260px; box-sizing: border-box; }
    .notice { margin: 0 0 6px; padding: 6px 10px; background: #fff4d6; border: 1px solid #d9b24a; border-radius: 4px; }
    .body { flex: 1 1 auto; display: flex; gap: 12px; min-height: 0; }
    .map { position: relative; flex: 1 1 auto; min-width: 0; min-height: 200px; }
    canvas { position: absolute; inset: 0; width: 100%; height: 100%; display: block; }
    .tip { position: absolute; pointer-events: none; max-width: 260px; padding: 4px 6px; font-size: 12px;
      background: rgba(255, 255, 255, 0.96); border: 1px solid #8a939b; border-radius: 3px; }
    .legend { flex: 0 0 150px; display: flex; flex-direction: column; gap: 8px; font-size: 12px; }
    .ramp { position: relative; height: 160px; width: 14px; margin: 6px 0 6px 2px; border: 1px solid #6e767e; }
    .tick { position: absolute; left: 22px; transform: translateY(50%); white-space: nowrap; }
    .tick::before { content: ''; position: absolute; left: -8px; top: 50%; width: 5px; border-top: 1px solid #1d2328; }
    ul { list-style: none; margin: 0; padding: 0; }
    .swatch { display: inline-block; width: 9px; height: 9px; margin-right: 6px; border-radius: 50%; }
    .caption { margin: 4px 0 0; font-size: 12px; color: #3c4248; }
  `;

  override render() {
    const legend = this.#currentLegend();
    const tip = this.tip;
    return html`
      ${this.notice ? html`<p class="notice" role="status">${this.notice}</p>` : nothing}<slot name="notice"></slot>
      <div class="body">
        <div class="map" @pointermove=${this.#onPointerMove} @pointerdown=${this.#onPointerMove} @pointerleave=${this.#onPointerLeave}>
          <canvas role="img" aria-label=${mapDescription(this.view, this.slice, this.measure, PROJECTION_NAMES[this.projection])}></canvas>
          ${tip === undefined ? nothing : html`<div class="tip" role="tooltip" style=${styleMap({ left: `${tip.x}px`, top: `${tip.y}px` })}>${tip.lines.map((line) => html`<div>${line}</div>`)}</div>`}
        </div>
        <div class="legend" role="group" aria-label="Legend">
          <div>${legend.title}</div>
          <div class="ramp" style=${styleMap({ background: scaleGradientCss('to top') })}>
            ${legend.ticks.map((t) => html`<span class="tick" style=${styleMap({ bottom: `${t.position * 100}%` })}>${t.label}</span>`)}
          </div>
          ${legend.indicators.length === 0 ? nothing : html`<ul aria-label="Climate indicators">${legend.indicators.map((k) => html`
            <li><span class="swatch" style=${styleMap({ background: k.colour })}></span>${k.label}</li>`)}</ul>`}
        </div>
      </div>
      <p class="caption">${PROJECTION_CAPTIONS[this.projection]}</p>`;
  }

  override willUpdate(changed: PropertyValues<this>): void {
    if (changed.has('view')) {
      this.#geometry = this.view === undefined ? undefined : new ViewGeometry(this.view);
      this.#lookup = this.view === undefined ? undefined : new CellLookup(this.view.gridName, this.view.cells);
      this.#projected.clear();
    }
    if (changed.has('view') || changed.has('slice') || changed.has('projection')) this.#setHover(-1);
  }

  override updated(changed: PropertyValues): void {
    if (changed.has('view') || changed.has('projection') || changed.has('measure')) this.#prepareInIdleTime();
    if (!(changed.size === 1 && changed.has('tip'))) this.#draw();
  }

  /** The map as a standalone SVG document (title, legend and projection line included). */
  toSvg(): string {
    const [width, mapHeight] = this.#figureSize();
    return mapSvg({ geometry: this.#geometry, slice: this.slice, measure: this.measure, layers: this.layers, projection: this.projection, width, mapHeight });
  }

  /** The same figure as a PNG at twice the CSS pixel size. */
  async toPngBlob(): Promise<Blob> {
    const [width, mapHeight] = this.#figureSize();
    const legend = this.#currentLegend();
    const layout = figureLayout(width, mapHeight, legend.indicators.length > 0);
    const figure = { layout, legend, title: sliceTitle(this.view?.slices[this.slice]), projection: this.projection, picture: this.#picture(legend) };
    return figurePng(this.#projectedView(), figure, PNG_RATIO);
  }

  /** Figure width (the map's on screen, within limits) and the map height its projection's shape asks for. */
  #figureSize(): readonly [number, number] {
    const width = this.#size.width > 0 ? Math.max(MIN_FIGURE_WIDTH, Math.round(this.#size.width)) : FIGURE_WIDTH[this.projection];
    const [[x0, y0], [x1, y1]] = referenceProjection(this.projection).bounds;
    return [width, Math.round(((width - 2 * FIGURE_PAD) * (y1 - y0)) / (x1 - x0))];
  }

  #currentLegend(): MapLegend {
    const indicators = this.layers.indicators && hasSlice(this.view, this.slice);
    const memo = this.#legend;
    if (memo !== undefined && memo.view === this.view && memo.measure === this.measure && memo.indicators === indicators) return memo.legend;
    const legend = mapLegend(this.view, this.measure, indicators);
    this.#legend = { view: this.view, measure: this.measure, indicators, legend };
    return legend;
  }

  #picture(legend: MapLegend): MapPicture {
    return { slice: this.slice, measure: this.measure, layers: this.layers, scale: legend.scale };
  }

  #projectedView(): ProjectedView {
    let projected = this.#projected.get(this.projection);
    if (projected === undefined) {
      projected = new ProjectedView(referenceProjection(this.projection), this.#geometry);
      this.#projected.set(this.projection, projected);
    }
    return projected;
  }

  #draw(): void {
    const canvas = this.renderRoot.querySelector('canvas');
    const { width, height } = this.#size;
    if (canvas === null || width <= 0 || height <= 0) return;
    const ratio = window.devicePixelRatio || 1;
    const w = Math.round(width * ratio), h = Math.round(height * ratio);
    if (canvas.width !== w || canvas.height !== h) {
      canvas.width = w;
      canvas.height = h;
    }
    const ctx = canvas.getContext('2d');
    if (ctx === null) return;
    ctx.clearRect(0, 0, w, h);
    const projected = this.#projectedView();
    drawMap(ctx, projected, this.#picture(this.#currentLegend()), this.#frame(projected), ratio, this.#dots);
  }

  #frame(projected: ProjectedView): MapFrame {
    return fitFrame(projected.reference, MAP_PAD, MAP_PAD, this.#size.width - MAP_PAD, this.#size.height - MAP_PAD);
  }

  /** Builds every slice's projected pieces in idle time, the shown slice first. */
  #prepareInIdleTime(): void {
    const geometry = this.#geometry;
    if (geometry === undefined) {
      this.#prepare.cancel();
      return;
    }
    const projected = this.#projectedView();
    const { measure } = this, { scale } = this.#currentLegend();
    const count = geometry.view.slices.length;
    const first = hasSlice(geometry.view, this.slice) ? this.slice : 0;
    let done = 0;
    this.#prepare.run(() => {
      projected.prepareSlice((first + done++) % count, measure, scale);
      return done < count;
    });
  }

  /** Pointer moves, and taps (a touch gives a pointerdown without moves), find the cell under them. */
  #onPointerMove = (event: PointerEvent): void => {
    const view = this.view;
    const target = event.currentTarget;
    if (view === undefined || this.#lookup === undefined || !(target instanceof HTMLElement)) return;
    const box = target.getBoundingClientRect();
    const x = event.clientX - box.left, y = event.clientY - box.top;
    const projected = this.#projectedView();
    const entry = entryAtMapPoint(projected.reference, this.#frame(projected), this.#lookup, this.slice, x, y, this.#scratch);
    this.#setHover(entry);
    if (entry >= 0) this.tip = { x: x + 14 < box.width - 240 ? x + 14 : Math.max(0, x - 250), y: y + 14, lines: cellTipLines(view, entry) };
  };

  #onPointerLeave = (): void => this.#setHover(-1);

  #setHover(entry: number): void {
    if (entry < 0) this.tip = undefined;
    if (entry === this.#hoverEntry) return;
    this.#hoverEntry = entry;
    const detail = entry < 0 ? null : { slice: this.slice, entry };
    this.dispatchEvent(new CustomEvent('cell-hover', { detail, bubbles: true, composed: true }));
  }
}

customElements.define('dg-equal-area-view', DgEqualAreaView);

declare global {
  interface HTMLElementTagNameMap { 'dg-equal-area-view': DgEqualAreaView }
}
