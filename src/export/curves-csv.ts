import type { SliceMetrics } from '../analysis';
import { movedNames, SHIFT_STATES, type NamedSeries, type RichnessCurves } from '../richness';
import { csvLine, DECIMALS, fixed, trimmed } from './csv-text';

export const CURVES_COLUMNS = [
  'slice', 'name', 'base_ma', 'top_ma', 'taxa', 'range_through', 'n_FL', 'n_bL', 'n_Ft', 'n_bt',
  'three_timers', 'part_timers', 'completeness_3t', 'goods_u', 'goods_u_refs', 'chao1', 'chao1_sd', 'rarefied',
  'sqs_mean', 'sqs_lo', 'sqs_hi', 'sqs_draws', 'shared_cells', 'taxa_shared_prev', 'taxa_shared',
  'regions', 'regional_mean', 'regional_sd', 'age_median', 'age_lo', 'age_hi', 'shift',
] as const;

const FLAGGED = SHIFT_STATES.indexOf('flagged');

/**
 * `curves.csv`: one row per slice, oldest first, keyed as slices.csv is. A value that cannot be
 * computed (NaN in the kernels, or a series the run did not ask for) is an empty field.
 * `shift` names the footprint measures that moved, joined by ';', where the slice is flagged.
 */
export function curvesCsv(slices: readonly SliceMetrics[], curves: RichnessCurves, footprint: readonly NamedSeries[]): string {
  const count = (v: number) => fixed(v, 0);
  const real = (v: number) => fixed(v, DECIMALS.richness);
  const share = (v: number) => fixed(v, DECIMALS.coverage);
  const of = (series: Float64Array | undefined, s: number, format: (v: number) => string) => (series === undefined ? '' : format(series[s]));
  const { crossers, threeTimers, sqs, shared, regional, ages, shift } = curves;
  const lines = [csvLine(CURVES_COLUMNS)];
  slices.forEach((slice, s) => {
    lines.push(csvLine([
      String(s + 1), slice.name, trimmed(slice.baseMa, DECIMALS.ageMa), trimmed(slice.topMa, DECIMALS.ageMa),
      count(curves.taxa[s]), count(crossers.rangeThrough[s]),
      count(crossers.singletons[s]), count(crossers.bottomOnly[s]), count(crossers.topOnly[s]), count(crossers.both[s]),
      count(threeTimers.threeTimers[s]), count(threeTimers.partTimers[s]), share(threeTimers.completeness[s]),
      share(curves.goodsU[s]), of(curves.goodsURefs, s, share),
      real(curves.chao1[s]), real(curves.chao1Sd[s]), of(curves.rarefied, s, real),
      real(sqs.mean[s]), real(sqs.lo[s]), real(sqs.hi[s]), real(sqs.draws[s]),
      count(shared.sharedCells[s]), count(shared.taxaSharedPrev[s]), count(shared.taxaShared[s]),
      of(regional?.regions, s, count), of(regional?.mean, s, real), of(regional?.sd, s, real),
      of(ages?.median, s, real), of(ages?.lo, s, real), of(ages?.hi, s, real),
      shift !== undefined && shift.state[s] === FLAGGED ? movedNames(shift.moved[s], footprint) : '',
    ]));
  });
  return lines.join('');
}
