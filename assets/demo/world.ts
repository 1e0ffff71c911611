/**
 * The made-up world: six landmasses on six plates, where each sits today, and how it moved.
 * Everything here is invented. Present-day positions were chosen so that no landmass crosses
 * the antimeridian (so the GeoJSON needs no splitting); palaeopositions may cross it.
 *
 * Motions are designed as a centre path plus a spin and then sampled every 10 Myr into the
 * pole table; the table, not this design, is what the occurrences are reconstructed with.
 */

/** Seed of the whole scenario. */
export const DEMO_SEED = 20_240_917;

/** The fixed reference plate: it appears only as `relative_to`. */
export const FIXED_PLATE = 0;

/** Ages of the pole table, Ma: every 10 Myr from 0 to 300. */
export const POLE_TABLE_STEP_MYR = 10;
export const POLE_TABLE_OLDEST_MA = 300;

export interface LandmassDesign {
  readonly plateId: number;
  /** Present-day centre, degrees. */
  readonly lat: number;
  readonly lon: number;
  /** Mean angular radius of the outline, degrees. */
  readonly radiusDeg: number;
  readonly vertexCount: number;
}

/** A landmass moved relative to the fixed plate: its centre's palaeoposition and its spin
 * (degrees, anticlockwise about its own centre) at key ages; linear in between. */
export interface DriftMotion {
  readonly kind: 'drift';
  readonly keyframes: ReadonlyArray<{ readonly ageMa: number; readonly lat: number; readonly lon: number; readonly spinDeg: number }>;
}

/** A landmass that rifted from `relativeTo` at `riftMa`: before then it stayed docked at
 * (lat, lon, spin) in the parent's present-day frame; after, it drifted to where it is now. */
export interface RiftMotion {
  readonly kind: 'rift';
  readonly relativeTo: number;
  readonly riftMa: number;
  readonly dockedLat: number;
  readonly dockedLon: number;
  readonly spinDeg: number;
}

export interface PlateDesign {
  readonly landmass: LandmassDesign;
  readonly motion: DriftMotion | RiftMotion;
}

export const PLATES: readonly PlateDesign[] = [
  {
    landmass: { plateId: 101, lat: 5, lon: 15, radiusDeg: 20, vertexCount: 72 },
    motion: { kind: 'drift', keyframes: [
      { ageMa: 0, lat: 5, lon: 15, spinDeg: 0 },
      { ageMa: 100, lat: -8, lon: 0, spinDeg: 12 },
      { ageMa: 200, lat: -28, lon: -12, spinDeg: 25 },
      { ageMa: 300, lat: -48, lon: -20, spinDeg: 40 },
    ] },
  },
  {
    landmass: { plateId: 201, lat: -35, lon: 125, radiusDeg: 14, vertexCount: 56 },
    motion: { kind: 'drift', keyframes: [
      { ageMa: 0, lat: -35, lon: 125, spinDeg: 0 },
      { ageMa: 100, lat: -45, lon: 95, spinDeg: -15 },
      { ageMa: 200, lat: -40, lon: 60, spinDeg: -30 },
      { ageMa: 300, lat: -25, lon: 35, spinDeg: -35 },
    ] },
  },
  {
    landmass: { plateId: 301, lat: 45, lon: 75, radiusDeg: 11, vertexCount: 48 },
    motion: { kind: 'rift', relativeTo: 101, riftMa: 180, dockedLat: 27, dockedLon: 40, spinDeg: 20 },
  },
  {
    landmass: { plateId: 401, lat: -10, lon: -55, radiusDeg: 17, vertexCount: 64 },
    motion: { kind: 'drift', keyframes: [
      { ageMa: 0, lat: -10, lon: -55, spinDeg: 0 },
      { ageMa: 100, lat: -22, lon: -45, spinDeg: 10 },
      { ageMa: 200, lat: -42, lon: -68, spinDeg: 15 },
      { ageMa: 300, lat: -62, lon: -85, spinDeg: 30 },
    ] },
  },
  {
    landmass: { plateId: 501, lat: 25, lon: -105, radiusDeg: 10, vertexCount: 44 },
    motion: { kind: 'rift', relativeTo: 401, riftMa: 130, dockedLat: 10, dockedLon: -77, spinDeg: -15 },
  },
  {
    landmass: { plateId: 601, lat: 48, lon: -140, radiusDeg: 5, vertexCount: 32 },
    motion: { kind: 'rift', relativeTo: 501, riftMa: 90, dockedLat: 38, dockedLon: -122, spinDeg: 25 },
  },
];
