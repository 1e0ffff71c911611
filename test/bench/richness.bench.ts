// Richness kernels of src/richness on a seeded columnar table of 1,000,000 occurrences in 100
// slices (collections of 1–12 occurrences at clustered sites, skewed taxon frequencies, HEALPix
// nside 32), each against a straightforward reference in the same process: Maps, Sets and arrays
// of collections per trial for SQS; Sets and a distance test per pair of cells for the regions.
// Everything runs on one thread.
import { report, time } from './measure';
import { HealpixGrid } from '../../src/grid';
import { createSeededRandom, type SeededRandom } from '../../src/time';
import { greatCircleDistanceKm } from '../sphere/distance-km';
import {
  circularRegions, DEFAULT_REGION_SETTINGS, goodsU, occurrenceSingletons, shareholderQuorumSubsampling,
  sliceAbundances, sliceCells, sliceCollections, type RichnessInput,
} from '../../src/richness';

const SLICES = 100;
const ROWS_PER_SLICE = 10_000;
const TRIALS = 200;
const QUORUM = 0.5;
const SEED = 7;
const grid = new HealpixGrid(32);
const regionSettings = { ...DEFAULT_REGION_SETTINGS, seed: SEED };

export function syntheticInput(): RichnessInput {
  const random = createSeededRandom(SEED);
  const u = () => random.nextUniform();
  const centres = Array.from({ length: 400 }, () => [Math.asin(2 * u() - 1) * (180 / Math.PI), 360 * u() - 180]);
  const rows = SLICES * ROWS_PER_SLICE;
  const start = new Uint32Array(SLICES + 1);
  const taxon = new Uint32Array(rows);
  const collection = new Uint32Array(rows);
  const cell = new Uint32Array(rows);
  let r = 0;
  let code = 0;
  for (let s = 0; s < SLICES; s++) {
    start[s] = r;
    while (r < (s + 1) * ROWS_PER_SLICE) {
      const [clat, clon] = centres[Math.floor(u() * centres.length)];
      const site = grid.cellOf(Math.max(-90, Math.min(90, clat + (u() - 0.5) * 16)), ((clon + (u() - 0.5) * 24 + 540) % 360) - 180);
      const size = 1 + Math.floor(u() * 12);
      for (let k = 0; k < size && r < (s + 1) * ROWS_PER_SLICE; k++, r++) {
        taxon[r] = Math.floor(u() * u() * 20000);
        collection[r] = code;
        cell[r] = site;
      }
      code++;
    }
  }
  start[SLICES] = r;
  return { start, taxon, taxonCount: 20000, collection, collectionCount: code, cell };
}

function ourSqs(input: RichnessInput): Float64Array {
  const abundances = sliceAbundances(input);
  const f1 = occurrenceSingletons(abundances);
  const u = f1.map((f, s) => goodsU(f, input.start[s + 1] - input.start[s]));
  return shareholderQuorumSubsampling(abundances, sliceCollections(input), u, { quorum: QUORUM, trials: TRIALS, seed: SEED }).mean;
}

function shuffle<T>(items: T[], random: SeededRandom): void {
  for (let i = items.length - 1; i > 0; i--) {
    const j = Math.floor(random.nextUniform() * (i + 1));
    [items[i], items[j]] = [items[j], items[i]];
  }
}

/** Reference SQS: per slice a Map of collections to taxon lists; per trial a shuffled copy and a Set. */
function referenceSqs(input: RichnessInput): Float64Array {
  const means = new Float64Array(SLICES);
  for (let s = 0; s < SLICES; s++) {
    const random = createSeededRandom(SEED + s);
    const byCollection = new Map<number, number[]>();
    const counts = new Map<number, number>();
    for (let r = input.start[s]; r < input.start[s + 1]; r++) {
      const list = byCollection.get(input.collection[r]) ?? [];
      list.push(input.taxon[r]);
      byCollection.set(input.collection[r], list);
      counts.set(input.taxon[r], (counts.get(input.taxon[r]) ?? 0) + 1);
    }
    const n = input.start[s + 1] - input.start[s];
    const singletons = [...counts.values()].filter((c) => c === 1).length;
    const target = QUORUM / (1 - singletons / n);
    let sum = 0;
    for (let trial = 0; trial < TRIALS; trial++) {
      const order = [...byCollection.values()];
      shuffle(order, random);
      const drawn = new Set<number>();
      let covered = 0;
      for (const taxa of order) {
        for (const t of taxa) {
          if (!drawn.has(t)) {
            drawn.add(t);
            covered += (counts.get(t) ?? 0) / n;
          }
        }
        if (covered >= target) break;
      }
      sum += drawn.size;
    }
    means[s] = sum / TRIALS;
  }
  return means;
}

