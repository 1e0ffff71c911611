export {
  axisAngleFromQuaternionInto, createQuaternion, identityInto, multiplyQuaternionsInto,
  normalizeQuaternionInto, poleFromQuaternion, quaternionFromAxisAngleInto, quaternionFromPole, rotateVectorInto,
} from './quaternion';
export type { Quaternion, RotationPole } from './quaternion';
export { rotationMatrixFromQuaternionInto } from './rotation-matrix';
export { POLE_TABLE_COLUMNS, poleTableFromRecords } from './pole-table';
export type { PoleTable } from './pole-table';
export { BEYOND_MODEL, RotationModel, createRotationModel } from './rotation-model';
export type { BeyondModel, RotationModelOptions } from './rotation-model';
export { RotationLookupError } from './rotation-lookup-error';
export { ROTATION_STATUS } from './rotation-status';
export type { RotationStatus } from './rotation-status';
export { reconstructPointsInto } from './reconstruct-points';
export type { PresentDayPoints, ReconstructedPoints } from './reconstruct-points';
export { DEFAULT_MAX_STEP_DEG, reconstructGeometry } from './reconstruct-geometry';
export type { GeometryReconstructionOptions } from './reconstruct-geometry';
