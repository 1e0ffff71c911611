/**
 * Points along the great circle between two positions, for drawing: a map that joins vertices
 * with straight lines (in longitude/latitude or in its projection) then follows the true edge
 * to within the step. Longitudes stay continuous with the previous vertex (they may run past
 * ±180°), so a path crossing the antimeridian is not drawn the long way round.
 */
import { DEGREES, RADIANS } from './earth';

/**
 * Appends [lon, lat] pairs (degrees) of the great-circle arc from (lat0, lon0) to (lat1, lon1)
 * to `out`, leaving out the start point and ending with the end point; no step is longer than
 * `maxStepDeg`. `startLon` is the longitude the start was written with (continuous). Returns
 * the longitude written for the end point. Antipodal ends have no unique arc: the straight
 * end point is written alone.
 */
export function appendGreatCircleArc(
  lat0: number, lon0: number, lat1: number, lon1: number, maxStepDeg: number, startLon: number, out: number[],
): number {
  const phi0 = lat0 * RADIANS, lambda0 = lon0 * RADIANS, phi1 = lat1 * RADIANS, lambda1 = lon1 * RADIANS;
  const x0 = Math.cos(phi0) * Math.cos(lambda0), y0 = Math.cos(phi0) * Math.sin(lambda0), z0 = Math.sin(phi0);
  const x1 = Math.cos(phi1) * Math.cos(lambda1), y1 = Math.cos(phi1) * Math.sin(lambda1), z1 = Math.sin(phi1);
  // Angle by atan2(|a × b|, a · b): accurate for short and nearly antipodal arcs alike.
  const cx = y0 * z1 - z0 * y1, cy = z0 * x1 - x0 * z1, cz = x0 * y1 - y0 * x1;
  const angle = Math.atan2(Math.hypot(cx, cy, cz), x0 * x1 + y0 * y1 + z0 * z1);
  const steps = Math.PI - angle < 1e-12 ? 1 : Math.max(1, Math.ceil((angle * DEGREES) / maxStepDeg));
  const sinAngle = Math.sin(angle);
  let previousLon = startLon;
  for (let k = 1; k <= steps; k++) {
    let lat: number, lon: number;
    if (k === steps) {
      lat = lat1;
      lon = lon1;
    } else {
      // Spherical linear interpolation of the unit vectors (Shoemake 1985).
      const t = k / steps;
      const a = Math.sin((1 - t) * angle) / sinAngle, b = Math.sin(t * angle) / sinAngle;
      const x = a * x0 + b * x1, y = a * y0 + b * y1, z = a * z0 + b * z1;
      lat = Math.atan2(z, Math.hypot(x, y)) * DEGREES;
      lon = Math.atan2(y, x) * DEGREES;
    }
    lon = continuousLongitude(lon, previousLon);
    out.push(lon, lat);
    previousLon = lon;
  }
  return previousLon;
}

/** The longitude equal to `lon` modulo 360° that lies within 180° of `previous`. */
export function continuousLongitude(lon: number, previous: number): number {
  return lon + 360 * Math.round((previous - lon) / 360);
}
