/**
 * Palaeopositions of present-day points on plates, columnar. Rows sharing a (plate, age) share
 * one rotation, looked up once and turned into a 3×3 matrix; the loop over rows then only
 * converts degrees to a unit vector, multiplies by the matrix and converts back, in chunks so
 * that the working arrays stay small and are allocated once per call.
 */
import { degreesOfRowsInto, rotateRowsInto } from './rotation-kernels';
import { PlateAgeGroups } from './plate-age-groups';
import { createQuaternion, type Quaternion } from './quaternion';
import type { RotationModel } from './rotation-model';
import { rotationMatrixFromQuaternionInto } from './rotation-matrix';
import { ROTATION_STATUS } from './rotation-status';

/** Present-day positions with the plate each sits on. */
export interface PresentDayPoints {
  /** Degrees; NaN where a row has none. */
  readonly lat: Float64Array;
  readonly lon: Float64Array;
  /** Negative (NO_PLATE, −1) where a row has none. */
  readonly plateId: Int32Array;
}

export interface ReconstructedPoints {
  /** Palaeolatitude and palaeolongitude in degrees (longitude in [−180, 180]); NaN where the
   * row could not be reconstructed. */
  readonly lat: Float64Array;
  readonly lon: Float64Array;
  /** ROTATION_STATUS of each row: ok, clamped, or why it was not reconstructed. */
  readonly status: Uint8Array;
}

/** Rows per chunk: working arrays of 1024 rows fit in the first-level cache. */
const CHUNK = 1024;

/**
 * Rotates each row's present-day position by the total rotation of its plate at its age —
 * `ages` per row, or one age for all (Ma) — into `out`, and sets each row's status. A row is
 * reconstructed (status ok or clamped) when it has a plate id, a position within
 * [−90, 90] × [−180, 180], an age of 0 or more, and its plate reaches that age in the model
 * (or the model clamps); otherwise its position is NaN and its status says why.
 */
export function reconstructPointsInto(
  model: RotationModel, points: PresentDayPoints, ages: Float64Array | number, out: ReconstructedPoints,
): ReconstructedPoints {
  const n = points.lat.length;
  if (points.lon.length !== n || points.plateId.length !== n || (typeof ages !== 'number' && ages.length !== n)) {
    throw new RangeError(`Columns of different lengths: lat ${n}, lon ${points.lon.length}, plateId ${points.plateId.length}${typeof ages === 'number' ? '' : `, ages ${ages.length}`}.`);
  }
  if (out.lat.length < n || out.lon.length < n || out.status.length < n) throw new RangeError(`Output columns are shorter than the ${n} rows.`);
  const groups = new PlateAgeGroups();
  const work: Work = { matrices: new Float64Array(9 * 64), groupStatus: new Uint8Array(64), rowGroup: new Int32Array(CHUNK), xyz: new Float64Array(3 * CHUNK), rotation: createQuaternion() };
  for (let start = 0; start < n; start += CHUNK) {
    const end = Math.min(n, start + CHUNK);
    groupChunk(model, points, ages, start, end, groups, work, out.status);
    rotateRowsInto(points.lat, points.lon, start, end, work.rowGroup, work.matrices, work.xyz);
    degreesOfRowsInto(work.xyz, start, end, work.rowGroup, out.lat, out.lon);
  }
  return out;
}

/** Per call: each group's status and matrix, per chunk row its group (−1: not rotated) and
 * rotated unit vector, and the scratch rotation each new group is composed into. */
interface Work {
  matrices: Float64Array;
  groupStatus: Uint8Array;
  readonly rowGroup: Int32Array;
  readonly xyz: Float64Array;
  readonly rotation: Quaternion;
}

// The three passes over a chunk are separate functions so that V8 inlines the small kernels
// each calls (a call it does not inline passes numbers boxed, allocating).

/** Status and group of each row of the chunk; a new (plate, age) group gets its rotation. */
function groupChunk(
  model: RotationModel, points: PresentDayPoints, ages: Float64Array | number, start: number, end: number,
  groups: PlateAgeGroups, work: Work, outStatus: Uint8Array,
): void {
  const { lat, lon, plateId } = points, rowGroup = work.rowGroup;
  for (let i = start, j = 0; i < end; i++, j++) {
    const plate = plateId[i], la = lat[i], lo = lon[i];
    const age = typeof ages === 'number' ? ages : ages[i];
    let status: number, g = -1;
    if (plate < 0) status = ROTATION_STATUS.noPlateId;
    else if (!(la >= -90 && la <= 90 && lo >= -180 && lo <= 180)) status = ROTATION_STATUS.noPosition;
    else if (!(age >= 0)) status = ROTATION_STATUS.noAge;
    else {
      const known = groups.count;
      g = groups.groupOf(plate, age);
      if (g === known) resolveGroup(model, g, plate, age, work);
      status = work.groupStatus[g];
    }
    outStatus[i] = status;
    rowGroup[j] = status <= ROTATION_STATUS.clamped ? g : -1;
  }
}

function resolveGroup(model: RotationModel, g: number, plate: number, age: number, work: Work): void {
  if (g === work.groupStatus.length) {
    const m = new Float64Array(2 * work.matrices.length), s = new Uint8Array(2 * work.groupStatus.length);
    m.set(work.matrices);
    s.set(work.groupStatus);
    work.matrices = m;
    work.groupStatus = s;
  }
  work.groupStatus[g] = model.tryUncachedRotationAt(plate, age, work.rotation);
  if (work.groupStatus[g] <= ROTATION_STATUS.clamped) rotationMatrixFromQuaternionInto(work.rotation, work.matrices, 9 * g);
}
