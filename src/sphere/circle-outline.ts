import { DEGREES, RADIANS } from './earth';
import { splitAtAntimeridian, type Ring } from './split-antimeridian';

/** Vertices of a circle outline: a step of 4° of azimuth, short against the radii regions use. */
const CIRCLE_STEPS = 90;

// A vertex this close to ±180° would be written as the cut's own vertex: left out, so no position repeats.
const CUT_MARGIN_DEG = 1e-6;

/**
 * The outline of a spherical cap (centre in degrees, angular radius in radians, below π/2) as
 * GeoJSON polygon parts of [lon, lat] rings, counter-clockwise (RFC 7946 §3.1.6), cut at the
 * antimeridian (§3.1.9). A cap holding a pole becomes one ring running along its edge from −180°
 * to 180° and closed along the pole line, as a polar cell is. Edges are straight in lon/lat
 * between vertices on the circle.
 */
export function circleOutline(latDeg: number, lonDeg: number, angle: number): Ring[] {
  const points = circlePoints(latDeg, lonDeg, angle);
  const northPole = 90 - latDeg < angle * DEGREES;
  const southPole = 90 + latDeg < angle * DEGREES;
  if (!northPole && !southPole) {
    const ring = continuous(points);
    ring.push([ring[0][0], ring[0][1]]);
    return splitAtAntimeridian(ring);
  }
  return [poleRing(points, northPole ? 90 : -90)];
}

/** Points on the circle by decreasing azimuth (counter-clockwise seen from above), longitudes in [−180, 180). */
function circlePoints(latDeg: number, lonDeg: number, angle: number): Ring {
  const lat = latDeg * RADIANS;
  const lon = lonDeg * RADIANS;
  const points: Ring = [];
  for (let k = 0; k < CIRCLE_STEPS; k++) {
    const azimuth = (-2 * Math.PI * k) / CIRCLE_STEPS;
    const sinLat = Math.sin(lat) * Math.cos(angle) + Math.cos(lat) * Math.sin(angle) * Math.cos(azimuth);
    const lat2 = Math.asin(Math.max(-1, Math.min(1, sinLat)));
    const lon2 = lon + Math.atan2(Math.sin(azimuth) * Math.sin(angle) * Math.cos(lat), Math.cos(angle) - Math.sin(lat) * sinLat);
    points.push([wrap(lon2 * DEGREES), lat2 * DEGREES]);
  }
  return points;
}

function wrap(lonDeg: number): number {
  return ((((lonDeg + 180) % 360) + 360) % 360) - 180;
}

/** The points with each longitude within 180° of the one before (so the ring may run past ±180). */
function continuous(points: Ring): Ring {
  const out: Ring = [points[0]];
  for (let k = 1; k < points.length; k++) {
    const before = out[k - 1][0];
    let lon = points[k][0];
    while (lon - before > 180) lon -= 360;
    while (lon - before < -180) lon += 360;
    out.push([lon, points[k][1]]);
  }
  return out;
}

/**
 * A cap around a pole: its edge, taken eastward from where it crosses ±180°, then the pole line.
 * Counter-clockwise in lon/lat: north, the edge runs east and the pole line back west; south,
 * the pole line runs east and the edge back west.
 */
function poleRing(points: Ring, poleLat: 90 | -90): Ring {
  const unwrapped = continuous(points);
  const eastward = unwrapped[unwrapped.length - 1][0] > unwrapped[0][0] ? points : [...points].reverse();
  // The step that wraps from near +180 to near −180 is where the edge crosses the antimeridian.
  let after = eastward.findIndex((p, k) => k > 0 && p[0] < eastward[k - 1][0]);
  if (after < 0) after = 0;
  const before = eastward[(after + eastward.length - 1) % eastward.length];
  const next = eastward[after];
  const t = (180 - before[0]) / (next[0] + 360 - before[0]);
  const cutLat = before[1] + t * (next[1] - before[1]);
  const edge: Ring = [];
  for (let k = 0; k < eastward.length; k++) {
    const p = eastward[(after + k) % eastward.length];
    if (Math.abs(p[0]) < 180 - CUT_MARGIN_DEG) edge.push(p);
  }
  const east: Ring = [[-180, cutLat], ...edge, [180, cutLat]];
  const ring: Ring = poleLat === 90
    ? [...east, [180, 90], [-180, 90]]
    : [[-180, -90], [180, -90], ...east.reverse()];
  ring.push([ring[0][0], ring[0][1]]);
  return ring;
}
