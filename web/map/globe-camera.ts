/** The WebGL map's first camera. */

/**
 * Globe radius in CSS pixels at zoom 0 as maplibre 6 draws it (measured in the browser: 204 px
 * at zoom 1.6; each zoom level doubles it).
 */
export const GLOBE_RADIUS_PX_AT_ZOOM_0 = 67;
/** Share of the container's shorter side the globe's radius takes at first. */
export const FIT_SHARE = 0.42;
export const MIN_FIT_ZOOM = 0;
export const MAX_FIT_ZOOM = 3;

/** The zoom at which the globe fits a container of `width` × `height` CSS pixels (400 when unknown). */
export function fitZoom(width: number, height: number): number {
  const side = Math.min(width, height) || 400;
  return Math.max(MIN_FIT_ZOOM, Math.min(MAX_FIT_ZOOM, Math.log2((FIT_SHARE * side) / GLOBE_RADIUS_PX_AT_ZOOM_0)));
}
