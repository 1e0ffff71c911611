// Gaps and belts for 100 slices at nside 64 (issue 12: ≤ 2 s): every slice's cells classed, its
// gaps found and outlined, the gaps.csv measures and the belts (with the earth mover's distance)
// computed. Seeded made-up occurrences: each slice samples a few caps of the sphere, so its gaps
// are large, ragged and holed. The area is three made-up boxes of "land". The grid is prepared
// once (mesh, adjacency, centres) and timed on its own. Reference, in the same process: the
// straightforward way — per slice, each gap cell's outline recomputed, vertices keyed by text
// (6 decimals), shared edges cancelled through a Map of text keys, gaps as a union–find over
// those keys, rings chained through a Map; belts by filtering rows per band; the distance by
// sorting plain arrays. Run: npx tsx test/bench/gaps.bench.ts (or `npm run bench -- gaps`).
import type { Polygon } from 'geojson';
import {
  AREA_KINDS, availableCells, gapOutlines, gapsBySlice, gapSummary, type GapGrid, latitudeBelts, type OccupiedCells,
  prepareGapGrid, prepareSphericalPolygons,
} from '../../src/gaps';
import { type EqualAreaGrid, HealpixGrid } from '../../src/grid';
import { createSeededRandom } from '../../src/time/seeded-random';
import { report, time } from './measure';

const NSIDE = 64;
const SLICES = 100;
const ROWS_PER_SLICE = 3000;
const SEED = 20261202;
const DEG = 180 / Math.PI;

interface Workload { sliceOf: Int32Array; lat: Float64Array; occupied: OccupiedCells; available: Uint8Array }

export function workload(g: GapGrid): Workload {
  const random = createSeededRandom(SEED);
  const rows = SLICES * ROWS_PER_SLICE;
  const sliceOf = new Int32Array(rows), lat = new Float64Array(rows), lon = new Float64Array(rows);
  for (let s = 0; s < SLICES; s++) {
    // Three caps of 5°–25° radius per slice; positions uniform in area within each.
    const caps = Array.from({ length: 3 }, () => ({
      lat: Math.asin(2 * random.nextUniform() - 1) * DEG, lon: 360 * random.nextUniform() - 180, radius: 5 + 20 * random.nextUniform(),
    }));
    for (let k = 0; k < ROWS_PER_SLICE; k++) {
      const i = s * ROWS_PER_SLICE + k, cap = caps[k % 3];
      const z = 1 - (1 - Math.cos(cap.radius / DEG)) * random.nextUniform(), turn = 2 * Math.PI * random.nextUniform();
      const r = Math.sqrt(1 - z * z), t = (90 - cap.lat) / DEG;
      const x = r * Math.cos(turn), y = r * Math.sin(turn);
      const xt = x * Math.cos(t) + z * Math.sin(t), zt = -x * Math.sin(t) + z * Math.cos(t);
      const lonRad = Math.atan2(y, xt) + cap.lon / DEG;
      sliceOf[i] = s;
      lat[i] = Math.asin(Math.max(-1, Math.min(1, zt))) * DEG;
      lon[i] = Math.atan2(Math.sin(lonRad), Math.cos(lonRad)) * DEG;
    }
  }
  const cells = new Uint32Array(rows);
  g.grid.cellsOf(lat, lon, cells);
  const start = new Uint32Array(SLICES + 1);
  const cell: number[] = [];
  for (let s = 0; s < SLICES; s++) {
    const distinct = [...new Set(cells.subarray(s * ROWS_PER_SLICE, (s + 1) * ROWS_PER_SLICE))].sort((a, b) => a - b);
    cell.push(...distinct);
    start[s + 1] = cell.length;
  }
  const occupied = { start, cell: Uint32Array.from(cell) };
  const box = (w: number, s: number, e: number, n: number): Polygon => ({ type: 'Polygon', coordinates: [[[w, s], [e, s], [e, n], [w, n], [w, s]]] });
  const land = prepareSphericalPolygons([box(-120, -40, -30, 60), box(0, -50, 60, 40), box(150, -30, -150, 20)], 'land');
  return { sliceOf, lat, occupied, available: availableCells(g, { kind: AREA_KINDS.polygons, polygons: land }, occupied) };
}

