import type { MapFrame } from '../../web/equal-area/map-frame';

/**
 * Box position [x, y] of a reference point under a frame: x = k·xRef + tx, y = k·yRef + ty, the
 * affine map the frame stands for (draw-map.ts hands it to the canvas as setTransform).
 */
export function framePoint(frame: MapFrame, xRef: number, yRef: number): [number, number] {
  return [frame.k * xRef + frame.tx, frame.k * yRef + frame.ty];
}
