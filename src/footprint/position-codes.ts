import { ABSENT_CODE } from '../table/occurrence-table';

/** Distinct positions numbered in first-seen order; rows with a NaN coordinate get ABSENT_CODE. */
export interface PositionCodes {
  readonly codes: Uint32Array;
  readonly count: number;
}

const EMPTY = -1;

/**
 * Numbers the distinct positions of a table with an open-addressing hash on the coordinates' bits.
 * Positions are equal when their degrees are equal, with longitude -180 taken as 180 and every
 * longitude at a pole taken as one place (they name the same point on the sphere).
 */
export function positionCodes(latDeg: Float64Array, lonDeg: Float64Array): PositionCodes {
  const n = latDeg.length;
  const codes = new Uint32Array(n);
  let size = 16;
  while (size < 2 * n) size *= 2;
  const mask = size - 1;
  const slots = new Int32Array(size).fill(EMPTY);
  const firstRow = new Uint32Array(n);
  const pair = new Float64Array(2);
  const words = new Uint32Array(pair.buffer);
  let count = 0;
  for (let i = 0; i < n; i++) {
    const lat = latDeg[i];
    const lon = lonDeg[i];
    if (Number.isNaN(lat) || Number.isNaN(lon)) {
      codes[i] = ABSENT_CODE;
      continue;
    }
    pair[0] = lat + 0; // + 0 turns -0 into 0 so both hash alike
    pair[1] = canonicalLon(lat, lon);
    let h = Math.imul(words[0] ^ Math.imul(words[1], 0x9e3779b1), 0x85ebca6b);
    h ^= Math.imul(words[2] ^ Math.imul(words[3], 0xc2b2ae35), 0x27d4eb2f);
    h ^= h >>> 15;
    let slot = h & mask;
    for (;;) {
      const code = slots[slot];
      if (code === EMPTY) {
        slots[slot] = count;
        firstRow[count] = i;
        codes[i] = count++;
        break;
      }
      const row = firstRow[code];
      if (latDeg[row] === pair[0] && canonicalLon(latDeg[row], lonDeg[row]) === pair[1]) {
        codes[i] = code;
        break;
      }
      slot = (slot + 1) & mask;
    }
  }
  return { codes, count };
}

function canonicalLon(lat: number, lon: number): number {
  if (lat === 90 || lat === -90) return 0;
  return lon === -180 ? 180 : lon + 0;
}
