// Minimal typings for the part of d3-array the chart tests compare against (the package ships
// none; it is installed as a dependency of d3-geo).
declare module 'd3-array' {
  /** About `count` round values between start and stop (1, 2 or 5 × 10^k apart). */
  export function ticks(start: number, stop: number, count: number): number[];
}
