/** A ring of [longitude, latitude] pairs in degrees. */
export type Ring = Array<[number, number]>;

/**
 * Splits a closed [lon, lat] ring whose longitudes run continuously past ±180° into rings that
 * each stay within [-180, 180], so that GeoJSON readers draw it on the right side (RFC 7946 §3.1.9).
 * Edges are taken as straight in lon/lat, which is why rings are densified before they get here.
 * Orientation is kept. A ring already within range is returned as the only part.
 */
export function splitAtAntimeridian(ring: Ring): Ring[] {
  let min = Infinity;
  let max = -Infinity;
  for (const [lon] of ring) {
    if (lon < min) min = lon;
    if (lon > max) max = lon;
  }
  if (min >= -180 && max <= 180) return [ring];
  // Shift the ring so that it crosses +180 only, then cut it there.
  const shift = min < -180 ? 360 : 0;
  const shifted: Ring = ring.map(([lon, lat]) => [lon + shift, lat]);
  const west = clipAtLongitude(shifted, 180, -1);
  const east = clipAtLongitude(shifted, 180, 1).map(([lon, lat]): [number, number] => [lon - 360, lat]);
  return [west, east].filter((part) => part.length >= 4);
}

/**
 * Sutherland–Hodgman clipping of a closed ring against the half-plane side·(lon − edge) ≥ 0
 * (side -1 keeps the west, +1 the east); the result is closed again. A vertex on the cut is
 * kept on both sides and is itself where its edges meet the cut: a crossing is put in only
 * where an edge passes strictly from one side to the other, so no position is repeated. A side
 * with no vertex off the cut has no area and gives no part (an empty ring).
 */
function clipAtLongitude(ring: Ring, edge: number, side: 1 | -1): Ring {
  const out: Ring = [];
  let offCut = false;
  for (let i = 0; i + 1 < ring.length; i++) {
    const [lon0, lat0] = ring[i];
    const [lon1, lat1] = ring[i + 1];
    const d0 = side * (lon0 - edge);
    const d1 = side * (lon1 - edge);
    if (d0 >= 0) out.push([lon0, lat0]);
    if (d0 > 0) offCut = true;
    if (d0 * d1 < 0) {
      const t = (edge - lon0) / (lon1 - lon0);
      out.push([edge, lat0 + t * (lat1 - lat0)]);
    }
  }
  if (!offCut) return [];
  out.push([out[0][0], out[0][1]]);
  return out;
}
