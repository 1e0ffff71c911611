/** The WebGL map's HTML legend: the count scale with its unit, and a key to the overlays drawn. */
import { css, html, nothing, type TemplateResult } from 'lit';
import { INDICATOR_COLOURS, OVERLAY_COLOURS, rgbCss } from '../colour/layer-colours';
import { scaleGradientCss, type CountScale } from '../colour/measure-scale';
import type { Measure } from '../protocol';
import type { LayerVisibility } from '../state/view-options';
import { legendTicks, legendTitle } from '../text';

export function globeLegend(scale: CountScale, measure: Measure, on: LayerVisibility, indicatorKinds: readonly string[] | undefined): TemplateResult {
  const swatch = (colour: readonly number[], label: string, shape: 'line' | 'dot'): TemplateResult =>
    html`<span class="key"><span class=${shape} style="background:${rgbCss(colour)}"></span>${label}</span>`;
  return html`<div class="legend">
    ${on.cells ? html`
      <div class="unit">${legendTitle(measure)}</div>
      <div class="gradient" style="background:${scaleGradientCss()}"></div>
      <div class="ticks">${legendTicks(scale).map((t) => html`<span style="left:${t.position * 100}%">${t.label}</span>`)}</div>` : nothing}
    <div class="keys">
      ${on.hull ? swatch(OVERLAY_COLOURS.hull, 'convex hull', 'line') : nothing}
      ${on.spanningTree ? swatch(OVERLAY_COLOURS.spanningTree, 'spanning tree', 'line') : nothing}
      ${on.points ? swatch(OVERLAY_COLOURS.points, 'places', 'dot') : nothing}
      ${on.indicators && indicatorKinds ? indicatorKinds.map((kind, k) => swatch(INDICATOR_COLOURS[k % INDICATOR_COLOURS.length], kind, 'dot')) : nothing}
    </div>
  </div>`;
}

export const globeLegendStyles = css`
  .legend { position: absolute; left: 8px; bottom: 8px; width: 15em; padding: 6px 8px 4px; background: rgba(255, 255, 255, 0.92); border-radius: 3px; }
  .gradient { height: 10px; border-radius: 2px; }
  .ticks { position: relative; height: 1.4em; }
  .ticks span { position: absolute; transform: translateX(-50%); top: 1px; }
  .ticks span:first-child { transform: none; }
  .ticks span:last-child { transform: translateX(-100%); }
  .keys { display: flex; flex-wrap: wrap; gap: 2px 10px; }
  .key { display: inline-flex; align-items: center; gap: 4px; }
  .line { display: inline-block; width: 16px; height: 3px; }
  .dot { display: inline-block; width: 7px; height: 7px; border-radius: 50%; }
`;
