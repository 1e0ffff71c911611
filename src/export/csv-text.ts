/** A CSV field as RFC 4180 wants it: quoted only when it holds a comma, quote or line break. */
export function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** One CSV line (LF-terminated) from already formatted fields. */
export function csvLine(fields: readonly string[]): string {
  return fields.map(csvField).join(',') + '\n';
}

/** Fixed decimals for reproducible files; NaN (a measure that does not exist) becomes an empty field. */
export function fixed(value: number, decimals: number): string {
  if (Number.isNaN(value)) return '';
  const text = value.toFixed(decimals);
  return text.startsWith('-') && Number(text) === 0 ? text.slice(1) : text;
}

/** Like `fixed`, without trailing zeros: ages read as the chart prints them (538.8, not 538.800000). */
export function trimmed(value: number, decimals: number): string {
  const text = fixed(value, decimals);
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}

/** Decimals written for each kind of number (documented in the README's export contract). */
export const DECIMALS = { degrees: 6, areaKm2: 1, lengthKm: 3, ageMa: 6, richness: 3, coverage: 6 } as const;
