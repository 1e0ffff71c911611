const INITIAL_SLOTS = 1024;
const INITIAL_POOL = 1 << 16;
/** Int32 words per slot: hash, code, start of the value in the pool, its length. */
const SLOT = 4;
const EMPTY = -1;

/**
 * Distinct strings numbered in first-seen order, for CodedColumn. Looks up a span of a larger
 * text without cutting it out: an open-addressing table (linear probing, at most half full) of
 * FNV-1a hashes (Fowler, Noll & Vo), with each value's characters copied into one pool, so a
 * lookup touches the slot and the pool rather than scattered string objects.
 */
export class StringDictionary {
  readonly values: string[] = [];
  private slots = new Int32Array(SLOT * INITIAL_SLOTS).fill(EMPTY);
  private mask = INITIAL_SLOTS - 1;
  private pool = new Uint16Array(INITIAL_POOL);
  private poolUsed = 0;
  /** Rows of one collection or taxon often follow each other: the last answer's slot is kept. */
  private lastSlot = -1;

  /** Code of `value`, adding it on first sight. */
  code(value: string): number {
    return this.codeOf(value, 0, value.length);
  }

  /** Code of text[start, end), adding it on first sight. */
  codeOf(text: string, start: number, end: number): number {
    const slots = this.slots;
    const last = this.lastSlot;
    if (last >= 0 && this.equals(slots[last + 2], slots[last + 3], text, start, end)) return slots[last + 1];
    let h = 0x811c9dc5 | 0; // as int32, the form the Int32Array slots hold
    for (let i = start; i < end; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
    let at = SLOT * (h & this.mask);
    for (;;) {
      if (slots[at + 1] === EMPTY) break;
      if (slots[at] === h && this.equals(slots[at + 2], slots[at + 3], text, start, end)) {
        this.lastSlot = at;
        return slots[at + 1];
      }
      at = (at + SLOT) & (SLOT * this.mask + SLOT - 1);
    }
    return this.insert(at, h, text, start, end);
  }

  private equals(from: number, length: number, text: string, start: number, end: number): boolean {
    if (length !== end - start) return false;
    const pool = this.pool;
    for (let k = 0; k < length; k++) if (pool[from + k] !== text.charCodeAt(start + k)) return false;
    return true;
  }

  private insert(at: number, h: number, text: string, start: number, end: number): number {
    const code = this.values.length;
    const length = end - start;
    if (this.poolUsed + length > this.pool.length) {
      const pool = new Uint16Array(Math.max(2 * this.pool.length, this.poolUsed + length));
      pool.set(this.pool);
      this.pool = pool;
    }
    for (let k = 0; k < length; k++) this.pool[this.poolUsed + k] = text.charCodeAt(start + k);
    this.slots.set([h, code, this.poolUsed, length], at);
    this.poolUsed += length;
    this.values.push(detach(text.slice(start, end)));
    this.lastSlot = at;
    if (2 * this.values.length > this.mask) this.grow();
    return code;
  }

  private grow(): void {
    const old = this.slots;
    this.mask = 2 * (this.mask + 1) - 1;
    const wrap = SLOT * this.mask + SLOT - 1;
    this.slots = new Int32Array(SLOT * (this.mask + 1)).fill(EMPTY);
    for (let s = 0; s < old.length; s += SLOT) {
      if (old[s + 1] === EMPTY) continue;
      let at = SLOT * (old[s] & this.mask);
      while (this.slots[at + 1] !== EMPTY) at = (at + SLOT) & wrap;
      this.slots.set(old.subarray(s, s + SLOT), at);
    }
    this.lastSlot = -1;
  }
}

/** V8 copies substrings shorter than this anyway (SlicedString::kMinLength; from memory). */
const MIN_SLICED_LENGTH = 13;

/**
 * A copy of `s` that does not keep alive the large text it was cut from: V8 stores a long
 * substring as a view into its parent, so a dictionary of slices would pin every 1 MiB chunk
 * of the file. Concatenating and slicing forces a fresh flat copy.
 */
export function detach(s: string): string {
  return s.length < MIN_SLICED_LENGTH ? s : (' ' + s).slice(1);
}
