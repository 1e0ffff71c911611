/**
 * Colours for counts on the maps: viridis (van der Walt & Smith's perceptually uniform,
 * colour-blind-safe scale, from d3-scale-chromatic) on a logarithmic axis, because counts per
 * cell are strongly skewed. One lookup table of 256 colours, so colouring allocates nothing.
 */
import { interpolateViridis } from 'd3-scale-chromatic';

const STEPS = 256;
const TABLE = buildTable();

function buildTable(): Uint8Array {
  const table = new Uint8Array(STEPS * 3);
  for (let k = 0; k < STEPS; k++) {
    const css = interpolateViridis(k / (STEPS - 1)); // "#rrggbb" or "rgb(r, g, b)"
    const rgb = parseCssColour(css);
    table.set(rgb, k * 3);
  }
  return table;
}

function parseCssColour(css: string): [number, number, number] {
  if (css.startsWith('#')) return [parseInt(css.slice(1, 3), 16), parseInt(css.slice(3, 5), 16), parseInt(css.slice(5, 7), 16)];
  const parts = css.match(/\d+/g) ?? ['0', '0', '0'];
  return [Number(parts[0]), Number(parts[1]), Number(parts[2])];
}

/** A log scale from 1 to `max` onto the colour table. */
export interface CountScale {
  readonly max: number;
  /** Position 0…1 of a count on the scale (counts ≤ 1 at 0). */
  position(count: number): number;
  /** Writes [r, g, b] of a count into out at offset. */
  colourInto(count: number, out: Uint8Array | number[], offset: number): void;
  /** CSS colour of a count. */
  css(count: number): string;
  /** Round counts to label a legend with (1, 10, 100 … and max). */
  readonly ticks: readonly number[];
}

export function countScale(maxCount: number): CountScale {
  const max = Math.max(2, maxCount);
  const logMax = Math.log(max);
  const position = (count: number): number => (count <= 1 ? 0 : Math.min(1, Math.log(count) / logMax));
  const index = (count: number): number => Math.round(position(count) * (STEPS - 1)) * 3;
  const ticks: number[] = [];
  for (let t = 1; t < max; t *= 10) ticks.push(t);
  if (ticks[ticks.length - 1] !== max) ticks.push(max);
  return {
    max,
    position,
    colourInto(count, out, offset) {
      const k = index(count);
      out[offset] = TABLE[k];
      out[offset + 1] = TABLE[k + 1];
      out[offset + 2] = TABLE[k + 2];
    },
    css(count) {
      const k = index(count);
      return `rgb(${TABLE[k]}, ${TABLE[k + 1]}, ${TABLE[k + 2]})`;
    },
    ticks,
  };
}

/** CSS linear-gradient running along the scale, for legends. */
export function scaleGradientCss(direction = 'to right'): string {
  const stops: string[] = [];
  for (let k = 0; k <= 8; k++) {
    const i = Math.round((k / 8) * (STEPS - 1)) * 3;
    stops.push(`rgb(${TABLE[i]}, ${TABLE[i + 1]}, ${TABLE[i + 2]}) ${(k / 8) * 100}%`);
  }
  return `linear-gradient(${direction}, ${stops.join(', ')})`;
}
