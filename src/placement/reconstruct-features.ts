/**
 * Base polygons carried to one slice's mid-age by their plates' total rotations. A feature whose
 * plate the model cannot take to that age is left out of the slice with a note saying why;
 * a clamped one is kept, with a note saying at which age it was placed.
 */
import type { MultiPolygon, Polygon } from 'geojson';
import {
  createQuaternion, reconstructGeometry, ROTATION_STATUS, type GeometryReconstructionOptions, type RotationModel,
} from '../rotation';
import { formatMa } from '../time';
import type { PlateFeature } from './plate-features';

export interface ReconstructedFeature {
  readonly feature: PlateFeature;
  /** Age in Ma the feature was reconstructed at: the slice's mid-age, or the clamped age. */
  readonly ageMa: number;
  readonly geometry: Polygon | MultiPolygon;
}

/** Something to tell about one feature in one slice (left out, or clamped). */
export interface ReconstructionNote {
  readonly feature: number;
  readonly plateId: number;
  /** Slice number from 1 (the oldest). */
  readonly slice: number;
  readonly sliceName: string;
  /** Age the feature was (or would have been) reconstructed at, Ma. */
  readonly ageMa: number;
  readonly note: string;
}

export interface SliceTarget {
  /** Slice number from 1 (the oldest). */
  readonly slice: number;
  readonly name: string;
  /** The slice's mid-age, Ma. */
  readonly ageMa: number;
}

/**
 * The features of one slice, reconstructed at `target.ageMa`, and the notes for it. Throws
 * Error naming the feature when its geometry cannot be carried (an edge between antipodes, a
 * ring winding around a pole more than once).
 */
export function reconstructFeaturesAt(
  features: readonly PlateFeature[], model: RotationModel, target: SliceTarget, options: GeometryReconstructionOptions = {},
): { features: ReconstructedFeature[]; notes: ReconstructionNote[] } {
  const kept: ReconstructedFeature[] = [];
  const notes: ReconstructionNote[] = [];
  const q = createQuaternion();
  const mid = formatMa(target.ageMa);
  for (const feature of features) {
    const { plateId } = feature;
    const status = model.tryRotationAt(plateId, target.ageMa, q);
    const note = (ageMa: number, text: string) => notes.push({ feature: feature.index, plateId, slice: target.slice, sliceName: target.name, ageMa, note: text });
    const reach = model.reachMa(plateId) ?? Number.NaN;
    if (status === ROTATION_STATUS.plateNotInModel) {
      note(target.ageMa, `left out: plate ${plateId} is not in the rotation model ${model.source}`);
      continue;
    }
    if (status === ROTATION_STATUS.beyondModel) {
      note(target.ageMa, `left out: the slice's mid-age ${mid} Ma is older than ${model.source} reaches for plate ${plateId} (back to ${formatMa(reach)} Ma); --beyond-model clamp would place it as at ${formatMa(reach)} Ma`);
      continue;
    }
    const ageMa = status === ROTATION_STATUS.clamped ? reach : target.ageMa;
    if (status === ROTATION_STATUS.clamped) {
      note(ageMa, `clamped: reconstructed at ${formatMa(reach)} Ma, the oldest age ${model.source} reaches for plate ${plateId} (the slice's mid-age is ${mid} Ma)`);
    }
    let geometry: Polygon | MultiPolygon;
    try {
      geometry = reconstructGeometry(feature.geometry, q, options);
    } catch (error) {
      throw new Error(`feature ${feature.index} (plate ${plateId}) at ${formatMa(ageMa)} Ma: ${error instanceof Error ? error.message : String(error)}`);
    }
    kept.push({ feature, ageMa, geometry });
  }
  return { features: kept, notes };
}
