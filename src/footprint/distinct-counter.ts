import { ABSENT_CODE } from '../table/occurrence-table';

/**
 * Counts distinct dictionary codes among groups of rows without clearing memory between groups:
 * each group gets a fresh stamp, and a code counts when its stamp is not yet the current one.
 */
export class DistinctCounter {
  private readonly seen: Uint32Array;
  private stamp = 0;

  /** `codeCount`: the dictionary size (codes are 0 … codeCount - 1). */
  constructor(codeCount: number) {
    this.seen = new Uint32Array(codeCount);
  }

  /** Distinct codes of rows order[from … to - 1]; ABSENT_CODE is not counted. */
  count(codes: Uint32Array, order: Uint32Array, from: number, to: number): number {
    const seen = this.seen;
    const stamp = this.nextStamp();
    let distinct = 0;
    for (let k = from; k < to; k++) {
      const code = codes[order[k]];
      if (code !== ABSENT_CODE && seen[code] !== stamp) {
        seen[code] = stamp;
        distinct++;
      }
    }
    return distinct;
  }

  private nextStamp(): number {
    if (this.stamp === 0xffffffff) {
      this.seen.fill(0);
      this.stamp = 0;
    }
    return ++this.stamp;
  }
}
