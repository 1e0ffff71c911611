import { describe, expect, it } from 'vitest';
import { FEW_PLACES_BELOW, SLICE_CAUTION, WIDE_HULL_SHARE, sliceCautions } from '../../src/footprint/slice-cautions';
import { degreesToUnitVectors } from '../../src/sphere/unit-vectors';
import { polygonAreaKm2 } from '../../src/sphere/polygon-area';

const R_KM = 6371.0088;
const RAD = Math.PI / 180;
/** Area of a spherical cap of angular radius ρ, 2πR²(1 − cos ρ) (Archimedes' hat-box theorem). */
const capKm2 = (radiusDeg: number) => 2 * Math.PI * R_KM ** 2 * (1 - Math.cos(radiusDeg * RAD));
const slice = (positions: number, hullKm2: number, hullNote?: string) => ({ occurrences: positions, positions, hullKm2, hullNote });
const codes = (s: ReturnType<typeof slice>) => sliceCautions(s).map((c) => c.code);

describe('slice cautions', () => {
  it('calls fewer than ten distinct places few, because one place then moves the spanning-tree length by more than a ninth', () => {
    // A spanning tree over n places has n − 1 edges: one place is on average 1/(n − 1) of its length.
    expect(1 / (FEW_PLACES_BELOW - 2)).toBeGreaterThan(1 / 9);
    expect(1 / (FEW_PLACES_BELOW - 1)).toBeLessThanOrEqual(1 / 9);
    expect(sliceCautions(slice(9, 1000))).toEqual([{ code: SLICE_CAUTION.fewPlaces, places: 9, fewerThan: 10 }]);
    expect(sliceCautions(slice(10, 1000))).toEqual([]);
  });

  it('says why there is no hull, and that two places are few', () => {
    expect(sliceCautions(slice(2, NaN, 'fewer than three distinct positions'))).toEqual([
      { code: SLICE_CAUTION.fewPlaces, places: 2, fewerThan: 10 },
      { code: SLICE_CAUTION.noHull, reason: 'fewer than three distinct positions' },
    ]);
    expect(codes(slice(500, NaN, 'positions do not fit in an open hemisphere'))).toEqual([SLICE_CAUTION.noHull]);
  });

  it('calls a hull wide from the area of a cap of arccos(0.3) ≈ 72.5° radius, 35% of the sphere', () => {
    const edgeDeg = Math.acos(1 - 2 * WIDE_HULL_SHARE) / RAD;
    expect(edgeDeg).toBeCloseTo(72.54, 2);
    expect(codes(slice(100, capKm2(edgeDeg - 0.1)))).toEqual([]);
    const wide = sliceCautions(slice(100, capKm2(edgeDeg + 0.1)));
    expect(wide).toEqual([{ code: SLICE_CAUTION.wideHull, sphereShare: expect.closeTo((1 - Math.cos((edgeDeg + 0.1) * RAD)) / 2, 12), above: WIDE_HULL_SHARE }]);
    // Four places just north of the equator, a quarter turn apart: nearly the northern hemisphere.
    const lat = Float64Array.of(1, 1, 1, 1), lon = Float64Array.of(-180, -90, 0, 90);
    expect(codes(slice(100, polygonAreaKm2(degreesToUnitVectors(lat, lon))))).toEqual([SLICE_CAUTION.wideHull]);
  });

  it('says only that an empty slice is empty', () => {
    expect(sliceCautions({ occurrences: 0, positions: 0, hullKm2: NaN, hullNote: 'fewer than three distinct positions' }))
      .toEqual([{ code: SLICE_CAUTION.noOccurrences }]);
  });
});
