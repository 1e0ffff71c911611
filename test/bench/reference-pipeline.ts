// The straightforward way to do what `driftgrid coverage` does, written as a one-off script would:
// papaparse row objects, a linear scan over slices per row, per-slice loops with string Sets, and
// a brute-force Prim's minimum spanning tree on one slice of 5,000 positions. Run as its own
// process by pipeline.bench.ts; prints one JSON line with its figures and per-slice counts.
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { parseGridName } from '../../src/grid';
import { chartScale } from '../../src/time';

const MST_POSITIONS = 5000;
const R = 6371.0088;

interface Row { taxon: string; oldest_ma: string; youngest_ma: string; palaeo_lat: string; palaeo_lon: string; collection: string }

const started = performance.now();
const file = process.argv[2];
const rows = Papa.parse<Row>(readFileSync(file, 'utf8'), { header: true, skipEmptyLines: true }).data;
const scale = chartScale('stages');
const grid = parseGridName('healpix:32');
const slices = Array.from(scale.names, () => ({ occurrences: 0, taxa: new Set<string>(), collections: new Set<string>(), cells: new Set<number>(), positions: new Map<string, [number, number]>() }));
for (const row of rows) {
  const lat = Number(row.palaeo_lat);
  const lon = Number(row.palaeo_lon);
  const age = (Number(row.oldest_ma) + Number(row.youngest_ma)) / 2;
  if (!row.taxon || !(Math.abs(lat) <= 90) || !(Math.abs(lon) <= 180)) continue;
  for (let s = 0; s < scale.names.length; s++) {
    if (age <= scale.baseMa[s] && (age > scale.topMa[s] || (age === 0 && scale.topMa[s] === 0))) {
      const slice = slices[s];
      slice.occurrences++;
      slice.taxa.add(row.taxon);
      slice.collections.add(row.collection);
      slice.cells.add(grid.cellOf(lat, lon));
      slice.positions.set(`${lat},${lon}`, [lat, lon]);
      break;
    }
  }
}
const largest = slices.reduce((a, b) => (b.positions.size > a.positions.size ? b : a));
const points = [...largest.positions.values()].slice(0, MST_POSITIONS);
const mstStarted = performance.now();
const mstKm = primLength(points);
const mstMs = performance.now() - mstStarted;
const wallMs = performance.now() - started;
console.log(JSON.stringify({
  wallMs, mstMs, mstPositions: points.length, mstKm,
  slices: slices.map((s) => [s.occurrences, s.collections.size, s.taxa.size, s.cells.size]),
}));

/** O(n²) Prim's algorithm on great-circle (haversine) distances. */
function primLength(p: Array<[number, number]>): number {
  const n = p.length;
  const best = new Array<number>(n).fill(Infinity);
  const done = new Array<boolean>(n).fill(false);
  best[0] = 0;
  let total = 0;
  for (let step = 0; step < n; step++) {
    let u = -1;
    for (let i = 0; i < n; i++) if (!done[i] && (u < 0 || best[i] < best[u])) u = i;
    done[u] = true;
    total += best[u];
    for (let v = 0; v < n; v++) if (!done[v]) best[v] = Math.min(best[v], haversine(p[u], p[v]));
  }
  return total;
}

function haversine([lat1, lon1]: [number, number], [lat2, lon2]: [number, number]): number {
  const r = Math.PI / 180;
  const a = Math.sin(((lat2 - lat1) * r) / 2) ** 2 + Math.cos(lat1 * r) * Math.cos(lat2 * r) * Math.sin(((lon2 - lon1) * r) / 2) ** 2;
  return 2 * R * Math.asin(Math.min(1, Math.sqrt(a)));
}
