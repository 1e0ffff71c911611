import { hullLever, spanWithoutDeg } from '../sphere';

/**
 * How much one place can move a slice's footprint (leave-one-out over its distinct places): a
 * single mis-dated or mis-placed row can stretch the hull and the latitude span on its own.
 */
export interface SliceLevers {
  /** The place whose removal shrinks the hull most (ties: the first met in the slice), degrees; NaN without a hull. */
  readonly hullLeverLat: number;
  readonly hullLeverLon: number;
  /** Hull area without that place, km²; NaN when no hull remains or there was none. */
  readonly hullWithoutKm2: number;
  /** Latitude span left after removing the place whose removal narrows it most, degrees; NaN for fewer than two places. */
  readonly spanWithoutDeg: number;
}

/** Levers of a slice's distinct places (degrees, and the same as unit vectors), given the hull ring measured over them. */
export function measureLevers(latDeg: Float64Array, lonDeg: Float64Array, xyz: Float64Array, hullRing: Uint32Array | undefined): SliceLevers {
  const lever = hullLever(xyz, hullRing);
  return {
    hullLeverLat: lever.place < 0 ? NaN : latDeg[lever.place],
    hullLeverLon: lever.place < 0 ? NaN : lonDeg[lever.place],
    hullWithoutKm2: lever.withoutKm2,
    spanWithoutDeg: spanWithoutDeg(latDeg),
  };
}
