/**
 * Builds a large ASCII text (numbers, JSON punctuation, grid names) directly as bytes. Writing a
 * 60 MB GeoJSON file as millions of small strings spent most of its time in the garbage collector;
 * bytes copied into one growing buffer do not.
 */
const SHORT_PIECE = 48;
const MAX_DIGITS = 16;

export class AsciiWriter {
  private buffer: Uint8Array;
  private length = 0;

  constructor(initialBytes = 1 << 16) {
    this.buffer = new Uint8Array(Math.max(64, initialBytes));
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

  /** The bytes written so far (a view, valid until the next write). */
  result(): Uint8Array {
    return this.buffer.subarray(0, this.length);
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
