/**
 * Projects a run of points through a d3 projection's stream (rotation, clipping and projection
 * exactly as d3 draws them) into a flat [x, y, x, y, …] array. A point the clip hides (the far
 * hemisphere on a polar map) is written as NaN, NaN. Nothing is allocated per point by this code.
 */
import type { GeoProjection, GeoStream } from 'd3-geo';

/** Receives d3's projected points; `visible` tells whether the last point came through. */
class PointSink implements GeoStream {
  x = 0;
  y = 0;
  visible = false;
  point(x: number, y: number): void {
    this.x = x;
    this.y = y;
    this.visible = true;
  }
  lineStart(): void {}
  lineEnd(): void {}
  polygonStart(): void {}
  polygonEnd(): void {}
  sphere(): void {}
}

/**
 * Points from … to − 1 of lon/lat (degrees) projected into out[2·(i − outFrom)…]. Returns how
 * many were visible.
 */
export function projectPointsInto(
  projection: GeoProjection, lon: ArrayLike<number>, lat: ArrayLike<number>, from: number, to: number, out: Float32Array, outFrom = from,
): number {
  const sink = new PointSink();
  const stream = projection.stream(sink);
  let visible = 0;
  for (let i = from, o = 2 * outFrom; i < to; i++, o += 2) {
    sink.visible = false;
    stream.point(lon[i], lat[i]);
    if (sink.visible) {
      out[o] = sink.x;
      out[o + 1] = sink.y;
      visible++;
    } else {
      out[o] = Number.NaN;
      out[o + 1] = Number.NaN;
    }
  }
  return visible;
}
