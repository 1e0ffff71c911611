import {
  DistinctCounter, gather, groupBySlice, measureFootprintWithShapes, slicePositions, tallyCells,
  type CellTallies, type Footprint, type FootprintShapes, type SliceLevers,
} from './footprint';
import type { EqualAreaGrid } from './grid';
import {
  DEFAULT_PLACEMENT, collectExclusions, placeOccurrences, type Exclusions, type Placement, type PlacementSettings,
} from './placement';
import { pointsInSphericalPolygons, type SphericalPolygons } from './gaps';
import type { RotationModel } from './rotation';
import type { OccurrenceTable } from './table';
import { assignSlices, type AssignRule, type TimeScale } from './time';

export interface AnalysisSettings {
  readonly scale: TimeScale;
  readonly rule: AssignRule;
  readonly grid: EqualAreaGrid;
  /** Rotation model for rows with present-day lat/lon + plate_id; without it only the table's
   * palaeocoordinates place rows. */
  readonly rotation?: RotationModel;
  /** How rows are placed (see placeOccurrences); DEFAULT_PLACEMENT when absent. */
  readonly placement?: PlacementSettings;
  /** A fixed region: rows placed outside it are left out of every slice and counted, not excluded. */
  readonly within?: SphericalPolygons;
}

/** Per-slice results, one entry per slice of the scale, oldest first. */
export interface SliceMetrics extends Footprint, SliceLevers {
  readonly name: string;
  readonly baseMa: number;
  readonly topMa: number;
  readonly occurrences: number;
  /** Distinct collection ids, or distinct positions where the table names no collections. */
  readonly collections: number;
  readonly taxa: number;
  readonly cells: number;
}

export interface AnalysisResult {
  readonly slices: readonly SliceMetrics[];
  readonly cells: CellTallies;
  /** Slice of each table row, -1 where excluded. */
  readonly sliceOfRow: Int32Array;
  /** Palaeoposition used for each row, degrees (NaN where excluded). */
  readonly palaeoLat: Float64Array;
  readonly palaeoLon: Float64Array;
  /** Where each row's palaeoposition came from, or why it has none. */
  readonly placement: Placement;
  readonly exclusions: Exclusions;
  /** Rows placed outside the fixed region (settings.within), left out of every slice; 0 without a region. */
  readonly outsideRegion: number;
  /** True when `collections` counts distinct positions because the table has no collection ids. */
  readonly collectionsArePositions: boolean;
  /** Per slice, the distinct palaeopositions (degrees) the footprint was measured over. */
  readonly places: { readonly lat: readonly Float64Array[]; readonly lon: readonly Float64Array[] };
  /** Per slice, the hull and spanning tree the footprint was measured from (indices into `places`). */
  readonly shapes: readonly FootprintShapes[];
  /** Placed rows grouped by slice: rows of slice s are order[start[s]] … order[start[s + 1] − 1]. */
  readonly rowsBySlice: { readonly order: Uint32Array; readonly start: Uint32Array };
  /** The placed rows' columns in that order (k-th entry: table row order[k]), as the cell tallies used them. */
  readonly rows: SliceRows;
}

/** Columns of the placed rows in slice order (see AnalysisResult.rowsBySlice). */
export interface SliceRows {
  readonly start: Uint32Array;
  readonly taxon: Uint32Array;
  /** Collection codes, or per-slice position codes when the table names no collections. */
  readonly collection: Uint32Array;
  /** Collection codes lie below this. */
  readonly collectionCount: number;
  readonly cell: Uint32Array;
}

/** Where the rows of a table go: their slices and palaeopositions, and which were left out and why. */
export interface PlacedRows {
  /** Slice of each row, −1 where excluded or outside the fixed region. */
  readonly sliceOfRow: Int32Array;
  readonly placement: Placement;
  readonly exclusions: Exclusions;
  readonly outsideRegion: number;
}

/**
 * Bins and places the rows of a table (occurrences, or indicator sites: one path for both),
 * then leaves out the rows placed outside the fixed region, if any.
 */
