// NESTED numbering within a face interleaves the bits of ix (even positions) and iy (odd positions)
// (Górski et al. 2005, ApJ 622:759, the NESTED scheme). Checked against the definition written bit
// by bit, and as a round trip.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compactBits, nestedCell, nestedFace, nestedX, nestedY, spreadBits } from '../../src/grid/healpix-nested';

/** The definition, one bit at a time: bit k of v goes to bit 2k. */
function spreadByDefinition(v: number): number {
  let out = 0;
  for (let k = 0; k < 16; k++) if ((v >> k) & 1) out += 2 ** (2 * k);
  return out;
}

describe('NESTED bit interleaving', () => {
  it('spreads bits as the bit-by-bit definition does, and compacts them back', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 0xffff }), (v) => {
        expect(spreadBits(v)).toBe(spreadByDefinition(v));
        expect(compactBits(spreadBits(v))).toBe(v);
      }),
    );
  });

  it('numbers the cells of a face so that 4p … 4p+3 are the children of p (worked by hand)', () => {
    // order 1 (nside 2), face 0: (ix, iy) = (0,0) → 0, (1,0) → 1, (0,1) → 2, (1,1) → 3.
    expect([nestedCell(1, 0, 0, 0), nestedCell(1, 0, 1, 0), nestedCell(1, 0, 0, 1), nestedCell(1, 0, 1, 1)]).toEqual([0, 1, 2, 3]);
    // order 2, face 3, (ix, iy) = (2, 3) = (10b, 11b) → bits y1 x1 y0 x0 = 1 1 1 0 = 14; 3·16 + 14 = 62.
    expect(nestedCell(2, 3, 2, 3)).toBe(62);
  });

  it('reads face, ix and iy back from a cell number, up to nside 8192', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 13 }), fc.integer({ min: 0, max: 11 }), fc.nat(), fc.nat(), (order, face, a, b) => {
        const ix = a % 2 ** order;
        const iy = b % 2 ** order;
        const cell = nestedCell(order, face, ix, iy);
        expect(cell).toBeGreaterThanOrEqual(0);
        expect(cell).toBeLessThan(12 * 4 ** order);
        expect([nestedFace(order, cell), nestedX(order, cell), nestedY(order, cell)]).toEqual([face, ix, iy]);
      }),
    );
  });
});
