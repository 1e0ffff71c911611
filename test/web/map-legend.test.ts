// The legend's ramp and ticks against the colour scale the map colours cells with (countScale,
// viridis by d3-scale-chromatic as the outside source of the colours) and the unit wording.
import { interpolateViridis } from 'd3-scale-chromatic';
import { describe, expect, it } from 'vitest';
import { countScale } from '../../web/colour/measure-scale';
import { legendStops, mapLegend } from '../../web/equal-area/map-legend';
import { MEASURE_UNITS, measureMax } from '../../web/state/view-options';
import { legendTicks } from '../../web/text';
import { INDICATOR_KINDS, smallView } from './small-analysis-view';

/** "#rrggbb" or "rgb(r, g, b)" as "rgb(r, g, b)". */
function rgb(css: string): string {
  if (!css.startsWith('#')) return css;
  return `rgb(${parseInt(css.slice(1, 3), 16)}, ${parseInt(css.slice(3, 5), 16)}, ${parseInt(css.slice(5, 7), 16)})`;
}

describe('mapLegend', () => {
  it('runs the ramp from viridis(0) to viridis(1) in nine evenly spaced stops', () => {
    const stops = legendStops();
    expect(stops.map((s) => s.offset)).toEqual([0, 0.125, 0.25, 0.375, 0.5, 0.625, 0.75, 0.875, 1]);
    expect(stops[0].colour).toBe(rgb(interpolateViridis(0)));
    expect(stops[8].colour).toBe(rgb(interpolateViridis(1)));
  });

  it('puts ticks 1, 10, … and the largest count at their places on the log axis, with the unit', () => {
    const view = smallView();
    for (const measure of ['occurrences', 'collections', 'taxa'] as const) {
      const max = measureMax(view, measure);
      const legend = mapLegend(view, measure, false);
      // The scale's ticks, less any whose label would run into the largest count's (see legendTicks).
      expect(legend.ticks.map((t) => t.value)).toEqual(legendTicks(countScale(max)).map((t) => t.value));
      expect(countScale(max).ticks).toEqual(expect.arrayContaining(legend.ticks.map((t) => t.value)));
      expect(legend.ticks.at(-1)!.value).toBe(max);
      for (const tick of legend.ticks) expect(tick.position).toBeCloseTo(tick.value <= 1 ? 0 : Math.log(tick.value) / Math.log(max), 12);
      expect(legend.title).toContain(MEASURE_UNITS[measure]);
      // The colour at the top of the ramp is the colour of the fullest cell.
      expect(legendStops()[8].colour).toBe(legend.scale.css(max));
    }
  });

  it('lists the indicator kinds only when indicators are shown', () => {
    const view = smallView();
    expect(mapLegend(view, 'taxa', true).indicators.map((k) => k.label)).toEqual([...INDICATOR_KINDS]);
    expect(mapLegend(view, 'taxa', false).indicators).toEqual([]);
    expect(mapLegend(undefined, 'taxa', true).ticks.length).toBeGreaterThan(0);
  });
});
