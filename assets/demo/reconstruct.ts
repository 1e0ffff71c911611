/** Palaeoposition of a present-day site, by the production rotation model. */
import { createQuaternion, rotateVectorInto, type RotationModel } from '../../src/rotation';
import type { Vec3 } from './spherical';

/** Rotates the present-day unit vector of a site on `plateId` to its position at `ageMa`. */
export function palaeoPositionInto(
  model: RotationModel, plateId: number, ageMa: number, present: Vec3, out: Vec3,
): Vec3 {
  return rotateVectorInto(model.rotationAt(plateId, ageMa, createQuaternion()), present, out);
}
