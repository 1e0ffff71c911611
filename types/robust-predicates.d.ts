// Minimal typings for the parts of robust-predicates we use (the package names a types file it
// does not ship). Signs follow the package's y-down convention; see its README.
declare module 'robust-predicates' {
  /** Positive when a, b, c run counter-clockwise (y axis down), negative clockwise, 0 when collinear. */
  export function orient2d(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number;
  /** For a, b, c with orient2d > 0: negative when d is inside their circle, positive outside, 0 on it. */
  export function incircle(
    ax: number, ay: number, bx: number, by: number, cx: number, cy: number, dx: number, dy: number,
  ): number;
}
