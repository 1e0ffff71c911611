import { describe, expect, it } from 'vitest';
import { PLACEMENT_STATUS, collectExclusions, excludedRows, placeOccurrences } from '../../src/placement';
import { EXCLUSIONS, EXCLUSION_NAMES, EXCLUSION_STAGE, exclusionName } from '../../src/problems';
import { assignSlices, equalBins } from '../../src/time';
import { POLES, modelOf, tableOf, type Row } from './rows';

// Bins 100–0 Ma in steps of 25 (equal:25); the expected reason of each row is worked by hand
// from the placement rules (README, "Placement") and the slice assignment (DESIGN.md).
const SCALE = equalBins(25, 100);
const ROWS: readonly Row[] = [
  { oldestMa: 10, youngestMa: 10, palaeo: [10, 20] }, // placed from the table
  { oldestMa: 150, youngestMa: 150, palaeo: [10, 20] }, // older than every bin: ageOutside
  { oldestMa: 10, youngestMa: 10, present: [0, 0] }, // no plate id: noPlateId
  { oldestMa: 10, youngestMa: 10, present: [0, 0], plateId: 9 }, // plate 9 is not in POLES: plateNotInModel
  { oldestMa: 80, youngestMa: 80, present: [0, 0], plateId: 2 }, // plate 2 reaches back to 50 Ma: beyondModel
  { oldestMa: 30, youngestMa: 20, palaeo: [10, 20] }, // spans the 25 Ma boundary: spansSlices under "whole-range"
];

describe('the exclusion table', () => {
  it('gives every placement-stage reason the name of the placement status it stands for', () => {
    const placementNames = EXCLUSION_NAMES.filter((name) => EXCLUSIONS[name].stage === EXCLUSION_STAGE.placement);
    expect(placementNames.every((name) => name in PLACEMENT_STATUS)).toBe(true);
    expect(placementNames).toEqual(['needsModel', 'noPlateId', 'plateNotInModel', 'beyondModel', 'noPresentPosition']);
  });

  it('collects the rows of both stages with their named reason, in row order, and takes unplaced rows out of their slice', () => {
    const table = tableOf(ROWS);
    const model = modelOf(POLES);
    const assignment = assignSlices(table.oldestMa, table.youngestMa, SCALE, { kind: 'whole-range' });
    const placement = placeOccurrences(table, assignment, SCALE, model, { rotateAt: 'slice', preferModel: false });
    const sliceOfRow = Int32Array.from(assignment.slice);
    const exclusions = collectExclusions(assignment, placement, sliceOfRow);
    expect(Array.from(exclusions.rows)).toEqual([1, 2, 3, 4, 5]);
    expect(Array.from(exclusions.reasons, exclusionName)).toEqual(['ageOutside', 'noPlateId', 'plateNotInModel', 'beyondModel', 'spansSlices']);
    expect(Array.from(sliceOfRow)).toEqual([3, -1, -1, -1, -1, -1]);

    const rejects = excludedRows(table, exclusions, placement, model, 'slice', new Map([[3, 'original of line 3']]));
    expect(rejects.map((r) => [r.line, r.field])).toEqual([[3, 'age'], [4, 'plate_id'], [5, 'plate_id'], [6, 'age'], [7, 'age']]);
    expect(rejects[0]).toEqual({ line: 3, field: 'age', reason: EXCLUSIONS.ageOutside.reason, original: 'original of line 3' });
    expect(rejects[2].reason).toBe('plate_id 9 is not in the rotation model poles.csv; expected one of its plates (1, 2; fixed plate 0)');
    expect(rejects[3].reason).toContain("the slice's mid-age 87.5 Ma is older than poles.csv reaches for plate 2 (back to 50 Ma");
  });
});
