// Small decisions of the WebGL map: the point budget (the rule written in STACK.md / brief:
// draw places when ≤ POINT_BUDGET, when asked, or from zoom POINT_ZOOM), the slice cache, the
// offline style (nothing that makes maplibre request anything: no tiles, glyphs or sprites). The
// words it shows are tested with web/text (text-wording.test.ts).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FIT_SHARE, fitZoom, GLOBE_RADIUS_PX_AT_ZOOM_0 } from '../../web/map/globe-camera';
import { graticule, offlineStyle } from '../../web/map/offline-style';
import { POINT_ZOOM, pointDecision, pointNotice } from '../../web/map/point-budget';
import { SliceCache } from '../../web/map/slice-cache';
import { POINT_BUDGET } from '../../web/state/view-options';

describe('pointDecision', () => {
  it('draws up to the budget and leaves out one place more', () => {
    expect(pointDecision(POINT_BUDGET, true, false, 0)).toBe('drawn');
    expect(pointDecision(POINT_BUDGET + 1, true, false, 0)).toBe('over-budget');
  });

  it('draws any number when asked, or from zoom POINT_ZOOM on', () => {
    expect(pointDecision(10 * POINT_BUDGET, true, true, 0)).toBe('drawn');
    expect(pointDecision(10 * POINT_BUDGET, true, false, POINT_ZOOM)).toBe('drawn');
    expect(pointDecision(10 * POINT_BUDGET, true, false, POINT_ZOOM - 0.01)).toBe('over-budget');
  });

  it('says the layer is off before anything else', () => {
    expect(pointDecision(1, false, true, 10)).toBe('layer-off');
  });

  it('never draws more places where it refuses fewer (monotone in the count)', () => {
    fc.assert(fc.property(fc.nat(100_000), fc.nat(100_000), fc.boolean(), fc.double({ min: 0, max: 22, noNaN: true }), (a, b, all, zoom) => {
      const [few, many] = a <= b ? [a, b] : [b, a];
      return !(pointDecision(many, true, all, zoom) === 'drawn' && pointDecision(few, true, all, zoom) !== 'drawn');
    }));
  });

  it('explains a left-out slice with its count, the budget and the ways to see them', () => {
    expect(pointNotice('over-budget', 30_000, 20_000)).toBe(
      'Places not drawn: 30,000 in this slice, more than the budget of 20,000. Zoom in to level 4, or ask for all points.');
    expect(pointNotice('drawn', 30_000)).toBe('');
    expect(pointNotice('layer-off', 30_000)).toBe('');
  });
});

describe('SliceCache', () => {
  const viewA = {};
  const viewB = {};

  it('builds a slice once per view and measure, and again after either changes', () => {
    const cache = new SliceCache<string>(4);
    let builds = 0;
    const build = () => `built ${++builds}`;
    expect(cache.get(viewA, 'taxa', 0, build)).toBe('built 1');
    expect(cache.get(viewA, 'taxa', 0, build)).toBe('built 1');
    const generation = cache.generation;
    expect(cache.get(viewA, 'occurrences', 0, build)).toBe('built 2');
    expect(cache.get(viewB, 'occurrences', 0, build)).toBe('built 3');
    expect(cache.generation).toBe(generation + 2);
    expect([...cache.entries()].map(([s]) => s)).toEqual([0]);
  });

  it('drops the least recently shown slice when full', () => {
    const cache = new SliceCache<number>(2);
    cache.get(viewA, 'taxa', 1, () => 1);
    cache.get(viewA, 'taxa', 2, () => 2);
    cache.get(viewA, 'taxa', 1, () => -1); // touches 1
    cache.get(viewA, 'taxa', 3, () => 3); // evicts 2
    expect([...cache.entries()]).toEqual([[1, 1], [3, 3]]);
    expect(cache.peek(viewA, 'taxa', 2)).toBeUndefined();
    expect(cache.peek(viewB, 'taxa', 1)).toBeUndefined();
  });

  it('refuses a capacity below one, naming it', () => {
    expect(() => new SliceCache(0)).toThrow('Slice cache capacity 0 is not allowed: expected a whole number ≥ 1.');
  });
});

describe('offlineStyle', () => {
  it('names no address at all: no tiles, glyphs, sprites or URLs', () => {
    const style = offlineStyle();
    expect(style.glyphs).toBeUndefined();
    expect(style.sprite).toBeUndefined();
    expect(JSON.stringify(style)).not.toMatch(/https?:|\/\/|"url"|"tiles"|mapbox:|pmtiles:/);
    expect(style.layers.map((l) => l.type)).toEqual(['background', 'line']);
  });

  it('draws 12 meridians pole to pole and the 5 parallels at ±60°, ±30° and 0° for a 30° step', () => {
    const lines = graticule(30, 2).features.map((f) => f.geometry.coordinates);
    const meridians = lines.filter((c) => c[0][0] === c[c.length - 1][0]);
    const parallels = lines.filter((c) => c[0][1] === c[c.length - 1][1]);
    expect(meridians.map((c) => c[0][0])).toEqual([-180, -150, -120, -90, -60, -30, 0, 30, 60, 90, 120, 150]);
    expect(meridians.every((c) => c[0][1] === -90 && c[c.length - 1][1] === 90 && c.length === 91)).toBe(true);
    expect(parallels.map((c) => c[0][1])).toEqual([-60, -30, 0, 30, 60]);
    expect(parallels.every((c) => c[0][0] === -180 && c[c.length - 1][0] === 180)).toBe(true);
  });
});

describe('fitZoom', () => {
  it('sizes the globe’s radius to the share of the shorter side (radius doubles per zoom level)', () => {
    const z = fitZoom(900, 600);
    expect(GLOBE_RADIUS_PX_AT_ZOOM_0 * 2 ** z).toBeCloseTo(FIT_SHARE * 600, 9);
  });

  it('stays within zoom 0 to 3, and assumes 400 px when the container has no size yet', () => {
    expect(fitZoom(50, 50)).toBe(0);
    expect(fitZoom(10_000, 10_000)).toBe(3);
    expect(fitZoom(0, 0)).toBe(fitZoom(400, 400));
  });
});
