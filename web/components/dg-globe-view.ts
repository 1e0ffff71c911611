/**
 * The WebGL map: maplibre draws an offline ocean and graticule on a globe (or Web Mercator), and
 * deck.gl draws one slice's cells, places, hull, spanning tree, base polygons and indicators into
 * the same WebGL context (interleaved), so one canvas holds the whole picture.
 */
import { SliceMapElement } from './slice-map-element';
import type { Layer, PickingInfo } from '@deck.gl/core';
import { MapLibreOverlay } from '@deck.gl/maplibre';
import { html, nothing, type PropertyValues, type TemplateResult } from 'lit';
import * as maplibregl from 'maplibre-gl';
import workerUrl from 'maplibre-gl/dist/maplibre-gl-worker.mjs?url';
import { countScale, type CountScale } from '../colour/measure-scale';
import {
  cellLayerId, fitZoom, GLOBE_MAP_NAMES, globeLegend, globeViewStyles, offlineStyle, pointDecision, pointNotice,
  prepareSliceLayerData, SliceCache, sliceLayers, slicePointCount, type GlobeProjection, type SliceLayerData,
} from '../map';
import { IdleWorkController, SizeController } from '../controllers';
import type { AnalysisView, Measure } from '../protocol';
import { measureMax } from '../state/view-options';
import { FIGURE_PAD, drawFigureFrame, figureLayout, mapLegend } from '../equal-area';
import { cellTipLines, mapDescription, sliceTitle } from '../text';

/** The line under an exported picture of the WebGL map: what projection it is in. */
const GLOBE_CAPTIONS: Readonly<Record<GlobeProjection, string>> = {
  globe: 'Orthographic view of the globe as shown (not equal-area; the far side is hidden)',
  flat: 'Web Mercator map as shown (not equal-area: areas grow towards the poles)',
};

/** Slices whose layers stay loaded (hidden) after being shown, so stepping back re-uploads nothing. */
const KEPT_SLICES = 24;
/** Properties that change what deck draws (hover and the rest only change the HTML around it). */
const LAYER_INPUTS = ['view', 'slice', 'measure', 'layers', 'showAllPoints', '_zoomLevel'] as const;
const PICK_RADIUS_PX = 2;
/** Slices prepared ahead, in idle time, on each side of the current one (the arrow keys' next steps). */
const PREFETCH_STEPS = [1, -1] as const;

interface Hover { readonly x: number; readonly y: number; readonly entry: number }

export class DgGlobeView extends SliceMapElement {
  static override styles = globeViewStyles;
  static override properties = {
    projection: { type: String }, showAllPoints: { type: Boolean, attribute: 'show-all-points' },
    _zoomLevel: { state: true }, _hover: { state: true }, _failed: { state: true },
  };
  declare projection: GlobeProjection;
  declare showAllPoints: boolean;
  /** Whole zoom level (rounded down), for the point budget's zoom rule. */
  declare _zoomLevel: number;
  declare _hover: Hover | null;
  declare _failed: boolean;

  #map: maplibregl.Map | undefined = undefined;
  #overlay: MapLibreOverlay | undefined = undefined;
  readonly #cache = new SliceCache<SliceLayerData>(KEPT_SLICES);
  #scale: { view: AnalysisView; measure: Measure; scale: CountScale } | undefined = undefined;
  #hoverKey = '';
  /** Set on style.load (isStyleLoaded() stays false while the graticule source loads). */
  #styleReady = false;
  readonly #prefetch = new IdleWorkController(this);

  constructor() {
    super();
    this.projection = 'globe';
    this.showAllPoints = false;
    this._zoomLevel = 0;
    this._hover = null;
    this._failed = false;
    // maplibre's own trackResize follows the window; the map follows this element instead.
    new SizeController(this, () => this, { width: 0, height: 0, onResize: () => this.#map?.resize() });
  }

  override connectedCallback(): void {
    super.connectedCallback();
    if (this.hasUpdated && !this.#map) this.#createMap();
  }

  override disconnectedCallback(): void {
    super.disconnectedCallback();
    this.#prefetch.cancel();
    this.#map?.remove(); // removes the overlay control too, which finalizes deck
    this.#map = undefined;
    this.#overlay = undefined;
    this.#styleReady = false;
    this.#cache.clear();
  }

  /** The current frame as PNG: maplibre redraws synchronously and the canvas is read in the same task. */
  async snapshotPng(): Promise<Blob> {
    const map = this.#map;
    if (!map) throw new Error('The WebGL map is not showing, so there is no picture to save.');
    if (!map.loaded()) await map.once('idle');
    // The picture inside the figure frame the equal-area maps' figures have: slice title above,
    // count legend and a line naming the projection below.
    const source = map.getCanvas();
    const width = Math.max(1, source.clientWidth), height = Math.max(1, source.clientHeight);
    const pixelRatio = source.width / width;
    const legend = mapLegend(this.view, this.measure, this.layers.indicators);
    const layout = figureLayout(width + 2 * FIGURE_PAD, height, legend.indicators.length > 0);
    const canvas = Object.assign(document.createElement('canvas'), { width: Math.round(layout.width * pixelRatio), height: Math.round(layout.height * pixelRatio) });
    const context = canvas.getContext('2d');
    if (context === null) throw new Error('No 2D canvas is available to draw the PNG figure.');
    drawFigureFrame(context, { layout, legend, title: sliceTitle(this.view?.slices[this.slice]), caption: GLOBE_CAPTIONS[this.projection] }, pixelRatio);
    map.redraw(); // synchronous: the WebGL canvas holds the frame until this task ends
    context.drawImage(source, layout.map.x0 * pixelRatio, layout.map.y0 * pixelRatio, width * pixelRatio, height * pixelRatio);
    return new Promise((resolve, reject) => {
      canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('The browser could not encode the map as PNG.'))), 'image/png');
    });
  }

