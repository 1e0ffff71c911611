/**
 * Polygons carried to an age by their plate's total rotation, as GeoJSON (RFC 7946) ready to
 * write: edges are read as great-circle arcs (as d3-geo reads them) and densified before the
 * rotation, so that a reader drawing straight lon/lat edges follows the same path; rings stay
 * closed and keep their orientation (a rotation of the sphere keeps it); rings that end up
 * crossing the antimeridian are cut there, and rings that end up around a pole are closed along
 * the pole line (see unwrap-ring.ts), so the result may have more parts than the input.
 * Input rings must follow RFC 7946 order (exteriors anticlockwise, holes clockwise): the polygon
 * is taken to lie on each ring's left, so a clockwise exterior would be read as its complement
 * once it encloses a pole. Readers of user files should check or rewind before calling.
 */
import type { MultiPolygon, Polygon, Position } from 'geojson';
import { ANTIPODAL_ARC, appendArcInterior, RADIANS, splitAtAntimeridian, writeUnitVector } from '../sphere';
import { rotationMatrixFromQuaternionInto } from './rotation-matrix';
import { unwrapRing, type LonLat } from './unwrap-ring';

/** Longest step between vertices after densifying, degrees of arc, unless told otherwise. */
export const DEFAULT_MAX_STEP_DEG = 1;

export interface GeometryReconstructionOptions {
  /** Longest step between vertices after densifying, degrees of arc (> 0). */
  readonly maxStepDeg?: number;
}

/** Unit vectors of a closed ring's points with each edge divided into equal great-circle
 * steps of at most `maxStep` radians, the closing point not repeated. */
function densifiedRing(ring: readonly Position[], maxStep: number, where: string): Float64Array {
  const last = ring.length - 1;
  if (ring.length < 4 || ring[0][0] !== ring[last][0] || ring[0][1] !== ring[last][1]) {
    throw new RangeError(`${where}: expected a closed ring of at least 4 positions, the last equal to the first.`);
  }
  const vertices = new Float64Array(3 * ring.length);
  for (let k = 0; k <= last; k++) writeUnitVector(ring[k][1], ring[k][0], vertices, 3 * k);
  const out: number[] = [];
  for (let k = 0; k < last; k++) {
    out.push(vertices[3 * k], vertices[3 * k + 1], vertices[3 * k + 2]);
    if (appendArcInterior(vertices, k, k + 1, maxStep, out) > ANTIPODAL_ARC) {
      throw new RangeError(`${where}, edge ${k + 1}: its ends are antipodal, so no single great circle joins them.`);
    }
  }
  return Float64Array.from(out);
}

function rotateInPlace(xyz: Float64Array, m: Float64Array): void {
  for (let o = 0; o < xyz.length; o += 3) {
    const x = xyz[o], y = xyz[o + 1], z = xyz[o + 2];
    xyz[o] = m[0] * x + m[1] * y + m[2] * z;
    xyz[o + 1] = m[3] * x + m[4] * y + m[5] * z;
    xyz[o + 2] = m[6] * x + m[7] * y + m[8] * z;
  }
}

/** Cuts a ring into parts within [−180, 180] with the antimeridian splitter (which cuts once),
 * again on any part still out of range: an unwrapped ring can lie anywhere in longitude and a
 * ring around a pole can span a little more than 360°. */
function partsInRange(ring: LonLat[]): LonLat[][] {
  const parts = splitAtAntimeridian(ring);
  return parts.length === 1 && parts[0] === ring ? parts : parts.flatMap(partsInRange);
}

/** Even–odd rule in the plane (Franklin's crossing test). */
function insideRing(lon: number, lat: number, ring: readonly LonLat[]): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i], [xj, yj] = ring[j];
    if (yi > lat !== yj > lat && lon < ((xj - xi) * (lat - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/**
 * The polygon whose exterior holds a hole part: the one holding most of the part's points off
 * the cut and pole lines. Points of a hole may lie on its exterior's cut or closing edges,
 * where a point-in-ring test can go either way; a majority is safe from those few.
 */
function ownerOf(hole: readonly LonLat[], polygons: LonLat[][][]): LonLat[][] {
  let best = polygons[0], bestVotes = -1;
  for (const p of polygons) {
    let votes = 0;
    for (const [lon, lat] of hole) if (Math.abs(lon) < 180 && Math.abs(lat) < 90 && insideRing(lon, lat, p[0])) votes++;
    if (votes > bestVotes) {
      best = p;
      bestVotes = votes;
    }
  }
  return best;
}

/** One polygon (exterior, then holes) rotated and cut: one or more polygons within range. */
function polygonParts(rings: readonly Position[][], m: Float64Array, maxStep: number, where: string): LonLat[][][] {
  const unwrapped = rings.map((ring, r) => {
    const xyz = densifiedRing(ring, maxStep, `${where}, ring ${r + 1}`);
    rotateInPlace(xyz, m);
    return unwrapRing(xyz, r === 0).ring;
  });
  // Cutting reduces every longitude to [−180, 180] wherever the unwrapping started, so the
  // rings of one polygon need no common offset first.
  const polygons = partsInRange(unwrapped[0]).map((exterior) => [exterior]);
  for (const part of unwrapped.slice(1).flatMap(partsInRange)) ownerOf(part, polygons).push(part);
  return polygons;
}

/**
 * The polygon or multipolygon turned by the rotation `q` (a unit quaternion, e.g. from
 * `RotationModel.rotationAt`), edges densified to at most `maxStepDeg` of arc. Returns a
 * Polygon when the result is one part, else a MultiPolygon; longitudes in [−180, 180].
 * Throws RangeError for an unclosed ring, an edge between antipodes, or a ring that winds
 * around a pole more than once.
 */
export function reconstructGeometry(
  geometry: Polygon | MultiPolygon, q: ArrayLike<number>, options: GeometryReconstructionOptions = {},
): Polygon | MultiPolygon {
  const maxStepDeg = options.maxStepDeg ?? DEFAULT_MAX_STEP_DEG;
  if (!(maxStepDeg > 0 && maxStepDeg < 180)) throw new RangeError(`maxStepDeg ${maxStepDeg} is not an angle between 0 and 180 degrees.`);
  const m = rotationMatrixFromQuaternionInto(q, new Float64Array(9));
  const polygons = geometry.type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates;
  const parts = polygons.flatMap((rings, p) =>
    polygonParts(rings, m, maxStepDeg * RADIANS, geometry.type === 'Polygon' ? 'polygon' : `polygon ${p + 1}`));
  return parts.length === 1 ? { type: 'Polygon', coordinates: parts[0] } : { type: 'MultiPolygon', coordinates: parts };
}
