export type { EqualAreaGrid } from './equal-area-grid';
export { HEALPIX_MAX_NSIDE, HealpixGrid, isHealpixNside } from './healpix';
export { LatitudeBandsGrid } from './latitude-bands';
export { BANDS_MAX_CELLS, type BandLayout, bandLayout } from './latitude-bands-layout';
export { DEFAULT_RING_STEP_DEG } from './grid-input';
export { parseGridName } from './parse-grid';
