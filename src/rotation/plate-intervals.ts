/**
 * Each plate's rotations relative to its parent, as intervals between consecutive tabulated
 * ages. Interval k runs from ages[k] to ages[k + 1] and holds the rotations at both ends
 * relative to one parent, so that the rotation in between is a slerp of the two.
 *
 * - A plate without a 0 Ma row is at its present-day position at 0 Ma: an identity rotation is
 *   put at 0 Ma, relative to the parent of its youngest interval.
 * - `relative_to` may change through time. Between two tabulated ages both rows must name the
 *   same parent; where the parent changes, the age of the change is tabulated twice, once
 *   relative to each parent, and the two rows end the younger interval and begin the older one.
 *   Between two ages whose rows name different parents nothing can be interpolated: an error.
 */
import type { PoleTable } from './pole-table';
import { ProblemList } from '../problems';
import { createQuaternion, quaternionFromPole, type Quaternion } from './quaternion';
import { SLERP_ARC_SIZE, slerpArcInto } from './slerp';

/** A 0 Ma row rotating by less than this (radians of the quaternion's vector part) is the identity. */
const IDENTITY_TOLERANCE = 1e-12;

export interface PlateIntervals {
  readonly plateId: number;
  /** Knot ages in Ma, increasing, from 0: interval k runs from ages[k] to ages[k + 1]. A plate
   * tabulated only at 0 Ma has the single interval [0, 0]. */
  readonly ages: Float64Array;
  /** Parent plate of each interval. */
  readonly parents: Int32Array;
  /** Rotation relative to the parent at the younger and at the older end of each interval. */
  readonly young: readonly Quaternion[];
  readonly old: readonly Quaternion[];
  /** The slerp arc from young to old of each interval, SLERP_ARC_SIZE numbers each: worked out
   * once here, as a model interpolates every interval at many ages. */
  readonly arcs: Float64Array;
}

/** A tabulated age of one plate: its rows there (one, or two across a change of parent);
 * none for the identity put at 0 Ma. */
interface Knot {
  readonly ageMa: number;
  readonly rows: number[];
}

function knotsOf(table: PoleTable, rows: readonly number[]): Knot[] {
  const sorted = [...rows].sort((a, b) => table.ageMa[a] - table.ageMa[b] || a - b);
  const knots: Knot[] = [];
  for (const r of sorted) {
    const last = knots[knots.length - 1];
    if (last !== undefined && last.ageMa === table.ageMa[r]) last.rows.push(r);
    else knots.push({ ageMa: table.ageMa[r], rows: [r] });
  }
  if (knots[0].ageMa > 0) knots.unshift({ ageMa: 0, rows: [] });
  return knots;
}

function rowQuaternion(table: PoleTable, r: number): Quaternion {
  return quaternionFromPole(table.poleLat[r], table.poleLon[r], table.angleDeg[r]);
}

function parentList(table: PoleTable, knot: Knot): string {
  return knot.rows.map((r) => `${table.relativeTo[r]} (line ${table.line[r]})`).join(' and ');
}

/**
 * The row of `younger` and of `older` naming the same parent, or a problem. The identity at
 * 0 Ma goes with any parent; where `older` holds a change of parent, the row already starting
 * the next older interval is not a candidate.
 */
function linkKnots(table: PoleTable, plate: number, younger: Knot, older: Knot, taken: number, problems: ProblemList): [number, number] | undefined {
  const pairs: Array<[number, number]> = [];
  for (const b of older.rows) {
    if (b === taken && older.rows.length === 2) continue;
    if (younger.rows.length === 0) pairs.push([-1, b]);
    for (const a of younger.rows) if (table.relativeTo[a] === table.relativeTo[b]) pairs.push([a, b]);
  }
  if (pairs.length === 1) return pairs[0];
  const first = older.rows[0];
  const span = `between ${younger.ageMa} and ${older.ageMa} Ma`;
  problems.add(pairs.length === 0
    ? {
      line: table.line[first], field: 'relative_to', value: String(table.relativeTo[first]),
      expected: `the same relative_to as plate ${plate} has at ${younger.ageMa} Ma, ${parentList(table, younger)}, or the age where it changes tabulated relative to both plates: otherwise nothing can be interpolated ${span}`,
    }
    : {
      line: table.line[first], field: 'relative_to', value: older.rows.map((r) => table.relativeTo[r]).join(' and '),
      expected: `a single parent for plate ${plate} ${span}, but ${younger.rows.length === 0 ? 'at 0 Ma every plate is at its present-day position and ' : ''}both parents are given at ${older.ageMa} Ma${younger.rows.length === 0 ? '' : ' and at ' + younger.ageMa + ' Ma'}`,
    });
  return undefined;
}

