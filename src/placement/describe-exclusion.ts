/**
 * Why one row is left out, for rejects.csv: the reason of EXCLUSIONS, worded with the row's own
 * plate and age where the rotation model can say more.
 */
import { EXCLUSIONS, type ExclusionName, type RowProblem } from '../problems';
import type { RotationModel } from '../rotation';
import { formatMa } from '../time';
import { ROTATE_AT, type RotateAt } from './place-occurrences';

const LISTED_PLATES = 12;

function plateList(model: RotationModel): string {
  const ids = model.plateIds();
  const shown = ids.length <= LISTED_PLATES ? ids.join(', ') : `${ids.slice(0, LISTED_PLATES).join(', ')}, … (${ids.length} in all)`;
  return `${shown}; fixed plate ${model.fixedPlate}`;
}

/**
 * Field and reason for a row left out for `name`. `plateId` and `ageMa` are the row's plate and
 * the age it was to be reconstructed at (Placement.ageMa); they are used only for reasons the
 * rotation model words (a plate it lacks, an age beyond its reach).
 */
export function describeExclusion(
  name: ExclusionName, plateId: number, ageMa: number, model: RotationModel | undefined, rotateAt: RotateAt,
): RowProblem {
  const { field, reason } = EXCLUSIONS[name];
  if (model === undefined) return { field, reason };
  switch (name) {
    case 'plateNotInModel':
      return { field, reason: `plate_id ${plateId} is not in the rotation model ${model.source}; expected one of its plates (${plateList(model)})` };
    case 'beyondModel': {
      const age = `${rotateAt === ROTATE_AT.slice ? "the slice's mid-age" : "the row's age"} ${formatMa(ageMa)} Ma`;
      const reach = model.reachMa(plateId) ?? Number.NaN;
      const chain = model.chainAt(plateId, reach).join(' → ');
      return {
        field,
        reason: `${age} is older than ${model.source} reaches for plate ${plateId} (back to ${formatMa(reach)} Ma, chain ${chain}); expected an age of at most ${formatMa(reach)} Ma, or --beyond-model clamp`,
      };
    }
    default:
      return { field, reason };
  }
}
