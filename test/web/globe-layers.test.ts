// The deck.gl layers of a slice: slice-specific ids (so hidden slices keep their GPU buffers),
// visibility from the slice and the layer switches, and the places layer left out when asked.
// Layers are only constructed here (no WebGL): their props are what deck would diff.
import { describe, expect, it } from 'vitest';
import { countScale } from '../../web/colour/measure-scale';
import { cellLayerId, sliceLayers } from '../../web/map/globe-layers';
import { HORIZON_CULL } from '../../web/map/horizon-cull';
import { prepareSliceLayerData } from '../../web/map/slice-layer-data';
import { DEFAULT_LAYERS } from '../../web/state/view-options';
import { fixtureView } from './globe-fixture';

const data = prepareSliceLayerData(fixtureView(), 1, 'occurrences', countScale(120));
const ALL_ON = { cells: true, points: true, hull: true, spanningTree: true, polygons: true, indicators: true };

describe('sliceLayers', () => {
  it('names every layer by generation and slice, in drawing order', () => {
    const layers = sliceLayers(data, { generation: 3, current: true, layers: ALL_ON, includePoints: true });
    expect(layers.map((l) => l.id)).toEqual(['polygons-g3-s1', 'cells-g3-s1', 'hull-g3-s1', 'tree-g3-s1', 'lever-g3-s1', 'indicators-g3-s1', 'points-g3-s1']);
    expect(cellLayerId(3, 1)).toBe('cells-g3-s1');
  });

  it('keeps a slice that is not on screen loaded but hidden', () => {
    const layers = sliceLayers(data, { generation: 0, current: false, layers: ALL_ON, includePoints: true });
    expect(layers.every((l) => l.props.visible === false)).toBe(true);
  });

  it('shows the current slice’s layers as the switches say', () => {
    const layers = sliceLayers(data, { generation: 0, current: true, layers: DEFAULT_LAYERS, includePoints: true });
    const visible = Object.fromEntries(layers.map((l) => [l.id.split('-')[0], l.props.visible]));
    expect(visible).toEqual({ polygons: true, cells: true, hull: true, tree: false, lever: true, indicators: false, points: true });
  });

  it('leaves the places layer out when it may not be drawn, so its buffers are freed', () => {
    const layers = sliceLayers(data, { generation: 0, current: true, layers: ALL_ON, includePoints: false });
    expect(layers.some((l) => l.id.startsWith('points'))).toBe(false);
  });

  it('culls places and sites at the horizon instead of testing them against the globe’s depth', () => {
    const layers = sliceLayers(data, { generation: 0, current: true, layers: ALL_ON, includePoints: true });
    for (const id of ['points-g0-s1', 'indicators-g0-s1']) {
      const layer = layers.find((l) => l.id === id)!;
      expect(layer.props.extensions).toEqual([HORIZON_CULL]);
      expect(layer.props.parameters).toMatchObject({ depthCompare: 'always' });
    }
  });

  it('hands deck the prepared buffers themselves, not copies', () => {
    const [, cells] = sliceLayers(data, { generation: 0, current: true, layers: ALL_ON, includePoints: true });
    expect(cells.props.data).toBe(data.cells);
    expect(cells.props.modelMatrix).toBe(data.lifts.cells);
  });
});
