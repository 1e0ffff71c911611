/**
 * Great-circle distance as a central angle (radians). The kernels use the arctangent form
 * (Vincenty 1975, Survey Review 23(176), the sphere case of his inverse formula), which keeps
 * full relative precision for coincident, nearby and antipodal points alike — unlike the
 * arccosine of the dot product (poor for small angles) or the haversine (poor near antipodes).
 */

/** Central angle in radians between two positions given in radians. */
export function centralAngle(lat1: number, lon1: number, lat2: number, lon2: number): number {
  const dLon = lon2 - lon1;
  const sinLat1 = Math.sin(lat1);
  const cosLat1 = Math.cos(lat1);
  const sinLat2 = Math.sin(lat2);
  const cosLat2 = Math.cos(lat2);
  const cosDLon = Math.cos(dLon);
  const a = cosLat2 * Math.sin(dLon);
  const b = cosLat1 * sinLat2 - sinLat1 * cosLat2 * cosDLon;
  return Math.atan2(Math.sqrt(a * a + b * b), sinLat1 * sinLat2 + cosLat1 * cosLat2 * cosDLon);
}

/**
 * Central angle in radians between unit vectors i and j of an interleaved array
 * [x0, y0, z0, x1, …]: atan2(|a × b|, a · b), the same form in vector terms.
 */
export function unitVectorAngle(xyz: Float64Array, i: number, j: number): number {
  const ax = xyz[3 * i], ay = xyz[3 * i + 1], az = xyz[3 * i + 2];
  const bx = xyz[3 * j], by = xyz[3 * j + 1], bz = xyz[3 * j + 2];
  const cx = ay * bz - az * by;
  const cy = az * bx - ax * bz;
  const cz = ax * by - ay * bx;
  return Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), ax * bx + ay * by + az * bz);
}
