/**
 * Offset of the first byte of the first ill-formed UTF-8 sequence in `bytes`, or -1 when all
 * are well formed. Follows the table of well-formed byte sequences, Unicode Standard §3.9,
 * Table 3-7 (no overlong forms, no surrogates, nothing above U+10FFFF). A sequence cut off by
 * the end of `bytes` counts as ill-formed only when `final` (more bytes may follow otherwise).
 */
export function findInvalidUtf8(bytes: Uint8Array, final = true): number {
  const n = bytes.length;
  let i = 0;
  while (i < n) {
    const b = bytes[i];
    if (b < 0x80) {
      i++;
      continue;
    }
    let len: number;
    let lo = 0x80;
    let hi = 0xbf;
    if (b >= 0xc2 && b <= 0xdf) len = 2;
    else if (b >= 0xe0 && b <= 0xef) {
      len = 3;
      if (b === 0xe0) lo = 0xa0;
      else if (b === 0xed) hi = 0x9f;
    } else if (b >= 0xf0 && b <= 0xf4) {
      len = 4;
      if (b === 0xf0) lo = 0x90;
      else if (b === 0xf4) hi = 0x8f;
    } else return i;
    for (let k = 1; k < len; k++) {
      if (i + k >= n) return final ? i : -1;
      const c = bytes[i + k];
      if (c < (k === 1 ? lo : 0x80) || c > (k === 1 ? hi : 0xbf)) return i;
    }
    i += len;
  }
  return -1;
}

/** Number of leading UTF-8 continuation bytes (10xxxxxx), at most 3: where a sequence may start. */
export function continuationPrefix(bytes: Uint8Array): number {
  let i = 0;
  while (i < 3 && i < bytes.length && (bytes[i] & 0xc0) === 0x80) i++;
  return i;
}

/**
 * Byte offset in the whole input of the first ill-formed sequence, when a strict decoder failed
 * on `chunk` (which starts at byte `offset`): the sequence may have begun in the last bytes of
 * the `previous` chunk.
 */
export function invalidUtf8Offset(previous: Uint8Array, chunk: Uint8Array, offset: number, final: boolean): number {
  const tail = previous.subarray(Math.max(0, previous.length - 4));
  const joined = new Uint8Array(tail.length + chunk.length);
  joined.set(tail);
  joined.set(chunk, tail.length);
  const from = continuationPrefix(joined);
  const at = findInvalidUtf8(joined.subarray(from), final);
  return offset - tail.length + from + Math.max(at, 0);
}
