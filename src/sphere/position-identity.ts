/**
 * When two positions in degrees are the same place. Degree values are compared exactly, except
 * that −0 equals 0, longitude −180 equals 180, and every longitude at latitude ±90 is the pole.
 */

/** The latitude standing for the place (−0 becomes 0). */
export function canonicalLatitude(latDeg: number): number {
  return latDeg + 0;
}

/** The longitude standing for the place: 0 at either pole, 180 for −180, 0 for −0. */
export function canonicalLongitude(latDeg: number, lonDeg: number): number {
  if (latDeg === 90 || latDeg === -90) return 0;
  return lonDeg === -180 ? 180 : lonDeg + 0;
}

/** True when the two positions (degrees) name the same place. */
export function samePosition(lat1Deg: number, lon1Deg: number, lat2Deg: number, lon2Deg: number): boolean {
  return lat1Deg === lat2Deg && canonicalLongitude(lat1Deg, lon1Deg) === canonicalLongitude(lat2Deg, lon2Deg);
}
