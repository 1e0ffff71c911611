import { RADIANS } from '../sphere/earth';

/**
 * Angle between two positions (degrees in), in radians. Haversine form, which stays accurate
 * for the short steps of a densified cell edge (Sinnott 1984, Sky & Telescope 68:159).
 */
export function centralAngle(lat1Deg: number, lon1Deg: number, lat2Deg: number, lon2Deg: number): number {
  const sinHalfLat = Math.sin((lat2Deg - lat1Deg) * RADIANS * 0.5);
  const sinHalfLon = Math.sin((lon2Deg - lon1Deg) * RADIANS * 0.5);
  const h =
    sinHalfLat * sinHalfLat + Math.cos(lat1Deg * RADIANS) * Math.cos(lat2Deg * RADIANS) * sinHalfLon * sinHalfLon;
  return 2 * Math.asin(Math.min(1, Math.sqrt(h)));
}
