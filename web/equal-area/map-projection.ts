/**
 * The equal-area projections of the canvas map and its figures, and a fixed "reference" fit of
 * each. Geometry is projected once into reference pixels and then drawn at any size through an
 * affine frame (see map-frame.ts): fitting a projection to a box only changes its scale and
 * translation, so reference × frame is the projection fitted to that box.
 */
import { geoAzimuthalEqualArea, geoEqualEarth, geoPath, type GeoProjection, type GeoSphere } from 'd3-geo';

export const EQUAL_AREA_PROJECTIONS = ['equal-earth', 'polar-north', 'polar-south'] as const;
export type EqualAreaProjection = (typeof EQUAL_AREA_PROJECTIONS)[number];

export const SPHERE: GeoSphere = { type: 'Sphere' };

/** One line under every map and figure saying how it was drawn. */
export const PROJECTION_CAPTIONS: Readonly<Record<EqualAreaProjection, string>> = {
  'equal-earth': 'Equal Earth projection (equal-area), whole globe',
  'polar-north': 'Lambert azimuthal equal-area projection centred on the North Pole: northern hemisphere only',
  'polar-south': 'Lambert azimuthal equal-area projection centred on the South Pole: southern hemisphere only',
};

/** What each map is called in labels: "Equal Earth map of slice …". */
export const PROJECTION_NAMES: Readonly<Record<EqualAreaProjection, string>> = {
  'equal-earth': 'Equal Earth map',
  'polar-north': 'north polar equal-area map',
  'polar-south': 'south polar equal-area map',
};

/**
 * The polar maps clip at this angle from the pole, degrees: a hair inside 90°, because d3-geo
 * reads a polygon with a vertex exactly on its clip circle as the rest of the hemisphere (found
 * with HEALPix cells, whose corners lie on the equator). 1e-4° is about 11 m on the Earth and
 * keeps the clip's cosine above d3's 1e-6 tolerance for a hemisphere.
 */
export const POLAR_CLIP_DEG = 90 - 1e-4;

/** Side of the square the reference projections are fitted into, px. d3's adaptive resampling
 * keeps curves within 0.7 px of the truth at this size (its default precision), so within
 * 0.7/REFERENCE_SIZE of the map's width at any size drawn. */
export const REFERENCE_SIZE = 2048;

/**
 * A fresh, unfitted projection: Equal Earth (Šavrič, Patterson & Jenny 2018), or Lambert's
 * azimuthal equal-area turned to put a pole at the centre and clipped to its hemisphere.
 */
export function createProjection(kind: EqualAreaProjection): GeoProjection {
  switch (kind) {
    case 'equal-earth': return geoEqualEarth();
    case 'polar-north': return geoAzimuthalEqualArea().rotate([0, -90]).clipAngle(POLAR_CLIP_DEG);
    case 'polar-south': return geoAzimuthalEqualArea().rotate([0, 90]).clipAngle(POLAR_CLIP_DEG);
  }
}

/** The projection fitted to the box [x0, y0]–[x1, y1] (the sphere's outline touches it). */
export function fittedProjection(kind: EqualAreaProjection, x0: number, y0: number, x1: number, y1: number): GeoProjection {
  return createProjection(kind).fitExtent([[x0, y0], [x1, y1]], SPHERE);
}

export interface ReferenceProjection {
  readonly kind: EqualAreaProjection;
  readonly projection: GeoProjection;
  /** Outline of the drawn sphere in reference pixels: [[x0, y0], [x1, y1]]. */
  readonly bounds: readonly [readonly [number, number], readonly [number, number]];
}

export function referenceProjection(kind: EqualAreaProjection): ReferenceProjection {
  const projection = fittedProjection(kind, 0, 0, REFERENCE_SIZE, REFERENCE_SIZE);
  return { kind, projection, bounds: geoPath(projection).bounds(SPHERE) };
}

/**
 * Whether a position (degrees) lies on the drawn part of the globe: everywhere on Equal Earth,
 * within POLAR_CLIP_DEG of the pole on the polar maps (d3 keeps points strictly inside its clip).
 */
export function isOnMap(kind: EqualAreaProjection, latDeg: number): boolean {
  const edge = 90 - POLAR_CLIP_DEG;
  return kind === 'equal-earth' || (kind === 'polar-north' ? latDeg > edge : latDeg < -edge);
}
