/**
 * What the map's legend says, shared by the HTML legend, the SVG figure and the PNG figure so
 * that all three agree: the count colour ramp (stops read from scaleGradientCss, the same ramp
 * the page's CSS draws), tick values at their places on the log axis, the unit, and the
 * indicator kinds when they are drawn.
 */
import { INDICATOR_COLOURS, rgbCss } from '../colour/layer-colours';
import { countScale, scaleGradientCss, type CountScale } from '../colour/measure-scale';
import type { AnalysisView, Measure } from '../protocol';
import { MEASURE_UNITS, measureMax } from '../state/view-options';

export interface LegendStop {
  /** 0 … 1 along the ramp. */
  readonly offset: number;
  readonly colour: string;
}

export interface LegendTick {
  readonly value: number;
  /** 0 … 1 along the ramp. */
  readonly position: number;
  readonly label: string;
}

export interface LegendKey {
  readonly label: string;
  readonly colour: string;
}

export interface MapLegend {
  readonly scale: CountScale;
  readonly stops: readonly LegendStop[];
  readonly ticks: readonly LegendTick[];
  readonly unit: string;
  readonly indicators: readonly LegendKey[];
}

const STOP = /(rgba?\([^)]*\))\s+([0-9.]+)%/g;

/** Colour stops of the ramp, parsed from the CSS gradient. */
export function legendStops(): LegendStop[] {
  return Array.from(scaleGradientCss().matchAll(STOP), (m) => ({ offset: Number(m[2]) / 100, colour: m[1] }));
}

const COUNT_FORMAT = new Intl.NumberFormat('en-US');

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
    ticks: scale.ticks.map((value) => ({ value, position: scale.position(value), label: COUNT_FORMAT.format(value) })),
    unit: MEASURE_UNITS[measure],
    indicators: kinds.map((label, k) => ({ label, colour: rgbCss(indicatorColour(k)) })),
  };
}
