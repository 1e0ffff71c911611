/**
 * The palaeoposition of every row: from the table's palaeocoordinates, or by turning its
 * present-day lat/lon with the rotation model of its plate, or none, with the reason.
 *
 * Rules (README, "Placement"):
 * - A row with palaeo_lat/palaeo_lon keeps them, unless `preferModel` and the row also has
 *   lat/lon and a plate id: then the model places it, and if the model cannot, the row is left
 *   unplaced with the model's reason (the table's values are not used as a fallback, so that one
 *   slice never mixes two reconstructions without saying so).
 * - Otherwise lat/lon + plate_id are rotated: to the mid-age of the row's slice (`slice`, so
 *   every point of a slice shares one reconstruction with the base polygons), or to the row's own
 *   age from the slice assignment (`occurrence`: the mid-age of the range, or the draw).
 * - `modelOnly` (the rotate command) ignores the table's palaeocoordinates altogether.
 * - A row in no slice is not placed (PLACEMENT_STATUS.noSlice): it has no age to be placed at.
 */
import { reconstructPointsInto, ROTATION_STATUS, type RotationModel } from '../rotation';
import type { OccurrenceTable } from '../table/occurrence-table';
import type { SliceAssignment, TimeScale } from '../time/time-scale';
import { PLACEMENT_STATUS } from './placement-status';

/** The age a row is reconstructed at. */
export const ROTATE_AT = { slice: 'slice', occurrence: 'occurrence' } as const;
export type RotateAt = (typeof ROTATE_AT)[keyof typeof ROTATE_AT];

export interface PlacementSettings {
  readonly rotateAt: RotateAt;
  /** Rows with lat/lon + plate_id are placed by the model even when the table has palaeocoordinates. */
  readonly preferModel: boolean;
  /** Every row is placed by the model; the table's palaeocoordinates are never used. */
  readonly modelOnly?: boolean;
}

export const DEFAULT_PLACEMENT: PlacementSettings = { rotateAt: ROTATE_AT.slice, preferModel: false };

export interface Placement {
  /** Palaeolatitude and palaeolongitude of each row, degrees; NaN where the row is not placed. */
  readonly lat: Float64Array;
  readonly lon: Float64Array;
  /** PLACEMENT_STATUS of each row. */
  readonly status: Uint8Array;
  /** Age in Ma the model was asked to place the row at (the age it was placed at when clamped);
   * NaN for rows placed from the table or not given to the model. */
  readonly ageMa: Float64Array;
  /** Rows placed from the table, by the model (clamped included), and clamped. */
  readonly fromTable: number;
  readonly fromModel: number;
  readonly clamped: number;
}

/** The placement status of a row the model did not rotate. The rows given to the model have an
 * age and an in-range position (the reader checks ranges), so noPosition and noAge are mapped
 * only for completeness. */
const FROM_ROTATION_STATUS: Readonly<Record<number, number>> = {
  [ROTATION_STATUS.noPlateId]: PLACEMENT_STATUS.noPlateId,
  [ROTATION_STATUS.plateNotInModel]: PLACEMENT_STATUS.plateNotInModel,
  [ROTATION_STATUS.beyondModel]: PLACEMENT_STATUS.beyondModel,
  [ROTATION_STATUS.noPosition]: PLACEMENT_STATUS.noPresentPosition,
  [ROTATION_STATUS.noAge]: PLACEMENT_STATUS.noSlice,
};

/** Rows per reconstructPointsInto call: its (plate, age) groups and their matrices live for one
 * call, so where every row has its own age (--rotate-at occurrence with --assign draw) they
 * stay a few MB instead of growing with the table. */
const ROWS_PER_CALL = 1 << 16;

/** Mid-age of each slice, Ma. */
function sliceMidAges(scale: TimeScale): Float64Array {
  return Float64Array.from(scale.baseMa, (base, s) => 0.5 * (base + scale.topMa[s]));
}

/**
 * Places every row of `table` given its slice assignment (slice and age per row, from
 * assignSlices on the same table and `scale`). Without a model only table palaeocoordinates
 * are used. Rows to be rotated get their age, the others NaN, and reconstructPointsInto (called
 * on runs of ROWS_PER_CALL rows) groups rows by (plate, age), so a slice's rows on one plate
 * share one rotation matrix.
 */
