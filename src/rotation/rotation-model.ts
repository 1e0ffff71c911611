/**
 * A rotation model: total rotations of plates from their present-day positions to any age, in
 * the frame of the fixed plate.
 *
 * Convention (the one the demo generator uses): at age t each plate's rotation relative to
 * its parent at t is interpolated by slerp between the two tabulated ages around t (shortest
 * path on the quaternion sphere), then the chain is composed down to the fixed plate:
 *   total(P, t) = total(parent(P, t), t) ∘ relative(P, t),
 * i.e. rotate by the plate's own relative rotation first, then by its parent's total.
 * Interpolating each link, not the totals, keeps a docked plate exactly on its parent. Two
 * tabulated rotations exactly half a turn apart have no single shortest path between them;
 * slerp then turns the way the older row's pole and angle are written.
 * The parent at t is the `relative_to` of the tabulated interval holding t; an age equal to a
 * tabulated age belongs to the younger interval. A plate without a 0 Ma row is at its
 * present-day position at 0 Ma (identity). The fixed plate is the one plate that appears only
 * as `relative_to`; its rotation is the identity at every age.
 */
import { intervalAt, plateIntervalsOf, type PlateIntervals } from './plate-intervals';
import { plateChainsOf, type PlateReach } from './plate-chains';
import type { PoleTable } from './pole-table';
import {
  createQuaternion, identityInto, multiplyQuaternionsInto, type Quaternion,
} from './quaternion';
import { SLERP_ARC_SIZE, slerpAlongArcInto } from './slerp';
import { RotationLookupError } from './rotation-lookup-error';
import { ROTATION_STATUS, type RotationStatus } from './rotation-status';

/** What to do with an age older than the model reaches for a plate. */
export const BEYOND_MODEL = { reject: 'reject', clamp: 'clamp' } as const;
export type BeyondModel = (typeof BEYOND_MODEL)[keyof typeof BEYOND_MODEL];

export interface RotationModelOptions {
  /** `reject` (default): an error, or status beyondModel; `clamp`: the rotation at the oldest
   * age the model reaches for the plate, status clamped. */
  readonly beyond?: BeyondModel;
}

/** Rotations kept per model before the cache starts afresh (each 4 doubles plus map entries). */
const MAX_CACHED_ROTATIONS = 1 << 16;

export class RotationModel {
  readonly source: string;
  readonly fixedPlate: number;
  readonly beyond: BeyondModel;
  /** What was accepted but should be told (from the table and the plate tree). */
  readonly notes: readonly string[];
  private readonly plates: ReadonlyMap<number, PlateIntervals>;
  private readonly reach: ReadonlyMap<number, PlateReach>;
  private readonly cache = new Map<number, Map<number, Quaternion>>();
  private cached = 0;

  constructor(table: PoleTable, options: RotationModelOptions = {}) {
    const notes = [...table.notes];
    this.plates = plateIntervalsOf(table, notes);
    const chains = plateChainsOf(table, this.plates);
    this.source = table.source;
    this.fixedPlate = chains.fixedPlate;
    this.reach = chains.reach;
    this.beyond = options.beyond ?? BEYOND_MODEL.reject;
    this.notes = notes;
  }

  /** Plates with poles, increasing (the fixed plate is not among them). */
  plateIds(): number[] {
    return [...this.plates.keys()];
  }

  /** True for a plate with poles and for the fixed plate. */
  hasPlate(plateId: number): boolean {
    return plateId === this.fixedPlate || this.plates.has(plateId);
  }

  /** Oldest age in Ma the model reaches for the plate (Infinity for the fixed plate), or
   * undefined for a plate not in the model. */
  reachMa(plateId: number): number | undefined {
    return plateId === this.fixedPlate ? Infinity : this.reach.get(plateId)?.reachMa;
  }

  /** The plates from `plateId` to the fixed plate at `ageMa`, stopping where a table ends. */
  chainAt(plateId: number, ageMa: number): number[] {
    const chain = [plateId];
    for (let p = this.plates.get(plateId); p !== undefined; p = this.plates.get(chain[chain.length - 1])) {
      const k = intervalAt(p, ageMa);
      if (k < 0) break;
      chain.push(p.parents[k]);
    }
    return chain;
  }

  /**
   * Writes the total rotation of `plateId` from the present day to `ageMa` (fixed frame) into
   * `out` and returns ok or clamped; or returns noAge (negative or NaN age), plateNotInModel or
   * beyondModel and leaves `out` as it was. Repeated (plate, age) pairs come from a cache.
   */
  tryRotationAt(plateId: number, ageMa: number, out: Quaternion): RotationStatus {
    return this.lookUp(plateId, ageMa, out, true);
  }