/** Links the knots oldest first, so that at a change of parent the row the older interval
 * takes leaves the other to the younger one; stops at the plate's first problem. */
function intervalsOf(table: PoleTable, plate: number, rows: readonly number[], problems: ProblemList, notes: string[]): PlateIntervals | undefined {
  const knots = knotsOf(table, rows);
  if (knots.length === 1) knots.push(knots[0]); // only 0 Ma rows: the single interval [0, 0]
  const n = knots.length - 1;
  const parents = new Int32Array(n), young: Quaternion[] = new Array(n), old: Quaternion[] = new Array(n);
  const used = new Set<number>();
  let taken = -1;
  for (let k = n - 1; k >= 0; k--) {
    const pair = linkKnots(table, plate, knots[k], knots[k + 1], taken, problems);
    if (pair === undefined) return undefined;
    const [a, b] = pair;
    parents[k] = table.relativeTo[b];
    young[k] = a < 0 ? createQuaternion() : rowQuaternion(table, a);
    old[k] = rowQuaternion(table, b);
    used.add(a).add(b);
    taken = a;
  }
  for (const r of rows) {
    if (!used.has(r)) notes.push(`line ${table.line[r]} (plate ${plate} at ${table.ageMa[r]} Ma relative to ${table.relativeTo[r]}) is not used: no neighbouring age of the plate is relative to ${table.relativeTo[r]}`);
    const q = rowQuaternion(table, r);
    if (table.ageMa[r] === 0 && Math.hypot(q[1], q[2], q[3]) > IDENTITY_TOLERANCE) {
      notes.push(`line ${table.line[r]}: the 0 Ma rotation of plate ${plate} is not the identity, so its present-day positions move at 0 Ma`);
    }
  }
  const arcs = new Float64Array(SLERP_ARC_SIZE * n);
  for (let k = 0; k < n; k++) slerpArcInto(young[k], old[k], arcs, SLERP_ARC_SIZE * k);
  return { plateId: plate, ages: Float64Array.from(knots, (k) => k.ageMa), parents, young, old, arcs };
}

/** The intervals of every plate in the table, by plate id; throws InputError on the
 * problems described above. Adds notes about unused rows and non-identity 0 Ma rows. */
export function plateIntervalsOf(table: PoleTable, notes: string[]): Map<number, PlateIntervals> {
  const rowsByPlate = new Map<number, number[]>();
  for (let r = 0; r < table.count; r++) {
    const list = rowsByPlate.get(table.plateId[r]);
    if (list === undefined) rowsByPlate.set(table.plateId[r], [r]);
    else list.push(r);
  }
  const problems = new ProblemList();
  const plates = new Map<number, PlateIntervals>();
  for (const [plate, rows] of [...rowsByPlate].sort((a, b) => a[0] - b[0])) {
    const intervals = intervalsOf(table, plate, rows, problems, notes);
    if (intervals !== undefined) plates.set(plate, intervals);
  }
  problems.throwIfAny(table.source);
  return plates;
}

/** Index of the interval of `p` holding `ageMa` — the first k with ageMa ≤ ages[k + 1], so an
 * age on a tabulated age belongs to the younger interval — or −1 beyond the plate's oldest age. */
export function intervalAt(p: PlateIntervals, ageMa: number): number {
  const n = p.parents.length;
  if (!(ageMa <= p.ages[n])) return -1;
  let lo = 0, hi = n - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (ageMa <= p.ages[mid + 1]) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}
