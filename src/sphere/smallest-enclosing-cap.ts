/**
 * Smallest spherical cap holding a set of unit vectors, by the randomised incremental algorithm
 * of Welzl (1991, "Smallest enclosing disks (balls and ellipsoids)", LNCS 555) in its iterative
 * form. For points inside an open hemisphere the problem behaves as the planar one: the smallest
 * cap is unique and is fixed by at most three points on its rim. Checking each three-point cap
 * against the points already passed (expected O(n log n) in all) makes the algorithm a test for
 * an open hemisphere as well.
 */

/** A cap holds a point when p·centre ≥ cos(radius) − this (absorbs rounding on the rim). */
const RIM_TOLERANCE = 1e-14;

/**
 * The caps we accept must have cos(radius) above this: the points then lie at least about
 * 1e-12 radians (6 µm on the Earth) inside an open hemisphere.
 */
export const OPEN_HEMISPHERE_MARGIN = 1e-12;

/**
 * The smallest cap holding all the interleaved unit vectors, as [x, y, z, cos radius] with
 * (x, y, z) its unit centre, or null when no open hemisphere holds them (with the margin above).
 * `seed` fixes the random order, so results are reproducible.
 */
export function smallestEnclosingCap(xyz: Float64Array, seed = 0x2545f491): Float64Array | null {
  const n = xyz.length / 3;
  if (n === 0) return null;
  const order = shuffledIndices(n, seed);
  const cap = new Float64Array(4);
  pointCap(xyz, order[0], cap);
  for (let i = 1; i < n; i++) {
    const a = order[i];
    if (holds(cap, xyz, a)) continue;
    pointCap(xyz, a, cap);
    for (let j = 0; j < i; j++) {
      const b = order[j];
      if (holds(cap, xyz, b)) continue;
      if (!pairCap(xyz, a, b, cap)) return null; // a and b are (nearly) antipodal
      for (let k = 0; k < j; k++) {
        const c = order[k];
        if (holds(cap, xyz, c)) continue;
        // When the points fit, the smallest cap holding order[0..k] with a and b on its rim has
        // c on its rim too and is smaller than a hemisphere: it is the cap computed here, and it
        // holds order[0..k−1]. If it does not, the points cannot fit. (This check also stops
        // the loops, which otherwise could run for O(n³) on points that do not fit.)
        if (!tripleCap(xyz, a, b, c, cap)) return null;
        for (let m = 0; m < k; m++) if (!holds(cap, xyz, order[m])) return null;
      }
    }
  }
  // Each loop leaves a cap holding every point it has passed, so this one holds them all.
  return cap;
}

function holds(cap: Float64Array, xyz: Float64Array, p: number): boolean {
  return dotWith(cap, xyz, p) >= cap[3] - RIM_TOLERANCE;
}

function pointCap(xyz: Float64Array, a: number, cap: Float64Array): void {
  cap[0] = xyz[3 * a];
  cap[1] = xyz[3 * a + 1];
  cap[2] = xyz[3 * a + 2];
  cap[3] = 1;
}

/** Smallest cap with a and b on its rim: centred on their midpoint. False if it is too large. */
function pairCap(xyz: Float64Array, a: number, b: number, cap: Float64Array): boolean {
  return setCap(xyz[3 * a] + xyz[3 * b], xyz[3 * a + 1] + xyz[3 * b + 1], xyz[3 * a + 2] + xyz[3 * b + 2], xyz, a, b, b, cap);
}

/** The cap with a, b and c on its rim, centred on the normal of their plane. False if too large. */
function tripleCap(xyz: Float64Array, a: number, b: number, c: number, cap: Float64Array): boolean {
  const ax = xyz[3 * a], ay = xyz[3 * a + 1], az = xyz[3 * a + 2];
  const ux = xyz[3 * b] - ax, uy = xyz[3 * b + 1] - ay, uz = xyz[3 * b + 2] - az;
  const vx = xyz[3 * c] - ax, vy = xyz[3 * c + 1] - ay, vz = xyz[3 * c + 2] - az;
  let nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
  if (nx * ax + ny * ay + nz * az < 0) { nx = -nx; ny = -ny; nz = -nz; } // the cap on a's side
  return setCap(nx, ny, nz, xyz, a, b, c, cap);
}

/**
 * Sets the cap centred on the direction (x, y, z) with the rim points r1, r2, r3 on or inside its
 * rim: the radius is taken from the farthest of them, as rounding in the centre (large for
 * nearly antipodal or nearly collinear rim points) could otherwise leave one just outside.
 */
function setCap(
  x: number, y: number, z: number, xyz: Float64Array, r1: number, r2: number, r3: number, cap: Float64Array,
): boolean {
  const length = Math.sqrt(x * x + y * y + z * z);
  if (length === 0) return false;
  cap[0] = x / length;
  cap[1] = y / length;
  cap[2] = z / length;
  cap[3] = Math.min(dotWith(cap, xyz, r1), dotWith(cap, xyz, r2), dotWith(cap, xyz, r3));
  return cap[3] > OPEN_HEMISPHERE_MARGIN;
}

function dotWith(cap: Float64Array, xyz: Float64Array, p: number): number {
  return cap[0] * xyz[3 * p] + cap[1] * xyz[3 * p + 1] + cap[2] * xyz[3 * p + 2];
}

/** 0..n−1 in a seeded random order (Fisher–Yates with a xorshift32 generator, Marsaglia 2003). */
function shuffledIndices(n: number, seed: number): Uint32Array {
  const order = new Uint32Array(n);
  for (let i = 0; i < n; i++) order[i] = i;
  let state = seed >>> 0 || 1;
  for (let i = n - 1; i > 0; i--) {
    state ^= state << 13;
    state ^= state >>> 17;
    state ^= state << 5;
    const j = (state >>> 0) % (i + 1);
    const t = order[i];
    order[i] = order[j];
    order[j] = t;
  }
  return order;
}
