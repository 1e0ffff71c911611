import { describe, expect, it } from 'vitest';
import { parseGridName } from '../../src/grid';
import { earthMoversDistanceSorted, latitudeBelts, occupiedCellsOf, prepareGapGrid } from '../../src/gaps';
import { summariseIndicators } from '../../src/indicators';

const g = prepareGapGrid(parseGridName('healpix:8'));
const sliceCount = 4;
let seed = 11;
const next = () => (seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 2 ** 32;
// Slice 2 has no occurrences; some rows are in no slice (−1).
const rows = 600;
const sliceOf = Int32Array.from({ length: rows }, () => [0, 1, 3, -1][Math.floor(next() * 4)]);
const latDeg = Float64Array.from({ length: rows }, () => 180 * next() - 90);
const lonDeg = Float64Array.from({ length: rows }, () => 360 * next() - 180);

/** Occupied cells as tallied: one entry per (slice, cell), ordered by slice then cell. */
function tallies() {
  const keys = new Set<number>();
  for (let i = 0; i < rows; i++) if (sliceOf[i] >= 0) keys.add(sliceOf[i] * g.grid.cellCount + g.grid.cellOf(latDeg[i], lonDeg[i]));
  const sorted = [...keys].sort((a, b) => a - b);
  const slice = Uint32Array.from(sorted, (k) => Math.floor(k / g.grid.cellCount));
  const cell = Uint32Array.from(sorted, (k) => k % g.grid.cellCount);
  const zeros = new Uint32Array(sorted.length);
  return { count: sorted.length, slice, cell, occurrences: zeros, collections: zeros, taxa: zeros };
}
const occupied = occupiedCellsOf(tallies(), sliceCount);
const available = Uint8Array.from({ length: g.grid.cellCount }, (_, c) => (g.centreLat[c] > -30 ? 1 : 0));
const bandOf = (lat: number, bandDeg: number) => Math.min(180 / bandDeg - 1, Math.floor((lat + 90) / bandDeg));

describe.each([10, 30])('latitude belts of %i°', (bandDeg) => {
  const belts = latitudeBelts(g, { sliceOf, latDeg, occupied, available }, bandDeg);
  const bands = 180 / bandDeg;

  it('count occurrences, occupied cells and available cells per slice and band as a plain count does', () => {
    for (let s = 0; s < sliceCount; s++) {
      for (let b = 0; b < bands; b++) {
        let occurrences = 0, cells = 0, avail = 0;
        for (let i = 0; i < rows; i++) if (sliceOf[i] === s && bandOf(latDeg[i], bandDeg) === b) occurrences++;
        for (let k = occupied.start[s]; k < occupied.start[s + 1]; k++) if (bandOf(g.centreLat[occupied.cell[k]], bandDeg) === b) cells++;
        for (let c = 0; c < g.grid.cellCount; c++) if (available[c] === 1 && bandOf(g.centreLat[c], bandDeg) === b) avail++;
        expect([belts.occurrences[s * bands + b], belts.occupiedCells[s * bands + b], belts.availableCells[s * bands + b]]).toEqual([occurrences, cells, avail]);
      }
    }
  });

  it('give shares that sum to 1 in every slice with occurrences, and none in a slice without', () => {
    for (let s = 0; s < sliceCount; s++) {
      const share = belts.occurrenceShare.subarray(s * bands, (s + 1) * bands);
      const cellShare = belts.occupiedShare.subarray(s * bands, (s + 1) * bands);
      if (s === 2) {
        expect([...share].every(Number.isNaN)).toBe(true);
        expect([...cellShare].every(Number.isNaN)).toBe(true);
      } else {
        expect(share.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
        expect(cellShare.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
      }
    }
  });

  it("give each slice's shift from the slice before as the earth mover's distance of their latitudes", () => {
    const sorted = (s: number) => latDeg.filter((_, i) => sliceOf[i] === s).sort();
    expect(belts.shiftDeg[0]).toBeNaN();
    expect(belts.shiftDeg[1]).toBe(earthMoversDistanceSorted(sorted(0), sorted(1)));
    expect(belts.shiftDeg[2]).toBeNaN();
    expect(belts.shiftDeg[3]).toBeNaN();
  });
});

describe('latitude belts with indicators', () => {
  it('carry the indicator summary and refuse one in other bands', () => {
    const kinds = ['coal', 'reef'];
    const summary = summariseIndicators(Int32Array.of(0, 1), Float64Array.of(10, -5), Uint32Array.of(0, 1), kinds, sliceCount, 10);
    expect(latitudeBelts(g, { sliceOf, latDeg, occupied, available, indicators: summary }, 10).indicators).toBe(summary);
    expect(() => latitudeBelts(g, { sliceOf, latDeg, occupied, available, indicators: summary }, 30)).toThrow(
      'Indicator summary has 4 slices in 10° bands: expected 4 slices in 30° bands.',
    );
  });

  it('refuse a band width that does not divide 180°', () => {
    expect(() => latitudeBelts(g, { sliceOf, latDeg, occupied, available }, 7)).toThrow('band width 7° must divide 180°');
  });
});
