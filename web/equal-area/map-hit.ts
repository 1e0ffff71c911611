/**
 * The occupied cell under a point of the drawn map: the point is taken back through the frame
 * and the projection's inverse, kept only if it is on the drawn globe (the polar maps show one
 * hemisphere; the inverse wraps points off the Equal Earth outline round to the other side, which
 * a forward round trip catches), and the grid names its cell (cell-lookup.ts).
 */
import type { CellLookup } from './cell-lookup';
import { frameInverseInto, type MapFrame } from './map-frame';
import { isOnMap, type ReferenceProjection } from './map-projection';

/** Largest forward round-trip miss still counted as on the globe, reference px. */
const ROUND_TRIP_PX = 0.5;

/** Position (degrees) under box point (x, y), written into out as [lon, lat]; false when off the globe. */
export function mapPointToLonLatInto(reference: ReferenceProjection, frame: MapFrame, x: number, y: number, out: Float64Array): boolean {
  const ref = frameInverseInto(frame, x, y, out);
  const { projection } = reference;
  const lonLat = projection.invert?.([ref[0], ref[1]]);
  if (lonLat == null || !(Math.abs(lonLat[1]) <= 90) || !isOnMap(reference.kind, lonLat[1])) return false;
  const back = projection(lonLat);
  if (back == null || !(Math.hypot(back[0] - ref[0], back[1] - ref[1]) < ROUND_TRIP_PX)) return false;
  out[0] = lonLat[0];
  out[1] = lonLat[1];
  return true;
}

/** Entry (index into view.cells) of the slice's occupied cell under box point (x, y), or −1. */
export function entryAtMapPoint(
  reference: ReferenceProjection, frame: MapFrame, lookup: CellLookup, slice: number, x: number, y: number, scratch: Float64Array,
): number {
  if (!mapPointToLonLatInto(reference, frame, x, y, scratch)) return -1;
  return lookup.entryAt(slice, scratch[1], scratch[0]);
}
