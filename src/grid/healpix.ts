import type { EqualAreaGrid } from './equal-area-grid';
import { assertBatchLengths, assertCell, invalidPosition, ringStepDeg } from './grid-input';
import { nestedFace, nestedX, nestedY } from './healpix-nested';
import { healpixCellOf, healpixFacePointInto } from './healpix-projection';
import { healpixRing } from './healpix-ring';

/** Largest nside accepted: 12·8192² cells still number below 2^31. */
export const HEALPIX_MAX_NSIDE = 8192;

/** True for the nside values accepted: powers of two from 1 to HEALPIX_MAX_NSIDE. */
export function isHealpixNside(nside: number): boolean {
  return Number.isInteger(nside) && nside >= 1 && nside <= HEALPIX_MAX_NSIDE && (nside & (nside - 1)) === 0;
}

/**
 * HEALPix (Górski et al. 2005, ApJ 622:759) with NESTED cell numbers: 12·nside² cells of
 * 4π/(12·nside²) sr each. Cell centres are the scheme's pixel centres (on the rings
 * z = 1 − i²/(3nside²) in the caps and z = 4/3 − 2i/(3nside) between them), longitudes in
 * [-180, 180). A position on a boundary belongs to the cell east of it; a pole belongs to the
 * cell that holds it at longitude 0. Positions are checked: latitude within [-90, 90] degrees,
 * longitude finite (any value, taken modulo 360°).
 */
export class HealpixGrid implements EqualAreaGrid {
  readonly name: string;
  readonly nside: number;
  readonly cellCount: number;
  readonly cellAreaSr: number;
  readonly #order: number;

  constructor(nside: number) {
    if (!isHealpixNside(nside)) {
      throw new RangeError(`HEALPix nside ${nside} is not allowed: expected a power of two from 1 to ${HEALPIX_MAX_NSIDE}.`);
    }
    this.nside = nside;
    this.#order = 31 - Math.clz32(nside);
    this.name = `healpix:${nside}`;
    this.cellCount = 12 * nside * nside;
    this.cellAreaSr = (4 * Math.PI) / this.cellCount;
  }

  cellOf(latDeg: number, lonDeg: number): number {
    if (!(latDeg >= -90 && latDeg <= 90 && lonDeg - lonDeg === 0)) throw invalidPosition(latDeg, lonDeg);
    return healpixCellOf(this.#order, latDeg, lonDeg);
  }

  cellsOf(latDeg: Float64Array, lonDeg: Float64Array, out: Uint32Array): void {
    assertBatchLengths(latDeg, lonDeg, out);
    const order = this.#order;
    for (let i = 0; i < latDeg.length; i++) {
      const lat = latDeg[i];
      const lon = lonDeg[i];
      if (!(lat >= -90 && lat <= 90 && lon - lon === 0)) throw invalidPosition(lat, lon, i);
      out[i] = healpixCellOf(order, lat, lon);
    }
  }

  cellCentreInto(cell: number, out: Float64Array): Float64Array {
    assertCell(this.name, this.cellCount, cell);
    const order = this.#order;
    const nside = this.nside;
    const x = (nestedX(order, cell) + 0.5) / nside;
    const y = (nestedY(order, cell) + 0.5) / nside;
    healpixFacePointInto(nestedFace(order, cell), x, y, out);
    out[1] -= 360 * Math.floor((out[1] + 180) / 360);
    return out;
  }

  cellRing(cell: number, maxStepDeg?: number): Array<[number, number]> {
    assertCell(this.name, this.cellCount, cell);
    return healpixRing(this.#order, cell, ringStepDeg(maxStepDeg));
  }
}
