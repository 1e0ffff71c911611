/**
 * What the map's legend says, shared by the HTML legend, the SVG figure and the PNG figure so
 * that all three agree: the count colour ramp (stops read from scaleGradientCss, the same ramp
 * the page's CSS draws), tick values at their places on the log axis, the title, and the
 * indicator kinds when they are drawn. The words come from web/text, as on the WebGL map.
 */
import { INDICATOR_COLOURS, rgbCss } from '../colour/layer-colours';
import { countScale, scaleGradientCss, type CountScale } from '../colour/measure-scale';
import type { AnalysisView, Measure } from '../protocol';
import { measureMax } from '../state/view-options';
import { legendTicks, legendTitle, type LegendTick } from '../text';

export interface LegendStop {
  /** 0 … 1 along the ramp. */
  readonly offset: number;
  readonly colour: string;
}

export interface LegendKey {
  readonly label: string;
  readonly colour: string;
}

export interface MapLegend {
  readonly scale: CountScale;
  readonly stops: readonly LegendStop[];
  readonly ticks: readonly LegendTick[];
  /** "Occupied cells: taxa per cell (log scale)". */
  readonly title: string;
  readonly indicators: readonly LegendKey[];
}

const STOP = /(rgba?\([^)]*\))\s+([0-9.]+)%/g;

/** Colour stops of the ramp, parsed from the CSS gradient. */
export function legendStops(): LegendStop[] {
  return Array.from(scaleGradientCss().matchAll(STOP), (m) => ({ offset: Number(m[2]) / 100, colour: m[1] }));
}

/** Colour of indicator kind `kind` (the palette repeats after its last colour). */
export function indicatorColour(kind: number): readonly [number, number, number] {
  return INDICATOR_COLOURS[kind % INDICATOR_COLOURS.length];
}

export function mapLegend(view: AnalysisView | undefined, measure: Measure, showIndicators: boolean): MapLegend {
  const scale = countScale(view === undefined ? 0 : measureMax(view, measure));
  const kinds = showIndicators && view?.indicators !== undefined ? view.indicators.kinds : [];
  return {
    scale,
    stops: legendStops(),
    ticks: legendTicks(scale),
    title: legendTitle(measure),
    indicators: kinds.map((label, k) => ({ label, colour: rgbCss(indicatorColour(k)) })),
  };
}
