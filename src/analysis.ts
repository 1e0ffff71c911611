import type { EqualAreaGrid } from './grid/equal-area-grid';
import type { OccurrenceTable } from './table/occurrence-table';
import type { AssignRule, TimeScale } from './time/time-scale';
import { assignSlices } from './time/assign-slices';
import { DistinctCounter } from './footprint/distinct-counter';
import { groupBySlice } from './footprint/group-by-slice';
import { positionCodes } from './footprint/position-codes';
import { tallyCells, type CellTallies } from './footprint/cell-tallies';
import { measureFootprint, type Footprint } from './footprint/slice-footprint';

export interface AnalysisSettings {
  readonly scale: TimeScale;
  readonly rule: AssignRule;
  readonly grid: EqualAreaGrid;
}

/** Per-slice results, one entry per slice of the scale, oldest first. */
export interface SliceMetrics extends Footprint {
  readonly name: string;
  readonly baseMa: number;
  readonly topMa: number;
  readonly occurrences: number;
  /** Distinct collection ids, or distinct positions where the table names no collections. */
  readonly collections: number;
  readonly taxa: number;
  readonly cells: number;
}

/** Rows that reached no slice or no position, with the reason (never dropped silently). */
export interface Exclusions {
  readonly rows: Uint32Array;
  /** Index into EXCLUSION_REASONS for each excluded row. */
  readonly reasons: Uint8Array;
}

/** Why an accepted row reached no slice; indices 0–2 follow UNASSIGNED_REASONS 1–3. */
export const EXCLUSION_REASONS = [
  'age range reaches outside the time slices, or into a gap between them; expected an age within the chosen bins',
  'age range spans more than one slice; the "within" rule needs it inside one slice',
  'no slice holds the required share of the age range (the "overlap" rule)',
  'no palaeo_lat/palaeo_lon, and present-day lat/lon can be placed only with a rotation model; expected palaeo_lat and palaeo_lon',
] as const;
const NO_POSITION = EXCLUSION_REASONS.length - 1;

export interface AnalysisResult {
  readonly slices: readonly SliceMetrics[];
  readonly cells: CellTallies;
  /** Slice of each table row, -1 where excluded. */
  readonly sliceOfRow: Int32Array;
  /** Palaeoposition used for each row, degrees (NaN where excluded). */
  readonly palaeoLat: Float64Array;
  readonly palaeoLon: Float64Array;
  readonly exclusions: Exclusions;
  /** True when `collections` counts distinct positions because the table has no collection ids. */
  readonly collectionsArePositions: boolean;
}

/** The whole computation from accepted occurrences to per-slice footprint and gridded coverage. */
export function analyse(table: OccurrenceTable, settings: AnalysisSettings): AnalysisResult {
  const { scale, rule, grid } = settings;
  const assignment = assignSlices(table.maxMa, table.minMa, scale, rule);
  const sliceOfRow = Int32Array.from(assignment.slice);
  const { palaeoLat, palaeoLon } = table;

  const excludedRows: number[] = [];
  const excludedReasons: number[] = [];
  for (let i = 0; i < table.count; i++) {
    if (sliceOfRow[i] < 0) {
      excludedRows.push(i);
      excludedReasons.push(assignment.reason[i] - 1);
    } else if (Number.isNaN(palaeoLat[i]) || Number.isNaN(palaeoLon[i])) {
      sliceOfRow[i] = -1;
      excludedRows.push(i);
      excludedReasons.push(NO_POSITION);
    }
  }

  const sliceCount = scale.names.length;
  const groups = groupBySlice(sliceOfRow, sliceCount);
  const cellOfRow = cellsOfPlacedRows(grid, groups.order, palaeoLat, palaeoLon, table.count);

  const positions = positionCodes(palaeoLat, palaeoLon);
  const collectionsArePositions = table.collection.values.length === 0;
  const collectionCodes = collectionsArePositions ? positions.codes : table.collection.codes;
  const collectionCounter = new DistinctCounter(collectionsArePositions ? positions.count : table.collection.values.length);
  const taxonCounter = new DistinctCounter(table.taxon.values.length);
  const cells = tallyCells(groups, cellOfRow, collectionCodes, table.taxon.codes, collectionCounter, taxonCounter);

  const positionCounter = new DistinctCounter(positions.count);
  const firstRows = new Uint32Array(groups.order.length);
  const slices: SliceMetrics[] = [];
  let cellEntry = 0;
  for (let s = 0; s < sliceCount; s++) {
    const from = groups.start[s];
    const to = groups.start[s + 1];
    let occupied = 0;
    while (cellEntry < cells.count && cells.slice[cellEntry] === s) {
      occupied++;
      cellEntry++;
    }
    const distinct = positionCounter.firstRowsInto(positions.codes, groups.order, from, to, firstRows);
    const lat = new Float64Array(distinct);
    const lon = new Float64Array(distinct);
    for (let k = 0; k < distinct; k++) {
      lat[k] = palaeoLat[firstRows[k]];
      lon[k] = palaeoLon[firstRows[k]];
    }
    slices.push({
      name: scale.names[s],
      baseMa: scale.baseMa[s],
      topMa: scale.topMa[s],
      occurrences: to - from,
      collections: collectionCounter.count(collectionCodes, groups.order, from, to),
      taxa: taxonCounter.count(table.taxon.codes, groups.order, from, to),
      cells: occupied,
      ...measureFootprint(lat, lon),
    });
  }

  return {
    slices,
    cells,
    sliceOfRow,
    palaeoLat,
    palaeoLon,
    exclusions: { rows: Uint32Array.from(excludedRows), reasons: Uint8Array.from(excludedReasons) },
    collectionsArePositions,
  };
}

/** Cell of every placed row (the rows in `order`); other rows keep 0 and are never read. */
function cellsOfPlacedRows(grid: EqualAreaGrid, order: Uint32Array, lat: Float64Array, lon: Float64Array, rowCount: number): Uint32Array {
  const placedLat = new Float64Array(order.length);
  const placedLon = new Float64Array(order.length);
  for (let k = 0; k < order.length; k++) {
    placedLat[k] = lat[order[k]];
    placedLon[k] = lon[order[k]];
  }
  const placedCells = new Uint32Array(order.length);
  grid.cellsOf(placedLat, placedLon, placedCells);
  const cellOfRow = new Uint32Array(rowCount);
  for (let k = 0; k < order.length; k++) cellOfRow[order[k]] = placedCells[k];
  return cellOfRow;
}
