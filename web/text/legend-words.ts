/** The count legend's words, the same on both maps and in the figures: its title and tick labels. */
import type { CountScale } from '../colour/measure-scale';
import type { Measure } from '../protocol';
import { MEASURE_UNITS } from '../state/view-options';
import { formatCount } from './count-words';

export interface LegendTick {
  readonly value: number;
  /** 0 … 1 along the ramp. */
  readonly position: number;
  readonly label: string;
}

/** "Occupied cells: taxa per cell (log scale)". */
export function legendTitle(measure: Measure): string {
  return `Occupied cells: ${MEASURE_UNITS[measure]} (log scale)`;
}

/**
 * Both legends' ramps are about 13em long (15em less padding); labels are centred on their tick
 * except the first (starts there) and the last (ends there). Widths are estimates for sans-serif
 * digits (tabular, about 0.56em) and the thousands comma.
 */
const RAMP_EM = 13;
const GAP_EM = 0.4;
const labelEm = (label: string): number => [...label].reduce((sum, c) => sum + (c === ',' ? 0.3 : 0.56), 0);

/**
 * The scale's ticks (1, 10, 100 … and its largest count), placed where the scale puts them on
 * its log axis; a decade tick whose label would run into the largest count's (100 beside 122)
 * is left out, so that no two labels touch.
 */
export function legendTicks(scale: CountScale): LegendTick[] {
  const ticks = scale.ticks.map((value) => ({ value, position: scale.position(value), label: formatCount(value) }));
  if (ticks.length < 2) return ticks;
  const last = ticks[ticks.length - 1];
  const lastStart = last.position * RAMP_EM - labelEm(last.label);
  return ticks.filter((t, k) => {
    if (k === ticks.length - 1) return true;
    const width = labelEm(t.label);
    const end = t.position * RAMP_EM + (k === 0 ? width : width / 2);
    return end + GAP_EM <= lastStart;
  });
}
