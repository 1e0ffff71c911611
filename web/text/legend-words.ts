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

/** The scale's ticks (1, 10, 100 … and its largest count), placed where the scale puts them on its log axis. */
export function legendTicks(scale: CountScale): LegendTick[] {
  return scale.ticks.map((value) => ({ value, position: scale.position(value), label: formatCount(value) }));
}
