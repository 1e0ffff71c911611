/**
 * Messages between the page and the analysis worker, and the shape of what the worker hands the
 * views. Everything here is structured-cloneable; typed arrays are transferred, not copied.
 */
import type { FeatureCollection } from 'geojson';
import type { SliceMetrics } from '../src/analysis';
import type { ExportFile, RunSettings } from '../src/run';
import type { RejectedRow } from '../src/table/occurrence-table';

/** What colours the occupied cells. */
export const MEASURES = ['occurrences', 'collections', 'taxa'] as const;
export type Measure = (typeof MEASURES)[number];

/** Optional inputs besides the occurrence table. */
export type ExtraRole = 'rotation' | 'polygons' | 'indicators' | 'bins';

/** A file the worker reads: one the user picked, or one served by the app itself (the demo). */
export type Source =
  | { readonly kind: 'file'; readonly file: File }
  | { readonly kind: 'url'; readonly url: string; readonly name: string };

/** Files the worker writes on request: the command line's set (src/run). */
export { EXPORT_FILES, type ExportFile } from '../src/run';
/** The files of `driftgrid gaps` the page exports beside the run's (session.json is among those). */
export const GAPS_FILES = ['gaps.csv', 'gaps.geojson', 'belts.csv'] as const;

export type Request =
  | { readonly type: 'preview'; readonly id: number; readonly source: Source }
  | { readonly type: 'load-table'; readonly id: number; readonly source: Source; readonly mapping: Readonly<Record<string, string>> }
  | { readonly type: 'load-extra'; readonly id: number; readonly role: ExtraRole; readonly source: Source }
  | { readonly type: 'unload-extra'; readonly id: number; readonly role: ExtraRole }
  | { readonly type: 'analyse'; readonly id: number; readonly settings: RunSettings }
  | { readonly type: 'cell-taxa'; readonly id: number; readonly slice: number; readonly cell: number }
  | { readonly type: 'export'; readonly id: number; readonly file: ExportFile }
  | { readonly type: 'cancel'; readonly id: number };

/** First lines of a table and the columns the reader would use, for the mapping step. */
export interface TablePreview {
  readonly name: string;
  readonly bytes: number;
  readonly header: readonly string[];
  /** Up to PREVIEW_ROWS data rows, split into fields. */
  readonly rows: readonly (readonly string[])[];
  /** field → header it would be read from (synonyms), for the fields found. */
  readonly detected: Readonly<Record<string, string>>;
  /** Every field the reader knows. */
  readonly fields: readonly string[];
  /** Why the table cannot be read with the detected columns (the user can map them). */
  readonly problem?: string;
}

export const PREVIEW_ROWS = 8;

export interface TableSummary {
  readonly name: string;
  readonly bytes: number;
  readonly sha256: string;
  readonly rowsRead: number;
  readonly accepted: number;
  /** Rows refused on reading, with their reasons (all of them). */
  readonly rejects: readonly RejectedRow[];
  /** The mapping used: field → header. */
  readonly columns: Readonly<Record<string, string>>;
}

export interface ExtraSummary {
  readonly role: ExtraRole;
  readonly name: string;
  /** One line saying what was read, e.g. "6 plates, 186 poles". */
  readonly description: string;
}

/**
 * Polylines grouped by slice: slice s owns paths sliceStart[s] … sliceStart[s + 1] − 1; path p
 * owns vertices pathStart[p] … pathStart[p + 1] − 1 of `coords` ([lon, lat] pairs, degrees).
 * Edges are densified along great circles (≤ 1°), so straight drawing in any projection is
 * close to the true edge; longitudes are continuous (may run past ±180°).
 */
export interface PathSet {
  readonly sliceStart: Uint32Array;
  readonly pathStart: Uint32Array;
  readonly coords: Float32Array;
}

/**
 * Occupied cells of every slice, columnar: slice s owns entries sliceStart[s] … sliceStart[s+1] − 1.
 * `shape` indexes `CellShapes`, which holds each distinct cell's outline once.
 */
export interface CellEntries {
  readonly sliceStart: Uint32Array;
  readonly cell: Uint32Array;
  readonly shape: Uint32Array;
  readonly occurrences: Uint32Array;
  readonly collections: Uint32Array;
  readonly taxa: Uint32Array;
}

