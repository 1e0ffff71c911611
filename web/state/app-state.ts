/** Everything the page shows, in one object (see Store). */
import { DEFAULT_RUN_SETTINGS, type RunSettings } from '../../src/run';
import type { AnalysisView, ExtraRole, ExtraSummary, Measure, TablePreview, TableSummary } from '../protocol';
import { DEFAULT_LAYERS, type LayerVisibility, type MapView } from './view-options';

export interface Busy {
  readonly label: string;
  /** 0…1, or undefined while the length of the work is unknown. */
  readonly fraction: number | undefined;
  /** Worker request a cancel button would stop. */
  readonly cancelId?: number;
}

/** A picked table waiting for the user to confirm its columns. */
export interface PendingImport {
  readonly file: File;
  readonly preview: TablePreview;
}

export interface CellFocus {
  readonly slice: number;
  /** Index into view.cells. */
  readonly entry: number;
  /** Taxa in the cell, once the worker has answered. */
  readonly taxa?: readonly string[];
}

/** The curves panel's series (its SERIES table is the one list). */
import type { SeriesKey } from '../charts/series';
export { SERIES_KEYS as CURVE_SERIES } from '../charts/series';
export type CurveSeries = SeriesKey;

export interface AppState {
  readonly phase: 'loading' | 'ready' | 'error';
  readonly busy: Busy | undefined;
  /** The last problem to tell the user about (cleared by the next successful action). */
  readonly problem: string | undefined;
  readonly table: TableSummary | undefined;
  readonly extras: Readonly<Partial<Record<ExtraRole, ExtraSummary>>>;
  readonly pendingImport: PendingImport | undefined;
  readonly settings: RunSettings;
  readonly measure: Measure;
  readonly view: AnalysisView | undefined;
  readonly slice: number;
  /** Show every slice of the scale, not only the data's range (see shownSlices). */
  readonly wholeScale: boolean;
  readonly mapView: MapView;
  readonly layers: LayerVisibility;
  readonly showAllPoints: boolean;
  readonly curveSeries: readonly CurveSeries[];
  readonly normaliseCurves: boolean;
  /** False when the browser gives no WebGL: the equal-area view stands in for the globe. */
  readonly webgl: boolean;
  readonly cell: CellFocus | undefined;
}

export const INITIAL_STATE: AppState = {
  phase: 'loading',
  busy: undefined,
  problem: undefined,
  table: undefined,
  extras: {},
  pendingImport: undefined,
  settings: DEFAULT_RUN_SETTINGS,
  measure: 'occurrences',
  view: undefined,
  slice: 0,
  wholeScale: false,
  mapView: 'globe',
  layers: DEFAULT_LAYERS,
  showAllPoints: false,
  curveSeries: ['occurrences', 'taxa', 'cells', 'hullKm2'],
  normaliseCurves: false,
  webgl: true,
  cell: undefined,
};
