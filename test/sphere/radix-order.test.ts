import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { orderByBits, orderByKey } from '../../src/sphere/radix-order';

// Reference: JavaScript's own stable Array.prototype.sort (ECMAScript 2019 and later) with a
// numeric comparator, which orders −0 and 0 as equal (keys compared with <).
function referenceOrder(keys: Float64Array, indices: number[]): number[] {
  return [...indices].sort((a, b) => keys[a] - keys[b]);
}

describe('orderByKey', () => {
  it('orders indices exactly as a stable comparison sort does, for keys of any sign and size (property)', () => {
    const key = fc.oneof(
      fc.double({ noNaN: true, noDefaultInfinity: false }),
      fc.integer({ min: -3, max: 3 }),
      fc.constantFrom(0, 5e-324, -5e-324, Number.MAX_VALUE, -Infinity, Infinity),
    );
    fc.assert(fc.property(fc.array(key, { maxLength: 500 }), (values) => {
      const keys = Float64Array.from(values.map((v) => (Object.is(v, -0) ? 0 : v)));
      const indices = Array.from(keys, (_, i) => i);
      const got = Array.from(orderByKey(keys, Uint32Array.from(indices)));
      expect(got).toEqual(referenceOrder(keys, indices));
    }), { numRuns: 300, seed: 31 });
  });

  it('orders keys that differ only in their low 32 bits exactly, in runs short and long (property)', () => {
    // Keys 1 + k·2⁻⁵², a few ulps apart: equal in sign, exponent and the top of the mantissa.
    const key = fc.oneof(fc.integer({ min: 0, max: 40 }).map((k) => 1 + k * 2 ** -52), fc.double({ min: 0.5, max: 2, noNaN: true }));
    fc.assert(fc.property(fc.array(key, { maxLength: 400 }), (values) => {
      const keys = Float64Array.from(values);
      const indices = Array.from(keys, (_, i) => i);
      expect(Array.from(orderByKey(keys, Uint32Array.from(indices)))).toEqual(referenceOrder(keys, indices));
    }), { numRuns: 200, seed: 32 });
  });

  it('orders 32-bit keys by their low bits as a stable comparison sort does (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 32 }), fc.array(fc.nat({ max: 2 ** 32 - 1 }), { maxLength: 3000 }), (bits, values) => {
      const keys = Uint32Array.from(values);
      const low = (k: number) => (bits === 32 ? k : k % 2 ** bits);
      const expected = Array.from(keys, (_, i) => i).sort((a, b) => low(keys[a]) - low(keys[b]));
      expect(Array.from(orderByBits(keys, Uint32Array.from(keys, (_, i) => i), bits))).toEqual(expected);
    }), { numRuns: 200, seed: 33 });
  });

  it('sorts lexicographically when applied to the secondary key first and then the primary one', () => {
    const x = Float64Array.of(2, 1, 2, 1, 0);
    const y = Float64Array.of(5, 9, -5, 3, 7);
    const order = orderByKey(x, orderByKey(y, Uint32Array.of(0, 1, 2, 3, 4)));
    expect(Array.from(order)).toEqual([4, 3, 1, 2, 0]);
  });

  it('sorts a subset of indices and leaves short lists alone', () => {
    const keys = Float64Array.of(3, 2, 1, 0);
    expect(Array.from(orderByKey(keys, Uint32Array.of(0, 2)))).toEqual([2, 0]);
    expect(Array.from(orderByKey(keys, Uint32Array.of(1)))).toEqual([1]);
    expect(orderByKey(keys, new Uint32Array(0)).length).toBe(0);
  });
});
