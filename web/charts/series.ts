/**
 * The per-slice measures the curves panel draws, in drawing order, with their wording, units
 * and colours. Colours are from the Okabe & Ito colour-blind-safe palette (common practice),
 * without its yellow (too pale for a thin line on white); hull and tree match the map overlays.
 */
import type { SliceMetrics } from '../../src/analysis';
import { OVERLAY_COLOURS } from '../colour/layer-colours';

export interface SeriesSpec {
  readonly key: 'occurrences' | 'collections' | 'taxa' | 'cells' | 'hullKm2' | 'mstKm' | 'latSpan';
  readonly label: string;
  /** Unit after a value ('' for counts). */
  readonly unit: string;
  /** Decimals in readouts. */
  readonly decimals: number;
  readonly colour: readonly [number, number, number];
  /** SVG stroke-dasharray when the series share one axis ('' for solid). */
  readonly dash: string;
}

export const SERIES: readonly SeriesSpec[] = [
  { key: 'occurrences', label: 'occurrences', unit: '', decimals: 0, colour: [0, 114, 178], dash: '' },
  { key: 'collections', label: 'collections', unit: '', decimals: 0, colour: [86, 180, 233], dash: '' },
  { key: 'taxa', label: 'taxa', unit: '', decimals: 0, colour: [204, 121, 167], dash: '' },
  { key: 'cells', label: 'occupied cells', unit: '', decimals: 0, colour: [0, 158, 115], dash: '' },
  { key: 'hullKm2', label: 'hull area', unit: 'km²', decimals: 0, colour: OVERLAY_COLOURS.hull, dash: '6 3' },
  { key: 'mstKm', label: 'spanning-tree length', unit: 'km', decimals: 0, colour: OVERLAY_COLOURS.spanningTree, dash: '2 2' },
  { key: 'latSpan', label: 'latitude span', unit: '°', decimals: 1, colour: [0, 0, 0], dash: '8 2 2 2' },
];

export type SeriesKey = SeriesSpec['key'];

export const SERIES_KEYS: readonly SeriesKey[] = SERIES.map((s) => s.key);

/** The series named in `keys`, in SERIES order; names that are not series are ignored. */
export function visibleSeries(keys: readonly string[]): SeriesSpec[] {
  return SERIES.filter((s) => keys.includes(s.key));
}

/** What a series is called for this analysis ("distinct places" when collections are positions). */
export function seriesLabel(spec: SeriesSpec, collectionsArePositions: boolean): string {
  return spec.key === 'collections' && collectionsArePositions ? 'distinct places' : spec.label;
}

/** "hull area (km²)", "taxa": a label with its unit, for axes. */
export function seriesAxisLabel(spec: SeriesSpec, collectionsArePositions: boolean): string {
  const label = seriesLabel(spec, collectionsArePositions);
  return spec.unit === '' ? label : `${label} (${spec.unit})`;
}

/** One series' value per slice (NaN kept: it means "no value", see SliceMetrics). */
export function seriesValues(slices: readonly SliceMetrics[], key: SeriesKey): Float64Array {
  const out = new Float64Array(slices.length);
  for (let s = 0; s < slices.length; s++) out[s] = slices[s][key];
  return out;
}

/** Largest finite value (0 when there is none). */
export function finiteMax(values: ArrayLike<number>): number {
  let max = 0;
  for (let i = 0; i < values.length; i++) if (values[i] > max && Number.isFinite(values[i])) max = values[i];
  return max;
}

/**
 * Each value divided by the series' largest finite value, so every series runs 0…1; NaN stays
 * NaN. A series whose largest value is 0 is left at 0 (there is nothing to divide by).
 */
export function normalised(values: ArrayLike<number>): Float64Array {
  const max = finiteMax(values);
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = max > 0 ? values[i] / max : values[i];
  return out;
}
