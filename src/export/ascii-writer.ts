/**
 * Builds a large ASCII text (numbers, JSON punctuation, grid names) directly as bytes, handed out
 * in chunks of about `chunkBytes` so that a file of any size is written in bounded memory. Writing
 * a 60 MB GeoJSON file as millions of small strings spent most of its time in the garbage
 * collector; bytes copied into a buffer do not.
 */
const SHORT_PIECE = 48;
const MAX_DIGITS = 16;
/** Room past a full chunk for the pieces that complete it, so that a chunk's buffer seldom grows. */
const SLACK_BYTES = 1 << 14;

/** Bytes per chunk the exports hand out: large enough that per-chunk costs vanish, small beside any file. */
export const CHUNK_BYTES = 1 << 20;

export class AsciiWriter {
  private buffer: Uint8Array;
  private length = 0;

  constructor(private readonly chunkBytes = CHUNK_BYTES) {
    this.buffer = new Uint8Array(Math.max(64, chunkBytes + SLACK_BYTES));
  }

  /** Encodes ASCII text once, for pieces that are written many times. */
  static encode(text: string): Uint8Array {
    const bytes = new Uint8Array(text.length);
    for (let i = 0; i < text.length; i++) {
      const code = text.charCodeAt(i);
      if (code > 0x7f) throw new RangeError(`AsciiWriter: "${text.slice(0, 40)}" holds a non-ASCII character at ${i}.`);
      bytes[i] = code;
    }
    return bytes;
  }

  /** True once a chunk's worth is written: time to `take` it. */
  get full(): boolean {
    return this.length >= this.chunkBytes;
  }

  bytes(piece: Uint8Array): this {
    const n = piece.length;
    this.reserve(n);
    const buffer = this.buffer;
    const at = this.length;
    // TypedArray.set costs more than a short loop for the many small pieces.
    if (n > SHORT_PIECE) buffer.set(piece, at);
    else for (let i = 0; i < n; i++) buffer[at + i] = piece[i];
    this.length = at + n;
    return this;
  }

  /** A whole number 0 … 2^53 in decimal. */
  unsigned(value: number): this {
    this.reserve(MAX_DIGITS);
    const buffer = this.buffer;
    let digits = 1;
    for (let v = value; v >= 10; v = Math.floor(v / 10)) digits++;
    let at = this.length + digits;
    this.length = at;
    let v = value;
    do {
      buffer[--at] = 48 + (v % 10);
      v = Math.floor(v / 10);
    } while (v > 0);
    return this;
  }

  /** The bytes written since the last `take`, now the caller's; writing goes on into a new buffer. */
  take(): Uint8Array {
    const chunk = this.buffer.subarray(0, this.length);
    this.buffer = new Uint8Array(this.buffer.length);
    this.length = 0;
    return chunk;
  }

  private reserve(extra: number): void {
    if (this.length + extra <= this.buffer.length) return;
    let size = Math.max(64, this.buffer.length * 2);
    while (size < this.length + extra) size *= 2;
    const grown = new Uint8Array(size);
    grown.set(this.buffer.subarray(0, this.length));
    this.buffer = grown;
  }
}
