import type { EqualAreaGrid } from './grid/equal-area-grid';
import type { OccurrenceTable } from './table/occurrence-table';
import type { AssignRule, TimeScale } from './time/time-scale';
import { assignSlices } from './time/assign-slices';
import { DistinctCounter } from './footprint/distinct-counter';
import { groupBySlice } from './footprint/group-by-slice';
import { positionCodes } from './footprint/position-codes';
import { tallyCells, type CellTallies } from './footprint/cell-tallies';
import { gather } from './footprint/gather';
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
  const sliceOfRow = assignment.slice; // fresh from assignSlices: ours to mark exclusions in
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
  const { order, start } = groupBySlice(sliceOfRow, sliceCount);
  const positions = positionCodes(palaeoLat, palaeoLon);
  const collectionsArePositions = table.collection.values.length === 0;
  const collectionCodes = collectionsArePositions ? positions.codes : table.collection.codes;

  // Every column the slices need, gathered into slice order once (see gather.ts).
  const lat = gather(palaeoLat, order);
  const lon = gather(palaeoLon, order);
  const rows = {
    start,
    cell: new Uint32Array(order.length),
    collection: gather(collectionCodes, order),
    taxon: gather(table.taxon.codes, order),
  };
  grid.cellsOf(lat, lon, rows.cell);
  const position = gather(positions.codes, order);

  const collectionCounter = new DistinctCounter(collectionsArePositions ? positions.count : table.collection.values.length);
  const taxonCounter = new DistinctCounter(table.taxon.values.length);
  const positionCounter = new DistinctCounter(positions.count);
  const cells = tallyCells(rows, collectionCounter, taxonCounter);

  const inOrder = identityOrder(order.length);
  const firstRows = new Uint32Array(order.length);
  const slices: SliceMetrics[] = [];
  let cellEntry = 0;
  for (let s = 0; s < sliceCount; s++) {
    const from = start[s];
    const to = start[s + 1];
    let occupied = 0;
    while (cellEntry < cells.count && cells.slice[cellEntry] === s) {
      occupied++;
      cellEntry++;
    }
    const distinct = positionCounter.firstRowsInto(position, inOrder, from, to, firstRows);
    const distinctLat = new Float64Array(distinct);
    const distinctLon = new Float64Array(distinct);
    for (let k = 0; k < distinct; k++) {
      distinctLat[k] = lat[firstRows[k]];
      distinctLon[k] = lon[firstRows[k]];
    }
    slices.push({
      name: scale.names[s],
      baseMa: scale.baseMa[s],
      topMa: scale.topMa[s],
      occurrences: to - from,
      collections: collectionCounter.count(rows.collection, inOrder, from, to),
      taxa: taxonCounter.count(rows.taxon, inOrder, from, to),
      cells: occupied,
      ...measureFootprint(distinctLat, distinctLon),
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

function identityOrder(length: number): Uint32Array {
  const order = new Uint32Array(length);
  for (let k = 0; k < length; k++) order[k] = k;
  return order;
}
