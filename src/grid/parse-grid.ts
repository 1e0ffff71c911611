import type { EqualAreaGrid } from './equal-area-grid';
import { HEALPIX_MAX_NSIDE, HealpixGrid, isHealpixNside } from './healpix';
import { LatitudeBandsGrid } from './latitude-bands';

const GRID_SYNTAX = `healpix:NSIDE (NSIDE a power of two, 1–${HEALPIX_MAX_NSIDE}) or bands:DEG (0 < DEG <= 90)`;

/**
 * The grid named by `text`: `healpix:NSIDE` or `bands:DEG`, as written in exports. NSIDE is
 * written as digits, DEG as a plain decimal number (`2`, `2.5`, `0.5`); nothing else is accepted.
 */
export function parseGridName(text: string): EqualAreaGrid {
  const healpix = /^healpix:([0-9]+)$/.exec(text);
  if (healpix !== null) {
    const nside = Number(healpix[1]);
    if (!isHealpixNside(nside)) {
      throw new RangeError(`Invalid grid "${text}": NSIDE must be a power of two from 1 to ${HEALPIX_MAX_NSIDE}.`);
    }
    return new HealpixGrid(nside);
  }
  const bands = /^bands:([0-9]+(?:\.[0-9]*)?|\.[0-9]+)$/.exec(text);
  if (bands !== null) {
    const deg = Number(bands[1]);
    if (!(deg > 0 && deg <= 90)) {
      throw new RangeError(`Invalid grid "${text}": DEG must be a number of degrees with 0 < DEG <= 90.`);
    }
    return new LatitudeBandsGrid(deg);
  }
  throw new RangeError(`Unknown grid "${text}": expected ${GRID_SYNTAX}.`);
}
