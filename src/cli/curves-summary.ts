import type { SliceMetrics } from '../analysis';
import { movedNames, SHIFT_STATES, SQS_REASONS } from '../richness';
import type { CurvesRun } from '../run';

const FLAGGED = SHIFT_STATES.indexOf('flagged');
const SUBSAMPLED = SQS_REASONS.indexOf('subsampled');
const NO_OCCURRENCES = SQS_REASONS.indexOf('no occurrences');

/**
 * What a curves run adds to the summary: the slices SQS could not subsample and why, the flagged
 * slices with the footprint measures that moved, and the correlations of first differences
 * between raw richness and each footprint measure.
 */
export function curvesLines(slices: readonly SliceMetrics[], run: CurvesRun): string[] {
  const { curves, footprint, settings } = run;
  const lines: string[] = [];
  const subsampled = slices.filter((_, s) => curves.sqs.reason[s] === SUBSAMPLED).length;
  lines.push(`SQS at quorum ${settings.quorum}, ${settings.trials} trials: ${subsampled} of ${slices.length} slices subsampled`);
  // Empty slices are counted; slices with occurrences but no value are named, each with its reason.
  const empty = slices.filter((_, s) => curves.sqs.reason[s] === NO_OCCURRENCES).length;
  if (empty > 0) lines.push(`  no SQS value, ${SQS_REASONS[NO_OCCURRENCES]}: ${empty} slice${empty === 1 ? '' : 's'}`);
  const below = slices.flatMap((slice, s) => {
    const reason = curves.sqs.reason[s];
    return reason === SUBSAMPLED || reason === NO_OCCURRENCES ? [] : [`${slice.name} (${SQS_REASONS[reason]}: Good's u ${coverage(curves.goodsU[s])})`];
  });
  if (below.length > 0) lines.push(`  no SQS value: ${below.join(', ')}`);
  const flagged = slices.flatMap((slice, s) => (curves.shift?.state[s] === FLAGGED ? [`${slice.name} (${movedNames(curves.shift.moved[s], footprint)})`] : []));
  lines.push(flagged.length === 0
    ? 'sampling shift: no slice flagged'
    : `sampling shift: ${flagged.length} slice${flagged.length === 1 ? '' : 's'} flagged (raw richness moved with the measures named, standardised richness did not): ${flagged.join(', ')}`);
  lines.push('first differences of raw richness against the footprint (Pearson r, Spearman rho, pairs):');
  for (const c of curves.correlations ?? []) lines.push(`  ${c.name}: r ${coefficient(c.pearson)}, rho ${coefficient(c.spearman)}, n ${c.pairs}`);
  return lines;
}

function coefficient(value: number): string {
  return Number.isNaN(value) ? 'n/a' : value.toFixed(3);
}

function coverage(value: number): string {
  return Number.isNaN(value) ? 'n/a' : value.toFixed(3);
}
