// Footprint kernels of src/sphere on seeded made-up positions, each against a straightforward
// reference run in the same process: Prim's O(n²) minimum spanning tree, Jarvis's gift-wrapping
// hull (O(n·h)), and a Map with text keys for distinct positions.
import { report, time } from './measure';
import { minimumSpanningTree } from '../../src/sphere/minimum-spanning-tree';
import { convexHull } from '../../src/sphere/convex-hull';
import { slicePositions } from '../../src/footprint/slice-positions';
import { degreesToUnitVectors } from '../../src/sphere/unit-vectors';
import { EARTH_RADIUS_KM } from '../../src/sphere/earth';

const DEG = 180 / Math.PI;

/** Seeded positions uniform in area over a cap of `radiusDeg` about (centreLat, 0). */
function positions(seed: number, n: number, radiusDeg = 180, centreLat = 90) {
  let s = seed >>> 0;
  const next = () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
  const lat = new Float64Array(n), lon = new Float64Array(n);
  const floorZ = Math.cos(radiusDeg / DEG);
  for (let i = 0; i < n; i++) {
    // Uniform on the cap about the north pole (Archimedes: uniform in z), then tilted.
    const z = floorZ + (1 - floorZ) * next(), l = 2 * Math.PI * next(), r = Math.sqrt(1 - z * z);
    const t = (90 - centreLat) / DEG;
    const x = r * Math.cos(l), y = r * Math.sin(l);
    const xt = x * Math.cos(t) + z * Math.sin(t), zt = -x * Math.sin(t) + z * Math.cos(t);
    lat[i] = Math.asin(zt) * DEG;
    lon[i] = Math.atan2(y, xt) * DEG;
  }
  return { lat, lon };
}

/** Reference: Prim's algorithm on the complete graph, O(n²) time, O(n) memory. */
function primLengthKm(lat: Float64Array, lon: Float64Array): number {
  const n = lat.length;
  const xyz = degreesToUnitVectors(lat, lon);
  const inTree = new Uint8Array(n);
  const best = new Float64Array(n).fill(Infinity);
  best[0] = 0;
  let total = 0;
  for (let step = 0; step < n; step++) {
    let u = -1;
    for (let i = 0; i < n; i++) if (!inTree[i] && (u < 0 || best[i] < best[u])) u = i;
    inTree[u] = 1;
    total += 2 * Math.asin(Math.min(1, Math.sqrt(best[u]) / 2));
    for (let v = 0; v < n; v++) {
      if (inTree[v]) continue;
      const dx = xyz[3 * u] - xyz[3 * v], dy = xyz[3 * u + 1] - xyz[3 * v + 1], dz = xyz[3 * u + 2] - xyz[3 * v + 2];
      const chord2 = dx * dx + dy * dy + dz * dz;
      if (chord2 < best[v]) best[v] = chord2;
    }
  }
  return total * EARTH_RADIUS_KM;
}

/** Reference: gift wrapping on the sphere with triple products (Jarvis 1973), O(n·h). */
function jarvisHullSize(lat: Float64Array, lon: Float64Array): number {
  const n = lat.length;
  const v = degreesToUnitVectors(lat, lon);
  const det = (a: number, b: number, c: number) =>
    v[3 * a] * (v[3 * b + 1] * v[3 * c + 2] - v[3 * b + 2] * v[3 * c + 1]) +
    v[3 * a + 1] * (v[3 * b + 2] * v[3 * c] - v[3 * b] * v[3 * c + 2]) +
    v[3 * a + 2] * (v[3 * b] * v[3 * c + 1] - v[3 * b + 1] * v[3 * c]);
  let start = 0;
  for (let i = 1; i < n; i++) if (lat[i] < lat[start]) start = i; // southernmost is on the hull here
  let size = 0;
  for (let p = start; ;) {
    size++;
    let q = p === 0 ? 1 : 0;
    for (let r = 0; r < n; r++) if (r !== p && det(p, q, r) < 0) q = r;
    p = q;
    if (p === start || size > n) return size;
  }
}

/** Reference: distinct positions through a Map keyed by text. */
function distinctByText(lat: Float64Array, lon: Float64Array, rows: Uint32Array): number {
  const seen = new Map<string, number>();
  for (const r of rows) {
    const la = lat[r] + 0;
    const lo = la === 90 || la === -90 ? 0 : lon[r] === -180 ? 180 : lon[r] + 0;
    const key = `${la},${lo}`;
    if (!seen.has(key)) seen.set(key, r);
  }
  return seen.size;
}

export async function run(): Promise<void> {
  // A slice of the whole-pipeline benchmark holds about 1,500–4,000 distinct positions, and the
  // pipeline measures about a hundred slices in a row: warm-up enough for steady figures.
  const slice = positions(6, 1_500);
  report(
    time('minimumSpanningTree, 1,500 positions', () => minimumSpanningTree(degreesToUnitVectors(slice.lat, slice.lon)), 100, 20),
    time('reference: Prim O(n²), 1,500 positions', () => primLengthKm(slice.lat, slice.lon), 5, 1),
  );
  const small = positions(1, 5_000);
  const ours5k = time('minimumSpanningTree, 5,000 positions', () => minimumSpanningTree(degreesToUnitVectors(small.lat, small.lon)), 30, 5);
  const prim5k = time('reference: Prim O(n²), 5,000 positions', () => primLengthKm(small.lat, small.lon), 3, 1);
  report(ours5k, prim5k);
  const check = Math.abs(minimumSpanningTree(degreesToUnitVectors(small.lat, small.lon)).lengthKm - primLengthKm(small.lat, small.lon));
  console.log(`${''.padEnd(48)} length difference from Prim: ${check.toExponential(1)} km`);

  const large = positions(2, 100_000);
  report(time('minimumSpanningTree, 100,000 positions', () => minimumSpanningTree(degreesToUnitVectors(large.lat, large.lon)), 5, 1), undefined, '< 1000 ms');

  const footprint = positions(3, 100_000, 60, 20);
  report(
    time('convexHull, 100,000 positions in a 60° cap', () => convexHull(degreesToUnitVectors(footprint.lat, footprint.lon)), 10, 2),
    time('reference: gift wrapping O(n·h), same', () => jarvisHullSize(footprint.lat, footprint.lon), 3, 1),
  );
  report(time('convexHull, 100,000 positions over the globe', () => convexHull(degreesToUnitVectors(large.lat, large.lon)), 10, 2));

  const rows = Uint32Array.from({ length: 1_000_000 }, (_, i) => i);
  const million = positions(4, 1_000_000);
  for (let i = 0; i < million.lat.length; i++) {
    million.lat[i] = Math.round(million.lat[i]); // a 1° lattice: many repeats, as in real tables
    million.lon[i] = Math.round(million.lon[i]);
  }
  // One slice of a million rows: the hardest case for the per-slice tables of slicePositions.
  const oneSlice = Uint32Array.of(0, 1_000_000);
  report(
    time('slicePositions, 1,000,000 rows on a 1° lattice', () => slicePositions(million.lat, million.lon, oneSlice), 10, 2),
    time('reference: Map of text keys, same', () => distinctByText(million.lat, million.lon, rows), 3, 1),
    '< 100 ms',
  );
  const spread = positions(5, 1_000_000);
  report(time('slicePositions, 1,000,000 rows all distinct', () => slicePositions(spread.lat, spread.lon, oneSlice), 10, 2), undefined, '< 100 ms');
}
