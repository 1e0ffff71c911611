/**
 * Round axis ticks: multiples of 1, 2 or 5 × 10^k, the step chosen so that about `count` ticks
 * fall within the range (the "nice numbers" idea of Heckbert, Graphics Gems, 1990; common practice).
 */

// The step's leading digit m ∈ [1, 10) goes to whichever of 1, 2, 5, 10 is nearest on a log
// scale: the thresholds are the geometric means √(1·2), √(2·5), √(5·10).
const TO_TWO = Math.SQRT2;
const TO_FIVE = Math.sqrt(10);
const TO_TEN = Math.sqrt(50);

/**
 * A tick step as an exact ratio: the step is `multiple` when `divisor` is 1, else 1 / `divisor`
 * (so 0.2 is 1/5, and ticks k/5 print as 0.2, 0.4 … rather than 0.6000000000000001).
 */
interface Step {
  readonly multiple: number;
  readonly divisor: number;
}

function niceStep(start: number, stop: number, count: number): Step {
  const raw = (stop - start) / count;
  const power = Math.floor(Math.log10(raw));
  const leading = raw / 10 ** power;
  const factor = leading >= TO_TEN ? 10 : leading >= TO_FIVE ? 5 : leading >= TO_TWO ? 2 : 1;
  return power >= 0 ? { multiple: factor * 10 ** power, divisor: 1 } : { multiple: 1, divisor: 10 ** -power / factor };
}

function valueOf(k: number, step: Step): number {
  return step.divisor === 1 ? k * step.multiple : k / step.divisor;
}

/** The first and last k with k·step within [start, stop] (rounding first, then correcting, so binary noise cannot skip a tick). */
function tickRange(start: number, stop: number, step: Step): [number, number] {
  const perUnit = (x: number): number => (step.divisor === 1 ? x / step.multiple : x * step.divisor);
  let first = Math.round(perUnit(start));
  let last = Math.round(perUnit(stop));
  if (valueOf(first, step) < start) first++;
  if (valueOf(last, step) > stop) last--;
  // Math.round(−0.0004) is −0; a tick at −0 would print as "-0" in some formatters.
  return [first === 0 ? 0 : first, last];
}

/** About `count` round values within [start, stop], ascending (descending when start > stop). */
export function niceTicks(start: number, stop: number, count: number): number[] {
  if (!(count > 0) || !Number.isFinite(start) || !Number.isFinite(stop)) return [];
  if (start === stop) return [start];
  const lo = Math.min(start, stop);
  const hi = Math.max(start, stop);
  const step = niceStep(lo, hi, count);
  const [first, last] = tickRange(lo, hi, step);
  const ticks: number[] = [];
  for (let k = first; k <= last; k++) ticks.push(valueOf(k, step));
  return start > stop ? ticks.reverse() : ticks;
}

/** The step between niceTicks(start, stop, count), as a number. */
export function niceTickStep(start: number, stop: number, count: number): number {
  const step = niceStep(Math.min(start, stop), Math.max(start, stop), count);
  return step.divisor === 1 ? step.multiple : 1 / step.divisor;
}

/** An axis from 0 up to a round value: its top, the step between its ticks, and the ticks. */
export interface NiceAxis {
  readonly top: number;
  readonly step: number;
  readonly ticks: readonly number[];
}

/**
 * An axis from 0 that holds `max` and ends on a tick: the step is chosen for [0, max] and the top
 * is the first multiple of it at or above max (taking ticks of [0, top] afresh could pick a
 * coarser step that skips the top). A max of 0 or less, or not finite, gives the axis 0…1.
 */
export function niceAxis(max: number, count: number): NiceAxis {
  const upper = max > 0 && Number.isFinite(max) ? max : 1;
  const step = niceStep(0, upper, count);
  let last = Math.round(step.divisor === 1 ? upper / step.multiple : upper * step.divisor);
  if (valueOf(last, step) < upper) last++;
  const ticks: number[] = [];
  for (let k = 0; k <= last; k++) ticks.push(valueOf(k, step));
  return { top: valueOf(last, step), step: step.divisor === 1 ? step.multiple : 1 / step.divisor, ticks };
}
