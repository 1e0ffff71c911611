// Gridding 1,000,000 seeded positions, uniform on the sphere: HEALPix nside 32 and bands:2 through
// cellsOf, against straightforward versions of the same formulas (radians and colatitude, one
// object per position, bits interleaved in a loop; bands rows found with findIndex) in the same
// process. Target for HEALPix: under 60 ms. Run: npx tsx test/bench/grid.bench.ts (or `npm run bench`).
import { type EqualAreaGrid, HealpixGrid, LatitudeBandsGrid } from '../../src/grid';
import { createSeededRandom } from '../../src/time/seeded-random';
import { report, time } from './measure';

const POSITIONS = 1_000_000;
const SEED = 20250301;
const REPETITIONS = 10;
const WARM_UP = 3;

interface FaceCell { face: number; ix: number; iy: number }

/** HEALPix NESTED written the obvious way from Górski et al. (2005) §4. */
function referenceHealpix(nside: number, latDeg: number, lonDeg: number): number {
  const theta = ((90 - latDeg) * Math.PI) / 180;
  const phi = ((((lonDeg * Math.PI) / 180) % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
  const z = Math.cos(theta);
  const tt = phi / (Math.PI / 2);
  let cell: FaceCell;
  if (Math.abs(z) <= 2 / 3) {
    const jp = Math.floor(nside * (0.5 + tt - 0.75 * z));
    const jm = Math.floor(nside * (0.5 + tt + 0.75 * z));
    const fp = Math.floor(jp / nside);
    const fm = Math.floor(jm / nside);
    const face = fp === fm ? 4 + (fp % 4) : fp < fm ? fp % 4 : 8 + (fm % 4);
    cell = { face, ix: jm % nside, iy: nside - 1 - (jp % nside) };
  } else {
    const column = Math.min(3, Math.floor(tt));
    const tp = tt - column;
    const r = nside * Math.sqrt(3 * (1 - Math.abs(z)));
    const jp = Math.min(nside - 1, Math.floor(tp * r));
    const jm = Math.min(nside - 1, Math.floor((1 - tp) * r));
    cell = z > 0 ? { face: column, ix: nside - 1 - jm, iy: nside - 1 - jp } : { face: 8 + column, ix: jp, iy: jm };
  }
  let local = 0;
  for (let bit = 0; 2 ** bit < nside; bit++) {
    local += (Math.floor(cell.ix / 2 ** bit) % 2) * 2 ** (2 * bit) + (Math.floor(cell.iy / 2 ** bit) % 2) * 2 ** (2 * bit + 1);
  }
  return cell.face * nside * nside + local;
}

/** bands:DEG the obvious way: the row by findIndex over the edges, one object per position. */
function referenceBands(grid: LatitudeBandsGrid): (latDeg: number, lonDeg: number) => number {
  const edges = Array.from(grid.layout.edgeLatDeg);
  const columns = Array.from(grid.layout.columns);
  const first = Array.from(grid.layout.firstCell);
  return (latDeg, lonDeg) => {
    const above = edges.findIndex((edge, k) => k > 0 && latDeg < edge);
    const found = { row: above < 0 ? columns.length - 1 : above - 1, east: (((lonDeg + 180) % 360) + 360) % 360 };
    const col = Math.min(columns[found.row] - 1, Math.floor(found.east / (360 / columns[found.row])));
    return first[found.row] + col;
  };
}

function positions(): { lat: Float64Array; lon: Float64Array } {
  const random = createSeededRandom(SEED);
  const lat = new Float64Array(POSITIONS);
  const lon = new Float64Array(POSITIONS);
  for (let i = 0; i < POSITIONS; i++) {
    lat[i] = (Math.asin(2 * random.nextUniform() - 1) * 180) / Math.PI;
    lon[i] = random.nextUniform() * 360 - 180;
  }
  return { lat, lon };
}

function compare(grid: EqualAreaGrid, reference: (lat: number, lon: number) => number, target?: string): void {
  const { lat, lon } = positions();
  const ours = new Uint32Array(POSITIONS);
  const theirs = new Uint32Array(POSITIONS);
  const fast = time(`${grid.name} cellsOf, ${POSITIONS} positions`, () => grid.cellsOf(lat, lon, ours), REPETITIONS, WARM_UP);
  const slow = time(`${grid.name} straightforward reference`, () => {
    for (let i = 0; i < POSITIONS; i++) theirs[i] = reference(lat[i], lon[i]);
  }, REPETITIONS, WARM_UP);
  report(fast, slow, target);
  let agree = 0;
  for (let i = 0; i < POSITIONS; i++) if (ours[i] === theirs[i]) agree++;
  console.log(`${''.padEnd(48)} same cell for ${agree} of ${POSITIONS} positions`);
}

export async function run(): Promise<void> {
  compare(new HealpixGrid(32), (lat, lon) => referenceHealpix(32, lat, lon), '< 60 ms');
  const bands = new LatitudeBandsGrid(2);
  compare(bands, referenceBands(bands));
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