export function placeOccurrences(
  table: OccurrenceTable, assignment: SliceAssignment, scale: TimeScale, model: RotationModel | undefined, settings: PlacementSettings,
): Placement {
  const n = table.count;
  const lat = new Float64Array(n), lon = new Float64Array(n), status = new Uint8Array(n);
  const ageMa = new Float64Array(n).fill(Number.NaN);
  const midAge = sliceMidAges(scale);
  const bySlice = settings.rotateAt === ROTATE_AT.slice;
  const modelOnly = settings.modelOnly === true;
  const preferModel = settings.preferModel && model !== undefined;
  let toRotate = 0;
  for (let i = 0; i < n; i++) {
    const s = assignment.slice[i];
    const hasPalaeo = !Number.isNaN(table.palaeoLat[i]);
    const hasPresent = !Number.isNaN(table.lat[i]);
    let st: number;
    if (s < 0) st = PLACEMENT_STATUS.noSlice;
    else if (!modelOnly && hasPalaeo && !(preferModel && hasPresent && table.plateId[i] >= 0)) st = PLACEMENT_STATUS.fromTable;
    else if (model === undefined) st = PLACEMENT_STATUS.needsModel;
    else if (!hasPresent) st = PLACEMENT_STATUS.noPresentPosition;
    else {
      st = PLACEMENT_STATUS.fromModel; // provisional: the model has the last word below
      ageMa[i] = bySlice ? midAge[s] : assignment.age[i];
      toRotate++;
    }
    status[i] = st;
    if (st === PLACEMENT_STATUS.fromTable) {
      lat[i] = table.palaeoLat[i];
      lon[i] = table.palaeoLon[i];
    } else {
      lat[i] = Number.NaN;
      lon[i] = Number.NaN;
    }
  }
  let clamped = 0;
  if (model !== undefined && toRotate > 0) clamped = rotateRows(model, table, ageMa, lat, lon, status);
  let fromTable = 0, fromModel = 0;
  for (let i = 0; i < n; i++) {
    if (status[i] === PLACEMENT_STATUS.fromTable) fromTable++;
    else if (status[i] === PLACEMENT_STATUS.fromModel || status[i] === PLACEMENT_STATUS.clamped) fromModel++;
  }
  return { lat, lon, status, ageMa, fromTable, fromModel, clamped };
}

/**
 * Rotates the rows whose age is set (the others have NaN and come back with status noAge,
 * which is ignored), writing positions of the rotated rows into lat/lon and turning their
 * provisional status into the model's verdict. Returns the number clamped.
 */
function rotateRows(
  model: RotationModel, table: OccurrenceTable, ageMa: Float64Array, lat: Float64Array, lon: Float64Array, status: Uint8Array,
): number {
  const n = table.count;
  const size = Math.min(n, ROWS_PER_CALL);
  const rotated = { lat: new Float64Array(size), lon: new Float64Array(size), status: new Uint8Array(size) };
  let clamped = 0;
  for (let a = 0; a < n; a += ROWS_PER_CALL) {
    const b = Math.min(n, a + ROWS_PER_CALL);
    const out = b - a === size ? rotated : { lat: rotated.lat.subarray(0, b - a), lon: rotated.lon.subarray(0, b - a), status: rotated.status.subarray(0, b - a) };
    const rows = { lat: table.lat.subarray(a, b), lon: table.lon.subarray(a, b), plateId: table.plateId.subarray(a, b) };
    reconstructPointsInto(model, rows, ageMa.subarray(a, b), out);
    for (let i = a; i < b; i++) {
      if (status[i] !== PLACEMENT_STATUS.fromModel) continue;
      const verdict = out.status[i - a];
      if (verdict !== ROTATION_STATUS.ok && verdict !== ROTATION_STATUS.clamped) {
        status[i] = FROM_ROTATION_STATUS[verdict];
        continue;
      }
      lat[i] = out.lat[i - a];
      lon[i] = out.lon[i - a];
      if (verdict === ROTATION_STATUS.clamped) {
        status[i] = PLACEMENT_STATUS.clamped;
        ageMa[i] = model.reachMa(table.plateId[i]) ?? Number.NaN;
        clamped++;
      }
    }
  }
  return clamped;
}