  /** As `tryRotationAt`, but composes the rotation afresh into `out` and keeps nothing: for
   * callers that ask for each (plate, age) once (reconstructPointsInto groups its rows), where
   * a cache entry per row's own age would only cost memory and garbage collection. */
  tryUncachedRotationAt(plateId: number, ageMa: number, out: Quaternion): RotationStatus {
    return this.lookUp(plateId, ageMa, out, false);
  }

  private lookUp(plateId: number, ageMa: number, out: Quaternion, cached: boolean): RotationStatus {
    if (!(ageMa >= 0)) return ROTATION_STATUS.noAge;
    if (plateId === this.fixedPlate) {
      identityInto(out);
      return ROTATION_STATUS.ok;
    }
    const reach = this.reach.get(plateId);
    if (reach === undefined) return ROTATION_STATUS.plateNotInModel;
    let status: RotationStatus = ROTATION_STATUS.ok;
    if (ageMa > reach.reachMa) {
      if (this.beyond === BEYOND_MODEL.reject) return ROTATION_STATUS.beyondModel;
      ageMa = reach.reachMa;
      status = ROTATION_STATUS.clamped;
    }
    if (cached) out.set(this.cachedTotal(plateId, ageMa));
    else this.totalInto(plateId, ageMa, out);
    return status;
  }

  /** As `tryRotationAt`, but throws RotationLookupError (or RangeError for a bad age) instead
   * of returning a failure. Under policy `clamp` an older age gives the rotation at `reachMa`
   * (`tryRotationAt` says when that happened). */
  rotationAt(plateId: number, ageMa: number, out: Quaternion = createQuaternion()): Quaternion {
    const status = this.tryRotationAt(plateId, ageMa, out);
    if (status === ROTATION_STATUS.noAge) throw new RangeError(`Age ${ageMa} Ma is not an age of 0 Ma or more.`);
    if (status === ROTATION_STATUS.plateNotInModel) {
      throw new RotationLookupError(status, plateId, ageMa, `Plate ${plateId} is not in the rotation model ${this.source} (plates with poles: ${listed(this.plateIds())}; fixed plate ${this.fixedPlate}).`);
    }
    if (status === ROTATION_STATUS.beyondModel) {
      const reach = this.reach.get(plateId)!;
      const limit = reach.limitedBy === plateId ? 'its own poles end there' : `the poles of plate ${reach.limitedBy} end there`;
      const chain = this.chainAt(plateId, reach.reachMa).join(' → ');
      throw new RotationLookupError(status, plateId, ageMa, `Plate ${plateId} can be reconstructed back to ${reach.reachMa} Ma with ${this.source} (chain ${chain}; ${limit}); ${ageMa} Ma is older.`);
    }
    return out;
  }

  private cachedTotal(plateId: number, ageMa: number): Quaternion {
    let byAge = this.cache.get(plateId);
    const hit = byAge?.get(ageMa);
    if (hit !== undefined) return hit;
    if (this.cached >= MAX_CACHED_ROTATIONS) {
      this.cache.clear();
      this.cached = 0;
      byAge = undefined;
    }
    if (byAge === undefined) this.cache.set(plateId, (byAge = new Map()));
    const total = this.totalInto(plateId, ageMa, createQuaternion());
    byAge.set(ageMa, total);
    this.cached++;
    return total;
  }

  /** total(P, t) = total(parent(P, t), t) ∘ relative(P, t) (see above), at an age every link
   * of the chain reaches. */
  private totalInto(plateId: number, ageMa: number, out: Quaternion): Quaternion {
    const parent = this.relativeInto(this.plates.get(plateId)!, ageMa, out);
    if (parent === this.fixedPlate) return out;
    return multiplyQuaternionsInto(this.totalInto(parent, ageMa, createQuaternion()), out, out);
  }

  /** Writes the rotation of `p` relative to its parent at `ageMa` and returns the parent. */
  private relativeInto(p: PlateIntervals, ageMa: number, out: Quaternion): number {
    const k = intervalAt(p, ageMa);
    const span = p.ages[k + 1] - p.ages[k];
    slerpAlongArcInto(p.young[k], p.arcs, SLERP_ARC_SIZE * k, span > 0 ? (ageMa - p.ages[k]) / span : 0, out);
    return p.parents[k];
  }
}

function listed(ids: readonly number[]): string {
  return ids.length <= 12 ? ids.join(', ') : `${ids.slice(0, 12).join(', ')}, … (${ids.length} in all)`;
}

/**
 * The rotation model of a validated pole table. Throws InputError when the table cannot
 * be one: rows that cannot be interpolated across a change of parent, not exactly one fixed
 * plate, or plates that form a cycle at some age.
 */
export function createRotationModel(table: PoleTable, options: RotationModelOptions = {}): RotationModel {
  return new RotationModel(table, options);
}
