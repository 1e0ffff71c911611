/**
 * Rows left out of every slice, with the reason: the slice assignment found none for their age,
 * or they could not be placed. One numbering for both, shared by the analysis and reconstruct.
 */
import type { SliceAssignment } from '../time/time-scale';
import type { Placement } from './place-occurrences';
import { PLACEMENT_STATUS, UNPLACED_FIELDS, UNPLACED_REASONS, UNPLACED_STATUSES, type UnplacedStatus } from './placement-status';

/** Rows that reached no slice or no position, with the reason (never dropped silently). */
export interface Exclusions {
  readonly rows: Uint32Array;
  /** Index into EXCLUSION_REASONS for each excluded row. */
  readonly reasons: Uint8Array;
}

/**
 * Why an accepted row is in no slice: indices 0–2 follow UNASSIGNED_REASONS 1–3 (the slice
 * assignment), the rest the placement statuses of UNPLACED_STATUSES, in that order.
 */
export const EXCLUSION_REASONS: readonly string[] = [
  'age range reaches outside the time slices, or into a gap between them; expected an age within the chosen bins',
  'age range spans more than one slice; the "within" rule needs it inside one slice',
  'no slice holds the required share of the age range (the "overlap" rule)',
  ...UNPLACED_STATUSES.map((s) => UNPLACED_REASONS[s]),
];
/** The field at fault (rejects.csv) for each exclusion reason. */
export const EXCLUSION_FIELDS: readonly string[] = ['age', 'age', 'age', ...UNPLACED_STATUSES.map((s) => UNPLACED_FIELDS[s])];

const ASSIGNMENT_REASONS = 3;
/** Exclusion index of each placement status (−1: placed, or in no slice). */
const EXCLUSION_OF_STATUS = Int8Array.from({ length: PLACEMENT_STATUS.noPresentPosition + 1 }, (_, status) => {
  const k = (UNPLACED_STATUSES as readonly number[]).indexOf(status);
  return k < 0 ? -1 : ASSIGNMENT_REASONS + k;
});

/** The placement status an exclusion reason stands for, or undefined for a slice-assignment reason. */
export function exclusionStatus(reason: number): UnplacedStatus | undefined {
  return reason < ASSIGNMENT_REASONS ? undefined : UNPLACED_STATUSES[reason - ASSIGNMENT_REASONS];
}

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
      reasons.push(assignment.reason[i] - 1);
    } else if (EXCLUSION_OF_STATUS[placement.status[i]] >= 0) {
      sliceOfRow[i] = -1;
      rows.push(i);
      reasons.push(EXCLUSION_OF_STATUS[placement.status[i]]);
    }
  }
  return { rows: Uint32Array.from(rows), reasons: Uint8Array.from(reasons) };
}
