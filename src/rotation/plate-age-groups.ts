/**
 * Dense numbers 0, 1, 2 … for distinct (plate id, age) pairs, in order of first sight: open
 * addressing with linear probing over typed arrays (no object or string per lookup), the
 * table kept at most half full, behind a small direct-mapped cache of the last pair seen per
 * plate (rows of one slice repeat few pairs, so most lookups end there without hashing).
 */
const INITIAL_BITS = 6;
const RECENT = 256;
const GOLDEN = 0x9e3779b1; // 2³² / golden ratio: Knuth's multiplicative hashing (TAOCP 3, §6.4)

export class PlateAgeGroups {
  /** Number of distinct pairs seen. */
  count = 0;
  /** Plate id and age of each group. */
  plateId = new Int32Array(1 << (INITIAL_BITS - 1));
  ageMa = new Float64Array(1 << (INITIAL_BITS - 1));
  /** Group + 1 in each slot, 0 when empty; 2^bits slots. */
  private slots = new Int32Array(1 << INITIAL_BITS);
  private bits = INITIAL_BITS;
  private readonly recentPlate = new Int32Array(RECENT).fill(-1);
  private readonly recentAge = new Float64Array(RECENT);
  private readonly recentGroup = new Int32Array(RECENT);
  private readonly age = new Float64Array(1);
  private readonly ageBits = new Uint32Array(this.age.buffer);

  /** The group of (plateId ≥ 0, ageMa), new if not seen before. `ageMa` must not be NaN. */
  groupOf(plateId: number, ageMa: number): number {
    const r = plateId & (RECENT - 1);
    if (this.recentPlate[r] === plateId && this.recentAge[r] === ageMa) return this.recentGroup[r];
    const group = this.lookUp(plateId, ageMa);
    this.recentPlate[r] = plateId;
    this.recentAge[r] = ageMa;
    this.recentGroup[r] = group;
    return group;
  }

  private lookUp(plateId: number, ageMa: number): number {
    const mask = this.slots.length - 1;
    let s = this.slotOf(plateId, ageMa);
    for (let g = this.slots[s]; g !== 0; g = this.slots[s]) {
      if (this.plateId[g - 1] === plateId && this.ageMa[g - 1] === ageMa) return g - 1;
      s = (s + 1) & mask;
    }
    const group = this.count++;
    if (group === this.plateId.length) this.grow();
    this.plateId[group] = plateId;
    this.ageMa[group] = ageMa + 0;
    if (2 * this.count > this.slots.length) this.rehash();
    else this.slots[s] = group + 1;
    return group;
  }

  private grow(): void {
    const plateId = new Int32Array(2 * this.plateId.length);
    const ageMa = new Float64Array(2 * this.ageMa.length);
    plateId.set(this.plateId);
    ageMa.set(this.ageMa);
    this.plateId = plateId;
    this.ageMa = ageMa;
  }

  /** Doubles the slots and puts every group back, the newest included. */
  private rehash(): void {
    this.bits++;
    this.slots = new Int32Array(1 << this.bits);
    const mask = this.slots.length - 1;
    for (let g = 0; g < this.count; g++) {
      let s = this.slotOf(this.plateId[g], this.ageMa[g]);
      while (this.slots[s] !== 0) s = (s + 1) & mask;
      this.slots[s] = g + 1;
    }
  }

  /** First slot to probe: the top bits of a multiplicative hash of the plate and the age's bits. */
  private slotOf(plateId: number, ageMa: number): number {
    this.age[0] = ageMa + 0; // −0 and 0 are one age
    return Math.imul(plateId ^ Math.imul(this.ageBits[0] ^ this.ageBits[1], GOLDEN), GOLDEN) >>> (32 - this.bits);
  }
}