export function placeRows(table: OccurrenceTable, settings: AnalysisSettings): PlacedRows {
  const { scale, rule } = settings;
  const assignment = assignSlices(table.oldestMa, table.youngestMa, scale, rule);
  const placement = placeOccurrences(table, assignment, scale, settings.rotation, settings.placement ?? DEFAULT_PLACEMENT);
  const sliceOfRow = assignment.slice; // fresh from assignSlices: ours to mark exclusions in
  const exclusions = collectExclusions(assignment, placement, sliceOfRow);
  let outsideRegion = 0;
  if (settings.within !== undefined) {
    const placed: number[] = [];
    for (let i = 0; i < sliceOfRow.length; i++) if (sliceOfRow[i] >= 0) placed.push(i);
    const lat = Float64Array.from(placed, (i) => placement.lat[i]), lon = Float64Array.from(placed, (i) => placement.lon[i]);
    const inside = pointsInSphericalPolygons(settings.within, lat, lon, new Uint8Array(placed.length));
    placed.forEach((i, k) => {
      if (inside[k] === 0) {
        sliceOfRow[i] = -1;
        outsideRegion++;
      }
    });
  }
  return { sliceOfRow, placement, exclusions, outsideRegion };
}

/** The whole computation from accepted occurrences to per-slice footprint and gridded coverage. */
export function analyse(table: OccurrenceTable, settings: AnalysisSettings): AnalysisResult {
  const { scale, grid } = settings;
  const { sliceOfRow, placement, exclusions, outsideRegion } = placeRows(table, settings);
  const { lat: palaeoLat, lon: palaeoLon } = placement;

  const sliceCount = scale.names.length;
  const { order, start } = groupBySlice(sliceOfRow, sliceCount);
  const collectionsArePositions = table.collection.values.length === 0;

  // Every column the slices need, gathered into slice order once (see gather.ts).
  const lat = gather(palaeoLat, order);
  const lon = gather(palaeoLon, order);
  const places = slicePositions(lat, lon, start);
  const rows: SliceRows = {
    start,
    cell: new Uint32Array(order.length),
    collection: collectionsArePositions ? places.codes : gather(table.collection.codes, order),
    collectionCount: collectionsArePositions ? places.mostInOneSlice : table.collection.values.length,
    taxon: gather(table.taxon.codes, order),
  };
  grid.cellsOf(lat, lon, rows.cell);

  const collectionCounter = new DistinctCounter(rows.collectionCount);
  const taxonCounter = new DistinctCounter(table.taxon.values.length);
  const cells = tallyCells(rows, collectionCounter, taxonCounter);

  const inOrder = identityOrder(order.length);
  const slices: SliceMetrics[] = [];
  const shapes: FootprintShapes[] = [];
  let cellEntry = 0;
  for (let s = 0; s < sliceCount; s++) {
    const from = start[s];
    const to = start[s + 1];
    let occupied = 0;
    while (cellEntry < cells.count && cells.slice[cellEntry] === s) {
      occupied++;
      cellEntry++;
    }
    const measured = measureFootprintWithShapes(places.lat[s], places.lon[s]);
    shapes.push(measured.shapes);
    slices.push({
      name: scale.names[s],
      baseMa: scale.baseMa[s],
      topMa: scale.topMa[s],
      occurrences: to - from,
      collections: collectionCounter.count(rows.collection, inOrder, from, to),
      taxa: taxonCounter.count(rows.taxon, inOrder, from, to),
      cells: occupied,
      ...measured.footprint,
      ...measured.levers,
    });
  }

  return {
    slices,
    cells,
    sliceOfRow,
    palaeoLat,
    palaeoLon,
    placement,
    exclusions,
    outsideRegion,
    collectionsArePositions,
    places: { lat: places.lat, lon: places.lon },
    shapes,
    rowsBySlice: { order, start },
    rows,
  };
}

function identityOrder(length: number): Uint32Array {
  const order = new Uint32Array(length);
  for (let k = 0; k < length; k++) order[k] = k;
  return order;
}
