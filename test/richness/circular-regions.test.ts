import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { geoDistance } from 'd3-geo';
import { circularRegions, sliceAbundances, sliceCells, sliceCollections, type RegionSettings } from '../../src/richness';
import { EARTH_RADIUS_KM } from '../../src/sphere/earth';
import { tableOf } from './fixtures';

/** A stand-in grid whose cell k is centred at the given positions (degrees). */
function gridAt(lat: number[], lon: number[]) {
  return { cellCentreInto: (cell: number, out: Float64Array) => ((out[0] = lat[cell]), (out[1] = lon[cell]), out) };
}

function regionsOf(rows: Array<readonly [number, number, number]>, lat: number[], lon: number[], settings: RegionSettings) {
  const input = tableOf([rows]);
  return circularRegions(input.start, sliceAbundances(input), sliceCells(input), sliceCollections(input), gridAt(lat, lon), settings);
}

describe('circular-region standardisation', () => {
  it('keeps regions by cell and collection minimums and counts the taxa of their cells, by hand', () => {
    // Cells 0–3 on the equator at longitudes 0°, 1°, 2°, 10° (1° ≈ 111.2 km). Radius 250 km:
    // region of cell 0 = {0, 1, 2}; of 1 = {0, 1, 2}; of 2 = {0, 1, 2}; of 3 = {3}.
    // With minCells 3 the first three are kept, each subsampled to all 3 cells: taxa 0, 1, 2 → 3.
    const rows = [[0, 0, 0], [1, 1, 1], [2, 2, 2], [0, 3, 2], [5, 4, 3]] as const;
    const settings = { radiusKm: 250, minCells: 3, minCollections: 3, trials: 2, seed: 1 };
    const r = regionsOf([...rows], [0, 0, 0, 0], [0, 1, 2, 10], settings);
    expect(Array.from(r.centreCell)).toEqual([0, 1, 2]);
    expect(Array.from(r.richness)).toEqual([3, 3, 3]);
    expect(r.regions[0]).toBe(3);
    expect(r.mean[0]).toBe(3);
    expect(r.sd[0]).toBe(0);
    // Five collections needed: no region qualifies, and the series is NaN, not 0.
    const none = regionsOf([...rows], [0, 0, 0, 0], [0, 1, 2, 10], { ...settings, minCollections: 5 });
    expect(none.regions[0]).toBe(0);
    expect(none.mean[0]).toBeNaN();
  });

  it('admits exactly the cells d3-geo finds within the radius', () => {
    // d3-geo geoDistance (great-circle angle) × R as the outside reference for membership.
    const cellCount = 25;
    fc.assert(fc.property(
      fc.double({ min: -90, max: 90, noNaN: true }),
      fc.double({ min: -180, max: 180, noNaN: true }),
      // noBias: without it the offsets crowd onto ±20 and 0, and few pairs sit near the radius.
      fc.noBias(fc.array(fc.tuple(fc.double({ min: -20, max: 20, noNaN: true }), fc.double({ min: -20, max: 20, noNaN: true })), { minLength: cellCount, maxLength: cellCount })),
      fc.integer({ min: 1, max: 8 }),
      (centreLat, centreLon, offsets, minCells) => {
        // Cells scattered within 20° of a centre anywhere, poles and antimeridian included.
        const lat = offsets.map(([d]) => Math.max(-90, Math.min(90, centreLat + d)));
        const lon = offsets.map(([, d]) => centreLon + d);
        const rows = lat.map((_, k) => [k, k, k] as const);
        const r = regionsOf([...rows], lat, lon, { radiusKm: 1500, minCells, minCollections: 0, trials: 1, seed: 0 });
        const members = lat.map((_, c) => lat.filter((__, k) => geoDistance([lon[c], lat[c]], [lon[k], lat[k]]) * EARTH_RADIUS_KM <= 1500).length);
        const kept = members.map((m, c) => (m >= minCells ? c : -1)).filter((c) => c >= 0);
        const borderline = lat.some((_, c) => lat.some((__, k) => Math.abs(geoDistance([lon[c], lat[c]], [lon[k], lat[k]]) * EARTH_RADIUS_KM - 1500) < 1e-6));
        fc.pre(!borderline);
        expect(Array.from(r.centreCell)).toEqual(kept);
        expect(Array.from(r.cellCount)).toEqual(kept.map((c) => members[c]));
        // One taxon per cell: each region's subsample of minCells cells has minCells taxa.
        r.richness.forEach((v) => expect(v).toBe(minCells));
      },
    ), { numRuns: 60 });
  });

  it('gives the same regions for the same seed', () => {
    const rows = Array.from({ length: 60 }, (_, k) => [k % 13, k % 17, k % 9] as const);
    const lat = Array.from({ length: 9 }, (_, k) => k * 2);
    const lon = Array.from({ length: 9 }, (_, k) => (k % 3) * 3);
    const settings = { radiusKm: 1500, minCells: 4, minCollections: 2, trials: 5, seed: 42 };
    expect(regionsOf([...rows], lat, lon, settings)).toEqual(regionsOf([...rows], lat, lon, settings));
  });
});
