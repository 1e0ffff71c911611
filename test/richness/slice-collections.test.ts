import { describe, expect, it } from 'vitest';
import { richnessCurves, sliceCollections } from '../../src/richness';
import { tableOf } from './fixtures';

const ABSENT = 0xffffffff;

describe('collections per slice', () => {
  it('groups rows by collection within each slice, a row naming none being a collection of its own', () => {
    // Slice 0: rows 0–3 in collections 4, ABSENT, 4, ABSENT → three collections {0, 2}, {1}, {3}.
    // Slice 1: rows 4–5 both in collection 4 → one collection.
    const input = { ...tableOf([[[0, 4, 0], [1, 0, 0], [2, 4, 0], [3, 0, 0]], [[0, 4, 0], [1, 4, 0]]]), collectionCount: 5 };
    const collection = Uint32Array.from([4, ABSENT, 4, ABSENT, 4, 4]);
    const c = sliceCollections({ ...input, collection });
    expect(Array.from(c.collectionFirst)).toEqual([0, 3, 4]);
    const rowsOf = (g: number) => Array.from(c.rows.subarray(c.begin[g], c.end[g]));
    expect([0, 1, 2, 3].map(rowsOf)).toEqual([[0, 2], [1], [3], [4, 5]]);
  });
});

describe('SQS coverage from references', () => {
  it("uses single-reference taxa as singletons when asked (Alroy 2010's rule)", () => {
    // Four taxa, each twice, all from reference 0 except taxon 3 (references 0 and 1).
    // Occurrence singletons: none, u = 1. Single-reference taxa: 0, 1, 2 → f1 = 3, N = 8,
    // u_refs = 1 − 3/8 = 0.625 (Good 1953) — below a quorum of 0.7.
    const input = tableOf([[0, 0, 1, 1, 2, 2, 3, 3].map((t, k) => [t, k, 0] as const)]);
    const reference = Uint32Array.from([0, 0, 0, 0, 0, 0, 0, 1]);
    const options = { quorum: 0.7, trials: 20, seed: 2 };
    const byOccurrences = richnessCurves({ ...input, reference }, options);
    const byReferences = richnessCurves({ ...input, reference }, { ...options, coverageFrom: 'references' });
    expect(byOccurrences.goodsURefs?.[0]).toBeCloseTo(0.625, 15);
    expect(byOccurrences.sqs.reason[0]).toBe(0);
    expect(byReferences.sqs.reason[0]).toBe(2);
    expect(byReferences.sqs.mean[0]).toBeNaN();
  });
});