/**
 * Outlines of the distinct occupied cells: ring r owns vertices ringStart[r] … ringStart[r + 1] − 1
 * of `coords` ([lon, lat] pairs, degrees, closed, counter-clockwise seen from above as in
 * RFC 7946: reverse it for d3-geo, which wants clockwise). `centre` holds [lon, lat] per ring.
 */
export interface CellShapes {
  readonly ringStart: Uint32Array;
  readonly coords: Float32Array;
  readonly centre: Float32Array;
}

/** Source-file lines grouped by slice: slice s owns line[sliceStart[s]] … line[sliceStart[s + 1] − 1], in file order. */
export interface LeverRows {
  readonly sliceStart: Uint32Array;
  readonly line: Uint32Array;
}

/** Points grouped by slice: slice s owns points sliceStart[s] … sliceStart[s + 1] − 1. */
export interface PointSet {
  readonly sliceStart: Uint32Array;
  readonly lon: Float32Array;
  readonly lat: Float32Array;
}

/** Indicator sites per slice, each with its kind (index into `kinds`). */
export interface IndicatorPoints extends PointSet {
  readonly kinds: readonly string[];
  readonly kind: Uint8Array;
}

/** Counts per palaeolatitude band, from the South Pole up: band b covers −90 + b·bandDeg … */
export interface LatitudeCounts {
  readonly bandDeg: number;
  readonly bands: number;
  /** Occurrences per (slice, band): index slice · bands + band. */
  readonly perSlice: Uint32Array;
  /** Occurrences per band over every slice. */
  readonly total: Uint32Array;
  /** Indicator sites per (slice, kind, band): index (slice · kinds + kind) · bands + band. */
  readonly indicatorsPerSlice?: Uint32Array;
  /** Indicator sites per (kind, band) over every slice. */
  readonly indicatorsTotal?: Uint32Array;
}

/** Everything the views draw, for every slice of one analysis. */
export interface AnalysisView {
  readonly settings: RunSettings;
  readonly gridName: string;
  readonly cellAreaKm2: number;
  /** One per slice, oldest first (the same numbers as slices.csv). */
  readonly slices: readonly SliceMetrics[];
  /** Chart period each slice falls in (by mid-age), for colouring the time strip. */
  readonly periods: readonly string[];
  readonly collectionsArePositions: boolean;
  /** Accepted rows left out of every slice (outside the bins, or no palaeoposition). */
  readonly excluded: number;
  /** Distinct palaeopositions per slice (what hull and spanning tree are measured over). */
  readonly positions: PointSet;
  readonly cells: CellEntries;
  readonly shapes: CellShapes;
  readonly hulls: PathSet;
  readonly spanningTrees: PathSet;
  /** Lines of the rows at each slice's hull lever (slices[s].hullLeverLat/Lon). */
  readonly leverRows: LeverRows;
  readonly latitude: LatitudeCounts;
  readonly indicators?: IndicatorPoints;
  /** Base polygons reconstructed to each slice's mid-age (present when polygons and a model are loaded). */
  readonly basePolygons?: readonly FeatureCollection[];
  /** Lines for the user about this analysis (polygons left out, rows clamped …). */
  readonly notes: readonly string[];
}

export type Response =
  | { readonly type: 'progress'; readonly id: number; readonly bytesRead: number; readonly totalBytes: number; readonly rowsRead: number }
  | { readonly type: 'preview'; readonly id: number; readonly preview: TablePreview }
  | { readonly type: 'table-loaded'; readonly id: number; readonly summary: TableSummary }
  | { readonly type: 'extra-loaded'; readonly id: number; readonly summary: ExtraSummary }
  | { readonly type: 'extra-unloaded'; readonly id: number; readonly role: ExtraRole }
  | { readonly type: 'analysis'; readonly id: number; readonly view: AnalysisView }
  | { readonly type: 'cell-taxa'; readonly id: number; readonly slice: number; readonly cell: number; readonly taxa: readonly string[] }
  | { readonly type: 'export'; readonly id: number; readonly file: ExportFile; readonly bytes: Uint8Array; readonly mime: string }
  | { readonly type: 'cancelled'; readonly id: number }
  | { readonly type: 'error'; readonly id: number; readonly message: string };
