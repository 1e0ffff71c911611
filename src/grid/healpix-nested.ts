/**
 * HEALPix NESTED numbering (Górski et al. 2005, ApJ 622:759, §3): inside each of the 12 base
 * faces the cell (ix, iy) gets the number whose bits interleave those of ix (even bits) and iy
 * (odd bits), so the four children of cell p at 2·nside are 4p … 4p+3. The face comes on top:
 * cell = face·nside² + interleave(ix, iy). With nside ≤ 8192 every number fits 30 bits, so
 * plain 32-bit integer operations are exact.
 *
 * The bit spreading uses the usual mask-and-shift steps for Morton codes (common practice).
 */

/** Spreads the low 16 bits of `v` over the even bit positions: abcd → 0a0b0c0d. */
export function spreadBits(v: number): number {
  v = (v | (v << 8)) & 0x00ff00ff;
  v = (v | (v << 4)) & 0x0f0f0f0f;
  v = (v | (v << 2)) & 0x33333333;
  return (v | (v << 1)) & 0x55555555;
}

/** Inverse of spreadBits: gathers the even bit positions of `v` into the low 16 bits. */
export function compactBits(v: number): number {
  v &= 0x55555555;
  v = (v | (v >>> 1)) & 0x33333333;
  v = (v | (v >>> 2)) & 0x0f0f0f0f;
  v = (v | (v >>> 4)) & 0x00ff00ff;
  return (v | (v >>> 8)) & 0x0000ffff;
}

/** NESTED number of cell (ix, iy) of `face` at nside = 2^order. */
export function nestedCell(order: number, face: number, ix: number, iy: number): number {
  return (face << (2 * order)) | spreadBits(ix) | (spreadBits(iy) << 1);
}

/** Face of a NESTED cell number at nside = 2^order. */
export function nestedFace(order: number, cell: number): number {
  return cell >>> (2 * order);
}

/** Column ix (along the face's north-east axis) of a NESTED cell number. */
export function nestedX(order: number, cell: number): number {
  return compactBits(cell & ((1 << (2 * order)) - 1));
}

/** Row iy (along the face's north-west axis) of a NESTED cell number. */
export function nestedY(order: number, cell: number): number {
  return compactBits((cell & ((1 << (2 * order)) - 1)) >>> 1);
}
