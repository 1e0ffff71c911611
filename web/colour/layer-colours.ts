/**
 * Fixed colours of the footprint overlays. Taken from the Okabe & Ito colour-blind-safe
 * palette (common practice for categorical colours), chosen to stand apart from viridis.
 */
export const OVERLAY_COLOURS = {
  hull: [230, 159, 0],
  spanningTree: [213, 94, 0],
  points: [0, 0, 0],
  polygons: [204, 201, 190],
  polygonEdge: [140, 136, 124],
  ocean: [236, 241, 245],
  graticule: [200, 208, 216],
} as const satisfies Record<string, readonly [number, number, number]>;

/** Indicator kinds, in order of first appearance (Okabe & Ito, skipping the overlay colours). */
export const INDICATOR_COLOURS: readonly (readonly [number, number, number])[] = [
  [0, 114, 178], [204, 121, 167], [0, 158, 115], [86, 180, 233], [240, 228, 66], [0, 0, 0],
];

export function rgbCss([r, g, b]: readonly number[], alpha = 1): string {
  return alpha === 1 ? `rgb(${r}, ${g}, ${b})` : `rgba(${r}, ${g}, ${b}, ${alpha})`;
}
