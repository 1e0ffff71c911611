import fc from 'fast-check';
import type { RichnessInput } from '../../src/richness';

/** Builds a RichnessInput from per-slice row lists [taxon, collection, cell]. */
export function tableOf(slices: ReadonlyArray<ReadonlyArray<readonly [number, number, number]>>, taxonCount?: number): RichnessInput {
  const rows = slices.flat();
  const start = new Uint32Array(slices.length + 1);
  slices.forEach((s, i) => (start[i + 1] = start[i] + s.length));
  const taxon = Uint32Array.from(rows, (r) => r[0]);
  const collection = Uint32Array.from(rows, (r) => r[1]);
  return {
    start, taxon, collection,
    cell: Uint32Array.from(rows, (r) => r[2]),
    taxonCount: taxonCount ?? Math.max(0, ...taxon) + 1,
    collectionCount: Math.max(0, ...collection) + 1,
  };
}

/** Arbitrary small tables: up to 6 slices of up to 40 rows over 12 taxa, 10 collections, 9 cells. */
export const arbitraryTable = fc
  .array(fc.array(fc.tuple(fc.nat(11), fc.nat(9), fc.nat(8)), { maxLength: 40 }), { minLength: 1, maxLength: 6 })
  .map((slices) => tableOf(slices, 12));
