/**
 * Rows left out of every slice, with the reason: the slice assignment found none for their age,
 * or they could not be placed. Both are stored as EXCLUSION_CODE values (src/problems).
 */
import { EXCLUSIONS, EXCLUSION_CODE, NOT_EXCLUDED, type ExclusionName } from '../problems';
import type { SliceAssignment } from '../time';
import type { Placement } from './place-occurrences';
import { PLACEMENT_STATUS } from './placement-status';

/** Rows that reached no slice or no position, with the reason (never dropped silently). */
export interface Exclusions {
  readonly rows: Uint32Array;
  /** EXCLUSION_CODE of each excluded row. */
  readonly reasons: Uint8Array;
}

const isExclusion = (name: string): name is ExclusionName => name in EXCLUSIONS;

/**
 * Exclusion code of each placement status, matched by name; NOT_EXCLUDED for placed rows and
 * for rows in no slice (the slice assignment gives their reason).
 */
const EXCLUSION_OF_STATUS = (() => {
  const codes = new Uint8Array(Math.max(...Object.values(PLACEMENT_STATUS)) + 1).fill(NOT_EXCLUDED);
  for (const [name, status] of Object.entries(PLACEMENT_STATUS)) if (isExclusion(name)) codes[status] = EXCLUSION_CODE[name];
  return codes;
})();

/**
 * The rows in no slice or without a position, in row order, and marks the latter −1 in
 * `sliceOfRow` (the assignment's slice column, or a copy of it).
 */
export function collectExclusions(assignment: SliceAssignment, placement: Placement, sliceOfRow: Int32Array): Exclusions {
  const rows: number[] = [];
  const reasons: number[] = [];
  for (let i = 0; i < sliceOfRow.length; i++) {
    if (assignment.slice[i] < 0) {
      rows.push(i);
      reasons.push(assignment.reason[i]);
      continue;
    }
    const unplaced = EXCLUSION_OF_STATUS[placement.status[i]];
    if (unplaced !== NOT_EXCLUDED) {
      sliceOfRow[i] = -1;
      rows.push(i);
      reasons.push(unplaced);
    }
  }
  return { rows: Uint32Array.from(rows), reasons: Uint8Array.from(reasons) };
}
