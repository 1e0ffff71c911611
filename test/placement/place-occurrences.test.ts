import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  DEFAULT_PLACEMENT, PLACEMENT_STATUS, describeExclusion, placeOccurrences, type PlacementSettings,
} from '../../src/placement';
import type { RotationModel } from '../../src/rotation';
import type { OccurrenceTable } from '../../src/table';
import { assignSlices, equalBins, type AssignRule } from '../../src/time';
import { angleBetweenDeg, apply, matMul, poleMatrix, unit } from '../rotation/rodrigues';
import { POLES, modelOf, tableOf, type Row } from './rows';

// Reference: rotation matrices by Rodrigues' formula (test/rotation/rodrigues.ts), which uses no
// quaternions. Plate 1 turns about the x axis (pole 0°N 0°E) by 0.3° per Myr, so slerp between its
// two rows is a rotation about that axis by the linearly interpolated angle (a closed form); the
// y axis (0°N 90°E) then moves to latitude = the angle, longitude 90°.

const scale = equalBins(50, 100); // slice 0: 100–50 Ma (mid-age 75), slice 1: 50–0 Ma (mid-age 25)
const MIDPOINT: AssignRule = { kind: 'mid-age' };

const ROWS: Row[] = [
  /* 0 */ { oldestMa: 70, youngestMa: 50, palaeo: [10, 20], present: [0, 90], plateId: 1 },
  /* 1 */ { oldestMa: 30, youngestMa: 20, palaeo: [5, 5] },
  /* 2 */ { oldestMa: 40, youngestMa: 20, present: [0, 90], plateId: 1 },
  /* 3 */ { oldestMa: 30, youngestMa: 20, present: [10, 10] },
  /* 4 */ { oldestMa: 30, youngestMa: 20, present: [10, 10], plateId: 9 },
  /* 5 */ { oldestMa: 90, youngestMa: 60, present: [0, 0], plateId: 2 },
  /* 6 */ { oldestMa: 200, youngestMa: 150, present: [0, 90], plateId: 1 },
];

function place(rows: readonly Row[], model: RotationModel | undefined, settings: PlacementSettings = DEFAULT_PLACEMENT, rule = MIDPOINT) {
  const table = tableOf(rows);
  return placeOccurrences(table, assignSlices(table.oldestMa, table.youngestMa, scale, rule), scale, model, settings);
}

const latLonOf = (v: readonly number[]) => [Math.asin(v[2]) * (180 / Math.PI), Math.atan2(v[1], v[0]) * (180 / Math.PI)];

