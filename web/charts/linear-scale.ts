/** A straight map from a data interval onto a pixel interval (either may run backwards). */
export interface LinearScale {
  readonly domain: readonly [number, number];
  readonly range: readonly [number, number];
  /** Pixel of a data value (values outside the domain extrapolate). */
  (value: number): number;
  /** Data value of a pixel, the inverse of the forward map. */
  invert(pixel: number): number;
}

export function linearScale(domain: readonly [number, number], range: readonly [number, number]): LinearScale {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  // A zero-width domain maps everything to the middle of the range rather than dividing by 0.
  const slope = d1 === d0 ? 0 : (r1 - r0) / (d1 - d0);
  const forward = (value: number): number => (slope === 0 ? (r0 + r1) / 2 : r0 + (value - d0) * slope);
  const invert = (pixel: number): number => (slope === 0 ? d0 : d0 + (pixel - r0) / slope);
  return Object.assign(forward, { domain: [d0, d1] as const, range: [r0, r1] as const, invert });
}
