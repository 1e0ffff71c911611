import { chartIntervals, chartScale, type ChartScaleRank } from './chart';
import { equalBins } from './equal-bins';
import { InputError } from '../problems';
import type { TimeScale } from './time-scale';

const CHART_SCALES: readonly ChartScaleRank[] = ['periods', 'epochs', 'stages'];

const EQUAL_PREFIX = 'equal:';

// A plain positive or zero decimal; the range check is equalBins' job.
const DECIMAL = /^(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/** Base of the Phanerozoic on the built-in chart, Ma: the default extent of equal bins. */
export const PHANEROZOIC_BASE_MA: number = chartIntervals('period')[0].baseMa;

/**
 * The time scale named by a bins option: `periods`, `epochs` or `stages` of the built-in chart,
 * or `equal:N` (N-Myr bins anchored at 0 Ma, covering 0..oldestMa; by default the whole
 * Phanerozoic). Case and surrounding whitespace are ignored. A bin table given as a file path is
 * the caller's business. Throws InputError for anything else.
 */
export function parseBinsOption(text: string, oldestMa: number = PHANEROZOIC_BASE_MA): TimeScale {
  const option = text.trim().toLowerCase();
  const chartRank = CHART_SCALES.find((rank) => rank === option);
  if (chartRank !== undefined) return chartScale(chartRank);
  if (option.startsWith(EQUAL_PREFIX)) {
    const width = option.slice(EQUAL_PREFIX.length).trim();
    if (!DECIMAL.test(width)) {
      throw new InputError([{ field: 'equal', value: width, expected: 'a bin width in Myr greater than 0, as in equal:10' }]);
    }
    return equalBins(Number(width), oldestMa);
  }
  throw new InputError([
    { field: 'bins', value: text, expected: 'periods, epochs, stages, equal:N (N-Myr bins, e.g. equal:10) or a bin table file' },
  ]);
}