function ourRegions(input: RichnessInput) {
  const abundances = sliceAbundances(input);
  return circularRegions(input.start, abundances, sliceCells(input), sliceCollections(input), grid, regionSettings);
}

/** Reference regions: Sets of cells, collections and taxa, and a great-circle distance per pair of cells. */
function referenceRegions(input: RichnessInput): { regions: Float64Array; mean: Float64Array } {
  const regions = new Float64Array(SLICES);
  const mean = new Float64Array(SLICES);
  const centre = new Float64Array(2);
  for (let s = 0; s < SLICES; s++) {
    const random = createSeededRandom(SEED + s);
    const rowsOf = new Map<number, number[]>();
    for (let r = input.start[s]; r < input.start[s + 1]; r++) {
      const list = rowsOf.get(input.cell[r]) ?? [];
      list.push(r);
      rowsOf.set(input.cell[r], list);
    }
    const cells = [...rowsOf.keys()];
    const where = cells.map((c) => Array.from(grid.cellCentreInto(c, centre)));
    const richness: number[] = [];
    for (const [lat, lon] of where) {
      const members = cells.filter((_, k) => greatCircleDistanceKm(lat, lon, where[k][0], where[k][1]) <= regionSettings.radiusKm);
      if (members.length < regionSettings.minCells) continue;
      const collections = new Set(members.flatMap((c) => (rowsOf.get(c) ?? []).map((r) => input.collection[r])));
      if (collections.size < regionSettings.minCollections) continue;
      let sum = 0;
      for (let trial = 0; trial < regionSettings.trials; trial++) {
        shuffle(members, random);
        sum += new Set(members.slice(0, regionSettings.minCells).flatMap((c) => (rowsOf.get(c) ?? []).map((r) => input.taxon[r]))).size;
      }
      richness.push(sum / regionSettings.trials);
    }
    regions[s] = richness.length;
    mean[s] = richness.length ? richness.reduce((a, b) => a + b, 0) / richness.length : Number.NaN;
  }
  return { regions, mean };
}

/** Processor time (user + system, ms) of one call: on a shared machine, wall time includes waiting. */
function cpuMs(work: () => unknown): number {
  const before = process.cpuUsage();
  work();
  const used = process.cpuUsage(before);
  return (used.user + used.system) / 1000;
}

function largestGap(a: Float64Array, b: Float64Array): number {
  let gap = 0;
  for (let s = 0; s < a.length; s++) if (Number.isFinite(a[s]) || Number.isFinite(b[s])) gap = Math.max(gap, Math.abs(a[s] - b[s]));
  return gap;
}

export async function run(): Promise<void> {
  const input = syntheticInput();
  console.log(`richness: ${input.taxon.length.toLocaleString('en')} occurrences, ${SLICES} slices, ${input.collectionCount.toLocaleString('en')} collections, ${grid.name}; one thread`);

  let ourMeans: Float64Array = new Float64Array(0);
  let referenceMeans: Float64Array = new Float64Array(0);
  const sqs = time(`SQS, ${TRIALS} trials, quorum ${QUORUM} (from the columns)`, () => (ourMeans = ourSqs(input)), 5, 1);
  const sqsReference = time('SQS reference: Maps, Sets, shuffled copies', () => (referenceMeans = referenceSqs(input)), 1, 0);
  report(sqs, sqsReference, '≤ 3000 ms');
  console.log(`${''.padEnd(48)} processor time of one SQS run: ${cpuMs(() => ourSqs(input)).toFixed(0)} ms`);
  console.log(`${''.padEnd(48)} largest |mean difference| per slice vs reference (different draws): ${largestGap(ourMeans, referenceMeans).toFixed(2)} taxa`);

  let ours = ourRegions(input);
  let theirs: { regions: Float64Array; mean: Float64Array } = { regions: new Float64Array(0), mean: new Float64Array(0) };
  const regions = time(`regions ${regionSettings.radiusKm} km, ${regionSettings.minCells} cells × ${regionSettings.trials} trials`, () => (ours = ourRegions(input)), 5, 1);
  const regionsReference = time('regions reference: Sets, distance per pair', () => (theirs = referenceRegions(input)), 1, 0);
  report(regions, regionsReference, '≤ 2000 ms');
  console.log(`${''.padEnd(48)} processor time of one regions run: ${cpuMs(() => ourRegions(input)).toFixed(0)} ms`);
  console.log(`${''.padEnd(48)} slices whose kept-region count differs from the reference: ${ours.regions.filter((n, s) => n !== theirs.regions[s]).length}; largest |mean difference|: ${largestGap(ours.mean, theirs.mean).toFixed(2)} taxa`);
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
