/**
 * SVG path data for a series of points, with gaps: a NaN (or infinite) value breaks the line,
 * because a slice without a value (no hull, one place) has no value to draw, not a value of zero.
 */

/** Coordinates are written to 0.1 px, plenty for screens and figures and keeps paths short. */
function px(value: number): string {
  return String(Math.round(value * 10) / 10);
}

/** Polyline through (xs[i], ys[i]), broken at non-finite ys; runs of a single point draw nothing here (see markerPath). */
export function linePath(xs: ArrayLike<number>, ys: ArrayLike<number>): string {
  const parts: string[] = [];
  let run = 0;
  for (let i = 0; i < ys.length; i++) {
    if (!Number.isFinite(ys[i])) {
      run = 0;
      continue;
    }
    const next = i + 1 < ys.length && Number.isFinite(ys[i + 1]);
    if (run === 0 && !next) continue; // an isolated point: no segment to draw
    parts.push(`${run === 0 ? 'M' : 'L'}${px(xs[i])},${px(ys[i])}`);
    run++;
  }
  return parts.join('');
}

/**
 * Filled dots of radius r at finite points: at every point when `all`, else only at isolated
 * ones (finite with no finite neighbour), which linePath cannot show. Each dot is two arcs.
 */
export function markerPath(xs: ArrayLike<number>, ys: ArrayLike<number>, r: number, all: boolean): string {
  const parts: string[] = [];
  const d = px(2 * r);
  for (let i = 0; i < ys.length; i++) {
    if (!Number.isFinite(ys[i])) continue;
    const isolated = !(i > 0 && Number.isFinite(ys[i - 1])) && !(i + 1 < ys.length && Number.isFinite(ys[i + 1]));
    if (!all && !isolated) continue;
    parts.push(`M${px(xs[i] - r)},${px(ys[i])}a${px(r)},${px(r)} 0 1,0 ${d},0a${px(r)},${px(r)} 0 1,0 -${d},0`);
  }
  return parts.join('');
}
