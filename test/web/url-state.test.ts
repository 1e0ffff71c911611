import { describe, expect, it } from 'vitest';
import { DEFAULT_RUN_SETTINGS } from '../../src/run';
import { decodeUrlState, encodeUrlState, type UrlState } from '../../web/state/url-state';
import { DEFAULT_LAYERS } from '../../web/state/view-options';
import { matchingSlice, sliceNamed } from '../../web/state/slice-matching';
import type { SliceMetrics } from '../../src/analysis';

const state: UrlState = {
  settings: {
    ...DEFAULT_RUN_SETTINGS, bins: { kind: 'equal', widthMyr: 5 }, assign: { kind: 'draw' }, seed: 42, grid: { kind: 'bands', degrees: 10 },
    rotateAt: 'occurrence', preferModel: true, beyondModel: 'clamp',
  },
  measure: 'taxa',
  sliceName: 'Late Cretaceous & <b>',
  mapView: 'polar-south',
  layers: { ...DEFAULT_LAYERS, spanningTree: true, points: false },
  curveSeries: ['taxa', 'hullKm2'],
  normaliseCurves: true,
  wholeScale: true,
};

describe('the page address', () => {
  it('brings back every part of the view it holds', () => {
    const { state: back, ignored } = decodeUrlState(`#${encodeUrlState(state)}`);
    expect(back).toEqual(state);
    expect(ignored).toEqual([]);
  });

  it('gives the defaults for an empty address', () => {
    const { state: back } = decodeUrlState('');
    expect(back.settings).toEqual(DEFAULT_RUN_SETTINGS);
    expect(back.layers).toEqual(DEFAULT_LAYERS);
    expect(back.sliceName).toBeUndefined();
  });

  it('writes the settings as their canonical text, as session files do', () => {
    const hash = new URLSearchParams(encodeUrlState(state));
    expect([hash.get('bins'), hash.get('assign'), hash.get('seed'), hash.get('grid')]).toEqual(['equal:5', 'draw', '42', 'bands:10']);
  });

  it('ignores, and names, a setting the settings reader refuses', () => {
    const { state: back, ignored } = decodeUrlState('#bins=equal:-5&grid=healpix:33&assign=share:0.25&seed=x');
    expect(back.settings.bins).toEqual(DEFAULT_RUN_SETTINGS.bins);
    expect(back.settings.grid).toEqual(DEFAULT_RUN_SETTINGS.grid);
    expect(back.settings.assign).toEqual({ kind: 'share', fraction: 0.25 });
    expect([...ignored].sort()).toEqual(['bins=equal:-5', 'grid=healpix:33', 'seed=x']);
  });

  it('names what it ignored instead of failing on edited values', () => {
    const { state: back, ignored } = decodeUrlState('#measure=weight&map=moon&layers=cells,rivers&rotate-at=later');
    expect(back.measure).toBe('occurrences');
    expect(back.mapView).toBeUndefined();
    expect(back.layers.cells).toBe(true);
    expect(back.layers.points).toBe(false);
    expect([...ignored].sort()).toEqual(['layers: rivers', 'map=moon', 'measure=weight', 'rotate-at=later']);
  });
});

const slice = (name: string, baseMa: number, topMa: number) => ({ name, baseMa, topMa }) as SliceMetrics;

describe('keeping the place in time', () => {
  const stages = [slice('a', 100, 90), slice('b', 90, 80), slice('c', 80, 60)];
  it('picks the new slice that holds the old slice mid-age', () => {
    expect(matchingSlice(stages, slice('x', 90, 84))).toBe(1); // mid-age 87
    expect(matchingSlice(stages, slice('y', 75, 61))).toBe(2);
  });
  it('picks the nearest slice when the old mid-age lies outside every new slice', () => {
    expect(matchingSlice(stages, slice('z', 140, 120))).toBe(0);
    expect(matchingSlice(stages, slice('w', 20, 0))).toBe(2);
  });
  it('finds a slice by name', () => {
    expect(sliceNamed(stages, 'b')).toBe(1);
    expect(sliceNamed(stages, 'q')).toBeUndefined();
  });
});