function ours(g: GapGrid, w: Workload, slices = SLICES): number {
  const occupied = { start: w.occupied.start.subarray(0, slices + 1), cell: w.occupied.cell };
  const gaps = gapsBySlice(g, w.available, occupied);
  let rings = 0;
  for (const slice of gaps) for (const outline of gapOutlines(g, slice)) rings += outline.coordinates.length;
  const summary = gapSummary(g, gaps);
  const belts = latitudeBelts(g, { sliceOf: w.sliceOf.map((s) => (s < slices ? s : -1)), latDeg: w.lat, occupied, available: w.available });
  return rings + summary.gaps.reduce((a, b) => a + b, 0) + belts.shiftDeg.length;
}

/** The straightforward way; returns the number of gaps over the slices, for a check against ours. */
function reference(grid: EqualAreaGrid, w: Workload, slices: number): number {
  const key = (p: [number, number]) => {
    const lon = Math.abs(p[1]) === 90 ? 0 : ((((p[0] + 180) % 360) + 360) % 360) - 180;
    return `${lon.toFixed(6)},${p[1].toFixed(6)}`;
  };
  let total = 0, gaps = 0;
  for (let s = 0; s < slices; s++) {
    const occupied = new Set(w.occupied.cell.subarray(w.occupied.start[s], w.occupied.start[s + 1]));
    const gapCells: number[] = [];
    for (let c = 0; c < grid.cellCount; c++) if (w.available[c] === 1 && !occupied.has(c)) gapCells.push(c);
    const edges = new Map<string, { cell: number; from: string; to: string }>();
    const parent = new Map<number, number>(gapCells.map((c) => [c, c]));
    const find = (c: number): number => (parent.get(c) === c ? c : find(parent.get(c) as number));
    for (const c of gapCells) {
      const ring = grid.cellRing(c).map(key);
      for (let k = 0; k + 1 < ring.length; k++) {
        if (ring[k] === ring[k + 1]) continue;
        const twin = edges.get(`${ring[k + 1]}|${ring[k]}`);
        if (twin !== undefined) {
          edges.delete(`${ring[k + 1]}|${ring[k]}`);
          parent.set(find(c), find(twin.cell));
        } else edges.set(`${ring[k]}|${ring[k + 1]}`, { cell: c, from: ring[k], to: ring[k + 1] });
      }
    }
    const byStart = new Map<string, string[]>();
    for (const [k, e] of edges) byStart.set(e.from, [...(byStart.get(e.from) ?? []), k]);
    const used = new Set<string>();
    let rings = 0;
    for (const k of edges.keys()) {
      if (used.has(k)) continue;
      rings++;
      for (let at = k; !used.has(at); ) {
        used.add(at);
        const next = (byStart.get((edges.get(at) as { to: string }).to) ?? []).find((n) => !used.has(n));
        if (next === undefined) break;
        at = next;
      }
    }
    const roots = new Set(gapCells.map(find));
    gaps += roots.size;
    total += rings;
    // Belts: each band filtered from the rows; the distance from plain sorted arrays.
    for (let b = 0; b < 18; b++) total += w.lat.filter((lat, i) => w.sliceOf[i] === s && Math.min(17, Math.floor((lat + 90) / 10)) === b).length;
    if (s > 0) {
      const a = [...w.lat.filter((_, i) => w.sliceOf[i] === s - 1)].sort((x, y) => x - y);
      const c = [...w.lat.filter((_, i) => w.sliceOf[i] === s)].sort((x, y) => x - y);
      total += a[0] + c[0];
    }
  }
  return total > 0 ? gaps : -1;
}

export async function run(): Promise<void> {
  const grid = new HealpixGrid(NSIDE);
  let g = prepareGapGrid(grid);
  report(time(`prepare healpix:${NSIDE} (mesh, adjacency, centres)`, () => (g = prepareGapGrid(grid)), 5, 1));
  const w = workload(g);
  const gaps = gapsBySlice(g, w.available, w.occupied);
  const count = gaps.reduce((a, s) => a + s.gapCount, 0);
  console.log(`${SLICES} slices, ${w.sliceOf.length} rows, ${w.occupied.cell.length} occupied (slice, cell), ${count} gaps`);
  report(time(`gaps, outlines, summary and belts, ${SLICES} slices`, () => ours(g, w), 10, 2), undefined, '≤ 2000 ms');
  const few = 10;
  const agree = reference(grid, w, few) === gaps.slice(0, few).reduce((a, s) => a + s.gapCount, 0);
  console.log(`reference finds the same number of gaps in the first ${few} slices: ${agree ? 'yes' : 'NO'}`);
  report(time(`the same, first ${few} slices`, () => ours(g, w, few), 10, 2), time(`reference, first ${few} slices`, () => reference(grid, w, few), 3, 1));
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
