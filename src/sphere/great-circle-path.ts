/**
 * Points along great circles, for drawing and for carrying polygon edges through a rotation: a
 * reader that joins vertices with straight lines (in longitude/latitude or in its projection)
 * then follows the true edge to within the step.
 */
import { RADIANS } from './earth';
import { unitVectorAngle } from './distance';
import { unitVectorsToDegreesInto, writeUnitVector } from './unit-vectors';

/** An arc this close to π radians joins near-antipodes: no one great circle joins them. */
export const ANTIPODAL_ARC = Math.PI - 1e-9;

/**
 * Appends to `out` the unit vectors (x, y, z) of the points that divide the great-circle arc
 * from vector i to vector j of `xyz` (interleaved [x0, y0, z0, x1, …]) into equal steps of at
 * most `maxStepRad`, both ends left out, by spherical linear interpolation (Shoemake 1985).
 * Returns the arc's angle in radians; when it exceeds ANTIPODAL_ARC nothing is appended and the
 * caller decides what an edge between antipodes means.
 */
export function appendArcInterior(xyz: Float64Array, i: number, j: number, maxStepRad: number, out: number[]): number {
  const theta = unitVectorAngle(xyz, i, j);
  if (theta > ANTIPODAL_ARC) return theta;
  const steps = Math.max(1, Math.ceil(theta / maxStepRad));
  const sinTheta = Math.sin(theta);
  const ax = xyz[3 * i], ay = xyz[3 * i + 1], az = xyz[3 * i + 2];
  const bx = xyz[3 * j], by = xyz[3 * j + 1], bz = xyz[3 * j + 2];
  for (let s = 1; s < steps; s++) {
    const ka = Math.sin(((steps - s) / steps) * theta) / sinTheta, kb = Math.sin((s / steps) * theta) / sinTheta;
    out.push(ka * ax + kb * bx, ka * ay + kb * by, ka * az + kb * bz);
  }
  return theta;
}

/**
 * Appends [lon, lat] pairs (degrees) of the great-circle arc from (lat0, lon0) to (lat1, lon1)
 * to `out`, leaving out the start point and ending with the end point; no step is longer than
 * `maxStepDeg`. Longitudes stay continuous with the previous vertex (they may run past ±180°),
 * so a path crossing the antimeridian is not drawn the long way round: `startLon` is the
 * longitude the start was written with. Returns the longitude written for the end point.
 * Antipodal ends have no unique arc: the end point is written alone.
 */
export function appendGreatCircleArc(
  lat0: number, lon0: number, lat1: number, lon1: number, maxStepDeg: number, startLon: number, out: number[],
): number {
  const ends = new Float64Array(6);
  writeUnitVector(lat0, lon0, ends, 0);
  writeUnitVector(lat1, lon1, ends, 3);
  const between: number[] = [];
  appendArcInterior(ends, 0, 1, maxStepDeg * RADIANS, between);
  const n = between.length / 3;
  const lat = new Float64Array(n), lon = new Float64Array(n);
  unitVectorsToDegreesInto(Float64Array.from(between), lat, lon);
  let previousLon = startLon;
  for (let k = 0; k < n; k++) {
    previousLon = continuousLongitude(lon[k], previousLon);
    out.push(previousLon, lat[k]);
  }
  previousLon = continuousLongitude(lon1, previousLon);
  out.push(previousLon, lat1);
  return previousLon;
}

/** The longitude equal to `lon` modulo 360° that lies within 180° of `previous`. */
export function continuousLongitude(lon: number, previous: number): number {
  return lon + 360 * Math.round((previous - lon) / 360);
}
