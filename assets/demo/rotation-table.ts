/**
 * The demo's own reading of a pole table: interpolation between tabulated ages and
 * composition along the plate chain. Kept small and separate from the production plate tree
 * in src/rotation on purpose, so each can check the other.
 *
 * Convention: each plate's rotation relative to its parent is interpolated at the wanted age
 * (slerp between the two bracketing tabulated ages), then the chain is composed:
 * total(P, t) = total(parent, t) ∘ relative(P, t), down to the fixed plate.
 */
import {
  createQuaternion, multiplyQuaternionsInto, quaternionFromPole, slerpQuaternionsInto, type Quaternion,
} from '../../src/rotation/quaternion';
import { FIXED_PLATE } from './world';

export interface PoleRow {
  readonly plateId: number;
  readonly ageMa: number;
  readonly poleLat: number;
  readonly poleLon: number;
  readonly angleDeg: number;
  readonly relativeTo: number;
}

interface PlateRotations {
  readonly relativeTo: number;
  /** Tabulated ages, increasing. */
  readonly ages: readonly number[];
  readonly rotations: readonly Quaternion[];
}

export type RotationModel = ReadonlyMap<number, PlateRotations>;

export const POLE_TABLE_HEADER = 'plate_id,age_ma,pole_lat,pole_lon,angle_deg,relative_to';

export function rotationModel(rows: readonly PoleRow[]): RotationModel {
  const model = new Map<number, { relativeTo: number; ages: number[]; rotations: Quaternion[] }>();
  const sorted = [...rows].sort((a, b) => a.plateId - b.plateId || a.ageMa - b.ageMa);
  for (const r of sorted) {
    const entry = model.get(r.plateId) ?? { relativeTo: r.relativeTo, ages: [], rotations: [] };
    entry.ages.push(r.ageMa);
    entry.rotations.push(quaternionFromPole(r.poleLat, r.poleLon, r.angleDeg));
    model.set(r.plateId, entry);
  }
  return model;
}

/** Rotation of `plateId` relative to its parent at `ageMa`, by slerp between tabulated ages. */
export function relativeRotationInto(model: RotationModel, plateId: number, ageMa: number, out: Quaternion): Quaternion {
  const plate = model.get(plateId);
  if (plate === undefined) throw new Error(`Plate ${plateId} is not in the pole table.`);
  const { ages, rotations } = plate;
  if (!(ageMa >= ages[0] && ageMa <= ages[ages.length - 1])) {
    throw new Error(`Age ${ageMa} Ma is outside the poles of plate ${plateId} (${ages[0]}–${ages[ages.length - 1]} Ma).`);
  }
  let k = 1;
  while (ages[k] < ageMa) k++;
  return slerpQuaternionsInto(rotations[k - 1], rotations[k], (ageMa - ages[k - 1]) / (ages[k] - ages[k - 1]), out);
}

/** Total rotation of `plateId` relative to the fixed plate at `ageMa`. */
export function totalRotationInto(model: RotationModel, plateId: number, ageMa: number, out: Quaternion): Quaternion {
  relativeRotationInto(model, plateId, ageMa, out);
  const step = createQuaternion();
  for (let p = model.get(plateId)?.relativeTo ?? FIXED_PLATE; p !== FIXED_PLATE; p = model.get(p)?.relativeTo ?? FIXED_PLATE) {
    multiplyQuaternionsInto(relativeRotationInto(model, p, ageMa, step), out, out);
  }
  return out;
}
