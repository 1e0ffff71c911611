/**
 * How far above the sphere to draw deck's geometry on the globe. deck draws flat triangles
 * between vertices on the sphere, so a triangle's inside dips below the surface (the sagitta of
 * a chord), while maplibre's globe mesh, finer, stays closer to it: without a lift the depth
 * test hides the insides of cells and breaks lines into dashes. A lift of R(1 − cos θ), θ the
 * angular radius of a spherical cap holding the triangle, keeps every point of it outside the
 * sphere (the convex hull of a cap lies beyond the cap's base plane, at R·cos θ from the centre).
 */
import { EARTH_RADIUS_KM } from '../../src/sphere/earth';

const EARTH_RADIUS_M = EARTH_RADIUS_KM * 1000;
const RAD = Math.PI / 180;
/** Added to every lift: the two renderers' spheres agree only to float precision (our margin, not derived). */
export const LIFT_MARGIN_M = 200;

/**
 * An upper bound, in degrees, of the great-circle angle between two positions (degrees): the
 * length of one path between them, along a parallel at the more poleward latitude and then along
 * a meridian. Longitudes are taken as given (continuous rings: no wrap-around).
 */
export function angleBoundDeg(lon1: number, lat1: number, lon2: number, lat2: number): number {
  const cosPoleward = Math.min(Math.cos(lat1 * RAD), Math.cos(lat2 * RAD));
  return Math.min(180, Math.abs(lat2 - lat1) + Math.abs(lon2 - lon1) * Math.max(0, cosPoleward));
}

/** Lift, metres, that keeps a flat triangle within a cap of angular radius `capDeg` outside the sphere. */
export function liftForCapMetres(capDeg: number): number {
  return EARTH_RADIUS_M * (1 - Math.cos(Math.min(90, capDeg) * RAD)) + LIFT_MARGIN_M;
}

/** A deck.gl modelMatrix (column-major) adding `metres` to the altitude of lon/lat/z positions. */
export function liftMatrix(metres: number): Float64Array {
  return Float64Array.of(1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 0, 0, metres, 1);
}

