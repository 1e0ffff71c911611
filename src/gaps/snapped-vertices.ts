/**
 * Vertices of cell outlines made one where two outlines meet: positions that are one point
 * computed twice (from the two cells beside an edge) differ by rounding only, so they are
 * snapped together through a grid of buckets of side 1/SNAP_SCALE degrees. A position is
 * compared with its own bucket and, when it lies within SNAP_MARGIN of a bucket side, with the
 * neighbouring buckets too, so that rounding never splits one point into two. Buckets live in
 * an open-addressing hash table on typed arrays (linear probing; Knuth, TAOCP vol. 3, §6.4).
 */

/** Buckets per degree (2^16: about 1.7 m on the Earth): far below the smallest cell side
 * (nside 8192: ~0.007°) and far above the rounding of a computed outline vertex. */
const SNAP_SCALE = 65536;
/** Fraction of a bucket within which the neighbouring buckets are searched as well. */
const SNAP_MARGIN = 1e-3;
const EMPTY = -1;

export class SnappedVertices {
  #x = new Float64Array(1024);
  #y = new Float64Array(1024);
  #count = 0;
  #keyX = new Int32Array(2048);
  #keyY = new Int32Array(2048);
  #slot = new Int32Array(2048).fill(EMPTY);

  get count(): number {
    return this.#count;
  }

  /** Positions of the vertices, degrees, by id (the first position given for each). */
  get x(): Float64Array {
    return this.#x.subarray(0, this.#count);
  }

  get y(): Float64Array {
    return this.#y.subarray(0, this.#count);
  }

  /** Id of the vertex at (x, y) degrees: an existing one within the snapping distance, else a new one. */
  idOf(x: number, y: number): number {
    const sx = x * SNAP_SCALE, sy = y * SNAP_SCALE;
    const kx = Math.round(sx), ky = Math.round(sy);
    const found = this.#find(kx, ky);
    if (found !== EMPTY) return found;
    const fx = sx - kx, fy = sy - ky;
    const nx = Math.abs(fx) > 0.5 - SNAP_MARGIN ? kx + Math.sign(fx) : kx;
    const ny = Math.abs(fy) > 0.5 - SNAP_MARGIN ? ky + Math.sign(fy) : ky;
    if (nx !== kx || ny !== ky) {
      for (const [cx, cy] of [[nx, ny], [nx, ky], [kx, ny]]) {
        const near = this.#find(cx, cy);
        if (near !== EMPTY) return near;
      }
    }
    return this.#add(x, y, kx, ky);
  }

  /** Bucket row of a latitude: vertices on one parallel share it. */
  static rowOf(y: number): number {
    return Math.round(y * SNAP_SCALE);
  }

  #find(kx: number, ky: number): number {
    const mask = this.#slot.length - 1;
    for (let h = hash(kx, ky) & mask; ; h = (h + 1) & mask) {
      const id = this.#slot[h];
      if (id === EMPTY || (this.#keyX[h] === kx && this.#keyY[h] === ky)) return id;
    }
  }

  #add(x: number, y: number, kx: number, ky: number): number {
    const id = this.#count++;
    if (id === this.#x.length) {
      this.#x = grown(this.#x);
      this.#y = grown(this.#y);
    }
    this.#x[id] = x;
    this.#y[id] = y;
    if (2 * this.#count > this.#slot.length) this.#rehash();
    this.#insert(kx, ky, id);
    return id;
  }

  #insert(kx: number, ky: number, id: number): void {
    const mask = this.#slot.length - 1;
    let h = hash(kx, ky) & mask;
    while (this.#slot[h] !== EMPTY) h = (h + 1) & mask;
    this.#slot[h] = id;
    this.#keyX[h] = kx;
    this.#keyY[h] = ky;
  }

  #rehash(): void {
    const { length } = this.#slot;
    const keyX = this.#keyX, keyY = this.#keyY, slot = this.#slot;
    this.#keyX = new Int32Array(2 * length);
    this.#keyY = new Int32Array(2 * length);
    this.#slot = new Int32Array(2 * length).fill(EMPTY);
    for (let h = 0; h < length; h++) if (slot[h] !== EMPTY) this.#insert(keyX[h], keyY[h], slot[h]);
  }
}

/** Multiplicative mixing of the two bucket indices (common practice for spatial hashing). */
function hash(kx: number, ky: number): number {
  return (Math.imul(kx, 0x9e3779b1) ^ Math.imul(ky, 0x85ebca77)) >>> 7;
}

function grown(a: Float64Array<ArrayBuffer>): Float64Array<ArrayBuffer> {
  const b = new Float64Array(2 * a.length);
  b.set(a);
  return b;
}
