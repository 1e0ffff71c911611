/**
 * An affine frame from reference pixels (map-projection.ts) to a box on a canvas or figure:
 * x = k·xRef + tx, y = k·yRef + ty. It is what d3's fitExtent computes for the same box (scale
 * to the tighter side, centre on the other), applied to an already-projected picture.
 */
import type { ReferenceProjection } from './map-projection';

export interface MapFrame {
  readonly k: number;
  readonly tx: number;
  readonly ty: number;
}

/** The frame that fits the reference sphere into the box [x0, y0]–[x1, y1]. */
export function fitFrame(reference: ReferenceProjection, x0: number, y0: number, x1: number, y1: number): MapFrame {
  const [[bx0, by0], [bx1, by1]] = reference.bounds;
  const k = Math.min((x1 - x0) / (bx1 - bx0), (y1 - y0) / (by1 - by0));
  const tx = x0 + ((x1 - x0) - k * (bx1 - bx0)) / 2 - k * bx0;
  const ty = y0 + ((y1 - y0) - k * (by1 - by0)) / 2 - k * by0;
  return { k, tx, ty };
}

/** Reference position of a box point, written into out as [xRef, yRef]. */
export function frameInverseInto(frame: MapFrame, x: number, y: number, out: Float64Array): Float64Array {
  out[0] = (x - frame.tx) / frame.k;
  out[1] = (y - frame.ty) / frame.k;
  return out;
}
