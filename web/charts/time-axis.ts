/** The time axis shared by the curves panel: old on the left, young on the right, as on the time strip. */
import type { SliceMetrics } from '../../src/analysis';
import { linearScale, type LinearScale } from './linear-scale';
import { AXIS, GRID, INK, lineMark, textMark, type Mark } from './marks';
import { niceTicks, niceTickStep } from './ticks';
import { tickFormat } from './number-format';

/** Pixels per time tick, roughly. */
const PX_PER_TICK = 80;

/** x scale from ages (Ma) to pixels: the oldest base at `left`, the youngest top at `right`. */
export function timeScale(slices: readonly SliceMetrics[], left: number, right: number): LinearScale {
  let oldest = -Infinity;
  let youngest = Infinity;
  for (const s of slices) {
    if (s.baseMa > oldest) oldest = s.baseMa;
    if (s.topMa < youngest) youngest = s.topMa;
  }
  return linearScale([oldest, youngest], [left, right]);
}

/** Each slice's left (base) and right (top) edge, px, and the x of its mid-age. */
export function sliceEdges(slices: readonly SliceMetrics[], x: LinearScale): { left: Float64Array; right: Float64Array; mid: Float64Array } {
  const n = slices.length;
  const left = new Float64Array(n);
  const right = new Float64Array(n);
  const mid = new Float64Array(n);
  for (let s = 0; s < n; s++) {
    left[s] = x(slices[s].baseMa);
    right[s] = x(slices[s].topMa);
    mid[s] = x((slices[s].baseMa + slices[s].topMa) / 2);
  }
  return { left, right, mid };
}

/** Grid lines from `top` to `bottom` at round ages, the axis line, ticks, labels and title below `bottom`. */
export function timeAxisMarks(x: LinearScale, top: number, bottom: number): { grid: Mark[]; axis: Mark[] } {
  const [oldest, youngest] = x.domain;
  const count = Math.max(2, Math.round(Math.abs(x.range[1] - x.range[0]) / PX_PER_TICK));
  const ticks = niceTicks(youngest, oldest, count);
  const format = tickFormat(niceTickStep(youngest, oldest, count), oldest);
  const grid: Mark[] = [];
  const axis: Mark[] = [lineMark(x.range[0], bottom, x.range[1], bottom, AXIS)];
  for (const t of ticks) {
    const px = Math.round(x(t)) + 0.5;
    grid.push(lineMark(px, top, px, bottom, GRID));
    axis.push(lineMark(px, bottom, px, bottom + 4, AXIS));
    axis.push(textMark(px, bottom + 15, format(t), 'middle', 10, { fill: INK }));
  }
  axis.push(textMark((x.range[0] + x.range[1]) / 2, bottom + 30, 'Age (Ma)', 'middle', 11, { fill: INK }));
  return { grid, axis };
}