  protected override firstUpdated(): void {
    this.#createMap();
  }

  protected override updated(changed: PropertyValues<this>): void {
    const map = this.#map;
    if (!map) return;
    if (changed.has('projection') && this.#styleReady) this.#applyProjection(map);
    if (!LAYER_INPUTS.some((key) => changed.has(key)) && !changed.has('projection')) return;
    map.getCanvas().setAttribute('aria-label', this.#description());
    if (changed.has('view') || changed.has('measure') || changed.has('slice')) this.#setHover(null);
    const centre = changed.has('view') && this.#dataCentre();
    if (centre) map.jumpTo({ center: centre }); // a new analysis: face its data (slice steps keep the camera)
    this.#syncLayers();
  }

  #applyProjection(map: maplibregl.Map): void {
    map.setProjection({ type: this.projection === 'globe' ? 'globe' : 'mercator' });
    // The overlay picks deck's view (GlobeView or MapView) from the map's projection when its
    // props are set; maplibre 6 fires no style event on setProjection, so tell it here.
    this.#overlay?.setProps({});
  }

  #createMap(): void {
    const container = this.renderRoot.querySelector<HTMLElement>('.map');
    if (!container || this._failed) return;
    // Probe first: maplibre's own failure without WebGL2 is an exception deep in its constructor.
    const probe = document.createElement('canvas').getContext('webgl2');
    if (!probe) return this.#fail();
    probe.getExtension('WEBGL_lose_context')?.loseContext(); // browsers cap live contexts: give it back now
    let map: maplibregl.Map;
    try {
      maplibregl.setWorkerUrl(workerUrl);
      map = new maplibregl.Map({
        container, style: offlineStyle(), center: this.#dataCentre() ?? [0, 15], zoom: fitZoom(container.clientWidth, container.clientHeight),
        attributionControl: false, maplibreLogo: false, keyboard: false, trackResize: false,
        dragRotate: false, pitchWithRotate: false, touchPitch: false, localIdeographFontFamily: false,
        canvasContextAttributes: { antialias: true },
      });
    } catch {
      return this.#fail();
    }
    this.#map = map;
    const canvas = map.getCanvas();
    canvas.setAttribute('role', 'img');
    canvas.setAttribute('tabindex', '-1'); // no keyboard handling of its own: the +/− buttons and the app's keys are the way
    map.on('style.load', () => {
      this.#styleReady = true;
      this.#applyProjection(map);
    });
    map.on('zoom', () => {
      const level = Math.max(0, Math.floor(map.getZoom()));
      if (level !== this._zoomLevel) this._zoomLevel = level;
    });
    map.on('movestart', () => this.#setHover(null));
    // Deck picks under the pointer itself (it also drives the highlight); a tap arrives as a click.
    this.#overlay = new MapLibreOverlay({
      interleaved: true, layers: [], pickingRadius: PICK_RADIUS_PX,
      onHover: (info) => this.#picked(info), onClick: (info) => this.#picked(info),
    });
    map.addControl(this.#overlay);
    this.#syncLayers();
  }

