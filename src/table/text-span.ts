/**
 * True for the characters String.prototype.trim removes: ECMA-262 WhiteSpace (tab, vertical
 * tab, form feed, space, no-break space, byte-order mark, Unicode Zs) and LineTerminator.
 */
export function isTrimmable(c: number): boolean {
  if (c < 0x80) return c === 32 || (c >= 9 && c <= 13);
  return (
    c === 0xa0 || c === 0x1680 || (c >= 0x2000 && c <= 0x200a) || c === 0x2028 || c === 0x2029 ||
    c === 0x202f || c === 0x205f || c === 0x3000 || c === 0xfeff
  );
}

/** Start of text[start, end) without its leading whitespace (end when it is all whitespace). */
export function trimmedStart(text: string, start: number, end: number): number {
  while (start < end && isTrimmable(text.charCodeAt(start))) start++;
  return start;
}

/** End of text[start, end) without its trailing whitespace. */
export function trimmedEnd(text: string, start: number, end: number): number {
  while (end > start && isTrimmable(text.charCodeAt(end - 1))) end--;
  return end;
}
