import { geoArea } from 'd3-geo';
import { booleanValid, kinks, polygon } from '@turf/turf';
import type { MultiPolygon, Polygon, Position } from 'geojson';

// Every polygon we export must be accepted by readers on the sphere and in the plane.
// Outside references: @turf/turf's booleanValid (rings closed, at least 4 positions, no spike or
// puncture, holes inside) and kinks (no self-intersection, a repeated position counts as one),
// on the positions as written. Beside them two explicit checks, read on the sphere as s2 reads
// a ring (S2Loop validation, as R's sf uses it: "Edge i is degenerate (duplicate vertex)"):
// - no repeated consecutive position (the closing position excepted);
// - no zero-length edge: two consecutive positions that are one point of the sphere written
//   two ways, i.e. the same latitude with longitudes −180 and 180.
// What s2 calls degenerate is an edge between two equal unit vectors. s2 turns (φ, λ) into
// (cos φ cos λ, cos φ sin λ, sin φ), and in doubles cos(90°) is about 6e-17, not 0: two pole
// positions at different longitudes are two distinct vectors and the edge between them is not
// degenerate to s2 (checked by hand with R's s2 package, s2_is_valid_detail, on every polar
// cell here). That pole-line edge is kept on purpose: a planar reader (turf, a lon/lat map) needs
// it to fill a cell or outline up to the pole, RFC 7946 §3.1.9 style. So a pole-line edge is
// allowed, once between two meridian edges: a run of pole positions is at most two long, and
// its two longitudes differ (else it is a repeat).

export type Written = Polygon | MultiPolygon;

const partsOf = (g: Written): Position[][][] => (g.type === 'Polygon' ? [g.coordinates] : g.coordinates);

/** Problems of one ring, as sentences; empty when the ring passes the explicit checks. */
export function ringProblems(ring: Position[]): string[] {
  const problems: string[] = [];
  let poleRun = 0;
  for (let i = 0; i + 1 < ring.length; i++) {
    const [lon0, lat0] = ring[i], [lon1, lat1] = ring[i + 1];
    if (lon0 === lon1 && lat0 === lat1) problems.push(`position ${i} repeated: [${lon0}, ${lat0}]`);
    else if (lat0 === lat1 && Math.abs(lat0) !== 90 && Math.abs(lon0) === 180 && lon0 === -lon1) {
      problems.push(`zero-length edge ${i} across the antimeridian at latitude ${lat0}`);
    }
    poleRun = Math.abs(lat0) === 90 ? poleRun + 1 : 0;
    if (poleRun > 2) problems.push(`more than one pole-line edge in a row at position ${i}`);
  }
  return problems;
}

/** Every problem of a written geometry: the explicit checks, turf's booleanValid and kinks. */
export function geometryProblems(g: Written): string[] {
  const problems: string[] = [];
  if (!booleanValid(g)) problems.push('turf booleanValid: false');
  partsOf(g).forEach((rings, p) => {
    if (!booleanValid(polygon(rings))) problems.push(`part ${p}: turf booleanValid false`);
    const crossings = kinks(polygon(rings)).features.length;
    if (crossings > 0) problems.push(`part ${p}: ${crossings} turf kinks`);
    rings.forEach((ring, r) => problems.push(...ringProblems(ring).map((text) => `part ${p}, ring ${r}: ${text}`)));
  });
  return problems;
}

/** d3-geo area (sr) of a written geometry; d3 reads rings clockwise (STACK.md), so each is reversed. */
export const d3Area = (g: Written) =>
  partsOf(g).reduce((sum, rings) => sum + geoArea({ type: 'Polygon', coordinates: rings.map((r) => [...r].reverse()) }), 0);

