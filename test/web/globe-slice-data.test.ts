// Per-slice buffers of the WebGL map, checked value by value against the hand-made fixture
// (globe-fixture.ts), the colour helpers (countScale, INDICATOR_COLOURS) and the protocol's
// layout rules (web/protocol.ts: slice s owns items sliceStart[s] … sliceStart[s + 1] − 1).
import { describe, expect, it } from 'vitest';
import { INDICATOR_COLOURS } from '../../web/colour/layer-colours';
import { countScale } from '../../web/colour/measure-scale';
import { prepareSliceLayerData } from '../../web/map/slice-layer-data';
import { slicePaths } from '../../web/map/slice-paths';
import { sliceKindColours, slicePointCount, slicePositions } from '../../web/map/slice-points';
import { measureMax } from '../../web/state/view-options';
import { fixtureView } from './globe-fixture';

describe('slicePaths', () => {
  const view = fixtureView();

  it('rebases the slice’s path starts to 0 and views its vertices without copying', () => {
    const paths = slicePaths(view.hulls, 1);
    expect(paths.length).toBe(2);
    expect([...paths.startIndices]).toEqual([0, 2, 5]);
    expect([...paths.positions]).toEqual([1, 1, 2, 2, 3, 3, 4, 4, 5, 5]);
    expect(paths.positions.buffer).toBe(view.hulls.coords.buffer);
  });

  it('bounds the longest segment: √2·1° steps at the equator give at most 2° (1° north plus 1° east)', () => {
    // Exact angle of the first step, by the spherical law of cosines: acos(cos²1°) ≈ 1.414°.
    const exact = Math.acos(Math.cos(Math.PI / 180) ** 2) * (180 / Math.PI);
    const bound = slicePaths(view.hulls, 1).maxStepDeg;
    expect(bound).toBeGreaterThanOrEqual(exact);
    expect(bound).toBeLessThanOrEqual(2);
  });

  it('gives a slice without paths no paths', () => {
    const none = slicePaths(view.spanningTrees, 0);
    expect([none.length, [...none.startIndices], none.positions.length, none.maxStepDeg]).toEqual([0, [0], 0, 0]);
  });
});

describe('slice points', () => {
  const view = fixtureView();

  it('interleaves the slice’s longitudes and latitudes as [lon, lat] pairs', () => {
    expect(slicePointCount(view.positions, 0)).toBe(3);
    expect([...slicePositions(view.positions, 0)]).toEqual([10, 1, 20, 2, 30, 3]);
    expect([...slicePositions(view.positions, 1)]).toEqual([-170, -80]);
  });

  it('colours indicator sites by kind from INDICATOR_COLOURS', () => {
    const sites = view.indicators!;
    expect([...sliceKindColours(sites, 0, INDICATOR_COLOURS)]).toEqual([...INDICATOR_COLOURS[1], ...INDICATOR_COLOURS[0]]);
    expect([...sliceKindColours(sites, 1, INDICATOR_COLOURS)]).toEqual([...INDICATOR_COLOURS[1]]);
  });

  it('wraps kinds past the palette’s end round to its start', () => {
    const many = { ...view.indicators!, kind: Uint8Array.of(INDICATOR_COLOURS.length, 0, 1) };
    expect([...sliceKindColours(many, 0, INDICATOR_COLOURS).subarray(0, 3)]).toEqual([...INDICATOR_COLOURS[0]]);
  });
});

describe('prepareSliceLayerData', () => {
  const view = fixtureView();

  it('hands deck the cell buffers coloured by the chosen measure over every slice’s maximum', () => {
    const scale = countScale(measureMax(view, 'taxa'));
    expect(scale.max).toBe(7);
    const data = prepareSliceLayerData(view, 0, 'taxa', scale);
    const colours = data.cells.attributes.getFillColor.value;
    const starts = data.cells.startIndices!;
    const expected = new Uint8Array(3);
    [1, 1, 7].forEach((taxa, i) => {
      scale.colourInto(taxa, expected, 0);
      expect([...colours.subarray(starts[i] * 3, starts[i] * 3 + 3)]).toEqual([...expected]);
    });
    expect(data.cells.length).toBe(3);
    expect(data.firstEntry).toBe(0);
    expect(data.cells.attributes.indices.value).toBeInstanceOf(Uint32Array);
  });

  it('carries the slice’s places, paths, indicator sites and base polygons', () => {
    const data = prepareSliceLayerData(view, 1, 'occurrences', countScale(120));
    expect(data.firstEntry).toBe(3);
    expect(data.points.length).toBe(1);
    expect([...data.points.attributes.getPosition.value]).toEqual([-170, -80]);
    expect(data.hull.length).toBe(2);
    expect(data.spanningTree.length).toBe(1);
    expect(data.indicators?.length).toBe(1);
    expect(data.polygons).toBe(view.basePolygons?.[1]);
  });

  it('lifts each layer by the altitude in the last column of its model matrix, cells by their reach', () => {
    const data = prepareSliceLayerData(view, 0, 'occurrences', countScale(120));
    // HEALPix nside 4 cells are about 15° across: their lift is tens of kilometres, the 1° hull’s below one.
    expect(data.lifts.cells[14]).toBeGreaterThan(10_000);
    expect(data.lifts.hull[14]).toBeLessThan(data.lifts.cells[14]);
    expect([...data.lifts.hull].filter((_, k) => k !== 14)).toEqual([1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, 1]);
  });
});
