/** Words for the curves panel: the hover readout, each slice's accessible name, the chart summary. */
import type { SliceMetrics } from '../../src/analysis';
import { formatMa } from '../../src/time';
import { sliceTitle } from '../text';
import { formatNumber } from './number-format';
import { seriesLabel, seriesValues, type SeriesSpec } from './series';

/** A value with its unit: "1,234", "12,345 km²", "45.2°"; "none" when there is no value, with the slice's hull note if it has one. */
export function seriesValueText(spec: SeriesSpec, slice: SliceMetrics): string {
  const value = slice[spec.key];
  if (!Number.isFinite(value)) return spec.key === 'hullKm2' && slice.hullNote !== undefined ? `none (${slice.hullNote})` : 'none';
  const number = formatNumber(value, spec.decimals);
  return spec.unit === '' ? number : spec.unit === '°' ? `${number}°` : `${number} ${spec.unit}`;
}

/** "Asselian, 298.9–293.5 Ma: occurrences 1,234; taxa 56; hull area 12,345 km²". */
export function curvesReadout(slice: SliceMetrics, series: readonly SeriesSpec[], collectionsArePositions: boolean): string {
  const values = series.map((spec) => `${seriesLabel(spec, collectionsArePositions)} ${seriesValueText(spec, slice)}`);
  return `${sliceTitle(slice)}${values.length === 0 ? '' : `: ${values.join('; ')}`}`;
}

/** One sentence for screen readers and the figure's description: what is drawn and where each series peaks. */
export function curvesDescription(slices: readonly SliceMetrics[], series: readonly SeriesSpec[], normalise: boolean, collectionsArePositions: boolean): string {
  if (slices.length === 0) return 'No time slices to chart.';
  const oldest = slices[0];
  const youngest = slices[slices.length - 1];
  const what = series.length === 0 ? 'No series shown' : `${series.map((s) => seriesLabel(s, collectionsArePositions)).join(', ')} per time slice`;
  const how = series.length === 0 ? '' : normalise ? ', each divided by its largest value' : ', one row per series';
  const peaks = series.map((spec) => {
    const values = seriesValues(slices, spec.key);
    let best = -1;
    for (let s = 0; s < values.length; s++) if (Number.isFinite(values[s]) && (best < 0 || values[s] > values[best])) best = s;
    return best < 0 ? `${seriesLabel(spec, collectionsArePositions)} has no values` : `${seriesLabel(spec, collectionsArePositions)} peaks at ${seriesValueText(spec, slices[best])} in ${slices[best].name}`;
  });
  return `${what}${how}, over ${slices.length} slices from ${formatMa(oldest.baseMa)} to ${formatMa(youngest.topMa)} Ma.${peaks.length === 0 ? '' : ` ${peaks.join('; ')}.`}`;
}
