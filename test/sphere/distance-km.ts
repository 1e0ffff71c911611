import { centralAngle } from '../../src/sphere/distance';
import { EARTH_RADIUS_KM, RADIANS } from '../../src/sphere/earth';

/** Great-circle distance in km between positions in degrees on the mean Earth sphere: R times the central angle. */
export function greatCircleDistanceKm(lat1: number, lon1: number, lat2: number, lon2: number): number {
  return EARTH_RADIUS_KM * centralAngle(lat1 * RADIANS, lon1 * RADIANS, lat2 * RADIANS, lon2 * RADIANS);
}
