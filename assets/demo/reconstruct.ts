/** Palaeoposition of a present-day site, with the demo's own reading of the pole table. */
import { createQuaternion, rotateVectorInto } from '../../src/rotation/quaternion';
import { totalRotationInto, type RotationModel } from './rotation-table';
import type { Vec3 } from './spherical';

/** Rotates the present-day unit vector of a site on `plateId` to its position at `ageMa`. */
export function palaeoPositionInto(
  model: RotationModel, plateId: number, ageMa: number, present: Vec3, out: Vec3,
): Vec3 {
  return rotateVectorInto(totalRotationInto(model, plateId, ageMa, createQuaternion()), present, out);
}
