/**
 * Landmass outlines: blobby rings that are star-shaped about their centre (the radius is a
 * positive function of bearing), so they cannot intersect themselves. Vertices run in order
 * of decreasing bearing, i.e. counter-clockwise seen from above (RFC 7946 exterior order).
 */
import { latOfVector, lonOfVector, vectorFromLatLonInto, destinationInto, type Vec3 } from './spherical';
import { randomIndex, uniform, weightedIndex, type Rng } from './random';
import type { LandmassDesign } from './world';

/** Harmonics 2…6 of the outline; each amplitude at most 0.09, so the radius stays within
 * [0.55, 1.45] of the mean. */
const HARMONICS = [2, 3, 4, 5, 6] as const;
const MAX_AMPLITUDE = 0.09;

/** Sites keep this fraction of the distance to the outline, leaving a margin of land. */
const SITE_REACH = 0.88;

export interface Landmass {
  readonly plateId: number;
  readonly name: string;
  readonly centre: Vec3;
  /** Radius (degrees) at vertex i, which lies at bearing 360·i/n degrees. */
  readonly radii: Float64Array;
  /** Closed ring of [lon, lat], counter-clockwise, coordinates unrounded. */
  readonly ring: ReadonlyArray<readonly [number, number]>;
}

export function buildLandmass(design: LandmassDesign, name: string, rng: Rng): Landmass {
  const n = design.vertexCount;
  const terms = HARMONICS.map((k) => ({ k, a: uniform(rng, 0.02, MAX_AMPLITUDE), phase: uniform(rng, 0, 2 * Math.PI) }));
  const radii = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const beta = (2 * Math.PI * i) / n;
    radii[i] = design.radiusDeg * (1 + terms.reduce((s, t) => s + t.a * Math.cos(t.k * beta + t.phase), 0));
  }
  const centre = vectorFromLatLonInto(design.lat, design.lon, new Float64Array(3));
  const ring: Array<readonly [number, number]> = [];
  const p = new Float64Array(3);
  for (let j = 0; j <= n; j++) {
    const i = (n - j) % n; // 0, n−1, …, 1, 0: decreasing bearing
    destinationInto(centre, (360 * i) / n, radii[i], p);
    ring.push([lonOfVector(p), latOfVector(p)]);
  }
  return { plateId: design.plateId, name, centre, radii, ring };
}

/**
 * A site inside the landmass: a random bearing between two neighbouring vertices and a
 * distance short of the chord between them. The triangle (centre, vertex i, vertex i+1) holds
 * the one with both radii cut to their minimum, whose edge is at least min(rᵢ, rᵢ₊₁)·cos(Δ/2)
 * from the centre (to first order on a small cap), so the site is inside with a margin.
 */
export function siteInto(land: Landmass, rng: Rng, out: Vec3): Vec3 {
  const n = land.radii.length, i = randomIndex(rng, n);
  const step = 360 / n, u = rng();
  const reach = Math.min(land.radii[i], land.radii[(i + 1) % n]) * Math.cos((step / 2) * (Math.PI / 180));
  // √v spreads sites evenly over the area of the sector instead of crowding the centre.
  return destinationInto(land.centre, (i + u) * step, SITE_REACH * reach * Math.sqrt(rng()), out);
}

/** A landmass drawn with probability proportional to its mean radius squared (≈ its area). */
export function pickByArea(rng: Rng, lands: readonly Landmass[]): Landmass {
  const weights = lands.map((l) => l.radii.reduce((s, r) => s + r * r, 0));
  return lands[weightedIndex(rng, weights, weights.reduce((a, b) => a + b, 0))];
}