  #description(): string {
    return mapDescription(this.view, this.slice, this.measure, GLOBE_MAP_NAMES[this.projection]);
  }

  /** The current slice's spherical centroid as [lon, lat], if it has one. */
  #dataCentre(): [number, number] | undefined {
    const metrics = this.view?.slices[this.slice];
    return metrics && Number.isFinite(metrics.centroidLon) && Number.isFinite(metrics.centroidLat) ? [metrics.centroidLon, metrics.centroidLat] : undefined;
  }

  #fail(): void {
    this._failed = true;
    this.dispatchEvent(new CustomEvent('webgl-unavailable', { bubbles: true, composed: true }));
  }

  #scaleOf(view: AnalysisView, measure: Measure): CountScale {
    if (this.#scale?.view !== view || this.#scale.measure !== measure) this.#scale = { view, measure, scale: countScale(measureMax(view, measure)) };
    return this.#scale.scale;
  }

  #pointsAllowed(data: SliceLayerData): boolean {
    return pointDecision(data.points.length, true, this.showAllPoints, this._zoomLevel) === 'drawn';
  }

  /**
   * Hands deck the current slice's layers plus the hidden layers of recently shown slices, then
   * asks for the neighbouring slices to be prepared when the page is idle: deck uploads hidden
   * layers too, so the next step with the arrow keys finds its buffers on the GPU already.
   */
  #syncLayers(prefetched: readonly number[] = []): void {
    const overlay = this.#overlay;
    if (!overlay) return;
    const { view, slice, measure } = this;
    const out: Layer[] = [];
    if (view && slice >= 0 && slice < view.slices.length) {
      const scale = this.#scaleOf(view, measure);
      for (const s of [...prefetched, slice]) this.#cache.get(view, measure, s, () => prepareSliceLayerData(view, s, measure, scale));
      const generation = this.#cache.generation;
      for (const [s, data] of this.#cache.entries()) {
        out.push(...sliceLayers(data, { generation, current: s === slice, layers: this.layers, includePoints: this.#pointsAllowed(data) }));
      }
    }
    overlay.setProps({ layers: out });
    if (prefetched.length === 0) this.#schedulePrefetch();
  }

  #schedulePrefetch(): void {
    const { view, slice, measure } = this;
    if (!view) return this.#prefetch.cancel();
    const wanted = PREFETCH_STEPS.map((step) => slice + step).filter((s) => s >= 0 && s < view.slices.length);
    // One slice per idle step, skipped if the view or measure has changed meanwhile.
    this.#prefetch.run(() => {
      const next = wanted.shift();
      if (next !== undefined && view === this.view && measure === this.measure && !this.#cache.peek(view, measure, next)) this.#syncLayers([next]);
      return wanted.length > 0;
    });
  }

  #picked(info: PickingInfo): void {
    const { view, slice } = this;
    const data = view && this.#cache.peek(view, this.measure, slice);
    const onCell = data && info.layer?.id === cellLayerId(this.#cache.generation, slice) && info.index >= 0;
    this.#setHover(onCell ? { x: info.x, y: info.y, entry: data.firstEntry + info.index } : null);
  }

  #setHover(hover: Hover | null): void {
    if (hover !== this._hover) this._hover = hover;
    const key = hover ? `${this.slice}:${hover.entry}` : '';
    if (key === this.#hoverKey) return;
    this.#hoverKey = key;
    const detail = hover ? { slice: this.slice, entry: hover.entry } : null;
    this.dispatchEvent(new CustomEvent('cell-hover', { detail, bubbles: true, composed: true }));
  }

  protected override render(): TemplateResult {
    if (this._failed) return html`<p class="failed" role="status">The WebGL map cannot be shown: this browser gave no WebGL2 context. The equal-area views show the same slices.</p>`;
    const { view, slice, measure } = this;
    const count = view && slice < view.slices.length ? slicePointCount(view.positions, slice) : 0;
    const decision = pointDecision(count, this.layers.points, this.showAllPoints, this._zoomLevel);
    const notice = pointNotice(decision, count);
    const hover = this._hover;
    return html`
      <div class="map" role="region" aria-label=${this.#description()}></div>
      <div class="zoom">
        <button type="button" aria-label="Zoom in" @click=${() => this.#map?.zoomIn()}>+</button>
        <button type="button" aria-label="Zoom out" @click=${() => this.#map?.zoomOut()}>−</button>
      </div>
      ${view ? globeLegend(this.#scaleOf(view, measure), measure, this.layers, view.indicators?.kinds) : nothing}
      ${notice || this.projection === 'flat' ? html`<div class="notes">
        ${notice ? html`<p role="status">${notice}</p>` : nothing}
        ${this.projection === 'flat' ? html`<p>Web Mercator is not equal-area: cells far from the equator look bigger than they are. Compare areas in the Equal Earth or polar views.</p>` : nothing}
      </div>` : nothing}
      ${hover && view ? html`<div class="tooltip ${hover.x > this.clientWidth / 2 ? 'west' : ''}" style="left:${hover.x}px;top:${hover.y}px">${cellTipLines(view, hover.entry).map((line) => html`<div>${line}</div>`)}</div>` : nothing}
    `;
  }
}

customElements.define('dg-globe-view', DgGlobeView);

declare global {
  interface HTMLElementTagNameMap { 'dg-globe-view': DgGlobeView }
}