describe('placing rows on the palaeoglobe', () => {
  const model = modelOf(POLES);

  it('keeps the table palaeocoordinates where given and rotates lat/lon + plate_id to the slice mid-age otherwise', () => {
    const p = place(ROWS, model);
    expect([p.lat[0], p.lon[0], p.status[0]]).toEqual([10, 20, PLACEMENT_STATUS.fromTable]);
    expect([p.lat[1], p.lon[1], p.status[1]]).toEqual([5, 5, PLACEMENT_STATUS.fromTable]);
    // Row 2 is in the 50–0 Ma slice: mid-age 25 Ma, 7.5° about the x axis.
    expect(p.status[2]).toBe(PLACEMENT_STATUS.fromModel);
    expect(p.lat[2]).toBeCloseTo(7.5, 12);
    expect(p.lon[2]).toBeCloseTo(90, 12);
    expect(p.ageMa[2]).toBe(25);
    expect([p.fromTable, p.fromModel, p.clamped]).toEqual([2, 1, 0]);
  });

  it("rotates to each row's own age (the assignment's age) with rotate-at occurrence", () => {
    const p = place(ROWS, model, { rotateAt: 'occurrence', preferModel: false });
    expect(p.ageMa[2]).toBe(30); // mid-age of 40–20 Ma
    expect(p.lat[2]).toBeCloseTo(9, 12);
    const drawn = place(ROWS, model, { rotateAt: 'occurrence', preferModel: false }, { kind: 'draw', seed: 5 });
    const table = tableOf(ROWS);
    const assignment = assignSlices(table.oldestMa, table.youngestMa, scale, { kind: 'draw', seed: 5 });
    expect(drawn.ageMa[2]).toBe(assignment.age[2]);
    expect(drawn.lat[2]).toBeCloseTo(0.3 * assignment.age[2], 10);
  });

  it('with preferModel lets the model place rows that also have lat/lon and a plate, and keeps the table for the others', () => {
    const p = place(ROWS, model, { rotateAt: 'slice', preferModel: true });
    expect(p.status[0]).toBe(PLACEMENT_STATUS.fromModel);
    expect(p.lat[0]).toBeCloseTo(22.5, 12); // slice 100–50 Ma, mid-age 75 Ma
    expect(p.status[1]).toBe(PLACEMENT_STATUS.fromTable);
  });

  it('does not fall back to the table palaeocoordinates when the preferred model cannot place a row', () => {
    const p = place([{ oldestMa: 30, youngestMa: 20, palaeo: [1, 2], present: [0, 0], plateId: 9 }], model, { rotateAt: 'slice', preferModel: true });
    expect(p.status[0]).toBe(PLACEMENT_STATUS.plateNotInModel);
    expect(Number.isNaN(p.lat[0])).toBe(true);
  });

  it('leaves rows unplaced with their reason: no plate, a plate not in the model, beyond the model, no slice', () => {
    const p = place(ROWS, model);
    expect(Array.from(p.status.subarray(3))).toEqual([
      PLACEMENT_STATUS.noPlateId, PLACEMENT_STATUS.plateNotInModel, PLACEMENT_STATUS.beyondModel, PLACEMENT_STATUS.noSlice,
    ]);
    for (let i = 3; i < ROWS.length; i++) expect([p.lat[i], p.lon[i]]).toEqual([Number.NaN, Number.NaN]);
  });

  it('clamps an age beyond the model to the oldest age it reaches, when asked, as the composed Rodrigues rotation there', () => {
    const p = place(ROWS, modelOf(POLES, 'clamp'));
    expect(p.status[5]).toBe(PLACEMENT_STATUS.clamped);
    expect(p.ageMa[5]).toBe(50);
    expect(p.clamped).toBe(1);
    // At 50 Ma plate 2 turns 10° about the north pole relative to plate 1, which turns 15° about x:
    // total = plate 1's rotation after plate 2's own (DESIGN.md: relative_to frames compose).
    const m = matMul(poleMatrix(0, 0, 15), poleMatrix(90, 0, 10));
    const [lat, lon] = latLonOf(apply(m, unit(0, 0)));
    expect(angleBetweenDeg(unit(p.lat[5], p.lon[5]), unit(lat, lon))).toBeLessThan(1e-10);
  });

  it('without a model places only rows with palaeocoordinates, and says the others need one', () => {
    const p = place(ROWS, undefined);
    expect(p.status[2]).toBe(PLACEMENT_STATUS.needsModel);
    expect(p.fromTable).toBe(2);
    expect(p.fromModel).toBe(0);
  });

  it('with modelOnly never uses the table palaeocoordinates', () => {
    const p = place(ROWS, model, { rotateAt: 'slice', preferModel: false, modelOnly: true });
    expect(p.status[0]).toBe(PLACEMENT_STATUS.fromModel);
    expect(p.status[1]).toBe(PLACEMENT_STATUS.noPresentPosition);
    expect(p.fromTable).toBe(0);
  });

  it('names the plate, the age, the reach and the chain when a row is beyond the model', () => {
    const problem = describeExclusion('beyondModel', 2, 75, model, 'slice');
    expect(problem.field).toBe('age');
    expect(problem.reason).toBe("the slice's mid-age 75 Ma is older than poles.csv reaches for plate 2 (back to 50 Ma, chain 2 → 1 → 0); expected an age of at most 50 Ma, or --beyond-model clamp");
    expect(describeExclusion('plateNotInModel', 9, 25, model, 'slice').reason)
      .toBe('plate_id 9 is not in the rotation model poles.csv; expected one of its plates (1, 2; fixed plate 0)');
  });

  it('moves all rows of one slice and plate rigidly: great-circle distances between them are unchanged (property)', () => {
    const point = fc.tuple(fc.double({ min: -89, max: 89, noNaN: true }), fc.double({ min: -180, max: 180, noNaN: true }));
    fc.assert(fc.property(fc.array(point, { minLength: 2, maxLength: 20 }), fc.constantFrom(1, 2), (points, plateId) => {
      const rows = points.map((present) => ({ oldestMa: 40, youngestMa: 10, present, plateId }));
      const p = place(rows, model);
      for (let i = 1; i < rows.length; i++) {
        const before = angleBetweenDeg(unit(...points[0]), unit(...points[i]));
        const after = angleBetweenDeg(unit(p.lat[0], p.lon[0]), unit(p.lat[i], p.lon[i]));
        expect(Math.abs(after - before)).toBeLessThan(1e-9);
      }
    }), { seed: 42 });
  });

  it('places every row exactly once: counts add up and unplaced rows have no position (property)', () => {
    const row = fc.record({
      oldestMa: fc.double({ min: 0, max: 120, noNaN: true }),
      span: fc.double({ min: 0, max: 30, noNaN: true }),
      palaeo: fc.option(fc.tuple(fc.integer({ min: -90, max: 90 }), fc.integer({ min: -180, max: 180 }))),
      present: fc.option(fc.tuple(fc.integer({ min: -90, max: 90 }), fc.integer({ min: -180, max: 180 }))),
      plateId: fc.option(fc.constantFrom(0, 1, 2, 9)),
    });
    fc.assert(fc.property(fc.array(row, { minLength: 1, maxLength: 30 }), fc.boolean(), (drawn, preferModel) => {
      const rows: Row[] = drawn.map((r) => ({
        oldestMa: r.oldestMa, youngestMa: Math.max(0, r.oldestMa - r.span), palaeo: r.palaeo ?? (r.present === null ? [0, 0] : undefined),
        present: r.present ?? undefined, plateId: r.plateId ?? undefined,
      }));
      const table: OccurrenceTable = tableOf(rows);
      const p = place(rows, model, { rotateAt: 'slice', preferModel });
      let placed = 0;
      for (let i = 0; i < rows.length; i++) {
        const isPlaced = p.status[i] <= PLACEMENT_STATUS.clamped;
        if (isPlaced) placed++;
        expect(Number.isNaN(p.lat[i])).toBe(!isPlaced);
        if (p.status[i] === PLACEMENT_STATUS.fromTable) expect([p.lat[i], p.lon[i]]).toEqual([table.palaeoLat[i], table.palaeoLon[i]]);
      }
      expect(p.fromTable + p.fromModel).toBe(placed);
    }), { seed: 7 });
  });
});
