/**
 * The cautions that go with one slice's footprint numbers (README "Read the numbers with
 * care"), decided once here as data, a code and the numbers behind it, and worded by each front
 * end.
 */
import { EARTH_RADIUS_KM } from '../sphere';

export const SLICE_CAUTION = {
  /** Nothing in the slice: every measure is empty. */
  noOccurrences: 'noOccurrences',
  /** Too few distinct places for the measures to be steady. */
  fewPlaces: 'fewPlaces',
  /** Occurrences but no convex hull, and why. */
  noHull: 'noHull',
  /** A hull close to a hemisphere, governed by a few outlying places. */
  wideHull: 'wideHull',
} as const;

export type SliceCaution =
  | { readonly code: typeof SLICE_CAUTION.noOccurrences }
  | { readonly code: typeof SLICE_CAUTION.fewPlaces; readonly places: number; readonly fewerThan: number }
  | { readonly code: typeof SLICE_CAUTION.noHull; readonly reason: string }
  | { readonly code: typeof SLICE_CAUTION.wideHull; readonly sphereShare: number; readonly above: number };

/**
 * Fewer distinct places than this are "few". A spanning tree over n places has n − 1 edges, so
 * one place more or less adds or removes on average 1/(n − 1) of its length: below ten places
 * that is more than a ninth, and the hull area and latitude span hang on as few extreme places.
 */
export const FEW_PLACES_BELOW = 10;

/**
 * A hull covering more than this share of the sphere is "close to a hemisphere": as large as a
 * spherical cap of angular radius arccos(1 − 2·0.35) ≈ 72.5° (a cap of radius ρ covers
 * (1 − cos ρ)/2 of the sphere), where the places nearly stop fitting in an open hemisphere and
 * one outlying place more can move the hull by a large area, or leave none at all.
 */
export const WIDE_HULL_SHARE = 0.35;

const SPHERE_KM2 = 4 * Math.PI * EARTH_RADIUS_KM ** 2;

/** What sliceCautions reads of a slice (a row of the analysis, or of the page's view). */
export interface SliceNumbers {
  readonly occurrences: number;
  /** Distinct places the footprint was measured over. */
  readonly positions: number;
  /** Hull area, km²; NaN when there is none. */
  readonly hullKm2: number;
  /** Why there is no hull, when there is none. */
  readonly hullNote: string | undefined;
}

/** The cautions for one slice's numbers, in the order a reader should meet them. */
export function sliceCautions(slice: SliceNumbers): SliceCaution[] {
  if (slice.occurrences === 0) return [{ code: SLICE_CAUTION.noOccurrences }];
  const cautions: SliceCaution[] = [];
  if (slice.positions < FEW_PLACES_BELOW) cautions.push({ code: SLICE_CAUTION.fewPlaces, places: slice.positions, fewerThan: FEW_PLACES_BELOW });
  if (slice.hullNote !== undefined) cautions.push({ code: SLICE_CAUTION.noHull, reason: slice.hullNote });
  const sphereShare = slice.hullKm2 / SPHERE_KM2;
  if (sphereShare > WIDE_HULL_SHARE) cautions.push({ code: SLICE_CAUTION.wideHull, sphereShare, above: WIDE_HULL_SHARE });
  return cautions;
}
