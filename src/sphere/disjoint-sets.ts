/**
 * Disjoint sets over 0..n−1 (union–find) on a typed array: union by size and path halving,
 * near-constant amortised time per operation (Tarjan 1975, J. ACM 22(2)).
 */
export class DisjointSets {
  private readonly parent: Int32Array;
  private readonly size: Int32Array;

  constructor(n: number) {
    this.parent = new Int32Array(n);
    this.size = new Int32Array(n).fill(1);
    for (let i = 0; i < n; i++) this.parent[i] = i;
  }

  /** Representative of the set holding `x`. */
  find(x: number): number {
    const parent = this.parent;
    while (parent[x] !== x) {
      parent[x] = parent[parent[x]];
      x = parent[x];
    }
    return x;
  }

  /** Merges the sets of `a` and `b`; false when they were already one set. */
  union(a: number, b: number): boolean {
    let ra = this.find(a);
    let rb = this.find(b);
    if (ra === rb) return false;
    if (this.size[ra] < this.size[rb]) {
      const t = ra;
      ra = rb;
      rb = t;
    }
    this.parent[rb] = ra;
    this.size[ra] += this.size[rb];
    return true;
  }
}
