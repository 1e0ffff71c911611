import type { EqualAreaGrid } from '../grid/equal-area-grid';
import { EARTH_RADIUS_KM } from '../sphere/earth';
import { writeUnitVector } from '../sphere/unit-vectors';
import type { SliceAbundances } from './slice-abundances';
import type { SliceCells } from './slice-cells';
import type { SliceCollections } from './slice-collections';
import { sliceRandom, uniformBelow } from './slice-seed';
import { mean, sampleSd } from './sample-summaries';
import { cellMembers, type CellMembers } from './cell-members';
import { LatitudeWindow } from './latitude-window';

export interface RegionSettings {
  /** Great-circle radius of a region, km. */
  readonly radiusKm: number;
  /** A region is kept when it holds at least this many occupied cells … */
  readonly minCells: number;
  /** … and at least this many distinct collections; kept regions are subsampled to minCells cells. */
  readonly minCollections: number;
  /** Subsamples per region; the region's richness is their mean. */
  readonly trials: number;
  readonly seed: number;
}

export const DEFAULT_REGION_SETTINGS = { radiusKm: 1500, minCells: 8, minCollections: 10, trials: 10 } as const;

/** Per slice: kept regions, mean and sample sd of their richness; and each kept region, slice by slice. */
export interface RegionalSeries {
  readonly regions: Float64Array;
  readonly mean: Float64Array;
  readonly sd: Float64Array;
  /** sliceCount + 1 offsets into centreCell and richness. */
  readonly regionFirst: Uint32Array;
  /** Grid cell at the centre of each kept region. */
  readonly centreCell: Uint32Array;
  /** Occupied cells within the radius of each kept region's centre. */
  readonly cellCount: Uint32Array;
  /** Mean subsampled richness of each kept region. */
  readonly richness: Float64Array;
}

/**
 * Circular-region standardisation of each slice. Every occupied cell is the centre of one
 * candidate region: the occupied cells whose centres lie within radiusKm of its centre (great-
 * circle distance on the mean Earth sphere, R = 6371.0088 km; regions overlap). A region is kept
 * when it holds at least minCells cells and minCollections distinct collections. For each kept
 * region, `trials` times, minCells of its cells are drawn without replacement (seeded, one
 * generator per slice) and the distinct taxa in their rows are counted; the region's richness is
 * the mean of those counts. The slice's `mean` and `sd` (divisor n − 1) are over its kept
 * regions: NaN without regions, sd NaN with one. Distances are compared as dot products of cell-
 * centre unit vectors against cos(radius / R), among the cells whose latitude is within the
 * radius of the centre's (a radius beyond half the circumference takes every cell). Single-threaded.
 */
export function circularRegions(
  start: Uint32Array, abundances: SliceAbundances, cells: SliceCells, collections: SliceCollections,
  grid: Pick<EqualAreaGrid, 'cellCentreInto'>, settings: RegionSettings,
): RegionalSeries {
  const { cellFirst, cells: cellList } = cells;
  const sliceCount = cellFirst.length - 1;
  const angle = Math.min(Math.PI, settings.radiusKm / EARTH_RADIUS_KM);
  const minCos = Math.cos(angle);
  const taxaOfCell = cellMembers(start, cells, abundances.entryOfRow);
  const collectionsOfCell = cellMembers(start, cells, collections.localOfRow, collections.collectionFirst);
  const xyz = new Float64Array(3 * cellList.length);
  const centre = new Float64Array(2);
  for (let k = 0; k < cellList.length; k++) {
    grid.cellCentreInto(cellList[k], centre);
    writeUnitVector(centre[0], centre[1], xyz, 3 * k);
  }
  const members = new Uint32Array(maxSpan(cellFirst));
  const window = new LatitudeWindow(maxSpan(cellFirst));
  const seenTaxon = new Uint32Array(abundances.taxon.length);
  const seenCollection = new Uint32Array(collections.begin.length);
  const regionFirst = new Uint32Array(sliceCount + 1);
  const centreCell: number[] = [];
  const cellCount: number[] = [];
  const richness: number[] = [];
  const out = { regions: new Float64Array(sliceCount), mean: new Float64Array(sliceCount), sd: new Float64Array(sliceCount) };
  let stamp = 0;
  for (let s = 0; s < sliceCount; s++) {
    regionFirst[s] = richness.length;
    const random = sliceRandom(settings.seed, s);
    const from = cellFirst[s];
    const to = cellFirst[s + 1];
    window.sort(xyz, from, to);
    for (let c = from; c < to; c++) {
      const cx = xyz[3 * c], cy = xyz[3 * c + 1], cz = xyz[3 * c + 2];
      let size = 0;
      const last = window.end(cz, angle);
      for (let i = window.begin(cz, angle); i < last; i++) {
        const k = window.cell[i];
        if (cx * xyz[3 * k] + cy * xyz[3 * k + 1] + cz * xyz[3 * k + 2] >= minCos) members[size++] = k;
      }
      if (size < settings.minCells) continue;
      stamp++;
      if (countDistinct(collectionsOfCell, members, size, seenCollection, stamp) < settings.minCollections) continue;
      let sum = 0;
      for (let trial = 0; trial < settings.trials; trial++) {
        // Partial Fisher–Yates: the first minCells entries of `members` become the draw.
        for (let k = 0; k < settings.minCells; k++) {
          const j = k + uniformBelow(random, size - k);
          const picked = members[j];
          members[j] = members[k];
          members[k] = picked;
        }
        stamp++;
        sum += countDistinct(taxaOfCell, members, settings.minCells, seenTaxon, stamp);
      }
      centreCell.push(cellList[c]);
      cellCount.push(size);
      richness.push(sum / settings.trials);
    }
    regionFirst[s + 1] = richness.length;
  }
  const richnessColumn = Float64Array.from(richness);
  for (let s = 0; s < sliceCount; s++) {
    out.regions[s] = regionFirst[s + 1] - regionFirst[s];
    out.mean[s] = mean(richnessColumn, regionFirst[s], regionFirst[s + 1]);
    out.sd[s] = sampleSd(richnessColumn, regionFirst[s], regionFirst[s + 1]);
  }
  return { ...out, regionFirst, centreCell: Uint32Array.from(centreCell), cellCount: Uint32Array.from(cellCount), richness: richnessColumn };
}

/** Distinct members (stamped in `seen`) over the lists of cells[0 … count − 1]. */
function countDistinct(lists: CellMembers, cells: Uint32Array, count: number, seen: Uint32Array, stamp: number): number {
  const { first, member } = lists;
  let distinct = 0;
  for (let k = 0; k < count; k++) {
    const c = cells[k];
    for (let m = first[c]; m < first[c + 1]; m++) {
      const id = member[m];
      if (seen[id] !== stamp) {
        seen[id] = stamp;
        distinct++;
      }
    }
  }
  return distinct;
}

function maxSpan(offsets: Uint32Array): number {
  let largest = 0;
  for (let s = 0; s + 1 < offsets.length; s++) largest = Math.max(largest, offsets[s + 1] - offsets[s]);
  return largest;
}
