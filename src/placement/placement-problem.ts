/**
 * The reason one row could not be placed, with its own values, for rejects.csv: the field at
 * fault, the value, and what was expected.
 */
import type { RotationModel } from '../rotation';
import { formatMa } from '../time';
import { PLACEMENT_STATUS, UNPLACED_FIELDS, UNPLACED_REASONS, type UnplacedStatus } from './placement-status';
import { ROTATE_AT, type RotateAt } from './place-occurrences';

export interface PlacementProblem {
  readonly field: string;
  readonly reason: string;
}

const LISTED_PLATES = 12;

function plateList(model: RotationModel): string {
  const ids = model.plateIds();
  const shown = ids.length <= LISTED_PLATES ? ids.join(', ') : `${ids.slice(0, LISTED_PLATES).join(', ')}, … (${ids.length} in all)`;
  return `${shown}; fixed plate ${model.fixedPlate}`;
}

/**
 * Field and reason for a row whose placement status is one of UNPLACED_STATUSES. `plateId` and
 * `ageMa` are the row's plate and the age it was to be reconstructed at (Placement.ageMa).
 */
export function describePlacementProblem(
  status: UnplacedStatus, plateId: number, ageMa: number, model: RotationModel | undefined, rotateAt: RotateAt,
): PlacementProblem {
  const field = UNPLACED_FIELDS[status];
  if (model === undefined) return { field, reason: UNPLACED_REASONS[status] };
  const age = `${rotateAt === ROTATE_AT.slice ? "the slice's mid-age" : "the row's age"} ${formatMa(ageMa)} Ma`;
  switch (status) {
    case PLACEMENT_STATUS.plateNotInModel:
      return { field, reason: `plate_id ${plateId} is not in the rotation model ${model.source}; expected one of its plates (${plateList(model)})` };
    case PLACEMENT_STATUS.beyondModel: {
      const reach = model.reachMa(plateId) ?? Number.NaN;
      const chain = model.chainAt(plateId, reach).join(' → ');
      return {
        field,
        reason: `${age} is older than ${model.source} reaches for plate ${plateId} (back to ${formatMa(reach)} Ma, chain ${chain}); expected an age of at most ${formatMa(reach)} Ma, or --beyond-model clamp`,
      };
    }
    default:
      return { field, reason: UNPLACED_REASONS[status] };
  }
}
