/** Styles of the dg-globe-view shadow root: maplibre's own (it needs them inside the shadow root), the legend's, and the component's. */
import { css, unsafeCSS } from 'lit';
import maplibreCss from 'maplibre-gl/dist/maplibre-gl.css?inline';
import { globeLegendStyles } from './globe-legend';

export const globeViewStyles = [unsafeCSS(maplibreCss), globeLegendStyles, css`
  :host { display: block; position: relative; min-height: 240px; overflow: hidden; font: 12px/1.35 system-ui, sans-serif; color: #1d2328; }
  .map { position: absolute; inset: 0; background: #fbfcfd; }
  .zoom { position: absolute; top: 8px; right: 8px; display: flex; flex-direction: column; gap: 2px; }
  .zoom button { width: 28px; height: 28px; font-size: 16px; line-height: 1; border: 1px solid #9aa4ad; border-radius: 3px; background: #fff; cursor: pointer; }
  .zoom button:focus-visible { outline: 2px solid #0072b2; outline-offset: 1px; }
  .notes { position: absolute; right: 8px; bottom: 8px; max-width: min(24em, 50%); display: grid; gap: 4px; }
  .notes p { margin: 0; padding: 4px 6px; background: rgba(255, 255, 255, 0.9); border-radius: 3px; }
  .tooltip { position: absolute; transform: translate(12px, 12px); pointer-events: none; padding: 4px 6px; background: rgba(255, 255, 255, 0.95); border: 1px solid #9aa4ad; border-radius: 3px; white-space: nowrap; }
  .tooltip.west { transform: translate(calc(-100% - 12px), 12px); }
  .failed { margin: 1em; }
`];
